package dev.soakfield.fem.run;

/** Hears of the run's progress after every accepted step. */
@FunctionalInterface
public interface RunProgress {
  void step(double time, double endTime, int steps, int rejectedSteps);

  /** The linear solver's iterations so far, told just before {@link #step}. */
  default void linearIterations(long total) {}

  RunProgress SILENT = (t, end, steps, rejected) -> {};
}
