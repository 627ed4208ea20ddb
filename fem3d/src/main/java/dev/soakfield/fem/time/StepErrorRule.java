package dev.soakfield.fem.time;

/**
 * What the adaptive step control holds to the tolerance, per scheme.
 *
 * <p>Both schemes start from the same local estimate l: the difference between the new solution and
 * its linear extrapolation from the two previous states, times dt / (dt + dt_prev), about
 * (dt²/2)·|u''| (Gresho & Sani, Incompressible Flow and the Finite Element Method, 1998, §3.16).
 *
 * <p>Backward Euler (first order) is held to an error per unit step: l·(window / dt) ≤ tol, the
 * window being the time since the start or the last kink of the boundary data. Its global error is
 * about the sum of the local errors over the time diffusion needs to forget them, at most that
 * window, so it is then about tol, and dt ∝ tol makes it fall in proportion to the tolerance.
 * Holding l itself (error per step) would give dt ∝ √tol and a global error ∝ √tol. (Error per unit
 * step against error per step: common practice; e.g. E. Hairer, S. P. Nørsett, G. Wanner, Solving
 * Ordinary Differential Equations I, 2nd ed., 1993, §II.4, from memory.)
 *
 * <p>Crank–Nicolson (second order) is held to l per step: l ∝ dt², so dt ∝ √tol and its global
 * error, ∝ dt², falls in proportion to the tolerance already.
 */
public final class StepErrorRule {
  private final boolean perUnitStep;

  private StepErrorRule(boolean perUnitStep) {
    this.perUnitStep = perUnitStep;
  }

  /** The rule for a run's scheme. */
  public static StepErrorRule of(boolean crankNicolson) {
    return new StepErrorRule(!crankNicolson);
  }

  /** The old rule, error per step whatever the scheme: kept to show the checks catch it. */
  public static StepErrorRule perStep() {
    return new StepErrorRule(false);
  }

  /**
   * The measure held to the tolerance for a step of {@code dt} whose local estimate (relative to
   * the field's scale) is {@code local}, ending {@code window} after the start or the last kink.
   */
  double measure(double local, double dt, double window) {
    return perUnitStep ? local * Math.max(1, window / dt) : local;
  }

  /**
   * The factor on dt that brings {@code measure} to the tolerance, with a safety of 0.9: the
   * measure goes as dt (per unit step, the window held) or as dt² (per step).
   */
  double stepFactor(double tolerance, double measure) {
    double ratio = tolerance / measure;
    return 0.9 * (perUnitStep ? ratio : Math.sqrt(ratio));
  }

  @Override
  public String toString() {
    return perUnitStep ? "error per unit step" : "error per step";
  }
}
