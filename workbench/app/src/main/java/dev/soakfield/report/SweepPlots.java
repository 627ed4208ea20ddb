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
        scatter(png, output + " against " + key, key, output, x, y);
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

  /** A file name from a column name: letters, digits, dot, dash and underscore. */
  static String fileName(String name) {
    return name.replaceAll("[^A-Za-z0-9._-]+", "_") + ".png";
  }

  private static void scatter(
      Path png, String title, String xTitle, String yTitle, double[] x, double[] y)
      throws IOException {
    List<Double> xs = new ArrayList<>();
    List<Double> ys = new ArrayList<>();
    for (int i = 0; i < x.length; i++) {
      if (Double.isFinite(y[i])) {
        xs.add(x[i]);
        ys.add(y[i]);
      }
    }
    XYChart chart = chart(title, xTitle, yTitle);
    chart.getStyler().setLegendVisible(false);
    XYSeries s = chart.addSeries("cases", xs, ys);
    s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
    s.setMarker(SeriesMarkers.CIRCLE);
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
    chart.getStyler().setYAxisMin(0.0).setYAxisMax(1.0);
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
