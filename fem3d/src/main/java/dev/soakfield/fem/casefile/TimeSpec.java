package dev.soakfield.fem.casefile;

import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * Time control of a run.
 *
 * @param end last time in seconds, positive
 * @param outputs times at which fields are written, increasing, in (0, end]
 * @param scheme theta scheme
 * @param capacity consistent or lumped capacity matrix
 * @param steps adaptive or fixed steps
 * @param stop a condition that ends the run early, when given
 * @param balanceLimit the largest relative balance error a finished run may have
 */
public record TimeSpec(
    double end,
    List<Double> outputs,
    TimeScheme scheme,
    CapacityForm capacity,
    StepControl steps,
    Optional<StopSpec> stop,
    double balanceLimit) {
  /** The balance limit when the case gives none. */
  public static final double DEFAULT_BALANCE_LIMIT = 1e-8;

  public TimeSpec {
    outputs = List.copyOf(outputs);
    Objects.requireNonNull(scheme, "scheme");
    Objects.requireNonNull(capacity, "capacity");
    Objects.requireNonNull(steps, "steps");
    Objects.requireNonNull(stop, "stop");
    if (!(end > 0) || !Double.isFinite(end)) {
      throw new IllegalArgumentException("end must be positive, got " + end);
    }
    if (!(balanceLimit > 0 && balanceLimit <= 1)) {
      throw new IllegalArgumentException("balance limit must lie in (0, 1], got " + balanceLimit);
    }
  }

  /** Time control with the default balance limit. */
  public TimeSpec(
      double end,
      List<Double> outputs,
      TimeScheme scheme,
      CapacityForm capacity,
      StepControl steps,
      Optional<StopSpec> stop) {
    this(end, outputs, scheme, capacity, steps, stop, DEFAULT_BALANCE_LIMIT);
  }

  /** Time control without a stop condition. */
  public TimeSpec(
      double end,
      List<Double> outputs,
      TimeScheme scheme,
      CapacityForm capacity,
      StepControl steps) {
    this(end, outputs, scheme, capacity, steps, Optional.empty());
  }

  /** The output times as a new array. */
  public double[] outputTimes() {
    double[] t = new double[outputs.size()];
    for (int i = 0; i < t.length; i++) {
      t[i] = outputs.get(i);
    }
    return t;
  }
}
