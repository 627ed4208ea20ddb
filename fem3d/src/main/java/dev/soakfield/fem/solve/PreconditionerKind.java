package dev.soakfield.fem.solve;

/** Which preconditioner {@link PcgSolver} builds for its matrix. */
public enum PreconditionerKind {
  /** Inverse diagonal: cheapest to build, good when the capacity term dominates (short steps). */
  JACOBI,
  /** Smoothed-aggregation algebraic multigrid, one V-cycle per application (long steps). */
  AMG,
  /**
   * Decided from the matrix at each {@link PcgSolver#setMatrix}; see {@link PreconditionerChoice}.
   */
  AUTO
}
