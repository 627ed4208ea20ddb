package dev.soakfield.fem.physics;

/**
 * The kind of condition on a face group: concentration, flux, exchange, sealed, ambient or a face
 * law.
 */
public enum FaceKind {
  /** Prescribed concentration in the adjacent material (Dirichlet). */
  CONCENTRATION("concentration"),
  /** Prescribed inward flux, amount per m² per s (Neumann). */
  FLUX("flux"),
  /** Inward flux h·(c_env − c) with transfer coefficient h in m/s (Robin). */
  EXCHANGE("exchange"),
  /**
   * The potential of the environment held on the faces (Dirichlet on φ): vapour partial pressure
   * RH·p_sat(T) under Henry's law, √f of the gas under Sieverts' law.
   */
  AMBIENT("ambient"),
  /** No flux. */
  SEALED("sealed"),
  /**
   * The flux a face law gives from the concentration inside, the gas outside and the temperature
   * (surface kinetics: dissociation and recombination, a charging current); nonlinear Neumann.
   */
  LAW("law");

  private final String word;

  FaceKind(String word) {
    this.word = word;
  }

  /** The spelling in a case file. */
  public String word() {
    return word;
  }
}
