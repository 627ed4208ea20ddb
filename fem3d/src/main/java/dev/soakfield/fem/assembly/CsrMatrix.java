package dev.soakfield.fem.assembly;

import java.util.Arrays;
import java.util.stream.IntStream;

/**
 * A square sparse matrix in compressed-row storage (every row stored in full, columns ascending).
 * The pattern is fixed at creation; values are added in place by assemblers and read by solvers.
 * The arrays are exposed on purpose: assembly and solver kernels are plain loops over them.
 */
public final class CsrMatrix {
  /** Rows below which one thread is faster than two (thread hand-off costs more than the work). */
  private static final int PARALLEL_ROWS = 20_000;

  private final int n;
  private final int[] rowStart;
  private final int[] cols;
  private final double[] values;

  /**
   * @param n rows (and columns)
   * @param rowStart n + 1 offsets into {@code cols}
   * @param cols column indices, ascending and unique within each row
   */
  public CsrMatrix(int n, int[] rowStart, int[] cols) {
    if (rowStart.length != n + 1 || rowStart[0] != 0 || rowStart[n] != cols.length) {
      throw new IllegalArgumentException("row offsets do not fit " + n + " rows");
    }
    this.n = n;
    this.rowStart = rowStart;
    this.cols = cols;
    this.values = new double[cols.length];
  }

  /** A matrix with the same pattern (shared, read-only) and all values zero. */
  public CsrMatrix zeroCopy() {
    return new CsrMatrix(n, rowStart, cols);
  }

  public int size() {
    return n;
  }

  public int nonZeros() {
    return cols.length;
  }

  /** Row offsets (shared; do not modify). */
  public int[] rowStart() {
    return rowStart;
  }

  /** Column indices (shared; do not modify). */
  public int[] cols() {
    return cols;
  }

  /** The values, in pattern order; assemblers add into this array. */
  public double[] values() {
    return values;
  }

  /** Position of entry (row, col) in {@link #values()}, or -1 when it is not in the pattern. */
  public int indexOf(int row, int col) {
    int k = Arrays.binarySearch(cols, rowStart[row], rowStart[row + 1], col);
    return k >= 0 ? k : -1;
  }

  public double get(int row, int col) {
    int k = indexOf(row, col);
    return k < 0 ? 0.0 : values[k];
  }

  public void setZero() {
    Arrays.fill(values, 0.0);
  }

  /** this += scale * other; both must share this pattern. */
  public void addScaled(double scale, CsrMatrix other) {
    if (other.cols != cols && !Arrays.equals(other.cols, cols)) {
      throw new IllegalArgumentException("patterns differ");
    }
    double[] o = other.values;
    for (int k = 0; k < values.length; k++) {
      values[k] += scale * o[k];
    }
  }

  /** The diagonal entries. */
  public double[] diagonal() {
    double[] d = new double[n];
    for (int i = 0; i < n; i++) {
      d[i] = get(i, i);
    }
    return d;
  }

  /** y = A x, rows split over the available cores for large matrices. */
  public void multiply(double[] x, double[] y) {
    if (n < PARALLEL_ROWS) {
      multiplyRows(x, y, 0, n);
      return;
    }
    int parts = Math.max(1, Runtime.getRuntime().availableProcessors());
    IntStream.range(0, parts)
        .parallel()
        .forEach(
            p ->
                multiplyRows(
                    x, y, (int) ((long) n * p / parts), (int) ((long) n * (p + 1) / parts)));
  }

  private void multiplyRows(double[] x, double[] y, int from, int to) {
    for (int i = from; i < to; i++) {
      double s = 0;
      for (int k = rowStart[i]; k < rowStart[i + 1]; k++) {
        s += values[k] * x[cols[k]];
      }
      y[i] = s;
    }
  }
}
