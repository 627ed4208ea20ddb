package dev.soakfield.report;

import dev.soakfield.mesh.AtomicFiles;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.knowm.xchart.BitmapEncoder;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * A PNG of measured points and the fitted curve through them (XChart, drawn off-screen without a
 * display). The caller chooses the axes, e.g. weight gain against √time for weighing data.
 */
public final class FitPlot {
  static {
    System.setProperty("java.awt.headless", "true");
  }

  private FitPlot() {}

  /** One set of points or one curve, with the axis values already in display units. */
  public static final class Series {
    private final String label;
    private final double[] x;
    private final double[] y;

    /** A series of {@code x.length} points, copied. */
    public Series(String label, double[] x, double[] y) {
      if (x.length != y.length || x.length == 0) {
        throw new IllegalArgumentException(
            label + ": x and y must be non-empty and equal in length");
      }
      this.label = label;
      this.x = x.clone();
      this.y = y.clone();
    }
  }

  /**
   * Writes {@code target} (replaced only when the new image is complete) with the measured points
   * as markers and the fit as a line.
   */
  public static void write(
      Path target, String title, String xTitle, String yTitle, Series measured, Series fitted)
      throws IOException {
    XYChart chart =
        new XYChartBuilder()
            .width(900)
            .height(600)
            .title(title)
            .xAxisTitle(xTitle)
            .yAxisTitle(yTitle)
            .build();
    chart.getStyler().setLegendPosition(org.knowm.xchart.style.Styler.LegendPosition.InsideSE);
    XYSeries points = chart.addSeries(measured.label, measured.x, measured.y);
    points.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
    XYSeries line = chart.addSeries(fitted.label, fitted.x, fitted.y);
    line.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
    line.setMarker(SeriesMarkers.NONE);
    byte[] png = BitmapEncoder.getBitmapBytes(chart, BitmapEncoder.BitmapFormat.PNG);
    AtomicFiles.write(target, f -> Files.write(f, png));
  }
}
