package dev.soakfield.fem.time;

/**
 * How time advances.
 *
 * @param end the simulated time to reach, s
 * @param outputs times at which fields are written (steps land on them exactly), ascending
 * @param crankNicolson θ = 1/2 after {@link #START_STEPS} backward-Euler steps; else backward Euler
 * @param tolerance adaptive steps: the local error allowed, relative to the field's scale; NaN for
 *     fixed steps
 * @param fixedStep fixed step length, s; NaN for adaptive steps
 * @param initialStep first adaptive step, s
 * @param maxStep longest step, s
 */
@SuppressWarnings("ArrayRecordComponent") // outputs is cloned in and out
public record TimeSettings(
    double end,
    double[] outputs,
    boolean crankNicolson,
    double tolerance,
    double fixedStep,
    double initialStep,
    double maxStep) {
  /** Backward-Euler steps before Crank–Nicolson takes over: they damp the start-up jump. */
  public static final int START_STEPS = 2;

  /**
   * The θ of a step: 1/2 under Crank–Nicolson once {@link #START_STEPS} backward-Euler steps have
   * been taken since the start or the last restart, else 1.
   */
  public static double thetaOfStep(boolean crankNicolson, int stepsSinceRestart) {
    return crankNicolson && stepsSinceRestart >= START_STEPS ? 0.5 : 1.0;
  }

  public TimeSettings {
    outputs = outputs.clone();
    if (!(end > 0)) {
      throw new IllegalArgumentException("end time must be positive");
    }
    if (Double.isNaN(tolerance) == Double.isNaN(fixedStep)) {
      throw new IllegalArgumentException("give either a tolerance or a fixed step");
    }
  }

  public boolean adaptive() {
    return !Double.isNaN(tolerance);
  }

  @Override
  public double[] outputs() {
    return outputs.clone();
  }
}
