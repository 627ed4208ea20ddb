package dev.soakfield.app;

import java.util.Arrays;

/**
 * The outer surface of the shown parts: faces of shown tetrahedra that no other shown tetrahedron
 * shares, so hiding a part opens the faces it shared with its neighbours. Each face of a 10-node
 * tetrahedron is drawn as its four linear sub-triangles (through the mid-edge nodes), so quadratic
 * fields show their mid-edge values. Triangles point outward (right-hand normal).
 *
 * <p>Faces are matched in buckets of their smallest corner (see {@link #unsharedFaces}); the face
 * groups' faces, far fewer, by an open-addressing table.
 */
public final class BoundarySurface {
  /** Outward local faces of a positively oriented tetrahedron (corner 3 above face 0-1-2). */
  static final int[][] FACES = {{0, 2, 1}, {0, 1, 3}, {1, 2, 3}, {0, 3, 2}};

  /** MSH mid-edge node of edge (i, j) of a 10-node tetrahedron. */
  private static final int[][] MID = {{-1, 4, 6, 7}, {4, -1, 5, 9}, {6, 5, -1, 8}, {7, 9, 8, -1}};

  private final int[] triNodes;
  private final int[] triGroup;
  private final int[] triPart;
  private final int[] triTet;

  private BoundarySurface(int[] triNodes, int[] triGroup, int[] triPart, int[] triTet) {
    this.triNodes = triNodes;
    this.triGroup = triGroup;
    this.triPart = triPart;
    this.triTet = triTet;
  }

  /**
   * The boundary of the parts with {@code shown[part]} true.
   *
   * @param shown one flag a part; shorter arrays show the parts beyond their end
   */
  public static BoundarySurface of(PartGeometry g, boolean[] shown) {
    int per = g.nodesPerTet;
    int[] boundary = allShown(g, shown) ? exteriorFaces(g, per) : null;
    if (boundary == null) {
      boundary = unsharedFaces(g, shown, per);
    }
    int[] groupTable = faceGroupTable(g);
    int sub = per == 4 ? 1 : 4;
    int count = boundary.length;
    int[] a = new int[3];
    int[] b = new int[3];
    int[] nodes = new int[3 * sub * count];
    int[] group = new int[sub * count];
    int[] partOf = new int[sub * count];
    int[] tetOf = new int[sub * count];
    int n = 0;
    int gmask = groupTable.length - 1;
    for (int id : boundary) {
      int t = id / 4;
      int[] lf = FACES[id % 4];
      corners(g.tets, per, t, id % 4, a);
      int fg = -1;
      if (groupTable.length > 0) {
        int slot = hash(a) & gmask;
        while (groupTable[slot] != -1) {
          int face = groupTable[slot];
          faceCorners(g, face, b);
          if (a[0] == b[0] && a[1] == b[1] && a[2] == b[2]) {
            fg = g.faceGroupOfFace[face];
            break;
          }
          slot = (slot + 1) & gmask;
        }
      }
      int base = t * per;
      int c0 = g.tets[base + lf[0]];
      int c1 = g.tets[base + lf[1]];
      int c2 = g.tets[base + lf[2]];
      if (per == 4) {
        n = put(nodes, group, partOf, tetOf, n, c0, c1, c2, fg, g.tetPart[t], t);
      } else {
        int m01 = g.tets[base + MID[lf[0]][lf[1]]];
        int m12 = g.tets[base + MID[lf[1]][lf[2]]];
        int m20 = g.tets[base + MID[lf[2]][lf[0]]];
        n = put(nodes, group, partOf, tetOf, n, c0, m01, m20, fg, g.tetPart[t], t);
        n = put(nodes, group, partOf, tetOf, n, m01, c1, m12, fg, g.tetPart[t], t);
        n = put(nodes, group, partOf, tetOf, n, m20, m12, c2, fg, g.tetPart[t], t);
        n = put(nodes, group, partOf, tetOf, n, m01, m12, m20, fg, g.tetPart[t], t);
      }
    }
    return new BoundarySurface(nodes, group, partOf, tetOf);
  }

