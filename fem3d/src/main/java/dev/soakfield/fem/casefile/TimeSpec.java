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
 * @param maxSteps the most time steps a run may take (fixed steps are checked before the run,
 *     adaptive ones as it goes)
 */
public record TimeSpec(
    double end,
    List<Double> outputs,
    TimeScheme scheme,
    CapacityForm capacity,
    StepControl steps,
    Optional<StopSpec> stop,
    double balanceLimit,
    long maxSteps) {
  /** The balance limit when the case gives none. */
  public static final double DEFAULT_BALANCE_LIMIT = 1e-8;

  /**
   * The step limit when the case gives none: ten million steps (a series of about 2 GB), far more
   * than a well-posed run takes.
   */
  public static final long DEFAULT_MAX_STEPS = 10_000_000;

  /** Time control with the default step limit. */
  public TimeSpec(
      double end,
      List<Double> outputs,
      TimeScheme scheme,
      CapacityForm capacity,
      StepControl steps,
      Optional<StopSpec> stop,
      double balanceLimit) {
    this(end, outputs, scheme, capacity, steps, stop, balanceLimit, DEFAULT_MAX_STEPS);
  }

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
    if (maxSteps < 1) {
      throw new IllegalArgumentException("max steps must be at least 1, got " + maxSteps);
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
