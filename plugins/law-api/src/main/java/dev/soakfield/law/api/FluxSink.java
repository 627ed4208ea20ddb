package dev.soakfield.law.api;

/** Receives a face law's answer at one point. */
public interface FluxSink {
  /**
   * Records the flux and its derivative; a law calls it exactly once per {@link FaceLaw#flux} call,
   * with finite numbers (the solver stops the run, naming the law, if not).
   *
   * @param flux the flux into the part through the face, amount per m² per s (negative: out)
   * @param derivative ∂flux/∂c at the point, m/s: the Newton iteration's Jacobian entry
   */
  void set(double flux, double derivative);
}
