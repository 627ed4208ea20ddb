package dev.soakfield.fem.solve;

import dev.soakfield.fem.assembly.CsrMatrix;

/**
 * A rectangular sparse matrix in compressed rows, for the AMG transfer operators and the products
 * that build coarse matrices. Package-private: arrays are shared, not copied.
 */
final class SparseRows {
  /** Fills rows [from, to) of a matrix into a collector, in order. */
  interface RowKernel {
    void fill(int from, int to, RowCollector out);
  }

  final int rows;
  final int columns;
  final int[] rowStart;
  final int[] cols;
  final double[] values;

  SparseRows(int rows, int columns, int[] rowStart, int[] cols, double[] values) {
    this.rows = rows;
    this.columns = columns;
    this.rowStart = rowStart;
    this.cols = cols;
    this.values = values;
  }

  /** Builds a matrix row by row, rows split over the cores, each part with its own collector. */
  static SparseRows build(int rows, int columns, int entriesPerRowGuess, RowKernel kernel) {
    int parts = RowSlices.slicesFor(rows);
    RowCollector[] collectors = new RowCollector[parts];
    RowSlices.run(
        parts,
        p -> {
          int from = RowSlices.start(rows, parts, p);
          int to = RowSlices.start(rows, parts, p + 1);
          RowCollector out = new RowCollector((to - from) * entriesPerRowGuess, to - from);
          kernel.fill(from, to, out);
          collectors[p] = out;
        });
    int total = 0;
    for (RowCollector c : collectors) {
      total += c.size();
    }
    int[] rowStart = new int[rows + 1];
    int[] cols = new int[total];
    double[] values = new double[total];
    int entry = 0;
    for (int p = 0; p < parts; p++) {
      collectors[p].copyInto(RowSlices.start(rows, parts, p), entry, rowStart, cols, values);
      entry += collectors[p].size();
    }
    return new SparseRows(rows, columns, rowStart, cols, values);
  }

  int nonZeros() {
    return cols.length;
  }

  /** y = S x. */
  void multiply(double[] x, double[] y) {
    int parts = RowSlices.slicesFor(rows);
    RowSlices.run(
        parts,
        p ->
            multiplyRows(
                x, y, RowSlices.start(rows, parts, p), RowSlices.start(rows, parts, p + 1), false));
  }

  /** y += S x. */
  void multiplyAdd(double[] x, double[] y) {
    int parts = RowSlices.slicesFor(rows);
    RowSlices.run(
        parts,
        p ->
            multiplyRows(
                x, y, RowSlices.start(rows, parts, p), RowSlices.start(rows, parts, p + 1), true));
  }

  private void multiplyRows(double[] x, double[] y, int from, int to, boolean add) {
    for (int i = from; i < to; i++) {
      double s = 0;
      for (int k = rowStart[i]; k < rowStart[i + 1]; k++) {
        s += values[k] * x[cols[k]];
      }
      y[i] = add ? y[i] + s : s;
    }
  }

  /** Sᵀ, with ascending columns in every row (a counting pass, then a scatter in row order). */
  SparseRows transpose() {
    int[] start = new int[columns + 1];
    for (int c : cols) {
      start[c + 1]++;
    }
    for (int c = 0; c < columns; c++) {
      start[c + 1] += start[c];
    }
    int[] next = start.clone();
    int[] tCols = new int[cols.length];
    double[] tValues = new double[cols.length];
    for (int i = 0; i < rows; i++) {
      for (int k = rowStart[i]; k < rowStart[i + 1]; k++) {
        int slot = next[cols[k]]++;
        tCols[slot] = i;
        tValues[slot] = values[k];
      }
    }
    return new SparseRows(columns, rows, start, tCols, tValues);
  }

  /** This square matrix with ascending columns as a {@link CsrMatrix}. */
  CsrMatrix toCsrMatrix() {
    if (rows != columns) {
      throw new IllegalStateException(rows + " x " + columns + " is not square");
    }
    CsrMatrix m = new CsrMatrix(rows, rowStart, cols);
    System.arraycopy(values, 0, m.values(), 0, values.length);
    return m;
  }
}
