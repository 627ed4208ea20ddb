package dev.soakfield.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class ReportPartsTest {
  @Test
  void theTimeAxisTakesTheLargestUnitSpannedTwice() {
    assertEquals(TimeAxis.SECONDS, TimeAxis.forEnd(100));
    assertEquals(TimeAxis.MINUTES, TimeAxis.forEnd(600));
    assertEquals(TimeAxis.HOURS, TimeAxis.forEnd(86400));
    assertEquals(TimeAxis.DAYS, TimeAxis.forEnd(604800));
  }

  @Test
  void markdownEscapesPipesAndHtmlEscapesMarkup() {
    ReportDocument d =
        new ReportDocument("t").table(List.of("a", "b"), List.of(List.of("x|y", "<b>")));
    assertTrue(d.toMarkdown().contains("| x\\|y | <b> |"), d.toMarkdown());
    assertTrue(d.toHtml().contains("<td>&lt;b&gt;</td>"), d.toHtml());
  }
}
