package dev.soakfield.mesh.gen;

/**
 * The round meshers' refusal to raise cell counts any further: the counts that keep every
 * tetrahedron's dihedral angles at 10° or more would make too large a mesh, or raising does not
 * settle (a grading whose cells differ too much for any counts). It carries the counts asked for
 * and those reached when the guard gave up.
 */
public final class CellCountsException extends IllegalArgumentException {
  private static final long serialVersionUID = 1L;

  private final int[] given;
  private final int[] reached;
  private final double tets;
  private final double cap;

  CellCountsException(int[] given, int[] reached, double tets, double cap) {
    super(
        String.format(
            "cells: found %s, whose tetrahedra would have dihedral angles under %.0f°, expected"
                + " counts that keep them at %.0f° or more within %,.0f tetrahedra; raising them"
                + " reached %s cells (%,.0f tetrahedra) without settling: the thinnest cell sets"
                + " the size of the others, so a gentler grading or fewer cells across needs"
                + " fewer, or keep the counts as given",
            joined(given),
            ShapeGuard.MIN_DIHEDRAL,
            ShapeGuard.MIN_DIHEDRAL,
            cap,
            joined(reached),
            tets));
    this.given = given.clone();
    this.reached = reached.clone();
    this.tets = tets;
    this.cap = cap;
  }

  /** The counts {radial, around, axial} asked for. */
  public int[] given() {
    return given.clone();
  }

  /** The counts {radial, around, axial} the guard had reached; the ones needed are no fewer. */
  public int[] reached() {
    return reached.clone();
  }

  /** Tetrahedra of a mesh with the {@link #reached} counts. */
  public double reachedTets() {
    return tets;
  }

  /** The most tetrahedra the guard raises a mesh to. */
  public double cap() {
    return cap;
  }

  /** Counts as a user writes them: radial,around,axial. */
  public static String joined(int[] counts) {
    return counts[0] + "," + counts[1] + "," + counts[2];
  }
}
