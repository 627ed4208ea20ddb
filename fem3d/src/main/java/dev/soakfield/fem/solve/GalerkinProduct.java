package dev.soakfield.fem.solve;

import dev.soakfield.fem.assembly.CsrMatrix;

/**
 * Sparse products for the coarse matrix A_c = Pᵀ A P (row-by-row, dense accumulator per thread).
 */
final class GalerkinProduct {
  private GalerkinProduct() {}

  /** Pᵀ A P, given P and its transpose. */
  static CsrMatrix coarse(CsrMatrix a, SparseRows p, SparseRows pt) {
    SparseRows ap =
        multiply(
            a.size(), a.rowStart(), a.cols(), a.values(), p, false, a.nonZeros() / a.size() + 8);
    SparseRows c = multiply(pt.rows, pt.rowStart, pt.cols, pt.values, ap, true, 27);
    return c.toCsrMatrix();
  }

  /** L · R for L given by its arrays; rows sorted by column when asked. */
  static SparseRows multiply(
      int rows,
      int[] lStart,
      int[] lCols,
      double[] lValues,
      SparseRows r,
      boolean sorted,
      int entriesPerRowGuess) {
    int width = r.columns;
    return SparseRows.build(
        rows,
        width,
        entriesPerRowGuess,
        (from, to, out) -> {
          double[] acc = new double[width];
          int[] mark = new int[width];
          java.util.Arrays.fill(mark, -1);
          int[] touched = new int[64];
          for (int i = from; i < to; i++) {
            int count = 0;
            for (int k = lStart[i]; k < lStart[i + 1]; k++) {
              double lv = lValues[k];
              int j = lCols[k];
              for (int m = r.rowStart[j]; m < r.rowStart[j + 1]; m++) {
                int c = r.cols[m];
                double v = lv * r.values[m];
                if (mark[c] != i) {
                  mark[c] = i;
                  acc[c] = v;
                  if (count == touched.length) {
                    touched = java.util.Arrays.copyOf(touched, 2 * count);
                  }
                  touched[count++] = c;
                } else {
                  acc[c] += v;
                }
              }
            }
            for (int t = 0; t < count; t++) {
              out.put(touched[t], acc[touched[t]]);
            }
            out.endRow(sorted);
          }
        });
  }
}
