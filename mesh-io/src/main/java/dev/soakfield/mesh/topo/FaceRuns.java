package dev.soakfield.mesh.topo;

/**
 * All tetrahedron faces and all file triangles, grouped by their sorted corner nodes, and cut into
 * runs of items with the same three corners. An item is a tetrahedron face {@code 4 * tet + local
 * face} (below {@link #tetFaceCount()}) or a triangle {@code tetFaceCount + tri}. Within a run the
 * tetrahedron faces come first, in (tet, local face) order, then the triangles in file order.
 *
 * <p>Items are bucketed by their smallest corner with one counting pass (a node is the smallest
 * corner of a few dozen faces at most in any usable mesh), then each bucket is sorted by the other
 * two corners with insertion sort: two passes over memory instead of a full multi-pass sort, and no
 * limit on node numbers.
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

  static FaceRuns build(int[] tets, int nodesPerTet, int[] tris, int nodesPerTri, int nodeCount) {
    int tetFaceCount = tets.length / nodesPerTet * 4;
    int n = tetFaceCount + tris.length / nodesPerTri;
    Corners corners = new Corners(tets, nodesPerTet, tris, nodesPerTri, tetFaceCount);
    int[] smallest = new int[n];
    long[] rest = new long[n];
    int[] abc = new int[3];
    int[] bucketStart = new int[nodeCount + 1];
    for (int i = 0; i < n; i++) {
      corners.sorted(i, abc);
      smallest[i] = abc[0];
      rest[i] = ((long) abc[1] << 32) | abc[2];
      bucketStart[abc[0] + 1]++;
    }
    for (int v = 0; v < nodeCount; v++) {
      bucketStart[v + 1] += bucketStart[v];
    }
    int[] items = new int[n];
    long[] keys = new long[n]; // rest[] in bucket order, so each bucket sorts in place
    int[] fill = java.util.Arrays.copyOf(bucketStart, nodeCount);
    for (int i = 0; i < n; i++) {
      int p = fill[smallest[i]]++; // ascending item order within each bucket
      items[p] = i;
      keys[p] = rest[i];
    }
    int[] runStart = new int[n + 1];
    int runCount = 0;
    for (int v = 0; v < nodeCount; v++) {
      int s = bucketStart[v];
      int e = bucketStart[v + 1];
      sortBucket(items, keys, s, e);
      for (int p = s; p < e; p++) {
        if (p == s || keys[p] != keys[p - 1]) {
          runStart[runCount++] = p;
        }
      }
    }
    runStart[runCount] = n;
    return new FaceRuns(tetFaceCount, items, runStart, runCount);
  }

  /** Stable insertion sort of items[s..e) and their keys by key (the two larger corners). */
  private static void sortBucket(int[] items, long[] keys, int s, int e) {
    for (int p = s + 1; p < e; p++) {
      int item = items[p];
      long key = keys[p];
      int q = p - 1;
      while (q >= s && keys[q] > key) {
        items[q + 1] = items[q];
        keys[q + 1] = keys[q];
        q--;
      }
      items[q + 1] = item;
      keys[q + 1] = key;
    }
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
