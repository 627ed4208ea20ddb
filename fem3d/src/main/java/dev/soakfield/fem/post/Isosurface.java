package dev.soakfield.fem.post;

/** Isosurfaces of a nodal field: where the field equals a chosen level (marching tetrahedra). */
public final class Isosurface {
  private Isosurface() {}

  /**
   * The surface {@code field = level} over the included tetrahedra; each corner carries the level
   * itself (up to rounding).
   *
   * @see LevelCut#cut
   */
  public static TriangleSoup extract(
      double[] xyz, int[] tets, int nodesPerTet, double[] field, double level, boolean[] include) {
    return LevelCut.cut(xyz, tets, nodesPerTet, field, level, field, include);
  }
}
