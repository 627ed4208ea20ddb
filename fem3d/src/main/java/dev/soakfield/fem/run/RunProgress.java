package dev.soakfield.fem.run;

/** Hears of the run's progress after every accepted step. */
@FunctionalInterface
public interface RunProgress {
  void step(double time, double endTime, int steps, int rejectedSteps);

  /** The linear solver's iterations so far, told just before {@link #step}. */
  default void linearIterations(long total) {}

  /**
   * Where the run's wall time went, told once at its end: building the model and its matrices, the
   * time stepping in all, the linear solves within it (with their iterations), writing the field
   * outputs within it, and the report with its pictures after it.
   */
  default void timed(RunTimes times) {}

  RunProgress SILENT = (t, end, steps, rejected) -> {};
}
