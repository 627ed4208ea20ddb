package dev.soakfield.fem.run;

import java.util.Locale;

/**
 * Wall seconds of a run's phases (see {@link RunProgress#timed}); solves and outputs lie within
 * stepping, and the rest of stepping is the per-step work around them (right-hand sides, balances,
 * series rows, checkpoints).
 *
 * @param model building the model and the step's matrices
 * @param stepping the time loop in all
 * @param solves the linear solves within it, preconditioner set-ups included
 * @param iterations their iterations
 * @param outputs writing the field outputs within it
 * @param report the report and its pictures, after the loop (NaN until they are made)
 */
public record RunTimes(
    double model, double stepping, double solves, long iterations, double outputs, double report) {
  /** Stepping less its solves and outputs. */
  public double perStepRest() {
    return stepping - solves - outputs;
  }

  /** These times with the report's. */
  public RunTimes withReport(double seconds) {
    return new RunTimes(model, stepping, solves, iterations, outputs, seconds);
  }

  /** One line for run.log (written before the report is made). */
  String line() {
    return String.format(
        Locale.ROOT,
        "time: model and matrices %.2f s; stepping %.2f s, of which linear solves %.2f s (%d"
            + " iterations), field outputs %.2f s, the rest %.2f s",
        model,
        stepping,
        solves,
        iterations,
        outputs,
        perStepRest());
  }
}
