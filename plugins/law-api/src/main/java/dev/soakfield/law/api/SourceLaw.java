package dev.soakfield.law.api;

import java.util.List;

/**
 * A volume source π(c, T, t, state) of one material, evaluated at its nodes. The solver integrates
 * the step implicitly: it asks for π and ∂π/∂c at the end-of-step concentration given the state at
 * the start of the step, iterates (Newton) until the balance holds, then asks for the end-of-step
 * state once the step is accepted. A law that integrates its own state implicitly over the step
 * (for instance θ₁ = (θ₀ + dt·k·c)/(1 + dt·(k·c + p))) stays stable for any step length.
 *
 * <p>Implementations may be called from several threads at once for different nodes and must not
 * keep per-node data in fields: per-node data belongs in the state.
 */
public interface SourceLaw {
  /** Names of the state variables per node, for outputs ("occupancy"); empty when stateless. */
  List<String> stateNames();

  /**
   * The state at a node at the start of a run, in equilibrium with concentration c at temperature T
   * unless the law says otherwise.
   *
   * @param state receives {@link #stateNames()}.size() values
   */
  void initialState(double concentration, double temperature, double[] state);

  /** π and ∂π/∂c at the end of the step, from the state at its start. */
  void rate(LawPoint at, StateView start, RateSink out);

  /**
   * The state at the end of an accepted step.
   *
   * @param end receives the new state (same length as the state)
   */
  void advance(LawPoint at, StateView start, double[] end);

  /**
   * Amount per m³ that the state holds apart from the mobile concentration (trapped hydrogen, bound
   * water), for the balance and the outputs; 0 for laws that only create or consume.
   */
  default double trappedAmount(StateView state, double temperature) {
    return 0.0;
  }
}
