package dev.soakfield.fem.assembly;

/**
 * For every element-matrix entry (i, j) of every tetrahedron and face, its position in the CSR
 * values: repeated assembly is then a pure scatter-add. Costs one int per entry (16 per linear
 * tetrahedron, 100 per quadratic one).
 */
final class ScatterMap {
  private ScatterMap() {}

  /** Positions of the per × per entries of each element, element-major, row-major within. */
  static int[] build(CsrMatrix pattern, int[] conn, int per, int threads, int minPart) {
    int count = conn.length / per;
    int[] pos = new int[count * per * per];
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
              for (int j = 0; j < per; j++) {
                pos[out++] = pattern.indexOf(row, conn[base + j]);
              }
            }
          }
        });
    return pos;
  }
}
