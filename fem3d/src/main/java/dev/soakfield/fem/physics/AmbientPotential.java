package dev.soakfield.fem.physics;

/**
 * The potential φ_env that the exposure imposes on faces open to the environment: the water vapour
 * partial pressure RH·p_sat(T) under Henry's law, √f of the hydrogen gas under Sieverts' law (f the
 * fugacity from the Abel–Noble equation of state, which matters above a few MPa).
 */
public final class AmbientPotential {
  private AmbientPotential() {}

  /**
   * φ_env over time for a law and a history.
   *
   * @throws IllegalArgumentException for the plain law, which has no environment potential
   */
  public static TimeFunction of(SorptionLaw law, ExposureHistory history) {
    return switch (law) {
      case HENRY ->
          history.function(
              t -> WaterVapour.partialPressure(history.humidity(t), history.temperature(t)));
      case SIEVERTS ->
          history.function(
              t ->
                  Math.sqrt(
                      HydrogenFugacity.fugacity(history.pressure(t), history.temperature(t))));
      case PLAIN ->
          throw new IllegalArgumentException(
              "the plain law has no ambient potential: use henry (humidity) or sieverts (pressure)");
    };
  }
}
