package dev.soakfield.report;

import dev.soakfield.fem.results.Series;
import dev.soakfield.fem.units.DurationText;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The report's weight gain: what a balance would show, as a curve over time and a table, when the
 * run could weigh its amounts (every part has a density and the species' molar mass is known).
 */
final class WeightGainSection {
  static final String COLUMN = "weight_gain_percent";

  private WeightGainSection() {}

  static void write(ReportDocument doc, Series s, TimeAxis axis) throws IOException {
    if (!s.has(COLUMN)) {
      return;
    }
    doc.heading("Weight gain");
    double[] t = s.column("time").orElse(new double[s.rows()]);
    SeriesPlot plot = new SeriesPlot("Weight gain", "weight gain [%]", axis).time(t);
    plot.line("whole", s.require(COLUMN));
    for (String g : s.suffixes(COLUMN + ":")) {
      plot.line(g, s.require(COLUMN + ":" + g));
    }
    if (plot.hasData()) {
      doc.picture("report-weight-gain.png", "Weight gain over time (dry mass = 100 %)", plot.png());
    }
    double[] w = s.require(COLUMN);
    List<List<String>> rows = new ArrayList<>();
    for (int i : sampleRows(t)) {
      rows.add(List.of(DurationText.of(t[i]), String.format(Locale.ROOT, "%.4g", w[i])));
    }
    doc.table(List.of("time", "weight gain [%]"), rows);
  }

  /** Up to about ten rows spread evenly over the run's time, first and last included. */
  static List<Integer> sampleRows(double[] t) {
    List<Integer> out = new ArrayList<>();
    if (t.length == 0) {
      return out;
    }
    double end = t[t.length - 1];
    int next = 0;
    for (int k = 0; k <= 10; k++) {
      double target = t[0] + (end - t[0]) * k / 10;
      while (next < t.length - 1 && t[next] < target) {
        next++;
      }
      if (out.isEmpty() || out.get(out.size() - 1) != next) {
        out.add(next);
      }
    }
    return out;
  }
}
