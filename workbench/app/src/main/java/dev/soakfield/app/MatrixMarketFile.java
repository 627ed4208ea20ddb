package dev.soakfield.app;

import dev.soakfield.fem.assembly.CsrMatrix;
import java.io.BufferedWriter;
import java.io.IOException;
import java.io.Writer;
import java.util.List;
import java.util.Locale;

/**
 * A sparse matrix in the Matrix Market coordinate format: "real symmetric" (entries on and below
 * the diagonal) when the matrix is symmetric to round-off, "real general" otherwise; 1-based.
 */
public final class MatrixMarketFile {
  /** Relative asymmetry up to which a matrix counts as symmetric (round-off of the assembly). */
  static final double SYMMETRY_TOLERANCE = 1e-12;

  private MatrixMarketFile() {}

  /**
   * Whether {@code a} equals its transpose within {@link #SYMMETRY_TOLERANCE} of its largest entry.
   */
  static boolean isSymmetric(CsrMatrix a) {
    int[] start = a.rowStart();
    int[] cols = a.cols();
    double[] v = a.values();
    double largest = 0;
    for (double x : v) {
      largest = Math.max(largest, Math.abs(x));
    }
    for (int i = 0; i < a.size(); i++) {
      for (int k = start[i]; k < start[i + 1]; k++) {
        int j = cols[k];
        int kt = a.indexOf(j, i);
        double t = kt < 0 ? 0 : v[kt];
        if (Math.abs(v[k] - t) > SYMMETRY_TOLERANCE * largest) {
          return false;
        }
      }
    }
    return true;
  }

  /** Writes {@code a} with the comment lines {@code comments}; returns the entries written. */
  public static long write(Writer w, CsrMatrix a, List<String> comments) throws IOException {
    boolean symmetric = isSymmetric(a);
    int[] start = a.rowStart();
    int[] cols = a.cols();
    double[] v = a.values();
    long entries = 0;
    for (int i = 0; i < a.size(); i++) {
      for (int k = start[i]; k < start[i + 1]; k++) {
        if (!symmetric || cols[k] <= i) {
          entries++;
        }
      }
    }
    BufferedWriter out = new BufferedWriter(w, 1 << 16);
    out.write(
        "%%MatrixMarket matrix coordinate real " + (symmetric ? "symmetric" : "general") + "\n");
    for (String c : comments) {
      out.write("% " + c.replace('\n', ' ') + "\n");
    }
    out.write(a.size() + " " + a.size() + " " + entries + "\n");
    for (int i = 0; i < a.size(); i++) {
      for (int k = start[i]; k < start[i + 1]; k++) {
        if (!symmetric || cols[k] <= i) {
          out.write(
              String.format(Locale.ROOT, "%d %d %s\n", i + 1, cols[k] + 1, Double.toString(v[k])));
        }
      }
    }
    out.flush();
    return entries;
  }
}
