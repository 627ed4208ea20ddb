package dev.soakfield.fem.post;

import java.util.Objects;

/**
 * Marching tetrahedra: the surface where a nodal scalar s equals a level, through linear
 * tetrahedra, with a second nodal field carried along by the same linear interpolation. A 10-node
 * tetrahedron is first split into 8 linear ones at its mid-edge nodes (4 corner tetrahedra and an
 * inner octahedron cut along one diagonal), so quadratic results are followed more closely than by
 * their corners alone.
 *
 * <p>Within a linear tetrahedron s is linear, so its level set is a plane: a triangle when one
 * corner lies on the other side from the rest, a quadrilateral (two triangles) when two do. The
 * corner where s equals the level exactly counts as above, so a surface is not drawn twice where it
 * runs along a face. Node order is MSH's (mid-edge nodes on (0,1), (1,2), (2,0), (3,0), (3,2),
 * (3,1)).
 */
public final class LevelCut {
  /** The 8 linear tetrahedra of a 10-node one, as local node indices. */
  static final int[][] SUB_TETS = {
    {0, 4, 6, 7}, {4, 1, 5, 9}, {6, 5, 2, 8}, {7, 9, 8, 3},
    // inner octahedron around the diagonal 4-8 (edge (0,1) to edge (3,2)); ring 5, 6, 7, 9
    {4, 8, 5, 6}, {4, 8, 6, 7}, {4, 8, 7, 9}, {4, 8, 9, 5}
  };

  private static final int[][] LINEAR = {{0, 1, 2, 3}};

  private LevelCut() {}

  /**
   * The level surface s = level with {@code carried} interpolated onto it.
   *
   * @param xyz node coordinates, 3 a node
   * @param tets connectivity, {@code nodesPerTet} a tetrahedron
   * @param nodesPerTet 4 or 10
   * @param s the scalar whose level is cut, one a node
   * @param level the level
   * @param carried the field to carry onto the surface, one a node (may be {@code s})
   * @param include which tetrahedra take part, one flag a tetrahedron, or an empty array for all
   */
  public static TriangleSoup cut(
      double[] xyz,
      int[] tets,
      int nodesPerTet,
      double[] s,
      double level,
      double[] carried,
      boolean[] include) {
    Objects.requireNonNull(xyz, "xyz");
    Objects.requireNonNull(tets, "tets");
    Objects.requireNonNull(s, "s");
    Objects.requireNonNull(carried, "carried");
    Objects.requireNonNull(include, "include");
    if (nodesPerTet != 4 && nodesPerTet != 10) {
      throw new IllegalArgumentException(
          "nodes per tetrahedron: found " + nodesPerTet + ", expected 4 or 10");
    }
    int nodes = xyz.length / 3;
    if (s.length != nodes || carried.length != nodes || tets.length % nodesPerTet != 0) {
      throw new IllegalArgumentException(
          "sizes: found "
              + nodes
              + " nodes, "
              + s.length
              + " level values, "
              + carried.length
              + " carried values, "
              + tets.length
              + " connectivity entries; expected one value a node and whole tetrahedra");
    }
    int count = tets.length / nodesPerTet;
    if (include.length != 0 && include.length != count) {
      throw new IllegalArgumentException(
          "include flags: found " + include.length + ", expected 0 or " + count);
    }
    if (!Double.isFinite(level)) {
      throw new IllegalArgumentException("level: found " + level + ", expected a finite number");
    }
    int[][] subs = nodesPerTet == 4 ? LINEAR : SUB_TETS;
    TriangleSoup.Builder out = new TriangleSoup.Builder();
    double[] p = new double[12];
    double[] v = new double[4];
    double[] sub = new double[4];
    int[] local = new int[4];
    for (int t = 0; t < count; t++) {
      if (include.length != 0 && !include[t]) {
        continue;
      }
      int base = t * nodesPerTet;
      // quick reject: all nodes on one side
      boolean anyAbove = false;
      boolean anyBelow = false;
      for (int k = 0; k < nodesPerTet; k++) {
        if (s[tets[base + k]] >= level) {
          anyAbove = true;
        } else {
          anyBelow = true;
        }
      }
      if (!anyAbove || !anyBelow) {
        continue;
      }
      for (int[] st : subs) {
        for (int k = 0; k < 4; k++) {
          local[k] = tets[base + st[k]];
          sub[k] = s[local[k]] - level;
        }
        cutLinear(xyz, carried, local, sub, t, p, v, out);
      }
    }
    return out.build();
  }

  /** Cuts one linear tetrahedron whose corners are {@code n} with level offsets {@code d}. */
  private static void cutLinear(
      double[] xyz,
      double[] carried,
      int[] n,
      double[] d,
      int tet,
      double[] p,
      double[] v,
      TriangleSoup.Builder out) {
    int mask = 0;
    for (int k = 0; k < 4; k++) {
      if (d[k] >= 0) {
        mask |= 1 << k;
      }
    }
    if (mask == 0 || mask == 15) {
      return;
    }
    int above = Integer.bitCount(mask);
    if (above == 1 || above == 3) {
      // the lone corner and its three edges
      int lone = Integer.numberOfTrailingZeros(above == 1 ? mask : ~mask & 15);
      int w = 0;
      for (int k = 0; k < 4; k++) {
        if (k != lone) {
          edge(xyz, carried, n, d, lone, k, w++, p, v);
        }
      }
      out.add(p, v, 0, 1, 2, tet);
    } else {
      // two above (a, b), two below (c, e): the quadrilateral a-c, a-e, b-e, b-c
      int a = -1;
      int b = -1;
      int c = -1;
      int e = -1;
      for (int k = 0; k < 4; k++) {
        if ((mask & (1 << k)) != 0) {
          if (a < 0) {
            a = k;
          } else {
            b = k;
          }
        } else if (c < 0) {
          c = k;
        } else {
          e = k;
        }
      }
      edge(xyz, carried, n, d, a, c, 0, p, v);
      edge(xyz, carried, n, d, a, e, 1, p, v);
      edge(xyz, carried, n, d, b, e, 2, p, v);
      edge(xyz, carried, n, d, b, c, 3, p, v);
      out.add(p, v, 0, 1, 2, tet);
      out.add(p, v, 0, 2, 3, tet);
    }
  }

  /** Point {@code slot} where the level crosses edge (i, j): linear interpolation of d to 0. */
  private static void edge(
      double[] xyz,
      double[] carried,
      int[] n,
      double[] d,
      int i,
      int j,
      int slot,
      double[] p,
      double[] v) {
    double w = d[i] / (d[i] - d[j]);
    int a = n[i];
    int b = n[j];
    for (int k = 0; k < 3; k++) {
      p[3 * slot + k] = xyz[3 * a + k] + w * (xyz[3 * b + k] - xyz[3 * a + k]);
    }
    v[slot] = carried[a] + w * (carried[b] - carried[a]);
  }
}
