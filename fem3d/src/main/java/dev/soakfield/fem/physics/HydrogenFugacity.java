package dev.soakfield.fem.physics;

/**
 * Fugacity of hydrogen gas from the Abel–Noble equation of state, p·(V_m − b) = R·T, which gives f
 * = p·exp(b·p/(R·T)). At high pressure Sieverts' law uses fugacity in place of pressure.
 *
 * <p>The co-volume b = 15.84 cm³/mol is the value San Marchi, Somerday and Robinson (Int. J.
 * Hydrogen Energy 32 (2007) 100) give for hydrogen; quoted from memory and not confirmed against
 * the paper here, so check it before relying on it for design values.
 */
public final class HydrogenFugacity {
  /** Molar gas constant, J/(mol·K) (CODATA 2018, exact). */
  public static final double GAS_CONSTANT = 8.314462618;

  /** Abel–Noble co-volume of hydrogen, m³/mol (15.84 cm³/mol, from memory; see class comment). */
  public static final double CO_VOLUME = 15.84e-6;

  private HydrogenFugacity() {}

  /**
   * Fugacity in Pa of hydrogen at {@code pressure} in Pa and {@code temperature} in K.
   *
   * @throws IllegalArgumentException for a negative pressure or a non-positive temperature
   */
  public static double fugacity(double pressure, double temperature) {
    if (!(pressure >= 0) || Double.isInfinite(pressure)) {
      throw new IllegalArgumentException(
          "hydrogen fugacity: found pressure " + pressure + " Pa, expected a finite value >= 0");
    }
    if (!(temperature > 0) || Double.isInfinite(temperature)) {
      throw new IllegalArgumentException(
          "hydrogen fugacity: found temperature " + temperature + " K, expected a value > 0");
    }
    return pressure * Math.exp(CO_VOLUME * pressure / (GAS_CONSTANT * temperature));
  }
}
