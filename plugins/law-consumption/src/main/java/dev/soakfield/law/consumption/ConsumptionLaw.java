package dev.soakfield.law.consumption;

import dev.soakfield.law.api.LawPoint;
import dev.soakfield.law.api.RateSink;
import dev.soakfield.law.api.SourceLaw;
import dev.soakfield.law.api.StateView;
import java.util.List;

/** π = −k0·exp(−Ea/(R·T))·c; stateless, so it is linear in c and its Jacobian is −k. */
final class ConsumptionLaw implements SourceLaw {
  /** Molar gas constant, J/(mol·K) (CODATA 2018, exact in the 2019 SI). */
  static final double GAS_CONSTANT = 8.314462618;

  private final double k0;
  private final double activationEnergy;

  ConsumptionLaw(double k0, double activationEnergy) {
    this.k0 = k0;
    this.activationEnergy = activationEnergy;
  }

  /** k(T), 1/s. */
  double rateConstant(double temperature) {
    return activationEnergy == 0
        ? k0
        : k0 * Math.exp(-activationEnergy / (GAS_CONSTANT * temperature));
  }

  @Override
  public List<String> stateNames() {
    return List.of();
  }

  @Override
  public void initialState(double concentration, double temperature, double[] state) {
    // stateless
  }

  @Override
  public void rate(LawPoint at, StateView start, RateSink out) {
    double k = rateConstant(at.temperature());
    out.set(-k * at.concentration(), -k);
  }

  @Override
  public void advance(LawPoint at, StateView start, double[] end) {
    // stateless
  }
}
