package dev.soakfield.fem.time;

/** Nodal sources q(φ) and ∂q/∂φ that Newton's method solves with: source laws, face laws. */
interface NodalSources {
  /**
   * q(φ) into {@code q} (amount per second per node) and ∂q/∂φ into {@code dq}, at the end of a
   * step [t1 − dt, t1] at temperature T1; both are overwritten.
   */
  void evaluate(double[] phi, double t1, double dt, double kelvin, double[] q, double[] dq);
}