  /**
   * The faces (tetrahedron × 4 + local face) of shown tetrahedra that no other shown tetrahedron
   * shares. Faces are bucketed by their smallest corner (a counting sort) and matched within their
   * bucket by the other two corners: every pass runs through memory in order, where a hash table of
   * millions of faces paid a cache miss per probe and another to read the stored face back. A face
   * met a third time (a non-manifold mesh) stays on the surface.
   */
  static int[] unsharedFaces(PartGeometry g, boolean[] shown, int per) {
    int tets = g.tetCount();
    int[] start = new int[g.nodeCount() + 1];
    int[] c = new int[3];
    for (int t = 0; t < tets; t++) {
      if (isShown(g, shown, t)) {
        for (int f = 0; f < 4; f++) {
          corners(g.tets, per, t, f, c);
          start[c[0] + 1]++;
        }
      }
    }
    for (int v = 0; v < g.nodeCount(); v++) {
      start[v + 1] += start[v];
    }
    int total = start[g.nodeCount()];
    int[] ids = new int[total];
    int[] second = new int[total];
    int[] third = new int[total];
    int[] next = Arrays.copyOf(start, start.length - 1);
    for (int t = 0; t < tets; t++) {
      if (isShown(g, shown, t)) {
        for (int f = 0; f < 4; f++) {
          corners(g.tets, per, t, f, c);
          int p = next[c[0]]++;
          ids[p] = 4 * t + f;
          second[p] = c[1];
          third[p] = c[2];
        }
      }
    }
    boolean[] shared = new boolean[total];
    int unshared = total;
    for (int v = 0; v < g.nodeCount(); v++) {
      for (int i = start[v]; i < start[v + 1]; i++) {
        for (int j = i + 1; j < start[v + 1] && !shared[i]; j++) {
          if (!shared[j] && second[j] == second[i] && third[j] == third[i]) {
            shared[i] = true;
            shared[j] = true;
            unshared -= 2;
          }
        }
      }
    }
    int[] out = new int[unshared];
    int k = 0;
    for (int i = 0; i < total; i++) {
      if (!shared[i]) {
        out[k++] = ids[i];
      }
    }
    return out;
  }

  private static boolean allShown(PartGeometry g, boolean[] shown) {
    for (int p = 0; p < Math.min(shown.length, g.partNames().size()); p++) {
      if (!shown[p]) {
        return false;
      }
    }
    return true;
  }

  /**
   * With every part shown, the outer surface is the faces of the exterior face groups, which the
   * import fills with every exterior face (the untagged ones in a group of their own): finding each
   * one's tetrahedron through the tetrahedra around its smallest corner reads a few million numbers
   * where matching every tetrahedron face against every other reads tens of millions. The result is
   * the same faces in the same order as {@link #unsharedFaces}; null when the groups do not make a
   * closed surface of faces each of one tetrahedron (a mesh built without the import's rules), and
   * the caller matches faces instead.
   */
  static int[] exteriorFaces(PartGeometry g, int per) {
    int faces = g.faces.length / g.nodesPerFace;
    int count = 0;
    for (int f = 0; f < faces; f++) {
      count += g.exteriorGroup[g.faceGroupOfFace[f]] ? 1 : 0;
    }
    if (count == 0) {
      return null;
    }
    int nodes = g.nodeCount();
    int tets = g.tetCount();
    int[] start = new int[nodes + 1];
    for (int t = 0; t < tets; t++) {
      for (int k = 0; k < 4; k++) {
        start[g.tets[t * per + k] + 1]++;
      }
    }
    for (int v = 0; v < nodes; v++) {
      start[v + 1] += start[v];
    }
    int[] around = new int[start[nodes]];
    int[] next = Arrays.copyOf(start, nodes);
    for (int t = 0; t < tets; t++) {
      for (int k = 0; k < 4; k++) {
        around[next[g.tets[t * per + k]]++] = t;
      }
    }
    long[] keyed = new long[count]; // smallest corner, then face id: unsharedFaces' order
    long[] edges = new long[3 * count];
    int[] a = new int[3];
    int[] c = new int[3];
    int k = 0;
    for (int f = 0; f < faces; f++) {
      if (!g.exteriorGroup[g.faceGroupOfFace[f]]) {
        continue;
      }
      faceCorners(g, f, a);
      int id = -1;
      for (int i = start[a[0]]; i < start[a[0] + 1]; i++) {
        int t = around[i];
        for (int lf = 0; lf < 4; lf++) {
          corners(g.tets, per, t, lf, c);
          if (c[0] == a[0] && c[1] == a[1] && c[2] == a[2]) {
            if (id >= 0) {
              return null; // a face of two tetrahedra in an exterior group
            }
            id = 4 * t + lf;
          }
        }
      }
      if (id < 0) {
        return null; // a face of no tetrahedron
      }
      keyed[k] = ((long) a[0] << 32) | id;
      edges[3 * k] = ((long) a[0] << 32) | a[1];
      edges[3 * k + 1] = ((long) a[1] << 32) | a[2];
      edges[3 * k + 2] = ((long) a[0] << 32) | a[2];
      k++;
    }
    // a closed surface uses every edge an even number of times; a missing face leaves odd ones
    Arrays.sort(edges);
    for (int i = 0; i < edges.length; ) {
      int j = i;
      while (j < edges.length && edges[j] == edges[i]) {
        j++;
      }
      if ((j - i) % 2 != 0) {
        return null;
      }
      i = j;
    }
    Arrays.sort(keyed);
    int[] out = new int[count];
    for (int i = 0; i < count; i++) {
      out[i] = (int) keyed[i];
    }
    return out;
  }

