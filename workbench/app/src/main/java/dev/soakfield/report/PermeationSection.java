package dev.soakfield.report;

import com.fasterxml.jackson.databind.JsonNode;
import dev.soakfield.fem.results.ResultUnits;
import dev.soakfield.fem.results.Series;
import dev.soakfield.fem.units.DurationText;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The report's permeation figures: the flux per unit area of every face group something flowed
 * through, over time (counted in the direction of its net flow at the end), and summary.json's
 * steady flux, time lag and breakthrough time of each.
 */
final class PermeationSection {
  private PermeationSection() {}

  static void write(ReportDocument doc, JsonNode summary, Series s, TimeAxis axis, ResultUnits u)
      throws IOException {
    JsonNode permeation = summary.path("permeation");
    if (!permeation.isObject() || permeation.isEmpty()) {
      return;
    }
    doc.heading("Permeation");
    String fluxUnit = u.amount() + "/(m²·s)";
    double[] t = s.column("time").orElse(new double[s.rows()]);
    SeriesPlot plot = new SeriesPlot("Flux per unit area", "flux [" + fluxUnit + "]", axis).time(t);
    List<List<String>> rows = new ArrayList<>();
    for (Map.Entry<String, JsonNode> e : permeation.properties()) {
      String group = e.getKey();
      JsonNode f = e.getValue();
      double area = f.path("area").asDouble(Double.NaN);
      boolean out = "out".equals(f.path("direction").asText());
      var rate = s.column("inflow_rate:" + group);
      if (rate.isPresent() && area > 0) {
        double[] flux = new double[t.length];
        for (int i = 0; i < flux.length; i++) {
          flux[i] = (out ? -1 : 1) * rate.get()[i] / area;
        }
        plot.line(group + (out ? " (out)" : " (in)"), flux);
      }
      rows.add(
          List.of(
              group,
              out ? "exit (outflow)" : "entry (inflow)",
              String.format(Locale.ROOT, "%.6g", area),
              number(f.path("steady_flux")),
              time(f.path("time_lag")),
              out ? time(f.path("breakthrough")) : "exit faces only"));
    }
    if (plot.hasData()) {
      doc.picture("report-permeation.png", "Flux per unit area over time", plot.png());
    }
    double share = permeation.elements().next().path("breakthrough_share").asDouble(0.1);
    doc.paragraph(
        "Steady flux: the flux at the end when it changed by less than 1 % over the last fifth"
            + " of the run. Time lag: where the straight line the cumulative flow approaches"
            + " crosses the time axis (Daynes–Barrer); an entry face's lies before the start."
            + " Breakthrough (exit faces): the first time the flux reached "
            + String.format(Locale.ROOT, "%.3g", 100 * share)
            + " % of the steady flux. \"not reached\" where the flux did not become steady.");
    doc.table(
        List.of(
            "face group",
            "direction",
            "area [m²]",
            "steady flux [" + fluxUnit + "]",
            "time lag",
            "breakthrough"),
        rows);
  }

  private static String number(JsonNode v) {
    return v.isNumber() ? String.format(Locale.ROOT, "%.6g", v.asDouble()) : "not reached";
  }

  private static String time(JsonNode v) {
    if (!v.isNumber()) {
      return "not reached";
    }
    double s = v.asDouble();
    return (s < 0 ? "−" + DurationText.of(-s) : DurationText.of(s))
        + String.format(Locale.ROOT, " (%.6g s)", s);
  }
}
