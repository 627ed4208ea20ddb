package dev.soakfield.report;

import com.fasterxml.jackson.databind.JsonNode;
import dev.soakfield.fem.units.DurationText;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/** The report's "Time to threshold": the case's single threshold and its list of thresholds. */
final class ThresholdSection {
  /** Probe rows of the first-time table at most: a report is read, not searched. */
  static final int MAX_PROBE_ROWS = 50;

  private ThresholdSection() {}

  static void write(ReportDocument doc, JsonNode summary, String unit) {
    doc.heading("Time to threshold");
    JsonNode th = summary.path("threshold");
    JsonNode list = summary.path("thresholds");
    if (!th.isObject() && !list.isArray()) {
      doc.paragraph("The case sets no threshold.");
      return;
    }
    if (th.isObject()) {
      single(doc, th, unit);
    }
    if (list.isArray()) {
      doc.paragraph(
          "The case's thresholds: the first time each watched value rises to its level or falls"
              + " below it (a part's value is its largest concentration, leaving out the nodes of"
              + " faces held at a set value; mean: is the part's mean):");
      List<List<String>> rows = new ArrayList<>();
      for (JsonNode t : list) {
        rows.add(
            List.of(
                t.path("name").asText(),
                t.path("where").asText(),
                t.path("when").asText() + " " + num(t.path("level").asDouble()) + " " + unit,
                when(t.path("time"))));
      }
      doc.table(List.of("threshold", "where", "level", "first time"), rows);
    }
  }

  private static void single(ReportDocument doc, JsonNode th, String unit) {
    doc.paragraph(
        "First time the concentration reaches "
            + th.path("value").asText()
            + " "
            + unit
            + ". For a part, the first node of it to get there; nodes on faces whose"
            + " concentration the case sets are left out, since they hold the face's value from"
            + " the start:");
    List<List<String>> rows = new ArrayList<>();
    int probes = 0;
    for (String kind : List.of("volume_groups", "probes")) {
      for (Map.Entry<String, JsonNode> e : th.path("first_time").path(kind).properties()) {
        boolean probe = kind.equals("probes");
        if (probe && ++probes > MAX_PROBE_ROWS) {
          continue;
        }
        rows.add(List.of(probe ? "probe" : "volume group", e.getKey(), when(e.getValue())));
      }
    }
    doc.table(List.of("where", "name", "first time"), rows);
    if (probes > MAX_PROBE_ROWS) {
      doc.paragraph(
          "The first "
              + MAX_PROBE_ROWS
              + " of "
              + probes
              + " probes (in the case's order); summary.json's threshold.first_time.probes has"
              + " every one.");
    }
  }

  private static String when(JsonNode v) {
    return v.isNumber()
        ? DurationText.of(v.asDouble()) + " (" + num(v.asDouble()) + " s)"
        : "not reached";
  }

  private static String num(double v) {
    return String.format(Locale.ROOT, "%.4g", v);
  }
}
