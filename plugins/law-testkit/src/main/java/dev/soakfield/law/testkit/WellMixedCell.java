package dev.soakfield.law.testkit;

import dev.soakfield.law.api.SourceLaw;
import java.util.function.DoubleUnaryOperator;

/**
 * One well-mixed volume without diffusion, where dc/dt = π(c, state): the zero-dimensional problem
 * that checks a law against closed-form kinetics. Each step is backward Euler solved by Newton with
 * the law's ∂π/∂c, as the solver does, then the law advances its state. Either closed (c changes,
 * mobile + held amount is kept) or held at a fixed concentration (a cell fed from a large bath).
 */
public final class WellMixedCell {
  private final SourceLaw law;
  private final boolean closed;
  private DoubleUnaryOperator temperatureAt;
  private double concentration;
  private double[] state;
  private double time;
  private int iterations;

  private WellMixedCell(SourceLaw law, double c, double temperature, boolean closed) {
    this.law = law;
    this.closed = closed;
    this.temperatureAt = t -> temperature;
    this.concentration = c;
    this.state = new double[law.stateNames().size()];
    law.initialState(c, temperature, state);
  }

  /** A closed cell starting at c with the law's initial state for c. */
  public static WellMixedCell closed(SourceLaw law, double c, double temperature) {
    return new WellMixedCell(law, c, temperature, true);
  }

  /** A cell whose concentration stays c, starting with the law's initial state for c. */
  public static WellMixedCell heldAt(SourceLaw law, double c, double temperature) {
    return new WellMixedCell(law, c, temperature, false);
  }

  /** Temperature as a function of time from now on (a heating ramp), K. */
  public WellMixedCell withTemperature(DoubleUnaryOperator temperatureAt) {
    this.temperatureAt = temperatureAt;
    return this;
  }

  /** Replaces the state (for a start out of equilibrium). */
  public WellMixedCell withState(double... values) {
    if (values.length != state.length) {
      throw new IllegalArgumentException(
          "state has " + state.length + " values, given " + values.length);
    }
    state = values.clone();
    return this;
  }

  /**
   * One backward-Euler step of length dt.
   *
   * @throws IllegalStateException when Newton does not converge in 50 iterations
   */
  public void step(double dt) {
    State start = new State(state);
    double temperature = temperatureAt.applyAsDouble(time + dt);
    double c0 = concentration;
    double c = c0;
    iterations = 0;
    if (closed) {
      while (true) {
        Answer a = Answer.of(law, new At(c, temperature, time + dt, dt), start);
        double residual = c - c0 - dt * a.rate();
        if (Math.abs(residual) <= 1e-13 * (Math.abs(c0) + Math.abs(dt * a.rate())) + 1e-300) {
          break;
        }
        if (++iterations > 50) {
          throw new IllegalStateException("Newton did not converge at t = " + (time + dt));
        }
        double update = -residual / (1 - dt * a.derivative());
        c = lineSearch(start, c0, c, residual, update, dt, temperature);
      }
    }
    double[] end = new double[state.length];
    law.advance(new At(c, temperature, time + dt, dt), start, end);
    state = end;
    concentration = c;
    time += dt;
  }

  /** The Newton update, halved until the residual decreases (at most 30 times). */
  private double lineSearch(
      State start,
      double c0,
      double c,
      double residual,
      double update,
      double dt,
      double temperature) {
    double step = update;
    for (int i = 0; i < 30; i++) {
      double trial = c + step;
      double r =
          trial - c0 - dt * Answer.of(law, new At(trial, temperature, time + dt, dt), start).rate();
      if (Math.abs(r) < Math.abs(residual)) {
        return trial;
      }
      step /= 2;
    }
    return c + step;
  }

  /** Steps of length dt until {@code until}. */
  public void run(double until, double dt) {
    while (time < until * (1 - 1e-12)) {
      step(Math.min(dt, until - time));
    }
  }

  public double concentration() {
    return concentration;
  }

  /** The law's held amount for the current state. */
  public double held() {
    return law.trappedAmount(new State(state), temperatureAt.applyAsDouble(time));
  }

  public double time() {
    return time;
  }

  /** Newton iterations of the last step (0 for a held cell). */
  public int iterations() {
    return iterations;
  }

  /** A copy of the current state. */
  public double[] state() {
    return state.clone();
  }
}
