package dev.soakfield.report;

import java.awt.Color;
import java.io.IOException;
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

/** A line chart of series against time, drawn off-screen to PNG bytes (XChart, no display). */
public final class SeriesPlot {
  static final int WIDTH = 900;
  static final int HEIGHT = 480;

  private final String title;
  private final String yTitle;
  private final TimeAxis axis;
  private final Map<String, double[]> lines = new LinkedHashMap<>();
  private double[] time = new double[0];

  /**
   * @param title the chart's title
   * @param yTitle the vertical axis' title with its unit
   * @param axis the unit of the time axis
   */
  public SeriesPlot(String title, String yTitle, TimeAxis axis) {
    this.title = title;
    this.yTitle = yTitle;
    this.axis = axis;
  }

  /** Sets the time values in seconds, shared by every line. */
  public SeriesPlot time(double[] seconds) {
    time = seconds.clone();
    return this;
  }

  /** Adds a line; NaN values (a probe outside the mesh) leave gaps. */
  public SeriesPlot line(String name, double[] values) {
    if (values.length != time.length) {
      throw new IllegalArgumentException(
          "line '" + name + "': " + values.length + " values for " + time.length + " times");
    }
    lines.put(name, values.clone());
    return this;
  }

  /** Whether any line has a finite value to draw. */
  public boolean hasData() {
    for (double[] v : lines.values()) {
      for (double x : v) {
        if (Double.isFinite(x)) {
          return true;
        }
      }
    }
    return false;
  }

  /** The chart as PNG bytes. */
  public byte[] png() throws IOException {
    HeadlessAwt.ensure();
    XYChart chart =
        new XYChartBuilder()
            .width(WIDTH)
            .height(HEIGHT)
            .title(title)
            .xAxisTitle("time (" + axis.unit() + ")")
            .yAxisTitle(yTitle)
            .build();
    Styler s = chart.getStyler();
    s.setChartBackgroundColor(Color.WHITE);
    s.setLegendPosition(Styler.LegendPosition.InsideNW);
    s.setLegendVisible(lines.size() > 1);
    for (Map.Entry<String, double[]> e : lines.entrySet()) {
      List<Double> x = new ArrayList<>();
      List<Double> y = new ArrayList<>();
      for (int i : drawn(time, e.getValue(), WIDTH)) {
        x.add(time[i] / axis.seconds());
        y.add(e.getValue()[i]);
      }
      if (x.isEmpty()) {
        continue;
      }
      XYSeries series = chart.addSeries(e.getKey(), x, y);
      series.setMarker(SeriesMarkers.NONE);
    }
    return BitmapEncoder.getBitmapBytes(chart, BitmapEncoder.BitmapFormat.PNG);
  }

  /**
   * The rows of a line worth drawing, in time order: all finite ones when there are few; else, in
   * each of {@code columns} equal slices of the rows, the first, the lowest, the highest and the
   * last. A chart {@code columns} pixels wide shows no more than that, and the line keeps its
   * envelope (every peak and trough); a run of 10⁵ steps drawn point by point kept the chart
   * library busy for a minute.
   */
  static int[] drawn(double[] time, double[] values, int columns) {
    int n = time.length;
    java.util.TreeSet<Integer> kept = new java.util.TreeSet<>();
    if (n <= 4 * columns) {
      for (int i = 0; i < n; i++) {
        if (Double.isFinite(values[i])) {
          kept.add(i);
        }
      }
    } else {
      for (int c = 0; c < columns; c++) {
        int from = (int) ((long) n * c / columns);
        int to = (int) ((long) n * (c + 1) / columns);
        int first = -1;
        int last = -1;
        int low = -1;
        int high = -1;
        for (int i = from; i < to; i++) {
          double v = values[i];
          if (!Double.isFinite(v)) {
            continue;
          }
          first = first < 0 ? i : first;
          last = i;
          low = low < 0 || v < values[low] ? i : low;
          high = high < 0 || v > values[high] ? i : high;
        }
        for (int i : new int[] {first, low, high, last}) {
          if (i >= 0) {
            kept.add(i);
          }
        }
      }
    }
    return kept.stream().mapToInt(Integer::intValue).toArray();
  }
}
