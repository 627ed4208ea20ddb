package dev.soakfield.fem.physics;

/**
 * A property that follows an Arrhenius law in temperature, value = prefactor·exp(−energy/(R·T)); a
 * constant when the energy is 0. For solubility the energy is the heat of solution ΔH (negative
 * when solubility falls with temperature).
 *
 * @param prefactor the value as T → ∞ (the constant itself when energy = 0)
 * @param energy activation energy or heat of solution, J/mol
 */
public record Arrhenius(double prefactor, double energy) {
  /** Molar gas constant, J/(mol·K) (CODATA 2018, exact by the SI definition). */
  public static final double GAS_CONSTANT = 8.314462618;

  public Arrhenius {
    if (!Double.isFinite(prefactor) || !Double.isFinite(energy)) {
      throw new IllegalArgumentException(
          "Arrhenius parameters must be finite: " + prefactor + ", " + energy);
    }
  }

  /** A value that does not change with temperature. */
  public static Arrhenius constant(double value) {
    return new Arrhenius(value, 0.0);
  }

  /** The value at an absolute temperature. */
  public double at(double kelvin) {
    if (energy == 0) {
      return prefactor;
    }
    if (!(kelvin > 0)) {
      throw new IllegalArgumentException("temperature must be positive kelvin, got " + kelvin);
    }
    return prefactor * Math.exp(-energy / (GAS_CONSTANT * kelvin));
  }

  /**
   * value(T) / value(reference): the factor that carries a value from one temperature to another.
   */
  public double ratio(double kelvin, double referenceKelvin) {
    if (energy == 0 || kelvin == referenceKelvin) {
      return 1.0;
    }
    return Math.exp(-energy / GAS_CONSTANT * (1.0 / kelvin - 1.0 / referenceKelvin));
  }

  public boolean dependsOnTemperature() {
    return energy != 0;
  }
}
