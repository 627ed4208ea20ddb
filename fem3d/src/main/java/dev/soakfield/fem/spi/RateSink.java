package dev.soakfield.fem.spi;

/** Receives a law's answer at one point. */
public interface RateSink {
  /**
   * Records the source and its derivative.
   *
   * @param rate the source π in amount per m³ per s over the step (negative: a sink)
   * @param derivative ∂π/∂c at the point, 1/s: the Newton iteration's Jacobian entry
   */
  void set(double rate, double derivative);
}
