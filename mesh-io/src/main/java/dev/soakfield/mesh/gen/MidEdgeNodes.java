package dev.soakfield.mesh.gen;

import dev.soakfield.mesh.TetMesh;
import java.util.Arrays;
import java.util.Objects;

/**
 * Promotes a linear mesh to a quadratic one by adding a node at the midpoint of every edge.
 *
 * <p>Edges are keys {@code (low << 32) | high} of their two node indices, sorted and made unique in
 * one {@code long[]}: no object per edge. The new node of the edge with rank e in that order gets
 * index {@code nodeCount + e}, so the numbering depends only on the input.
 */
public final class MidEdgeNodes {
  /** Corner pairs of the mid-edge nodes 4..9 of a 10-node tetrahedron (MSH order). */
  static final int[][] TET_EDGES = {{0, 1}, {1, 2}, {2, 0}, {3, 0}, {3, 2}, {3, 1}};

  /** Corner pairs of the mid-edge nodes 3..5 of a 6-node triangle. */
  static final int[][] FACE_EDGES = {{0, 1}, {1, 2}, {2, 0}};

  private static final long MAX_ARRAY = Integer.MAX_VALUE - 8;

  private MidEdgeNodes() {}

  /**
   * The order-2 mesh with the same nodes first, then one node per edge, and the same groups. Faces
   * use the same mid-edge nodes as the tetrahedra. An order-2 mesh is returned as it is.
   *
   * @throws IllegalArgumentException when the promoted mesh would not fit Java arrays
   */
  public static TetMesh promote(TetMesh linear) {
    Objects.requireNonNull(linear, "linear");
    if (linear.order() == 2) {
      return linear;
    }
    int nodes = linear.nodeCount();
    int tetCount = linear.tetCount();
    int faceCount = linear.faceCount();
    long keyCount = 6L * tetCount + 3L * faceCount;
    if (keyCount > MAX_ARRAY || 10L * tetCount > MAX_ARRAY || 3L * (nodes + keyCount) > MAX_ARRAY) {
      throw new IllegalArgumentException(
          "mesh to promote: found "
              + tetCount
              + " tetrahedra, expected a mesh whose quadratic form fits Java arrays");
    }
    int[] tets = linear.copyTets();
    int[] faces = linear.copyFaces();
    // Face edges join the keys too, so a face that is no tetrahedron's face still gets its nodes.
    long[] keys = new long[(int) keyCount];
    int p = 0;
    for (int t = 0; t < tetCount; t++) {
      for (int[] e : TET_EDGES) {
        keys[p++] = key(tets[4 * t + e[0]], tets[4 * t + e[1]]);
      }
    }
    for (int f = 0; f < faceCount; f++) {
      for (int[] e : FACE_EDGES) {
        keys[p++] = key(faces[3 * f + e[0]], faces[3 * f + e[1]]);
      }
    }
    Arrays.sort(keys);
    int edges = unique(keys);

    double[] xyz = Arrays.copyOf(linear.copyCoordinates(), 3 * (nodes + edges));
    for (int e = 0; e < edges; e++) {
      int a = (int) (keys[e] >>> 32);
      int b = (int) keys[e];
      int m = 3 * (nodes + e);
      xyz[m] = 0.5 * (xyz[3 * a] + xyz[3 * b]);
      xyz[m + 1] = 0.5 * (xyz[3 * a + 1] + xyz[3 * b + 1]);
      xyz[m + 2] = 0.5 * (xyz[3 * a + 2] + xyz[3 * b + 2]);
    }

    int[] tets10 = new int[10 * tetCount];
    for (int t = 0; t < tetCount; t++) {
      System.arraycopy(tets, 4 * t, tets10, 10 * t, 4);
      for (int k = 0; k < 6; k++) {
        int a = tets[4 * t + TET_EDGES[k][0]];
        int b = tets[4 * t + TET_EDGES[k][1]];
        tets10[10 * t + 4 + k] = nodes + Arrays.binarySearch(keys, 0, edges, key(a, b));
      }
    }
    int[] faces6 = new int[6 * faceCount];
    for (int f = 0; f < faceCount; f++) {
      System.arraycopy(faces, 3 * f, faces6, 6 * f, 3);
      for (int k = 0; k < 3; k++) {
        int a = faces[3 * f + FACE_EDGES[k][0]];
        int b = faces[3 * f + FACE_EDGES[k][1]];
        faces6[6 * f + 3 + k] = nodes + Arrays.binarySearch(keys, 0, edges, key(a, b));
      }
    }
    return new TetMesh.Builder()
        .nodes(xyz)
        .order(2)
        .tets(tets10, linear.copyTetGroups())
        .faces(faces6, linear.copyFaceGroups())
        .volumeGroups(linear.volumeGroups())
        .faceGroups(linear.faceGroups())
        .build();
  }

  /** Order-independent key of the edge between nodes a and b (both non-negative). */
  static long key(int a, int b) {
    int lo = Math.min(a, b);
    int hi = Math.max(a, b);
    return ((long) lo << 32) | hi;
  }

  /** Compacts a sorted array to its distinct values in front; returns how many there are. */
  private static int unique(long[] sorted) {
    if (sorted.length == 0) {
      return 0;
    }
    int n = 1;
    for (int i = 1; i < sorted.length; i++) {
      if (sorted[i] != sorted[n - 1]) {
        sorted[n++] = sorted[i];
      }
    }
    return n;
  }
}
