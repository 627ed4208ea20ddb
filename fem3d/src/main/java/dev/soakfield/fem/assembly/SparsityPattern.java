package dev.soakfield.fem.assembly;

import java.util.Arrays;

/**
 * Builds the CSR pattern of the space: entry (i, j) exists when nodes i and j share a tetrahedron
 * or a face. Faces are included so that face terms always find their entries.
 */
final class SparsityPattern {
  private static final long MAX_ARRAY = Integer.MAX_VALUE - 8;

  private SparsityPattern() {}

  static CsrMatrix build(FeSpace space, int threads, int minPart) {
    int n = space.dofCount();
    int[] tets = space.tetNodes();
    int[] faces = space.faceNodes();
    int perTet = space.nodesPerTet();
    int perFace = space.nodesPerFace();
    int tetCount = tets.length / perTet;
    // Node-to-element incidence; elements are tets 0..T-1, then faces T..T+F-1.
    int[] start = new int[n + 1];
    for (int v : tets) {
      start[v + 1]++;
    }
    for (int v : faces) {
      start[v + 1]++;
    }
    for (int i = 0; i < n; i++) {
      start[i + 1] += start[i];
    }
    int[] elems = new int[start[n]];
    int[] fill = Arrays.copyOf(start, n);
    for (int k = 0; k < tets.length; k++) {
      elems[fill[tets[k]]++] = k / perTet;
    }
    for (int k = 0; k < faces.length; k++) {
      elems[fill[faces[k]]++] = tetCount + k / perFace;
    }
    Incidence inc = new Incidence(start, elems, tets, faces, perTet, perFace, tetCount);

    int[] rowStart = new int[n + 1];
    ParallelRanges.run(
        0,
        n,
        threads,
        minPart,
        (from, to) -> {
          int[] mark = new int[n];
          Arrays.fill(mark, -1);
          for (int i = from; i < to; i++) {
            rowStart[i + 1] = inc.visitRow(i, mark, null, 0);
          }
        });
    long total = 0;
    for (int i = 0; i < n; i++) {
      total += rowStart[i + 1];
      if (total > MAX_ARRAY) {
        throw new IllegalArgumentException(
            "the matrix pattern would hold more than " + MAX_ARRAY + " entries");
      }
      rowStart[i + 1] = (int) total;
    }
    int[] cols = new int[(int) total];
    ParallelRanges.run(
        0,
        n,
        threads,
        minPart,
        (from, to) -> {
          int[] mark = new int[n];
          Arrays.fill(mark, -1);
          for (int i = from; i < to; i++) {
            inc.visitRow(i, mark, cols, rowStart[i]);
            Arrays.sort(cols, rowStart[i], rowStart[i + 1]);
          }
        });
    return new CsrMatrix(n, rowStart, cols);
  }

  /** Node-to-element incidence over tetrahedra and faces, with the connectivity it refers to. */
  private static final class Incidence {
    private final int[] start;
    private final int[] elems;
    private final int[] tets;
    private final int[] faces;
    private final int perTet;
    private final int perFace;
    private final int tetCount;

    Incidence(
        int[] start, int[] elems, int[] tets, int[] faces, int perTet, int perFace, int tetCount) {
      this.start = start;
      this.elems = elems;
      this.tets = tets;
      this.faces = faces;
      this.perTet = perTet;
      this.perFace = perFace;
      this.tetCount = tetCount;
    }

    /** Counts (and, when out is given, writes from {@code at}) the distinct neighbours of row i. */
    int visitRow(int i, int[] mark, int[] out, int at) {
      int count = 0;
      for (int k = start[i]; k < start[i + 1]; k++) {
        int e = elems[k];
        int[] conn = e < tetCount ? tets : faces;
        int per = e < tetCount ? perTet : perFace;
        int base = (e < tetCount ? e : e - tetCount) * per;
        for (int m = 0; m < per; m++) {
          int j = conn[base + m];
          if (mark[j] != i) {
            mark[j] = i;
            if (out != null) {
              out[at + count] = j;
            }
            count++;
          }
        }
      }
      return count;
    }
  }
}
