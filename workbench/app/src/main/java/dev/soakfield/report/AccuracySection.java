package dev.soakfield.report;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The report's "Accuracy": the run's own estimate of its discretisation error at the last output
 * (summary.json's {@code accuracy}), for the uptake, each probe and each threshold time.
 */
final class AccuracySection {
  private AccuracySection() {}

  static void write(ReportDocument doc, JsonNode summary) {
    JsonNode a = summary.path("accuracy");
    if (!a.isObject()) {
      return; // a folder from before the estimate
    }
    doc.heading("Accuracy");
    doc.paragraph(
        "Estimated discretisation error at the last output: in space from the recovered gradient"
            + " (the fields' error_indicator, per element, shows where a finer mesh would help),"
            + " in time from the accepted steps. An estimate, not a bound: checked against exact"
            + " solutions to within a factor of 3 (soakfield verify).");
    List<List<String>> rows = new ArrayList<>();
    rows.add(List.of("uptake", relative(a.path("amount"))));
    for (Map.Entry<String, JsonNode> e : a.path("probes").properties()) {
      rows.add(List.of("probe " + e.getKey(), relative(e.getValue())));
    }
    for (Map.Entry<String, JsonNode> e : a.path("thresholds").properties()) {
      rows.add(
          List.of(
              "threshold " + e.getKey() + " (time)",
              e.getValue().isNumber()
                  ? String.format(Locale.ROOT, "± %.3g s", e.getValue().asDouble())
                  : "not crossed"));
    }
    doc.table(List.of("result", "estimated error"), rows);
  }

  private static String relative(JsonNode v) {
    return v.isNumber()
        ? String.format(Locale.ROOT, "%.2g %%", 100 * v.asDouble())
        : "no estimate (no change, or a value of 0)";
  }
}
