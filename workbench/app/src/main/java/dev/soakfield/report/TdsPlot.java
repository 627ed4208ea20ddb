package dev.soakfield.report;

import dev.soakfield.mesh.AtomicFiles;
import java.awt.Color;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.knowm.xchart.BitmapEncoder;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.Styler;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * A thermal desorption spectrum: the desorption rate per unit area against temperature, one line
 * per heating rate, each peak marked (XChart, off-screen).
 */
public final class TdsPlot {
  private final String yTitle;
  private final Map<String, double[][]> lines = new LinkedHashMap<>();
  private final List<double[]> peaks = new ArrayList<>();

  /**
   * @param yTitle the vertical axis' title with its unit
   */
  public TdsPlot(String yTitle) {
    this.yTitle = yTitle;
  }

  /** Adds one heating rate's curve (ramp rows only) and its peaks {temperature, rate}. */
  public TdsPlot curve(String label, double[] temperature, double[] rate, List<double[]> marks) {
    if (temperature.length != rate.length || temperature.length == 0) {
      throw new IllegalArgumentException(label + ": temperature and rate differ in length");
    }
    lines.put(label, new double[][] {temperature.clone(), rate.clone()});
    peaks.addAll(marks);
    return this;
  }

  /** Writes the picture to {@code target}, replaced only when complete. */
  public void write(Path target) throws IOException {
    HeadlessAwt.ensure();
    XYChart chart =
        new XYChartBuilder()
            .width(SeriesPlot.WIDTH)
            .height(SeriesPlot.HEIGHT)
            .title("Thermal desorption")
            .xAxisTitle("temperature (K)")
            .yAxisTitle(yTitle)
            .build();
    Styler s = chart.getStyler();
    s.setChartBackgroundColor(Color.WHITE);
    s.setLegendPosition(Styler.LegendPosition.InsideNW);
    for (Map.Entry<String, double[][]> e : lines.entrySet()) {
      XYSeries line = chart.addSeries(e.getKey(), e.getValue()[0], e.getValue()[1]);
      line.setMarker(SeriesMarkers.NONE);
    }
    if (!peaks.isEmpty()) {
      double[] x = new double[peaks.size()];
      double[] y = new double[peaks.size()];
      for (int i = 0; i < x.length; i++) {
        x[i] = peaks.get(i)[0];
        y[i] = peaks.get(i)[1];
      }
      XYSeries marks = chart.addSeries("peaks", x, y);
      marks.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
    }
    byte[] png = BitmapEncoder.getBitmapBytes(chart, BitmapEncoder.BitmapFormat.PNG);
    AtomicFiles.write(target, f -> Files.write(f, png));
  }
}
