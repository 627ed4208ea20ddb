package dev.soakfield.law.testkit;

import dev.soakfield.law.api.StateView;

/** A law's state at one node, held in an array the test owns. */
public final class State implements StateView {
  private final double[] values;

  public State(double[] values) {
    this.values = values.clone();
  }

  @Override
  public double get(int k) {
    return values[k];
  }

  /** A copy of the values. */
  public double[] values() {
    return values.clone();
  }
}
