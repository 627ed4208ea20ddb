package dev.soakfield.fem.run;

import dev.soakfield.fem.time.StepListener;
import dev.soakfield.fem.time.StepOutcome;
import dev.soakfield.fem.units.DurationText;

/**
 * Stands between the time loop and the recorder: hands every step on, counts accepted and rejected
 * steps, linear iterations and solve time, and tells the caller's progress display and the run log.
 */
final class ProgressRelay implements StepListener {
  private final StepListener recorder;
  private final double end;
  private final RunProgress progress;
  private final RunLog log;
  private int steps;
  private int rejected;
  private long iterations;
  private double solveSeconds;

  ProgressRelay(StepListener recorder, double end, RunProgress progress, RunLog log) {
    this.recorder = recorder;
    this.end = end;
    this.progress = progress;
    this.log = log;
  }

  @Override
  public void started(StepOutcome initial) {
    recorder.started(initial);
  }

  @Override
  public void accepted(double t, double dt, StepOutcome outcome, boolean output) {
    recorder.accepted(t, dt, outcome, output);
    steps++;
    iterations += outcome.iterations();
    solveSeconds += outcome.solveSeconds();
    progress.linearIterations(iterations);
    progress.step(t, end, steps, rejected);
    log.progress(t, end, steps, rejected);
    if (output) {
      log.line("output written at t = " + DurationText.of(t));
    }
  }

  @Override
  public boolean stopRequested() {
    return recorder.stopRequested();
  }

  @Override
  public void rejected(double t, double triedDt) {
    rejected++;
    recorder.rejected(t, triedDt);
  }

  int steps() {
    return steps;
  }

  int rejectedSteps() {
    return rejected;
  }

  long iterations() {
    return iterations;
  }

  double solveSeconds() {
    return solveSeconds;
  }
}
