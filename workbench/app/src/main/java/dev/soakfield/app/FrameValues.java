package dev.soakfield.app;

import dev.soakfield.fem.results.StoredRun;

/**
 * The values of a field in one frame as the view needs them. A nodal field is read as it is. A
 * per-element field is read per tetrahedron for the surface colours, and spread to the nodes (the
 * volume-weighted mean over the tetrahedra that share a node) where a cut or an isosurface needs
 * values at nodes.
 */
public final class FrameValues {
  private FrameValues() {}

  /** One value per node. */
  public static double[] nodal(StoredRun r, int frame, FieldKind k, PartGeometry g) {
    if (!k.perElement) {
      return r.field(frame, k.fileName);
    }
    return spreadToNodes(r.cellField(frame, k.fileName), g);
  }

  /** One value per tetrahedron; only for a per-element field. */
  public static double[] perElement(StoredRun r, int frame, FieldKind k) {
    if (!k.perElement) {
      throw new IllegalArgumentException(k + " is a nodal field");
    }
    return r.cellField(frame, k.fileName);
  }

  /** The volume-weighted mean of the element values around each node. */
  static double[] spreadToNodes(double[] perTet, PartGeometry g) {
    double[] sum = new double[g.nodeCount()];
    double[] weight = new double[g.nodeCount()];
    int n = g.nodesPerTet;
    for (int t = 0; t < perTet.length; t++) {
      double v = volume(g.xyz, g.tets, n * t);
      for (int k = 0; k < n; k++) {
        int node = g.tets[n * t + k];
        sum[node] += v * perTet[t];
        weight[node] += v;
      }
    }
    for (int i = 0; i < sum.length; i++) {
      sum[i] = weight[i] > 0 ? sum[i] / weight[i] : 0;
    }
    return sum;
  }

  /** Volume of the tetrahedron whose four corners start at {@code at} in the connectivity. */
  private static double volume(double[] xyz, int[] tets, int at) {
    int a = 3 * tets[at];
    double[] e = new double[9];
    for (int k = 0; k < 3; k++) {
      int b = 3 * tets[at + 1 + k];
      for (int c = 0; c < 3; c++) {
        e[3 * k + c] = xyz[b + c] - xyz[a + c];
      }
    }
    double det =
        e[0] * (e[4] * e[8] - e[5] * e[7])
            - e[1] * (e[3] * e[8] - e[5] * e[6])
            + e[2] * (e[3] * e[7] - e[4] * e[6]);
    return Math.abs(det) / 6;
  }
}
