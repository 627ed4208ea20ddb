package dev.soakfield.fem.time;

/** Hears of every accepted step, in order. */
@FunctionalInterface
public interface StepListener {
  /**
   * @param t the time at the end of the step
   * @param dt the step length
   * @param outcome what the step produced
   * @param output true when t is one of the output times
   */
  void accepted(double t, double dt, StepOutcome outcome, boolean output);
}
