package dev.soakfield.fem.physics;

/**
 * How the potential φ, continuous across interfaces, relates to the concentration c = S·φ and to
 * the environment. One law per case.
 */
public enum SorptionLaw {
  /** φ is a concentration; S is a partition coefficient (1 for a single material). */
  PLAIN("plain"),
  /** Water vapour in polymers: φ is the vapour partial pressure in Pa, c = S·p (Henry's law). */
  HENRY("henry"),
  /** Hydrogen in metals: φ = √f in √Pa (f the gas fugacity), c = S·√f (Sieverts' law). */
  SIEVERTS("sieverts");

  private final String word;

  SorptionLaw(String word) {
    this.word = word;
  }

  /** The spelling in a case file. */
  public String word() {
    return word;
  }
}
