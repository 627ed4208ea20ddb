package dev.soakfield.fem.post;

/**
 * The estimated error of a threshold's crossing time, in seconds, by its three sources: the error
 * in space of the watched value, its error in time (both turned into time by the value's rate of
 * change at the crossing, a first-order Taylor step: δt = δQ/|Q'|), and the error of placing the
 * crossing by a straight line inside its step, dt²·|Q''|/(8·|Q'|) (the largest gap between a
 * parabola and its chord, common practice).
 *
 * <p>The sum of the three sizes bounds the crossing time's error as far as each part is right: the
 * parts are sizes, so where the true space and time errors have opposite signs and cancel, the sum
 * overstates the true error, without limit when they cancel exactly. Each part is therefore
 * validated on its own (verify's AccuracyEstimates: the space part against runs with steps too
 * short to matter, the time part against a run on the same mesh with far shorter steps).
 *
 * @param space seconds from the watched value's error in space
 * @param time seconds from the watched value's error in time
 * @param interpolation seconds from placing the crossing by a straight line within its step
 */
public record ThresholdTimeError(double space, double time, double interpolation) {
  /**
   * The parts from the watched value's errors at the crossing step.
   *
   * @param valueSpaceError estimated error in space of the watched value at the crossing
   * @param valueTimeError estimated error in time of the watched value (NaN: none yet)
   * @param rate the watched value's rate of change over the crossing step
   * @param dt the crossing step's length
   * @param secondDerivative the watched value's Q'' (NaN: not known yet)
   */
  public static ThresholdTimeError of(
      double valueSpaceError,
      double valueTimeError,
      double rate,
      double dt,
      double secondDerivative) {
    double r = Math.abs(rate);
    if (r == 0) {
      double inf = Double.POSITIVE_INFINITY;
      return new ThresholdTimeError(inf, inf, inf);
    }
    double interpolation =
        Double.isNaN(secondDerivative) ? 0 : dt * dt * Math.abs(secondDerivative) / 8;
    return new ThresholdTimeError(
        valueSpaceError / r,
        (Double.isNaN(valueTimeError) ? 0 : valueTimeError) / r,
        interpolation / r);
  }

  /** The estimate the run states: the three parts added. */
  public double seconds() {
    return space + time + interpolation;
  }
}
