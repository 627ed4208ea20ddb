package dev.soakfield.fem.post;

/**
 * A plane section through the tetrahedra: the triangles where the plane n·x = offset crosses them,
 * with a nodal field interpolated onto it. Each tetrahedron's part of the plane is cut by its own
 * linear pieces, so a linear field is reproduced exactly.
 */
public final class SectionCut {
  private SectionCut() {}

  /**
   * The section by the plane {@code nx·x + ny·y + nz·z = offset}.
   *
   * @param include which tetrahedra take part, or an empty array for all
   * @throws IllegalArgumentException when the normal is zero or not finite
   */
  public static TriangleSoup cut(
      double[] xyz,
      int[] tets,
      int nodesPerTet,
      double[] field,
      double nx,
      double ny,
      double nz,
      double offset,
      boolean[] include) {
    double len = Math.sqrt(nx * nx + ny * ny + nz * nz);
    if (!(len > 0) || !Double.isFinite(len)) {
      throw new IllegalArgumentException(
          "section normal: found (" + nx + ", " + ny + ", " + nz + "), expected a non-zero vector");
    }
    int nodes = xyz.length / 3;
    double[] distance = new double[nodes];
    for (int i = 0; i < nodes; i++) {
      distance[i] = (nx * xyz[3 * i] + ny * xyz[3 * i + 1] + nz * xyz[3 * i + 2]) / len;
    }
    return LevelCut.cut(xyz, tets, nodesPerTet, distance, offset / len, field, include);
  }
}
