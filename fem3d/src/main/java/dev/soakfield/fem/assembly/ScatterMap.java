package dev.soakfield.fem.assembly;

import java.util.Arrays;

/**
 * For every element-matrix entry (i, j) of every tetrahedron or face, where it goes in the CSR
 * values: repeated assembly is then a pure scatter-add. The place is kept as the entry's offset
 * within its row, one byte when no row has more than 256 entries (a linear mesh has about 15 a row,
 * a quadratic one about 60), else as an int: 16 bytes per linear tetrahedron instead of 64, which
 * was the largest array of a run after the matrices.
 */
final class ScatterMap {
  private static final int BYTE_ROWS = 256;

  private final int[] rowStart;
  private final int[] conn;
  private final int per;
  private final byte[] offsets; // when every row fits a byte
  private final int[] positions; // else

  private ScatterMap(int[] rowStart, int[] conn, int per, byte[] offsets, int[] positions) {
    this.rowStart = rowStart;
    this.conn = conn;
    this.per = per;
    this.offsets = offsets;
    this.positions = positions;
  }

  /** The map of the elements {@code conn} ({@code per} nodes each) into the pattern. */
  static ScatterMap build(CsrMatrix pattern, int[] conn, int per, int threads, int minPart) {
    return build(pattern, conn, per, threads, minPart, BYTE_ROWS);
  }

  /** As above, with offsets in bytes only for rows of at most {@code byteRows} (tests: 0). */
  static ScatterMap build(
      CsrMatrix pattern, int[] conn, int per, int threads, int minPart, int byteRows) {
    int[] rs = pattern.rowStart();
    int widest = 0;
    for (int i = 0; i + 1 < rs.length; i++) {
      widest = Math.max(widest, rs[i + 1] - rs[i]);
    }
    int count = conn.length / per;
    boolean bytes = widest <= byteRows;
    byte[] offsets = bytes ? new byte[count * per * per] : null;
    int[] positions = bytes ? null : new int[count * per * per];
    int[] cols = pattern.cols();
    ParallelRanges.run(
        0,
        count,
        threads,
        minPart,
        (from, to) -> {
          for (int e = from; e < to; e++) {
            int base = e * per;
            int out = e * per * per;
            for (int i = 0; i < per; i++) {
              int row = conn[base + i];
              for (int j = 0; j < per; j++, out++) {
                int k = Arrays.binarySearch(cols, rs[row], rs[row + 1], conn[base + j]);
                if (bytes) {
                  offsets[out] = (byte) (k - rs[row]);
                } else {
                  positions[out] = k;
                }
              }
            }
          }
        });
    return new ScatterMap(rs, conn, per, offsets, positions);
  }

  /** values += scale · ke, the per × per matrix (row-major) of element {@code e}. */
  void add(double[] values, int e, double[] ke, double scale) {
    int base = e * per;
    int k = e * per * per;
    for (int i = 0; i < per; i++, k += per) {
      if (offsets != null) {
        int row = rowStart[conn[base + i]];
        for (int j = 0; j < per; j++) {
          values[row + (offsets[k + j] & 0xff)] += scale * ke[i * per + j];
        }
      } else {
        for (int j = 0; j < per; j++) {
          values[positions[k + j]] += scale * ke[i * per + j];
        }
      }
    }
  }

  /** values += scale · diag on the diagonal entries of element {@code e}. */
  void addDiagonal(double[] values, int e, double[] diag, double scale) {
    int base = e * per;
    for (int i = 0; i < per; i++) {
      int k = e * per * per + i * (per + 1);
      int at = offsets != null ? rowStart[conn[base + i]] + (offsets[k] & 0xff) : positions[k];
      values[at] += scale * diag[i];
    }
  }
}