  private static boolean isShown(PartGeometry g, boolean[] shown, int t) {
    int part = g.tetPart[t];
    return part >= shown.length || shown[part];
  }

  private static int put(
      int[] nodes,
      int[] group,
      int[] part,
      int[] tet,
      int n,
      int a,
      int b,
      int c,
      int fg,
      int p,
      int t) {
    nodes[3 * n] = a;
    nodes[3 * n + 1] = b;
    nodes[3 * n + 2] = c;
    group[n] = fg;
    part[n] = p;
    tet[n] = t;
    return n + 1;
  }

  private static int[] faceGroupTable(PartGeometry g) {
    int faces = g.faces.length / g.nodesPerFace;
    if (faces == 0) {
      return new int[0];
    }
    int[] table = new int[tableSize(faces)];
    Arrays.fill(table, -1);
    int mask = table.length - 1;
    int[] a = new int[3];
    for (int f = 0; f < faces; f++) {
      faceCorners(g, f, a);
      int slot = hash(a) & mask;
      while (table[slot] != -1) {
        slot = (slot + 1) & mask;
      }
      table[slot] = f;
    }
    return table;
  }

  private static void faceCorners(PartGeometry g, int face, int[] out) {
    int base = face * g.nodesPerFace;
    sort3(g.faces[base], g.faces[base + 1], g.faces[base + 2], out);
  }

  private static void corners(int[] tets, int per, int t, int f, int[] out) {
    int[] lf = FACES[f];
    int base = t * per;
    sort3(tets[base + lf[0]], tets[base + lf[1]], tets[base + lf[2]], out);
  }

  private static void sort3(int x, int y, int z, int[] out) {
    int lo = Math.min(x, Math.min(y, z));
    int hi = Math.max(x, Math.max(y, z));
    out[0] = lo;
    out[1] = x + y + z - lo - hi;
    out[2] = hi;
  }

  private static int hash(int[] k) {
    int h = k[0] * 0x9E3779B1;
    h = (h ^ (h >>> 15)) + k[1] * 0x85EBCA77;
    h = (h ^ (h >>> 13)) + k[2] * 0xC2B2AE3D;
    return h ^ (h >>> 16);
  }

  private static int tableSize(long entries) {
    long size = Long.highestOneBit(Math.max(16, 2 * entries - 1)) << 1;
    if (size > 1 << 30) {
      throw new IllegalArgumentException(
          "mesh too large for the surface table: " + entries + " faces");
    }
    return (int) size;
  }

  public int triangleCount() {
    return triGroup.length;
  }

  /** Mesh node of corner k (0..2) of triangle t. */
  public int node(int t, int k) {
    return triNodes[3 * t + k];
  }

  /** Face group index of triangle t, or -1 for a face no group holds (opened by a hidden part). */
  public int faceGroup(int t) {
    return triGroup[t];
  }

  /** Part (volume group) of the tetrahedron triangle t bounds. */
  public int part(int t) {
    return triPart[t];
  }

  /** Tetrahedron triangle t bounds. */
  public int tet(int t) {
    return triTet[t];
  }
}
