package dev.soakfield.law.api;

/** Receives a law's answer at one point. */
public interface RateSink {
  /**
   * Records the source and its derivative; a law calls it exactly once per {@link SourceLaw#rate}
   * call, with finite numbers (the solver stops the run, naming the law, if not).
   *
   * @param rate the source π in amount per m³ per s over the step (negative: a sink)
   * @param derivative ∂π/∂c at the point, 1/s: the Newton iteration's Jacobian entry
   */
  void set(double rate, double derivative);
}
