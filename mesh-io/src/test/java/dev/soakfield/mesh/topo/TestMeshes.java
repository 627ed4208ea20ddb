package dev.soakfield.mesh.topo;

import dev.soakfield.mesh.RawMesh;
import java.util.function.IntUnaryOperator;

/** Raw meshes made by hand for the tests: boxes of cubes, single tetrahedra, triangles. */
final class TestMeshes {
  /** Axis permutations of the six-tetrahedron split of a cube; even ones first. */
  private static final int[][] PERMUTATIONS = {
    {0, 1, 2}, {1, 2, 0}, {2, 0, 1}, {0, 2, 1}, {1, 0, 2}, {2, 1, 0}
  };

  private TestMeshes() {}

  /** A box of nx * ny * nz cubes of side h at the origin. */
  static final class Grid {
    final int nx;
    final int ny;
    final int nz;
    final double h;

    Grid(int nx, int ny, int nz, double h) {
      this.nx = nx;
      this.ny = ny;
      this.nz = nz;
      this.h = h;
    }

    int node(int i, int j, int k) {
      return i + (nx + 1) * (j + (ny + 1) * k);
    }

    int nodeCount() {
      return (nx + 1) * (ny + 1) * (nz + 1);
    }

    int cell(int i, int j, int k) {
      return i + nx * (j + ny * k);
    }

    /**
     * Each cube split into six tetrahedra around its diagonal (0,0,0)-(1,1,1): path from the low
     * corner along the axes of a permutation. The path vectors e_p0, e_p0+e_p1, e_p0+e_p1+e_p2 have
     * the determinant of the permutation (exact geometry), so odd permutations get corners 1 and 2
     * swapped to come out positive, unless {@code reverseOdd} asks to leave every odd one inverted.
     * Tags come from {@code tagOfCell}; node ids are index + 1, tet ids 1000 + index.
     */
    RawMesh raw(IntUnaryOperator tagOfCell, boolean reverseOdd) {
      RawMesh raw = new RawMesh();
      raw.source = "grid.msh";
      raw.xyz = new double[3 * nodeCount()];
      raw.nodeIds = new long[nodeCount()];
      for (int k = 0; k <= nz; k++) {
        for (int j = 0; j <= ny; j++) {
          for (int i = 0; i <= nx; i++) {
            int n = node(i, j, k);
            raw.xyz[3 * n] = i * h;
            raw.xyz[3 * n + 1] = j * h;
            raw.xyz[3 * n + 2] = k * h;
            raw.nodeIds[n] = n + 1L;
          }
        }
      }
      int cells = nx * ny * nz;
      raw.tets = new int[24 * cells];
      raw.tetTags = new int[6 * cells];
      raw.tetIds = new long[6 * cells];
      int t = 0;
      for (int k = 0; k < nz; k++) {
        for (int j = 0; j < ny; j++) {
          for (int i = 0; i < nx; i++) {
            for (int p = 0; p < 6; p++) {
              int[] c = new int[] {i, j, k};
              int[] path = new int[4];
              path[0] = node(c[0], c[1], c[2]);
              for (int s = 0; s < 3; s++) {
                c[PERMUTATIONS[p][s]]++;
                path[s + 1] = node(c[0], c[1], c[2]);
              }
              boolean odd = p >= 3;
              if (odd && !reverseOdd) {
                int tmp = path[1];
                path[1] = path[2];
                path[2] = tmp;
              }
              System.arraycopy(path, 0, raw.tets, 4 * t, 4);
              raw.tetTags[t] = tagOfCell.applyAsInt(cell(i, j, k));
              raw.tetIds[t] = 1000L + t;
              t++;
            }
          }
        }
      }
      return raw;
    }

    /**
     * The two triangles the six-tetrahedron split leaves on side {@code side} (0 or 1) of cell (i,
     * j, k) across {@code axis}: every tetrahedron holds the cell diagonal, so the side's diagonal
     * runs through the cell's (0,0,0) corner on side 0 and through its (1,1,1) corner on side 1.
     */
    int[] sideTriangles(int i, int j, int k, int axis, int side) {
      return side(i, j, k, axis, side, false);
    }

    /** The same side cut along its other diagonal: triangles that match no tetrahedron face. */
    int[] wrongSideTriangles(int i, int j, int k, int axis, int side) {
      return side(i, j, k, axis, side, true);
    }

    private int[] side(int i, int j, int k, int axis, int side, boolean wrong) {
      int b = (axis + 1) % 3;
      int c = (axis + 2) % 3;
      int[] o = {i, j, k};
      o[axis] += side;
      int[] pb = o.clone();
      pb[b]++;
      int[] pc = o.clone();
      pc[c]++;
      int[] pbc = pb.clone();
      pbc[c]++;
      int n0 = node(o[0], o[1], o[2]);
      int nb = node(pb[0], pb[1], pb[2]);
      int nc = node(pc[0], pc[1], pc[2]);
      int nbc = node(pbc[0], pbc[1], pbc[2]);
      return wrong ? new int[] {nb, n0, nc, nb, nbc, nc} : new int[] {n0, nb, nbc, n0, nc, nbc};
    }
  }

  /** Adds triangles (3 nodes each) with one tag for all, ids from {@code firstId}. */
  static void addTriangles(RawMesh raw, int[] tris, int tag, long firstId) {
    int old = raw.triCount();
    int add = tris.length / 3;
    int[] conn = new int[raw.tris.length + tris.length];
    System.arraycopy(raw.tris, 0, conn, 0, raw.tris.length);
    System.arraycopy(tris, 0, conn, raw.tris.length, tris.length);
    int[] tags = java.util.Arrays.copyOf(raw.triTags, old + add);
    long[] ids = java.util.Arrays.copyOf(raw.triIds, old + add);
    for (int t = 0; t < add; t++) {
      tags[old + t] = tag;
      ids[old + t] = firstId + t;
    }
    raw.tris = conn;
    raw.triTags = tags;
    raw.triIds = ids;
  }

  /** A raw mesh of given nodes and 4-node tetrahedra, all with tag 1; ids index + 1. */
  static RawMesh tets(double[] xyz, int... tets) {
    RawMesh raw = new RawMesh();
    raw.source = "hand.msh";
    raw.xyz = xyz;
    raw.nodeIds = new long[xyz.length / 3];
    for (int i = 0; i < raw.nodeIds.length; i++) {
      raw.nodeIds[i] = i + 1L;
    }
    raw.tets = tets;
    raw.tetTags = new int[tets.length / 4];
    raw.tetIds = new long[tets.length / 4];
    for (int t = 0; t < raw.tetTags.length; t++) {
      raw.tetTags[t] = 1;
      raw.tetIds[t] = t + 1L;
    }
    return raw;
  }
}
