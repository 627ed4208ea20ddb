package dev.soakfield.mesh.gen;

/**
 * The smallest dihedral angle among the six Kuhn tetrahedra {@link KuhnSplit} cuts a cell into,
 * from the cell's corner positions, so that a mesher can test a cell before it builds the mesh.
 */
final class KuhnAngles {
  private KuhnAngles() {}

  /** Smallest dihedral angle of the cell's tetrahedra, degrees. */
  static double smallest(double[] xyz, int[] corners, int cell) {
    double smallest = 180;
    double[][] p = new double[4][];
    for (int[] axes : KuhnSplit.AXIS_ORDERS) {
      int first = 1 << axes[0];
      int[] local = {0, first, first | (1 << axes[1]), 7};
      for (int k = 0; k < 4; k++) {
        int node = corners[8 * cell + local[k]];
        p[k] = new double[] {xyz[3 * node], xyz[3 * node + 1], xyz[3 * node + 2]};
      }
      smallest = Math.min(smallest, smallestOfTet(p));
    }
    return smallest;
  }

  /**
   * The dihedral angle at an edge is π less the angle between the outward normals of the two faces
   * meeting there; the orientation of the corners does not matter.
   */
  static double smallestOfTet(double[][] p) {
    double[][] normal = new double[4][];
    for (int f = 0; f < 4; f++) {
      double[] a = p[(f + 1) % 4];
      double[] n = cross(minus(p[(f + 2) % 4], a), minus(p[(f + 3) % 4], a));
      double away = dot(n, minus(p[f], a));
      double scale = (away > 0 ? -1 : 1) / Math.sqrt(dot(n, n));
      normal[f] = new double[] {n[0] * scale, n[1] * scale, n[2] * scale};
    }
    double largestCos = -1;
    for (int i = 0; i < 4; i++) {
      for (int j = i + 1; j < 4; j++) {
        largestCos = Math.max(largestCos, -dot(normal[i], normal[j]));
      }
    }
    return Math.toDegrees(Math.acos(Math.min(1, largestCos)));
  }

  private static double[] minus(double[] a, double[] b) {
    return new double[] {a[0] - b[0], a[1] - b[1], a[2] - b[2]};
  }

  private static double[] cross(double[] a, double[] b) {
    return new double[] {
      a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]
    };
  }

  private static double dot(double[] a, double[] b) {
    return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
  }
}
