package dev.soakfield.fem.run;

import dev.soakfield.fem.results.StateBundle;

/**
 * The run's global balance: amount now − amount at start − ∫(boundary inflow + sources) dt, with
 * the inflow per face group and the amount moved (the scale of the relative error).
 */
final class BalanceLedger {
  private final double[] cumulativeInflow;
  private final double amount0;
  private double amountNow;
  private double sources;
  private double moved;

  BalanceLedger(int faceGroups, double amount0) {
    this.cumulativeInflow = new double[faceGroups];
    this.amount0 = amount0;
    this.amountNow = amount0;
  }

  /** Adds one step's inflow per face group and source amount; the amount after the step. */
  void add(double[] inflow, double sourceAmount, double amount) {
    for (int g = 0; g < inflow.length; g++) {
      cumulativeInflow[g] += inflow[g];
      moved += Math.abs(inflow[g]);
    }
    sources += sourceAmount;
    moved += Math.abs(sourceAmount);
    amountNow = amount;
  }

  /** The amount raised prescribed faces brought in at the start, before the first step. */
  void start(double[] raised, double amount) {
    for (int g = 0; g < raised.length; g++) {
      cumulativeInflow[g] += raised[g];
      moved += Math.abs(raised[g]);
    }
    amountNow = amount;
  }

  double cumulativeInflow(int group) {
    return cumulativeInflow[group];
  }

  double amountStart() {
    return amount0;
  }

  double amountNow() {
    return amountNow;
  }

  double error() {
    double in = 0;
    for (double v : cumulativeInflow) {
      in += v;
    }
    return amountNow - amount0 - in - sources;
  }

  double relative() {
    double scale = Math.max(moved, Math.abs(amountNow - amount0));
    return scale > 0 ? Math.abs(error()) / scale : 0.0;
  }

  /**
   * The error against the larger of the amounts moved and the amounts present: a sealed part moves
   * nothing, and its round-off must not read as a failure.
   */
  double relativeToAmounts() {
    double scale =
        Math.max(
            Math.max(moved, Math.abs(amountNow - amount0)),
            Math.max(Math.abs(amount0), Math.abs(amountNow)));
    return scale > 0 ? Math.abs(error()) / scale : 0.0;
  }

  void snapshot(StateBundle b) {
    b.put("rec.inflow", cumulativeInflow);
  }

  /** Restores from a checkpoint: the inflow here, the totals from {@code amountSourcesMoved}. */
  void restore(StateBundle b, double amount, double sourceAmount, double movedAmount) {
    double[] inflow = b.get("rec.inflow");
    System.arraycopy(inflow, 0, cumulativeInflow, 0, cumulativeInflow.length);
    amountNow = amount;
    sources = sourceAmount;
    moved = movedAmount;
  }

  double sources() {
    return sources;
  }

  double moved() {
    return moved;
  }
}
