package dev.soakfield.mesh.msh;

/**
 * The unit cube of the test files: 8 corners, six tetrahedra around the diagonal from (0,0,0) to
 * (1,1,1) (exact geometry: each has volume 1/6), and two outward triangles on each side. Node
 * numbers are 1-based file tags; corner tag n sits at bits (n-1) = x + 2y + 4z.
 */
final class CubeFixture {
  static final double[][] CORNERS = {
    {0, 0, 0}, {1, 0, 0}, {0, 1, 0}, {1, 1, 0}, {0, 0, 1}, {1, 0, 1}, {0, 1, 1}, {1, 1, 1}
  };

  static final int[][] TETS = {
    {1, 2, 4, 8}, {1, 6, 2, 8}, {1, 4, 3, 8}, {1, 3, 7, 8}, {1, 5, 6, 8}, {1, 7, 5, 8}
  };

  static final String[] SIDE_NAMES = {"x0", "x1", "y0", "y1", "z0", "z1"};

  /** Physical tag of side s is 11 + s; the volume's is 1 ("body"). */
  static final int[][][] SIDES = {
    {{1, 7, 3}, {1, 5, 7}},
    {{2, 4, 8}, {6, 2, 8}},
    {{1, 2, 6}, {1, 6, 5}},
    {{4, 3, 8}, {3, 7, 8}},
    {{1, 4, 2}, {1, 3, 4}},
    {{5, 6, 8}, {7, 5, 8}}
  };

  /** Quadratic cube: node tag 1 + i + 3j + 9k sits at (i/2, j/2, k/2). */
  static int gridTag(int corner) {
    int n = corner - 1;
    return 1 + 2 * (n & 1) + 6 * ((n >> 1) & 1) + 18 * ((n >> 2) & 1);
  }

  /** Tag of the grid node halfway between two corner tags. */
  static int midTag(int a, int b) {
    int ga = gridTag(a) - 1;
    int gb = gridTag(b) - 1;
    int i = (ga % 3 + gb % 3) / 2;
    int j = (ga / 3 % 3 + gb / 3 % 3) / 2;
    int k = (ga / 9 + gb / 9) / 2;
    return 1 + i + 3 * j + 9 * k;
  }

  /** The 10 grid tags of a tetrahedron in MSH order: corners, then edges 01 12 20 30 32 31. */
  static int[] tet10(int[] t) {
    return new int[] {
      gridTag(t[0]),
      gridTag(t[1]),
      gridTag(t[2]),
      gridTag(t[3]),
      midTag(t[0], t[1]),
      midTag(t[1], t[2]),
      midTag(t[2], t[0]),
      midTag(t[3], t[0]),
      midTag(t[3], t[2]),
      midTag(t[3], t[1])
    };
  }

  /** The 6 grid tags of a triangle in MSH order: corners, then edges 01 12 20. */
  static int[] tri6(int[] f) {
    return new int[] {
      gridTag(f[0]),
      gridTag(f[1]),
      gridTag(f[2]),
      midTag(f[0], f[1]),
      midTag(f[1], f[2]),
      midTag(f[2], f[0])
    };
  }

  private CubeFixture() {}
}
