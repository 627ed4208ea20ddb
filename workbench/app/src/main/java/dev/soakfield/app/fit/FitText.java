package dev.soakfield.app.fit;

import dev.soakfield.fem.fit.Estimate;
import dev.soakfield.fem.units.DurationText;
import dev.soakfield.fem.units.SiValue;
import dev.soakfield.fem.units.UnitException;

/** How the fits' text output writes values, intervals and durations. */
final class FitText {
  private FitText() {}

  /** A value in another unit of the same dimension; the units here are fixed and compatible. */
  static double in(double si, String siUnit, String unit) {
    try {
      return SiValue.fromSi(si, siUnit, unit);
    } catch (UnitException e) {
      throw new IllegalStateException(e);
    }
  }

  static String mg(double kg) {
    return SiValue.formatNumber(kg * 1e6) + " mg";
  }

  /** A duration in s, min or h, whichever reads best. */
  static String time(double s) {
    DurationText.Scaled d = DurationText.scaled(s, Double.POSITIVE_INFINITY);
    return SiValue.formatNumber(d.value()) + " " + d.unit();
  }

  static String interval(Estimate e, String siUnit) {
    return SiValue.format(e.value(), siUnit)
        + "  (95 % interval "
        + SiValue.formatNumber(e.low())
        + " to "
        + SiValue.formatNumber(e.high())
        + ")";
  }
}
