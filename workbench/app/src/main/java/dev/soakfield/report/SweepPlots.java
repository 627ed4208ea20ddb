package dev.soakfield.report;

import dev.soakfield.fem.sweep.CaseRow;
import dev.soakfield.fem.sweep.CasesTable;
import dev.soakfield.mesh.AtomicFiles;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.knowm.xchart.BitmapEncoder;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.Styler;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * The pictures of a sweep, PNG files under {@code DIR/plots/}: each output against each numeric
 * varied key (one point per finished case), and the spread of every time-to-threshold as the
 * fraction of cases that crossed by each time (cases that never crossed keep the curve below 1).
 */
public final class SweepPlots {
  public static final String FOLDER = "plots";

  static {
    System.setProperty("java.awt.headless", "true");
  }

  private SweepPlots() {}

  /** Writes the pictures of {@code table} into {@code sweepFolder/plots}; the files written. */
  public static List<Path> write(CasesTable table, Path sweepFolder) throws IOException {
    Path folder = Files.createDirectories(sweepFolder.resolve(FOLDER));
    List<CaseRow> done = table.rows().stream().filter(CaseRow::finished).toList();
    List<Path> written = new ArrayList<>();
    for (int k = 0; k < table.keys().size(); k++) {
      double[] x = numbers(done, k);
      if (x.length == 0) {
        continue; // a key varied by text (units, words): no axis to plot along
      }
      String key = table.keys().get(k);
      for (String output : table.outputs()) {
        double[] y = done.stream().mapToDouble(r -> r.value(output)).toArray();
        if (Arrays.stream(y).noneMatch(Double::isFinite)) {
          continue;
        }
        Path png = folder.resolve(fileName(output + "-vs-" + key));
        scatter(png, output + " against " + key, key, titled(output), x, y, groups(table, done));
        written.add(png);
      }
    }
    for (String output : table.outputs()) {
      if (output.startsWith("threshold:")) {
        double[] t = done.stream().mapToDouble(r -> r.value(output)).toArray();
        if (Arrays.stream(t).anyMatch(Double::isFinite)) {
          Path png = folder.resolve(fileName("spread-" + output));
          spread(png, output, t);
          written.add(png);
        }
      }
    }
    return written;
  }

  /** The key's values as numbers, or none when any case gave it as text. */
  private static double[] numbers(List<CaseRow> rows, int key) {
    double[] v = new double[rows.size()];
    for (int i = 0; i < v.length; i++) {
      try {
        v[i] = Double.parseDouble(rows.get(i).values().get(key));
      } catch (NumberFormatException e) {
        return new double[0];
      }
    }
    return v;
  }

  /**
   * Each case's group: the values of the keys varied by text (a soak condition "85 degC"), so that
   * points of one level share a colour; one group when every key is a number.
   */
  static List<String> groups(CasesTable table, List<CaseRow> rows) {
    List<Integer> textKeys = new ArrayList<>();
    for (int k = 0; k < table.keys().size(); k++) {
      if (numbers(rows, k).length == 0 && !rows.isEmpty()) {
        textKeys.add(k);
      }
    }
    List<String> g = new ArrayList<>();
    for (CaseRow r : rows) {
      StringBuilder sb = new StringBuilder();
      for (int k : textKeys) {
        String v = r.values().get(k);
        sb.append(sb.length() > 0 ? ", " : "")
            .append(table.keys().get(k))
            .append(" = ")
            .append(v.startsWith("\"") && v.endsWith("\"") ? v.substring(1, v.length() - 1) : v);
      }
      g.add(sb.length() == 0 ? "cases" : sb.toString());
    }
    return g;
  }

  /** An axis title with the unit the sweep knows for sure: seconds for threshold times. */
  static String titled(String column) {
    return column.startsWith("threshold:") ? column + " [s]" : column;
  }

  /** Plain decimals for ordinary magnitudes, powers of ten for very small or large ones. */
  static String pattern(List<Double> values) {
    double max = 0;
    for (double v : values) {
      max = Math.max(max, Math.abs(v));
    }
    return max != 0 && (max < 1e-2 || max >= 1e5) ? "0.###E0" : "0.####";
  }

  /** A file name from a column name: letters, digits, dot, dash and underscore. */
  static String fileName(String name) {
    return name.replaceAll("[^A-Za-z0-9._-]+", "_") + ".png";
  }

  private static void scatter(
      Path png,
      String title,
      String xTitle,
      String yTitle,
      double[] x,
      double[] y,
      List<String> groups)
      throws IOException {
    XYChart chart = chart(title, xTitle, yTitle);
    java.util.Map<String, List<List<Double>>> byGroup = new java.util.LinkedHashMap<>();
    List<Double> allX = new ArrayList<>();
    List<Double> allY = new ArrayList<>();
    for (int i = 0; i < x.length; i++) {
      if (Double.isFinite(y[i])) {
        List<List<Double>> xy =
            byGroup.computeIfAbsent(
                groups.get(i), g -> List.of(new ArrayList<>(), new ArrayList<>()));
        xy.get(0).add(x[i]);
        xy.get(1).add(y[i]);
        allX.add(x[i]);
        allY.add(y[i]);
      }
    }
    chart.getStyler().setLegendVisible(byGroup.size() > 1);
    chart.getStyler().setXAxisDecimalPattern(pattern(allX));
    chart.getStyler().setYAxisDecimalPattern(pattern(allY));
    for (var e : byGroup.entrySet()) {
      XYSeries s = chart.addSeries(e.getKey(), e.getValue().get(0), e.getValue().get(1));
      s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
      s.setMarker(SeriesMarkers.CIRCLE);
    }
    save(png, chart);
  }

  private static void spread(Path png, String output, double[] times) throws IOException {
    double[] crossed = Arrays.stream(times).filter(Double::isFinite).sorted().toArray();
    int n = times.length;
    List<Double> xs = new ArrayList<>();
    List<Double> ys = new ArrayList<>();
    for (int i = 0; i < crossed.length; i++) {
      xs.add(crossed[i] / 3600);
      ys.add(i == 0 ? 0.0 : (double) i / n);
      xs.add(crossed[i] / 3600);
      ys.add((double) (i + 1) / n);
    }
    XYChart chart =
        chart(
            "Spread of " + output + " (" + crossed.length + " of " + n + " cases crossed)",
            "time [h]",
            "fraction of cases crossed by then");
    chart.getStyler().setLegendVisible(false);
    chart.getStyler().setYAxisMin(0.0).setYAxisMax(1.0).setYAxisDecimalPattern("0.00");
    chart.getStyler().setXAxisDecimalPattern(pattern(xs));
    XYSeries s = chart.addSeries("cases", xs, ys);
    s.setMarker(SeriesMarkers.NONE);
    save(png, chart);
  }

  private static XYChart chart(String title, String xTitle, String yTitle) {
    XYChart chart =
        new XYChartBuilder()
            .width(SeriesPlot.WIDTH)
            .height(SeriesPlot.HEIGHT)
            .title(title)
            .xAxisTitle(xTitle)
            .yAxisTitle(yTitle)
            .build();
    chart.getStyler().setLegendPosition(Styler.LegendPosition.InsideNE);
    return chart;
  }

  private static void save(Path png, XYChart chart) throws IOException {
    byte[] bytes = BitmapEncoder.getBitmapBytes(chart, BitmapEncoder.BitmapFormat.PNG);
    AtomicFiles.write(png, f -> Files.write(f, bytes));
  }
}
