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
 */
public record TimeSpec(
    double end,
    List<Double> outputs,
    TimeScheme scheme,
    CapacityForm capacity,
    StepControl steps,
    Optional<StopSpec> stop) {
  public TimeSpec {
    outputs = List.copyOf(outputs);
    Objects.requireNonNull(scheme, "scheme");
    Objects.requireNonNull(capacity, "capacity");
    Objects.requireNonNull(steps, "steps");
    Objects.requireNonNull(stop, "stop");
    if (!(end > 0) || !Double.isFinite(end)) {
      throw new IllegalArgumentException("end must be positive, got " + end);
    }
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
