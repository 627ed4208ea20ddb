package dev.soakfield.fem.physics;

/**
 * Saturation pressure of water over liquid water, from the IAPWS Industrial Formulation 1997 (IAPWS
 * R7-97(2012), region 4, the saturation-pressure equation, eqs. 29–30 with the coefficients of its
 * Table 34). Valid from the triple-point temperature 273.15 K to the critical temperature 647.096
 * K.
 */
public final class WaterVapour {
  /** Lowest temperature of the IF97 saturation line, K. */
  public static final double MIN_TEMPERATURE = 273.15;

  /** Critical temperature of water, K (IAPWS R7-97(2012), eq. 1 ff.). */
  public static final double CRITICAL_TEMPERATURE = 647.096;

  private static final double N1 = 0.11670521452767e4;
  private static final double N2 = -0.72421316703206e6;
  private static final double N3 = -0.17073846940092e2;
  private static final double N4 = 0.12020824702470e5;
  private static final double N5 = -0.32325550322333e7;
  private static final double N6 = 0.14915108613530e2;
  private static final double N7 = -0.48232657361591e4;
  private static final double N8 = 0.40511340542057e6;
  private static final double N9 = -0.23855557567849;
  private static final double N10 = 0.65017534844798e3;

  private WaterVapour() {}

  /**
   * Saturation pressure in Pa at {@code temperature} in K.
   *
   * @throws IllegalArgumentException outside 273.15 K to 647.096 K
   */
  public static double saturationPressure(double temperature) {
    if (!(temperature >= MIN_TEMPERATURE && temperature <= CRITICAL_TEMPERATURE)) {
      throw new IllegalArgumentException(
          "water saturation pressure: found temperature "
              + temperature
              + " K, expected 273.15 K to 647.096 K (the range of IAPWS-IF97 region 4)");
    }
    double theta = temperature + N9 / (temperature - N10);
    double a = theta * theta + N1 * theta + N2;
    double b = N3 * theta * theta + N4 * theta + N5;
    double c = N6 * theta * theta + N7 * theta + N8;
    double ratio = 2 * c / (-b + Math.sqrt(b * b - 4 * a * c));
    double r2 = ratio * ratio;
    return r2 * r2 * 1e6;
  }

  /** Partial pressure of water vapour in Pa at relative humidity {@code rh} (0 to 1). */
  public static double partialPressure(double rh, double temperature) {
    if (!(rh >= 0 && rh <= 1)) {
      throw new IllegalArgumentException(
          "relative humidity: found " + rh + ", expected a fraction from 0 to 1");
    }
    return rh * saturationPressure(temperature);
  }
}
