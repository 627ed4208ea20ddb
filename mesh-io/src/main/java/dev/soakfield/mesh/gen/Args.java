package dev.soakfield.mesh.gen;

/** Argument checks of the structured meshes, with messages a user can act on. */
final class Args {
  /** Largest Java array length that every JVM grants. */
  private static final long MAX_ARRAY = Integer.MAX_VALUE - 8;

  private Args() {}

  static double length(String what, double value) {
    if (!(value > 0) || Double.isInfinite(value)) {
      throw new IllegalArgumentException(
          what + ": found " + value + ", expected a positive length in metres");
    }
    return value;
  }

  static int count(String what, int value) {
    if (value <= 0) {
      throw new IllegalArgumentException(what + ": found " + value + ", expected a positive count");
    }
    return value;
  }

  static int order(int order) {
    if (order != 1 && order != 2) {
      throw new IllegalArgumentException(
          "element order: found " + order + ", expected 1 (linear) or 2 (quadratic)");
    }
    return order;
  }

  /**
   * Refuses meshes whose arrays would not fit a Java array, before anything is allocated. The
   * counts are doubles so that products of large counts cannot overflow.
   *
   * @param cells hexahedral cells (six tetrahedra each)
   * @param nodes corner nodes
   */
  static void size(double cells, double nodes, int order) {
    double tets = 6 * cells;
    double perTet = order == 1 ? 4 : 10;
    // Promotion adds at most six edge nodes per tetrahedron and sorts six edge keys per
    // tetrahedron.
    double allNodes = order == 1 ? nodes : nodes + 6 * tets;
    double keys = order == 1 ? 0 : 6 * tets;
    if (tets * perTet > MAX_ARRAY || 3 * allNodes > MAX_ARRAY || keys > MAX_ARRAY) {
      throw new IllegalArgumentException(
          String.format(
              "mesh size: found %.0f tetrahedra requested, expected at most about %d at order %d",
              tets, MAX_ARRAY / (order == 1 ? 4 : 18), order));
    }
  }
}
