package dev.soakfield.fem.sweep;

import dev.soakfield.mesh.AtomicFiles;
import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Summary statistics of a sweep's numeric columns over its finished cases: how many cases have a
 * value and how many do not (a threshold never crossed, a time after the end), minimum, the 5th,
 * 25th, 50th, 75th and 95th percentiles, maximum, mean and standard deviation. Percentiles
 * interpolate linearly between order statistics (Hyndman and Fan, The American Statistician 50
 * (1996), definition 7). A threshold that a case never crossed counts as crossed after every time
 * (+∞, written "Infinity"): percentiles beyond the share of cases that crossed, the maximum, the
 * mean and the sd then say so rather than give a time from the crossed cases alone. Times after a
 * case's end (an {@code amount@} column) are left out.
 */
public final class SweepStatistics {
  public static final String FILE = "statistics.csv";

  static final double[] LEVELS = {0.05, 0.25, 0.50, 0.75, 0.95};

  /** One column's figures; NaN where no case has a value. */
  public record Column(
      String name,
      int cases,
      int missing,
      double min,
      double p5,
      double p25,
      double p50,
      double p75,
      double p95,
      double max,
      double mean,
      double sd) {}

  private final List<Column> columns;

  private SweepStatistics(List<Column> columns) {
    this.columns = List.copyOf(columns);
  }

  public List<Column> columns() {
    return columns;
  }

  /** The statistics of the numeric varied keys and of every output, over finished cases. */
  public static SweepStatistics of(CasesTable table) {
    List<CaseRow> done = table.rows().stream().filter(CaseRow::finished).toList();
    List<Column> out = new ArrayList<>();
    for (int k = 0; k < table.keys().size(); k++) {
      double[] v = new double[done.size()];
      boolean numeric = true;
      for (int i = 0; i < v.length && numeric; i++) {
        String cell = CasesTable.value(done.get(i).values().get(k));
        try {
          v[i] = Double.parseDouble(cell);
        } catch (NumberFormatException e) {
          numeric = false;
        }
      }
      if (numeric) {
        out.add(column(table.keys().get(k), v));
      }
    }
    for (String name : table.outputs()) {
      out.add(column(name, done.stream().mapToDouble(r -> r.value(name)).toArray()));
    }
    return new SweepStatistics(out);
  }

  static Column column(String name, double[] all) {
    // a threshold never crossed was crossed after the end, if ever: it counts as +∞, so that a
    // percentile the crossed cases alone cannot reach reads "not crossed", never a time too early
    boolean censored = name.startsWith("threshold:");
    double[] v =
        Arrays.stream(all)
            .map(x -> Double.isNaN(x) && censored ? Double.POSITIVE_INFINITY : x)
            .filter(x -> !Double.isNaN(x))
            .sorted()
            .toArray();
    double[] finite = Arrays.stream(v).filter(Double::isFinite).toArray();
    int n = finite.length;
    double mean = Double.NaN;
    double sd = Double.NaN;
    if (n > 0 && n == v.length) {
      double sum = 0;
      for (double x : finite) {
        sum += x;
      }
      mean = sum / n;
      double sq = 0;
      for (double x : finite) {
        sq += (x - mean) * (x - mean);
      }
      sd = n > 1 ? Math.sqrt(sq / (n - 1)) : Double.NaN;
    }
    boolean any = n > 0;
    return new Column(
        name,
        n,
        all.length - n,
        any ? v[0] : Double.NaN,
        any ? percentile(v, LEVELS[0]) : Double.NaN,
        any ? percentile(v, LEVELS[1]) : Double.NaN,
        any ? percentile(v, LEVELS[2]) : Double.NaN,
        any ? percentile(v, LEVELS[3]) : Double.NaN,
        any ? percentile(v, LEVELS[4]) : Double.NaN,
        any ? v[v.length - 1] : Double.NaN,
        mean,
        sd);
  }

  /** The p-quantile of sorted values, linear between order statistics; NaN when empty. */
  static double percentile(double[] sorted, double p) {
    int n = sorted.length;
    if (n == 0) {
      return Double.NaN;
    }
    double h = (n - 1) * p;
    int lo = (int) Math.floor(h);
    int hi = Math.min(lo + 1, n - 1);
    if (h == lo || sorted[hi] == sorted[lo]) {
      return sorted[lo];
    }
    return sorted[hi] == Double.POSITIVE_INFINITY
        ? Double.POSITIVE_INFINITY
        : sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
  }

  public void write(Path file) throws IOException {
    AtomicFiles.write(
        file,
        f -> {
          try (Writer w = Files.newBufferedWriter(f, StandardCharsets.UTF_8)) {
            w.write("column,cases,missing,min,p5,p25,p50,p75,p95,max,mean,sd\n");
            for (Column c : columns) {
              w.write(
                  String.join(
                          ",",
                          CasesTable.quote(c.name()),
                          Integer.toString(c.cases()),
                          Integer.toString(c.missing()),
                          SweepColumns.number(c.min()),
                          SweepColumns.number(c.p5()),
                          SweepColumns.number(c.p25()),
                          SweepColumns.number(c.p50()),
                          SweepColumns.number(c.p75()),
                          SweepColumns.number(c.p95()),
                          SweepColumns.number(c.max()),
                          SweepColumns.number(c.mean()),
                          SweepColumns.number(c.sd()))
                      + "\n");
            }
          }
        });
  }
}
