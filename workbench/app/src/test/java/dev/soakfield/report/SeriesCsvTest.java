package dev.soakfield.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.run.ResultFolderException;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SeriesCsvTest {
  @TempDir Path dir;

  @Test
  void quotedCellsFollowRfc4180() {
    // RFC 4180, section 2, rules 6 and 7: commas inside quotes, a doubled quote for a quote
    assertEquals(List.of("a", "b,c", "d\"e", ""), SeriesCsv.split("a,\"b,c\",\"d\"\"e\","));
  }

  @Test
  void columnsAreFoundByNameWhateverTheirOrderOrNumber() throws IOException {
    Path f =
        Files.writeString(
            dir.resolve("series.csv"),
            "time,new_column,amount,probe:core\n0,7,0,\n10,8,0.5,0.25\n20,9,0.75,0.5\n");
    SeriesCsv s = SeriesCsv.read(f);
    assertArrayEquals(new double[] {0, 0.5, 0.75}, s.column("amount").orElseThrow());
    assertEquals(List.of("core"), s.suffixes("probe:"));
    assertTrue(Double.isNaN(s.column("probe:core").orElseThrow()[0]), "an empty cell");
    assertEquals(0.5, s.last("probe:core"));
    assertEquals(9.0, s.max("new_column"));
    assertTrue(s.column("absent").isEmpty());
  }

  @Test
  void aRowThatDoesNotFitTheHeaderNamesItsLine() throws IOException {
    Path f = Files.writeString(dir.resolve("series.csv"), "time,amount\n0,0\n1\n");
    ResultFolderException e = assertThrows(ResultFolderException.class, () -> SeriesCsv.read(f));
    assertTrue(e.getMessage().contains("line 3: found 1 cells, expected 2"), e.getMessage());
  }

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
