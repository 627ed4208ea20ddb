package dev.soakfield.mesh.topo;

/**
 * Splits exterior faces into patches: two faces sharing an edge join the same patch when the angle
 * between their outward normals is below the feature angle. An edge shared by more than two
 * exterior faces (or a face too thin for a normal) joins nothing. Patches are numbered by their
 * lowest face index, so the result depends only on the face order.
 */
final class FeaturePatches {
  private final int[] patchOf;
  private final int patchCount;

  private FeaturePatches(int[] patchOf, int patchCount) {
    this.patchOf = patchOf;
    this.patchCount = patchCount;
  }

  /**
   * Splits the given faces into patches.
   *
   * @param faceRefs exterior tetrahedron faces (4 * tet + local face), outward orientation
   */
  static FeaturePatches split(
      double[] xyz, int[] tets, int nodesPerTet, int[] faceRefs, double featureAngleDeg) {
    int[] corner = new int[3 * faceRefs.length];
    for (int e = 0; e < faceRefs.length; e++) {
      for (int k = 0; k < 3; k++) {
        corner[3 * e + k] = TetFaces.corner(tets, nodesPerTet, faceRefs[e], k);
      }
    }
    return ofTriangles(xyz, corner, featureAngleDeg);
  }

  /**
   * Splits triangles given by their corner nodes (three a triangle, consistently oriented).
   *
   * @param corner node indices, 3 per triangle
   */
  static FeaturePatches ofTriangles(double[] xyz, int[] corner, double featureAngleDeg) {
    int m = corner.length / 3;
    double[] normal = new double[3 * m];
    boolean[] hasNormal = new boolean[m];
    for (int e = 0; e < m; e++) {
      hasNormal[e] =
          TetShape.unitNormal(
              xyz, corner[3 * e], corner[3 * e + 1], corner[3 * e + 2], normal, 3 * e);
    }
    int bits = RadixSort.bitsFor(xyz.length / 3);
    long[] keys = new long[3 * m];
    int[] owner = new int[3 * m];
    for (int e = 0; e < m; e++) {
      for (int k = 0; k < 3; k++) {
        int p = corner[3 * e + k];
        int q = corner[3 * e + (k + 1) % 3];
        keys[3 * e + k] = ((long) Math.min(p, q) << bits) | Math.max(p, q);
        owner[3 * e + k] = e;
      }
    }
    RadixSort.sort(keys, owner, 2 * bits);

    int[] parent = new int[m];
    for (int e = 0; e < m; e++) {
      parent[e] = e;
    }
    double limitRad = Math.toRadians(featureAngleDeg);
    int i = 0;
    while (i < keys.length) {
      int j = i + 1;
      while (j < keys.length && keys[j] == keys[i]) {
        j++;
      }
      if (j - i == 2) {
        int f = owner[i];
        int g = owner[i + 1];
        if (hasNormal[f] && hasNormal[g]) {
          double cos = TetShape.dot(normal, 3 * f, normal, 3 * g);
          if (Math.acos(Math.max(-1.0, Math.min(1.0, cos))) < limitRad) {
            union(parent, f, g);
          }
        }
      }
      i = j;
    }
    int[] patchOf = new int[m];
    int count = 0;
    for (int e = 0; e < m; e++) {
      int root = find(parent, e);
      // Roots are the lowest member (see union), and they are met before their members.
      patchOf[e] = root == e ? count++ : patchOf[root];
    }
    return new FeaturePatches(patchOf, count);
  }

  int patchCount() {
    return patchCount;
  }

  /** Patch (0-based) of the e-th face given to {@link #split}. */
  int patchOf(int e) {
    return patchOf[e];
  }

  private static int find(int[] parent, int x) {
    while (parent[x] != x) {
      parent[x] = parent[parent[x]];
      x = parent[x];
    }
    return x;
  }

  /** Hangs the higher root under the lower one, so every root is its set's lowest index. */
  private static void union(int[] parent, int x, int y) {
    int rx = find(parent, x);
    int ry = find(parent, y);
    if (rx < ry) {
      parent[ry] = rx;
    } else if (ry < rx) {
      parent[rx] = ry;
    }
  }
}
