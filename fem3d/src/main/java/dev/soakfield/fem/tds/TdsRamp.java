package dev.soakfield.fem.tds;

/**
 * The temperature programme of a thermal desorption (TDS) run: an optional rest at the start
 * temperature, then a linear ramp at a constant heating rate to the end temperature.
 *
 * @param startTemperature K
 * @param rest seconds at the start temperature before the ramp (0: none)
 * @param rate heating rate, K/s (positive)
 * @param endTemperature K, above the start temperature
 * @param maxStepChange the largest temperature change one time step may span, K: steps are no
 *     longer than this over the rate, so that no desorption peak falls between two steps
 */
public record TdsRamp(
    double startTemperature,
    double rest,
    double rate,
    double endTemperature,
    double maxStepChange) {
  /** The default largest temperature change per step, K. */
  public static final double DEFAULT_STEP_CHANGE = 0.5;

  public TdsRamp {
    if (!(startTemperature > 0) || !Double.isFinite(startTemperature)) {
      throw new IllegalArgumentException(
          "start temperature: found " + startTemperature + " K, expected above 0 K");
    }
    if (!(endTemperature > startTemperature) || !Double.isFinite(endTemperature)) {
      throw new IllegalArgumentException(
          "--to: found "
              + endTemperature
              + " K, expected a temperature above the start, "
              + startTemperature
              + " K");
    }
    if (!(rate > 0) || !Double.isFinite(rate)) {
      throw new IllegalArgumentException("--rate: found " + rate + " K/s, expected above 0");
    }
    if (!(rest >= 0) || !Double.isFinite(rest)) {
      throw new IllegalArgumentException("--rest: found " + rest + " s, expected 0 or more");
    }
    if (!(maxStepChange > 0) || !Double.isFinite(maxStepChange)) {
      throw new IllegalArgumentException(
          "--max-step-change: found " + maxStepChange + " K, expected above 0");
    }
  }

  /** When the ramp ends, s from the start of the run. */
  public double end() {
    return rest + (endTemperature - startTemperature) / rate;
  }

  /** The longest time step, s. */
  public double maxStep() {
    return maxStepChange / rate;
  }

  /** The same programme at another heating rate. */
  public TdsRamp atRate(double newRate) {
    return new TdsRamp(startTemperature, rest, newRate, endTemperature, maxStepChange);
  }
}
