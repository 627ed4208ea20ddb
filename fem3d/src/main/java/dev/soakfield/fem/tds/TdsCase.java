package dev.soakfield.fem.tds;

import dev.soakfield.fem.casefile.CaseSpec;
import dev.soakfield.fem.casefile.InitialSpec;
import dev.soakfield.fem.casefile.StepControl;
import dev.soakfield.fem.casefile.TimeScheme;
import dev.soakfield.fem.casefile.TimeSpec;
import dev.soakfield.fem.physics.ExposureHistory;
import dev.soakfield.fem.physics.SorptionLaw;
import dev.soakfield.fem.run.RunPipeline;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * A case turned into a TDS run: the ramp replaces its exposure (in vacuum: no vapour, no hydrogen
 * pressure outside), steps are adaptive and no longer than the ramp's largest temperature change
 * allows, and the start is the case's own initial state or an earlier run's final state.
 */
final class TdsCase {
  /** The step-error tolerance of a TDS run (tighter than a case's default). */
  static final double TOLERANCE = 1e-4;

  /** Frames every this many kelvin of the ramp. */
  static final double FRAME_EVERY = 50;

  private TdsCase() {}

  static RunPipeline.Prepared of(RunPipeline.Prepared base, TdsRamp ramp, Optional<Path> from) {
    CaseSpec spec = base.spec();
    boolean henry = spec.law() == SorptionLaw.HENRY;
    boolean sieverts = spec.law() == SorptionLaw.SIEVERTS;
    double dry = 0.0;
    List<ExposureHistory.Segment> segments = new ArrayList<>();
    double t0 = ramp.startTemperature();
    if (ramp.rest() > 0) {
      segments.add(
          new ExposureHistory.Segment(
              0,
              ramp.rest(),
              t0,
              t0,
              henry ? dry : Double.NaN,
              henry ? dry : Double.NaN,
              sieverts ? dry : Double.NaN,
              sieverts ? dry : Double.NaN));
    }
    segments.add(
        new ExposureHistory.Segment(
            ramp.rest(),
            ramp.end(),
            t0,
            ramp.endTemperature(),
            henry ? dry : Double.NaN,
            henry ? dry : Double.NaN,
            sieverts ? dry : Double.NaN,
            sieverts ? dry : Double.NaN));
    List<Double> outputs = new ArrayList<>();
    if (ramp.rest() > 0) {
      outputs.add(ramp.rest());
    }
    for (double k = t0 + FRAME_EVERY; k < ramp.endTemperature(); k += FRAME_EVERY) {
      outputs.add(ramp.rest() + (k - t0) / ramp.rate());
    }
    outputs.add(ramp.end());
    TimeSpec old = spec.time();
    double maxStep = ramp.maxStep();
    StepControl steps =
        new StepControl.Adaptive(
            TOLERANCE, OptionalDouble.of(Math.min(1.0, maxStep)), OptionalDouble.of(maxStep));
    TimeSpec time =
        new TimeSpec(
            ramp.end(),
            outputs,
            TimeScheme.BACKWARD_EULER,
            old.capacity(),
            steps,
            Optional.empty(),
            old.balanceLimit(),
            old.maxSteps());
    CaseSpec ramped = spec.withEnvironment(Optional.of(new ExposureHistory(segments)), time);
    if (from.isPresent()) {
      ramped = ramped.withInitial(InitialSpec.fromResults(from.get()));
    }
    return new RunPipeline.Prepared(ramped, base.mesh(), base.warnings());
  }
}
