package dev.soakfield.law.api;

/**
 * Where and when a law is evaluated: one node of one material at the end of a time step. The solver
 * reuses one instance; a law must not keep it beyond the call.
 */
public interface LawPoint {
  /** The mobile (lattice) concentration c = S·φ at the end of the step, amount per m³. */
  double concentration();

  /** Temperature at the end of the step, K. */
  double temperature();

  /** Time at the end of the step, s. */
  double time();

  /** Length of the step, s (positive). */
  double dt();
}
