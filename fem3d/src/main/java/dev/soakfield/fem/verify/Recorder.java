package dev.soakfield.fem.verify;

import dev.soakfield.fem.time.StepListener;
import dev.soakfield.fem.time.StepOutcome;
import java.util.HashMap;
import java.util.Map;

/** Collects what the verification cases look at: the balance, output fields, the lowest value. */
final class Recorder implements StepListener {
  private final double amount0;
  private double previousAmount;
  private double error;
  private double moved;
  private double lowest = Double.POSITIVE_INFINITY;
  private final Map<Double, double[]> outputs = new HashMap<>();
  private final Map<Double, Double> amounts = new HashMap<>();

  Recorder(double amount0) {
    this.amount0 = amount0;
    this.previousAmount = amount0;
  }

  @Override
  public void started(StepOutcome initial) {
    accepted(0.0, 0.0, initial, false);
  }

  @Override
  public void accepted(double t, double dt, StepOutcome out, boolean output) {
    double inflow = 0;
    for (double v : out.faceInflow()) {
      inflow += v;
      moved += Math.abs(v);
    }
    moved += Math.abs(out.sourceAmount());
    error += out.amount() - previousAmount - inflow - out.sourceAmount();
    previousAmount = out.amount();
    for (double v : out.phi()) {
      lowest = Math.min(lowest, v);
    }
    if (output) {
      outputs.put(t, out.phi());
      amounts.put(t, out.amount());
    }
  }

  /** |amount change − inflow − sources| over the amounts moved. */
  double balanceRelative() {
    return moved > 0 ? Math.abs(error) / moved : 0.0;
  }

  double lowest() {
    return lowest;
  }

  double[] phiAt(double t) {
    return outputs.get(t);
  }

  double uptakeAt(double t) {
    return amounts.get(t) - amount0;
  }
}
