package dev.soakfield.mesh.gen;

import dev.soakfield.mesh.TetMesh;

/**
 * Splits every cell of a {@link HexGrid} into the six Kuhn tetrahedra around the diagonal from
 * local corner 0 to local corner 7, and emits two outward triangles for each cell side that carries
 * a face group.
 *
 * <p>Kuhn tetrahedron for the axis order (a, b, c): corners 0, e_a, e_a + e_b, 7. Its face opposite
 * corner 7 lies on side (c, low) and its face opposite corner 0 on side (a, high); each side thus
 * receives exactly two triangles, split along the side's diagonal through the corner nearest local
 * corner 0.
 */
final class KuhnSplit {
  /** The six orders in which the path from corner 0 to corner 7 takes the three axes. */
  static final int[][] AXIS_ORDERS = {
    {0, 1, 2}, {0, 2, 1}, {1, 0, 2}, {1, 2, 0}, {2, 0, 1}, {2, 1, 0}
  };

  /** Faces of a positively oriented tetrahedron with outward right-hand normals. */
  private static final int[][] OUTWARD_FACES = {{1, 2, 3}, {0, 3, 2}, {0, 1, 3}, {0, 2, 1}};

  /** Returned by {@link #sideOf} for a triangle through the inside of the cell. */
  private static final int NOT_ON_SIDE = -1;

  private KuhnSplit() {}

  static TetMesh toTetMesh(HexGrid grid) {
    int cells = grid.cellCount();
    int faceSides = 0;
    for (int s : grid.sideGroup) {
      if (s != HexGrid.NO_FACE) {
        faceSides++;
      }
    }
    int[] tets = new int[cells * 24];
    int[] tetGroup = new int[cells * 6];
    int[] faces = new int[faceSides * 6];
    int[] faceGroup = new int[faceSides * 2];
    int[] local = new int[4];
    int[] node = new int[4];
    int t = 0;
    int f = 0;
    for (int cell = 0; cell < cells; cell++) {
      for (int[] axes : AXIS_ORDERS) {
        local[0] = 0;
        local[1] = 1 << axes[0];
        local[2] = local[1] | (1 << axes[1]);
        local[3] = 7;
        for (int k = 0; k < 4; k++) {
          node[k] = grid.corners[8 * cell + local[k]];
        }
        // The local frame may be left-handed (mirrored or mapped grids): fix the orientation here.
        if (signedVolume6(grid.xyz, node) < 0) {
          swap(local, 1, 2);
          swap(node, 1, 2);
        }
        System.arraycopy(node, 0, tets, 4 * t, 4);
        tetGroup[t++] = grid.cellGroup[cell];
        for (int[] tri : OUTWARD_FACES) {
          int side = sideOf(local[tri[0]], local[tri[1]], local[tri[2]]);
          int group = side == NOT_ON_SIDE ? HexGrid.NO_FACE : grid.sideGroup[6 * cell + side];
          if (group != HexGrid.NO_FACE) {
            faces[3 * f] = node[tri[0]];
            faces[3 * f + 1] = node[tri[1]];
            faces[3 * f + 2] = node[tri[2]];
            faceGroup[f++] = group;
          }
        }
      }
    }
    return new TetMesh.Builder()
        .nodes(grid.xyz)
        .order(1)
        .tets(tets, tetGroup)
        .faces(faces, faceGroup)
        .volumeGroups(grid.volumeGroups)
        .faceGroups(grid.faceGroups)
        .build();
  }

  /**
   * The cell side holding three local corners, or {@link #NOT_ON_SIDE}. Corners of one triangle on
   * a side agree in exactly one bit.
   */
  private static int sideOf(int c0, int c1, int c2) {
    int ones = c0 & c1 & c2;
    if (ones != 0) {
      return 2 * Integer.numberOfTrailingZeros(ones) + 1;
    }
    int zeros = ~(c0 | c1 | c2) & 7;
    if (zeros != 0) {
      return 2 * Integer.numberOfTrailingZeros(zeros);
    }
    return NOT_ON_SIDE;
  }

  private static double signedVolume6(double[] xyz, int[] n) {
    double ax = xyz[3 * n[1]] - xyz[3 * n[0]];
    double ay = xyz[3 * n[1] + 1] - xyz[3 * n[0] + 1];
    double az = xyz[3 * n[1] + 2] - xyz[3 * n[0] + 2];
    double bx = xyz[3 * n[2]] - xyz[3 * n[0]];
    double by = xyz[3 * n[2] + 1] - xyz[3 * n[0] + 1];
    double bz = xyz[3 * n[2] + 2] - xyz[3 * n[0] + 2];
    double cx = xyz[3 * n[3]] - xyz[3 * n[0]];
    double cy = xyz[3 * n[3] + 1] - xyz[3 * n[0] + 1];
    double cz = xyz[3 * n[3] + 2] - xyz[3 * n[0] + 2];
    return ax * (by * cz - bz * cy) - ay * (bx * cz - bz * cx) + az * (bx * cy - by * cx);
  }

  private static void swap(int[] a, int i, int j) {
    int tmp = a[i];
    a[i] = a[j];
    a[j] = tmp;
  }
}
