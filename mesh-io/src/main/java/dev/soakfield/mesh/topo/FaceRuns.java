package dev.soakfield.mesh.topo;

/**
 * All tetrahedron faces and all file triangles, sorted by their sorted corner nodes, and cut into
 * runs of items with the same three corners. An item is a tetrahedron face {@code 4 * tet + local
 * face} (below {@link #tetFaceCount()}) or a triangle {@code tetFaceCount + tri}. Within a run the
 * tetrahedron faces come first, in (tet, local face) order, then the triangles in file order,
 * because the sort is stable.
 *
 * <p>Keys are three node indices packed into one long when they fit in 21 bits each; otherwise two
 * stable passes sort by the last two corners, then by the first one.
 */
final class FaceRuns {
  private final int tetFaceCount;
  private final int[] items;
  private final int[] runStart;
  private final int runCount;

  private FaceRuns(int tetFaceCount, int[] items, int[] runStart, int runCount) {
    this.tetFaceCount = tetFaceCount;
    this.items = items;
    this.runStart = runStart;
    this.runCount = runCount;
  }

  static FaceRuns build(
      int[] tets, int nodesPerTet, int[] tris, int nodesPerTri, int nodeCount, boolean forceWide) {
    int tetFaceCount = tets.length / nodesPerTet * 4;
    int n = tetFaceCount + tris.length / nodesPerTri;
    Corners corners = new Corners(tets, nodesPerTet, tris, nodesPerTri, tetFaceCount);
    int bits = RadixSort.bitsFor(nodeCount);
    long[] keys = new long[n];
    int[] items = new int[n];
    int[] abc = new int[3];
    boolean packed = 3 * bits <= 63 && !forceWide;
    for (int i = 0; i < n; i++) {
      items[i] = i;
      corners.sorted(i, abc);
      keys[i] =
          packed
              ? ((long) abc[0] << (2 * bits)) | ((long) abc[1] << bits) | abc[2]
              : ((long) abc[1] << 31) | abc[2];
    }
    if (packed) {
      RadixSort.sort(keys, items, 3 * bits);
    } else {
      RadixSort.sort(keys, items, 62);
      for (int i = 0; i < n; i++) {
        corners.sorted(items[i], abc);
        keys[i] = abc[0];
      }
      RadixSort.sort(keys, items, bits);
    }
    int[] runStart = new int[n + 1];
    int runCount = 0;
    int[] prev = {-1, -1, -1};
    for (int i = 0; i < n; i++) {
      corners.sorted(items[i], abc);
      if (abc[0] != prev[0] || abc[1] != prev[1] || abc[2] != prev[2]) {
        runStart[runCount++] = i;
        prev[0] = abc[0];
        prev[1] = abc[1];
        prev[2] = abc[2];
      }
    }
    runStart[runCount] = n;
    return new FaceRuns(tetFaceCount, items, runStart, runCount);
  }

  int tetFaceCount() {
    return tetFaceCount;
  }

  int runCount() {
    return runCount;
  }

  /** Position in {@link #item(int)} order where run {@code r} starts. */
  int runStart(int r) {
    return runStart[r];
  }

  /** Position one past the end of run {@code r}. */
  int runEnd(int r) {
    return runStart[r + 1];
  }

  int item(int position) {
    return items[position];
  }

  /** Reads the corner nodes of an item and sorts them ascending. */
  private static final class Corners {
    private final int[] tets;
    private final int nodesPerTet;
    private final int[] tris;
    private final int nodesPerTri;
    private final int tetFaceCount;

    Corners(int[] tets, int nodesPerTet, int[] tris, int nodesPerTri, int tetFaceCount) {
      this.tets = tets;
      this.nodesPerTet = nodesPerTet;
      this.tris = tris;
      this.nodesPerTri = nodesPerTri;
      this.tetFaceCount = tetFaceCount;
    }

    void sorted(int item, int[] out) {
      int a;
      int b;
      int c;
      if (item < tetFaceCount) {
        a = TetFaces.corner(tets, nodesPerTet, item, 0);
        b = TetFaces.corner(tets, nodesPerTet, item, 1);
        c = TetFaces.corner(tets, nodesPerTet, item, 2);
      } else {
        int base = (item - tetFaceCount) * nodesPerTri;
        a = tris[base];
        b = tris[base + 1];
        c = tris[base + 2];
      }
      if (a > b) {
        int t = a;
        a = b;
        b = t;
      }
      if (b > c) {
        int t = b;
        b = c;
        c = t;
      }
      if (a > b) {
        int t = a;
        a = b;
        b = t;
      }
      out[0] = a;
      out[1] = b;
      out[2] = c;
    }
  }
}
