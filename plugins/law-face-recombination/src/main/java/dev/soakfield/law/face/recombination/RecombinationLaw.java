package dev.soakfield.law.face.recombination;

import dev.soakfield.law.api.FaceLaw;
import dev.soakfield.law.api.FacePoint;
import dev.soakfield.law.api.FluxSink;

/** J = k_d·p − k_r·c², ∂J/∂c = −2·k_r·c; a negative c (round-off undershoot) is taken as 0. */
final class RecombinationLaw implements FaceLaw {
  /** Molar gas constant, J/(mol·K) (CODATA 2018, exact in the 2019 SI). */
  static final double GAS_CONSTANT = 8.314462618;

  private final double kd0;
  private final double dissociationEnergy;
  private final double kr0;
  private final double recombinationEnergy;

  RecombinationLaw(double kd0, double dissociationEnergy, double kr0, double recombinationEnergy) {
    this.kd0 = kd0;
    this.dissociationEnergy = dissociationEnergy;
    this.kr0 = kr0;
    this.recombinationEnergy = recombinationEnergy;
  }

  @Override
  public void flux(FacePoint at, FluxSink out) {
    double rt = GAS_CONSTANT * at.temperature();
    double kd = kd0 * Math.exp(-dissociationEnergy / rt);
    double kr = kr0 * Math.exp(-recombinationEnergy / rt);
    double c = Math.max(at.concentration(), 0);
    out.set(kd * Math.max(at.pressure(), 0) - kr * c * c, -2 * kr * c);
  }
}
