package dev.soakfield.report;

import dev.soakfield.fem.results.ResultUnits;
import dev.soakfield.fem.results.Series;
import dev.soakfield.fem.units.DurationText;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The report's trapped amounts per trap: the lattice amount and each source-law instance's trapped
 * amount ({@code trapped:<part>:<name>}) over time, and a table at the end of the run with each
 * trap's share of the whole amount.
 */
final class TrapSection {
  private TrapSection() {}

  /** The instance columns' suffixes ("part:name"); per-part columns have no second colon. */
  static List<String> instances(Series s) {
    List<String> out = new ArrayList<>();
    for (String suffix : s.suffixes("trapped:")) {
      if (suffix.contains(":")) {
        out.add(suffix);
      }
    }
    return out;
  }

  static void write(ReportDocument doc, Series s, TimeAxis axis, ResultUnits units)
      throws IOException {
    List<String> instances = instances(s);
    if (!s.has("lattice_amount") || instances.isEmpty()) {
      return;
    }
    doc.heading("Trapped amount per trap");
    double[] t = s.column("time").orElse(new double[s.rows()]);
    SeriesPlot plot =
        new SeriesPlot("Lattice and trapped amounts", "amount [" + units.amount() + "]", axis)
            .time(t);
    plot.line("lattice", s.require("lattice_amount"));
    for (String i : instances) {
      plot.line(i, s.require("trapped:" + i));
    }
    if (plot.hasData()) {
      doc.picture("report-traps.png", "Lattice amount and the amount each trap holds", plot.png());
    }
    double total = s.last("amount");
    List<List<String>> rows = new ArrayList<>();
    rows.add(
        List.of(
            "lattice", "", num(s.last("lattice_amount")), share(s.last("lattice_amount"), total)));
    for (String i : instances) {
      int colon = i.indexOf(':');
      double v = s.last("trapped:" + i);
      rows.add(List.of(i.substring(colon + 1), i.substring(0, colon), num(v), share(v, total)));
    }
    doc.paragraph(
        "At the last recorded time, t = "
            + DurationText.of(s.last("time"))
            + " (trap names as the case gives them):");
    doc.table(
        List.of("trap", "part", "amount [" + units.amount() + "]", "share of the whole amount [%]"),
        rows);
  }

  private static String num(double v) {
    return String.format(Locale.ROOT, "%.6g", v);
  }

  private static String share(double v, double total) {
    return total != 0 ? String.format(Locale.ROOT, "%.3g", 100 * v / total) : "";
  }
}
