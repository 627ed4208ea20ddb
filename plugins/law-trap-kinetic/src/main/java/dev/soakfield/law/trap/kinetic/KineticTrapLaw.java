package dev.soakfield.law.trap.kinetic;

import dev.soakfield.law.api.LawPoint;
import dev.soakfield.law.api.RateSink;
import dev.soakfield.law.api.SourceLaw;
import dev.soakfield.law.api.StateView;
import java.util.List;

/**
 * The occupancy equation integrated by backward Euler over the step, with c, k and p at its end: θ₁
 * = (θ₀ + dt·k·c)/(1 + dt·(k·c + p)), which stays in [0, 1] for any step; π = −N_T·(θ₁ − θ₀)/dt, so
 * what the traps take up is exactly what the lattice loses. A negative c (round-off undershoot of
 * the field) is taken as 0.
 */
final class KineticTrapLaw implements SourceLaw {
  /** Molar gas constant, J/(mol·K) (CODATA 2018, exact in the 2019 SI). */
  static final double GAS_CONSTANT = 8.314462618;

  private final double trapDensity;
  private final double k0;
  private final double captureEnergy;
  private final double p0;
  private final double releaseEnergy;

  KineticTrapLaw(
      double trapDensity, double k0, double captureEnergy, double p0, double releaseEnergy) {
    this.trapDensity = trapDensity;
    this.k0 = k0;
    this.captureEnergy = captureEnergy;
    this.p0 = p0;
    this.releaseEnergy = releaseEnergy;
  }

  double capture(double temperature) {
    return k0 * Math.exp(-captureEnergy / (GAS_CONSTANT * temperature));
  }

  double release(double temperature) {
    return p0 * Math.exp(-releaseEnergy / (GAS_CONSTANT * temperature));
  }

  @Override
  public List<String> stateNames() {
    return List.of("occupancy");
  }

  /** The occupancy at rest with c: k·c·(1 − θ) = p·θ; empty traps when neither rate acts. */
  @Override
  public void initialState(double concentration, double temperature, double[] state) {
    double kc = capture(temperature) * Math.max(concentration, 0);
    double sum = kc + release(temperature);
    state[0] = sum > 0 ? kc / sum : 0;
  }

  @Override
  public void rate(LawPoint at, StateView start, RateSink out) {
    double dt = at.dt();
    double theta0 = start.get(0);
    double k = capture(at.temperature());
    double p = release(at.temperature());
    double c = Math.max(at.concentration(), 0);
    double den = 1 + dt * (k * c + p);
    double theta1 = (theta0 + dt * k * c) / den;
    double derivative =
        at.concentration() > 0 ? -trapDensity * k * (1 + dt * p - theta0) / (den * den) : 0;
    out.set(-trapDensity * (theta1 - theta0) / dt, derivative);
  }

  @Override
  public void advance(LawPoint at, StateView start, double[] end) {
    double dt = at.dt();
    double k = capture(at.temperature());
    double c = Math.max(at.concentration(), 0);
    end[0] = (start.get(0) + dt * k * c) / (1 + dt * (k * c + release(at.temperature())));
  }

  @Override
  public double trappedAmount(StateView state, double temperature) {
    return trapDensity * state.get(0);
  }
}
