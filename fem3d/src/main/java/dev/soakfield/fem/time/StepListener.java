package dev.soakfield.fem.time;

/** Hears of every accepted step, in order. */
@FunctionalInterface
public interface StepListener {
  /**
   * Called once per accepted step.
   *
   * @param t the time at the end of the step
   * @param dt the step length
   * @param outcome what the step produced
   * @param output true when t is one of the output times
   */
  void accepted(double t, double dt, StepOutcome outcome, boolean output);

  /**
   * Called once before the first step with the initial state, after prescribed values were raised;
   * {@code initial.faceInflow()} holds the amounts that raising added.
   */
  default void started(StepOutcome initial) {}

  /** Asked after every accepted step: true ends the run there (a stop condition was met). */
  default boolean stopRequested() {
    return false;
  }

  /**
   * Called when a tried step ending at {@code t} was rejected by the error estimate and will be
   * retried shorter; progress displays count these.
   */
  default void rejected(double t, double triedDt) {}
}
