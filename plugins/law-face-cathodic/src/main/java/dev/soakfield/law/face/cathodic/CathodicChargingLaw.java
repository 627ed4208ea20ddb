package dev.soakfield.law.face.cathodic;

import dev.soakfield.law.api.FaceLaw;
import dev.soakfield.law.api.FacePoint;
import dev.soakfield.law.api.FluxSink;

/** J = J_in − k_r·c², ∂J/∂c = −2·k_r·c; a negative c (round-off undershoot) is taken as 0. */
final class CathodicChargingLaw implements FaceLaw {
  /** Faraday constant, C/mol (CODATA 2018, exact in the 2019 SI). */
  static final double FARADAY = 96485.33212;

  /** Molar gas constant, J/(mol·K) (CODATA 2018, exact in the 2019 SI). */
  static final double GAS_CONSTANT = 8.314462618;

  private final double entry;
  private final double kr0;
  private final double recombinationEnergy;

  CathodicChargingLaw(double entry, double kr0, double recombinationEnergy) {
    this.entry = entry;
    this.kr0 = kr0;
    this.recombinationEnergy = recombinationEnergy;
  }

  @Override
  public void flux(FacePoint at, FluxSink out) {
    double kr = kr0 * Math.exp(-recombinationEnergy / (GAS_CONSTANT * at.temperature()));
    double c = Math.max(at.concentration(), 0);
    out.set(entry - kr * c * c, -2 * kr * c);
  }
}
