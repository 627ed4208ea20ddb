package dev.soakfield.mesh.gen;

/**
 * Cell counts for round parts that keep every tetrahedron well shaped. A Kuhn split of a cell whose
 * longest side is ρ times its shortest has a smallest dihedral angle of atan(1/ρ) (measured on
 * boxes: 14.0° at ρ = 4, 9.5° at ρ = 6), and no split of a thin cell does much better, since a
 * tetrahedron filling a thin layer is flat. So the counts of the coarse directions are raised until
 * no cell side is more than {@link #ASPECT} times the shortest one the given counts make; refining
 * never costs accuracy, only cells. A wall graded across keeps its radial count: its cells differ
 * in depth by design (rⁿ⁻¹), and raising the count would only thin the finest ones further, so
 * there only the around and axial sides are held to its thinnest cells.
 */
final class ShapeGuard {
  /**
   * Longest over shortest cell side allowed: atan(1/4) = 14°, above the 10° the meshers promise.
   */
  static final double ASPECT = 4;

  /**
   * The same for the O-grid of a cylinder, whose ring cells at the square's corners are skewed
   * quadrilaterals and so lose some of the margin (measured: 8.7° at ρ = 4 before this bound).
   */
  static final double SKEWED_ASPECT = 2.5;

  private ShapeGuard() {}

  /**
   * The counts {radial, around, axial} to mesh with.
   *
   * @param radialSizes the sizes across the wall the given radial count makes (graded or not)
   * @param innerArc the circumference where cells are narrowest around, m
   * @param outerArc the circumference where they are widest, m
   * @param height the axial length, m
   * @param counts {radial, around, axial} as given
   * @param aroundMultiple the around count stays a multiple of this
   */
  static int[] counts(
      double[] radialSizes,
      double innerArc,
      double outerArc,
      double height,
      int[] counts,
      int aroundMultiple,
      boolean radialGraded,
      double aspect) {
    double thinnest = Double.POSITIVE_INFINITY;
    double thickest = 0;
    for (double h : radialSizes) {
      thinnest = Math.min(thinnest, h);
      thickest = Math.max(thickest, h);
    }
    double shortest = Math.min(thinnest, Math.min(innerArc / counts[1], height / counts[2]));
    double longest = aspect * shortest;
    int radial = counts[0];
    if (thickest > longest && !radialGraded) {
      radial = (int) Math.ceil(counts[0] * thickest / longest);
    }
    int around = Math.max(counts[1], (int) Math.ceil(outerArc / longest));
    around = ((around + aroundMultiple - 1) / aroundMultiple) * aroundMultiple;
    int along = Math.max(counts[2], (int) Math.ceil(height / longest));
    return new int[] {radial, around, along};
  }

  /**
   * Applies {@code step} to the counts until they stop changing (raising one count changes the
   * sizes another is held to), at most a few times.
   */
  static int[] settle(int[] given, java.util.function.UnaryOperator<int[]> step) {
    int[] n = given;
    for (int pass = 0; pass < 8; pass++) {
      int[] next = step.apply(n);
      if (java.util.Arrays.equals(next, n)) {
        break;
      }
      n = next;
    }
    return n;
  }
}
