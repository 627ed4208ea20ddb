package dev.soakfield.law.trap.equilibrium;

import dev.soakfield.law.api.LawPoint;
import dev.soakfield.law.api.RateSink;
import dev.soakfield.law.api.SourceLaw;
import dev.soakfield.law.api.StateView;
import java.util.List;

/**
 * The trapped amount follows c at once: over a step π = −(c_T(c₁, T₁) − c_T,₀)/dt, with c_T,₀ the
 * state at the start. θ = x/(1 + x), x = (c/N_L)·exp(E_b/(R·T)), is computed from ln x so that a
 * deep trap at a low temperature does not overflow. A negative c (round-off undershoot) is taken as
 * 0.
 */
final class EquilibriumTrapLaw implements SourceLaw {
  /** Molar gas constant, J/(mol·K) (CODATA 2018, exact in the 2019 SI). */
  static final double GAS_CONSTANT = 8.314462618;

  private final double trapDensity;
  private final double latticeDensity;
  private final double bindingEnergy;

  EquilibriumTrapLaw(double trapDensity, double latticeDensity, double bindingEnergy) {
    this.trapDensity = trapDensity;
    this.latticeDensity = latticeDensity;
    this.bindingEnergy = bindingEnergy;
  }

  /** θ(c, T). */
  double occupancy(double concentration, double temperature) {
    if (concentration <= 0) {
      return 0;
    }
    double lnX =
        Math.log(concentration / latticeDensity) + bindingEnergy / (GAS_CONSTANT * temperature);
    return 1 / (1 + Math.exp(-lnX));
  }

  /** ∂c_T/∂c = N_T·θ(1 − θ)/c = (N_T·K/N_L)/(1 + x)², K = exp(E_b/(R·T)); N_T·K/N_L at c = 0. */
  double slope(double concentration, double temperature) {
    double k = Math.exp(bindingEnergy / (GAS_CONSTANT * temperature));
    double x = Math.max(concentration, 0) / latticeDensity * k;
    if (Double.isFinite(x)) {
      double inv = 1 / (1 + x);
      return trapDensity * k / latticeDensity * inv * inv;
    }
    double theta = occupancy(concentration, temperature);
    return trapDensity * theta * (1 - theta) / concentration;
  }

  @Override
  public List<String> stateNames() {
    return List.of("trapped");
  }

  @Override
  public void initialState(double concentration, double temperature, double[] state) {
    state[0] = trapDensity * occupancy(concentration, temperature);
  }

  @Override
  public void rate(LawPoint at, StateView start, RateSink out) {
    double trapped = trapDensity * occupancy(at.concentration(), at.temperature());
    double derivative =
        at.concentration() >= 0 ? -slope(at.concentration(), at.temperature()) / at.dt() : 0;
    out.set(-(trapped - start.get(0)) / at.dt(), derivative);
  }

  @Override
  public void advance(LawPoint at, StateView start, double[] end) {
    end[0] = trapDensity * occupancy(at.concentration(), at.temperature());
  }

  @Override
  public double trappedAmount(StateView state, double temperature) {
    return state.get(0);
  }
}
