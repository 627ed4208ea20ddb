package dev.soakfield.fem.run;

/** Hears of the run's progress after every accepted step. */
@FunctionalInterface
public interface RunProgress {
  void step(double time, double endTime, int steps, int rejectedSteps);

  RunProgress SILENT = (t, end, steps, rejected) -> {};
}
