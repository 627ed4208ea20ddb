package dev.soakfield.fem.time;

/**
 * What the adaptive step control holds to the tolerance, per scheme.
 *
 * <p>Both schemes start from the same local estimate l: the difference between the new solution and
 * its linear extrapolation from the two previous states, times dt / (dt + dt_prev), about
 * (dt²/2)·|u''| (Gresho & Sani, Incompressible Flow and the Finite Element Method, 1998, §3.16).
 *
 * <p>Backward Euler (first order) is held to an error per unit step: l·(memory / dt) ≤ tol. Its
 * global error is about the sum of the local errors over the time diffusion needs to forget them,
 * the memory; dt ∝ tol then makes it fall in proportion to the tolerance. The memory is taken as a
 * tenth of the time since the start or the last kink of the boundary data: with the whole of that
 * time the error came out about a tenth of the tolerance (measured on the manufactured two-part
 * wall, 1.4e-4 at 1e-3), for ten times the steps; with a tenth the tolerance reads as the relative
 * error of the result, and the default tolerance costs about as many steps as the per-step rule
 * did. Holding l itself (error per step) would give dt ∝ √tol and a global error ∝ √tol. (Error per
 * unit step against error per step: common practice; e.g. E. Hairer, S. P. Nørsett, G. Wanner,
 * Solving Ordinary Differential Equations I, 2nd ed., 1993, §II.4, from memory.)
 *
 * <p>Crank–Nicolson (second order) is held to l per step: l ∝ dt², so dt ∝ √tol and its global
 * error, ∝ dt², falls in proportion to the tolerance already.
 */
public final class StepErrorRule {
  /** The share of the time since the start or the last kink over which local errors add up. */
  static final double MEMORY_SHARE = 0.1;

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
   * the field's scale) is {@code local}, ending {@code window} after the start or the last kink
   * (the memory is {@link #MEMORY_SHARE} of it).
   */
  double measure(double local, double dt, double window) {
    return perUnitStep ? local * Math.max(1, MEMORY_SHARE * window / dt) : local;
  }

  /**
   * The factor on dt that brings {@code measure} to the tolerance, with a safety margin: the
   * measure goes as dt where it is per unit step (the memory held), as dt² where it is per step
   * (Crank–Nicolson, and backward Euler while a step is longer than its memory, early in a run or
   * after a kink). Per unit step the factor follows the measure one to one, so the margin is wider
   * (0.6, not 0.9) and a step at most doubles ({@link #growthLimit}): with 0.9 and fourfold growth
   * the sample case rejected 60 of 190 steps (1515 solver iterations); with 0.6 and doubling, 3 of
   * 156 (1000 iterations).
   */
  double stepFactor(double tolerance, double measure, double dt, double window) {
    double ratio = tolerance / measure;
    if (perUnitStep) {
      return 0.6 * (MEMORY_SHARE * window > dt ? ratio : Math.sqrt(ratio));
    }
    return 0.9 * Math.sqrt(ratio);
  }

  /** The most a step may grow from one to the next. */
  double growthLimit() {
    return perUnitStep ? 2.0 : 4.0;
  }

  @Override
  public String toString() {
    return perUnitStep ? "error per unit step" : "error per step";
  }
}
