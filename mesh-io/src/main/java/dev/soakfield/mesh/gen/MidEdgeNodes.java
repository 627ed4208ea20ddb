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
    // Face edges join the table too, so a face that is no tetrahedron's face still gets its nodes.
    EdgeTable table =
        new EdgeTable(
            nodes,
            new int[][] {tets, faces},
            new int[] {4, 3},
            new int[][][] {TET_EDGES, FACE_EDGES});
    int edges = table.edgeCount();

    double[] xyz = Arrays.copyOf(linear.copyCoordinates(), 3 * (nodes + edges));
    int[] ends = table.endpoints();
    for (int e = 0; e < edges; e++) {
      int a = ends[2 * e];
      int b = ends[2 * e + 1];
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
        tets10[10 * t + 4 + k] = nodes + table.edge(a, b);
      }
    }
    int[] faces6 = new int[6 * faceCount];
    for (int f = 0; f < faceCount; f++) {
      System.arraycopy(faces, 3 * f, faces6, 6 * f, 3);
      for (int k = 0; k < 3; k++) {
        int a = faces[3 * f + FACE_EDGES[k][0]];
        int b = faces[3 * f + FACE_EDGES[k][1]];
        faces6[6 * f + 3 + k] = nodes + table.edge(a, b);
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
}
