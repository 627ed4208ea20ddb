package dev.soakfield.law.api;

/** Read-only view of a law's internal state variables at one node. */
public interface StateView {
  /** State variable {@code k}, 0 ≤ k < {@link SourceLaw#stateNames()}.size(). */
  double get(int k);
}
