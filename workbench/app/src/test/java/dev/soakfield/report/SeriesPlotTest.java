package dev.soakfield.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;

/** A long series is drawn through its envelope; a short one point by point. */
class SeriesPlotTest {
  @Test
  void aLongSeriesKeepsItsEnvelopeAndEnds() {
    int n = 100_000;
    double[] t = new double[n];
    double[] v = new double[n];
    for (int i = 0; i < n; i++) {
      t[i] = i;
      v[i] = Math.sin(i * 1e-3);
    }
    v[54_321] = 10; // one step's spike
    v[777] = -5; // one step's trough
    int[] rows = SeriesPlot.drawn(t, v, 900);
    assertTrue(rows.length <= 4 * 900, "at most four rows a column: " + rows.length);
    assertTrue(rows.length >= 900, "at least one a column: " + rows.length);
    assertTrue(Arrays.binarySearch(rows, 54_321) >= 0, "the spike is drawn");
    assertTrue(Arrays.binarySearch(rows, 777) >= 0, "the trough is drawn");
    assertEquals(0, rows[0]);
    assertEquals(n - 1, rows[rows.length - 1]);
    for (int k = 1; k < rows.length; k++) {
      assertTrue(rows[k] > rows[k - 1], "in time order");
    }
    // every slice's highest value is among the drawn ones: the envelope is exact per column
    for (int c = 0; c < 900; c++) {
      int from = (int) ((long) n * c / 900);
      int to = (int) ((long) n * (c + 1) / 900);
      double max = Arrays.stream(v, from, to).max().orElseThrow();
      boolean found = false;
      for (int r : rows) {
        found |= r >= from && r < to && v[r] == max;
      }
      assertTrue(found, "column " + c);
    }
  }

  @Test
  void aShortSeriesIsDrawnWholeBarItsGaps() {
    double[] t = IntStream.range(0, 100).asDoubleStream().toArray();
    double[] v = t.clone();
    v[50] = Double.NaN; // a probe outside the mesh at one output
    int[] expected = IntStream.range(0, 100).filter(i -> i != 50).toArray();
    assertArrayEquals(expected, SeriesPlot.drawn(t, v, 900));
  }
}
