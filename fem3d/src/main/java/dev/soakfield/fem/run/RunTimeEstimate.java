package dev.soakfield.fem.run;

import dev.soakfield.fem.casefile.CaseSpec;
import dev.soakfield.fem.casefile.StepControl;
import dev.soakfield.mesh.TetMesh;

/**
 * A rough, order-of-magnitude estimate of a run's steps and wall time, before the run.
 *
 * <p>Steps: fixed steps are counted (end / step, plus one per output time that splits a step).
 * Adaptive steps grow roughly geometrically from the first step to the end, so their count goes
 * with the decades spanned, log10(end / first step), and with the square root of 1/tolerance (the
 * local error of backward Euler is second order in the step). Wall time: a start-up (JIT, set-up)
 * plus the steps times a cost per node and step. Measured on 2 cores: the sample case (sensor-pod,
 * 1 521 nodes, 111 adaptive steps, 1.3 s) and a 24³-cell box (15 625 nodes, 200 fixed steps, 6.4 s)
 * give {@link #STEPS_PER_DECADE}, {@link #START_SECONDS} and {@link #SECONDS_PER_NODE_STEP}. Real
 * runs differ by a factor of a few either way (stiffness, sources, machine).
 */
public record RunTimeEstimate(long steps, double seconds) {
  /** Accepted adaptive steps per decade of end / first step at tolerance 1e-3 (measured). */
  static final double STEPS_PER_DECADE = 18;

  /** Wall seconds per node and step, assembly and solve included (measured, 2 cores). */
  static final double SECONDS_PER_NODE_STEP = 2e-6;

  /** Wall seconds of start-up and set-up before the steps (measured). */
  static final double START_SECONDS = 1.0;

  /** The estimate for {@code spec} on {@code mesh} (as it will run, after any promotion). */
  public static RunTimeEstimate of(CaseSpec spec, TetMesh mesh) {
    double end = spec.time().end();
    long steps;
    if (spec.time().steps() instanceof StepControl.Fixed f) {
      steps = (long) Math.ceil(end / f.step()) + spec.time().outputs().size();
    } else {
      StepControl.Adaptive a = (StepControl.Adaptive) spec.time().steps();
      double first = a.initialStep().orElse(end * 1e-6);
      double decades = Math.max(1, Math.log10(end / first));
      double perDecade =
          STEPS_PER_DECADE * Math.sqrt(StepControl.DEFAULT_TOLERANCE / a.tolerance());
      steps = (long) Math.ceil(decades * perDecade) + spec.time().outputs().size();
      if (a.maxStep().isPresent()) {
        steps = Math.max(steps, (long) Math.ceil(end / a.maxStep().getAsDouble()));
      }
    }
    double seconds = START_SECONDS + steps * (double) mesh.nodeCount() * SECONDS_PER_NODE_STEP;
    return new RunTimeEstimate(steps, seconds);
  }
}
