package dev.soakfield.fem.bake;

import dev.soakfield.fem.casefile.CaseSpec;
import dev.soakfield.fem.casefile.StepControl;
import dev.soakfield.fem.casefile.StopSpec;
import dev.soakfield.fem.casefile.TimeScheme;
import dev.soakfield.fem.casefile.TimeSpec;
import dev.soakfield.fem.model.LawResolver;
import dev.soakfield.fem.physics.ExposureHistory;
import dev.soakfield.fem.physics.SorptionLaw;
import dev.soakfield.fem.results.ResultFiles;
import dev.soakfield.fem.results.Series;
import dev.soakfield.fem.run.RunOptions;
import dev.soakfield.fem.run.RunPipeline;
import dev.soakfield.fem.run.RunProgress;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;

/**
 * The shortest bake at a temperature that brings a target below a level: a part's largest or mean
 * concentration, a probe, the whole amount, or the weight gain over the dry mass. One run with a
 * stop condition brackets the time between two accepted steps; bisection on the bake duration, each
 * trial a transient run that ends exactly at the trial time, narrows the bracket to the tolerance.
 * The answer is the bracket's upper end, a time at which the target is met.
 */
public final class BakeSearch {
  /** The loosest step-error tolerance a bake search runs with. */
  public static final double BAKE_TOLERANCE = 1e-4;

  private BakeSearch() {}

  /**
   * What to bake for.
   *
   * @param target "group" (the part's largest concentration), "mean" (its mean), "probe", "amount"
   *     or "total" (the whole amount, lattice and trapped), "diffusible" (the lattice amount and
   *     what reversible traps hold) or "weight_gain" (the content in percent of the dry mass, what
   *     a balance reads against the dry weight)
   * @param name the part or probe ("" for amount and weight_gain)
   * @param level the value to fall below, in the target's unit ({@link Result#unit()})
   */
  public record Target(String target, String name, double level) {
    /**
     * As the command line spells it: max:body, mean:body, probe:core, amount, total, diffusible,
     * weight_gain.
     */
    public String spelling() {
      return switch (target) {
        case "group" -> "max:" + name;
        case "amount", "total", "diffusible", "weight_gain" -> target;
        default -> target + ":" + name;
      };
    }
  }

  /**
   * The bake environment.
   *
   * @param temperature K
   * @param humidity relative humidity during the bake (Henry's law), usually 0
   * @param pressure hydrogen pressure during the bake in Pa (Sieverts' law), usually 0
   * @param longest the longest bake to consider, s
   */
  public record Oven(double temperature, double humidity, double pressure, double longest) {}

  /**
   * The answer.
   *
   * @param met whether the target was met within the longest bake
   * @param time the shortest bake found, s (NaN when not met)
   * @param lowerBound the longest bake known not to meet the target, s
   * @param curveTimes times of the target's curve, s
   * @param curveValues the target quantity at those times
   * @param runs transient runs made
   * @param unit the target's unit (the case's concentration unit, its amount unit, or %)
   */
  @SuppressWarnings("ArrayRecordComponent") // built once and handed over
  public record Result(
      boolean met,
      double time,
      double lowerBound,
      double[] curveTimes,
      double[] curveValues,
      int runs,
      String unit) {}

  /**
   * Searches the bake time.
   *
   * @param relativeTolerance bracket width relative to the bake time at which bisection stops
   * @param work a folder for the trial runs (emptied of them afterwards)
   */
  public static Result search(
      Path caseFile,
      Oven oven,
      Target target,
      double relativeTolerance,
      LawResolver laws,
      Path work)
      throws IOException {
    RunPipeline.Prepared base = RunPipeline.prepare(caseFile);
    BakeTargets.check(base.spec(), target);
    String unit = BakeTargets.unit(base.spec(), target);
    // the run's own stop rule watches maxima and probes; other targets run the longest bake
    Optional<StopSpec> stop =
        target.target().equals("group") || target.target().equals("probe")
            ? Optional.of(new StopSpec(target.target(), target.name(), true, target.level()))
            : Optional.empty();
    Path first = work.resolve("bake-bracket");
    RunPipeline.run(
        withBake(base, oven, oven.longest(), stop),
        first,
        RunProgress.SILENT,
        RunOptions.defaults().withLaws(laws));
    Series firstSeries = Series.read(first.resolve(ResultFiles.SERIES));
    double[] curveTimes = firstSeries.require("time");
    double[] curveValues = BakeTargets.values(firstSeries, base, target);
    int runs = 1;
    int hit = -1;
    for (int i = 0; i < curveTimes.length; i++) {
      if (curveValues[i] < target.level()) {
        hit = i;
        break;
      }
    }
    if (hit < 0) {
      deleteTree(first);
      return new Result(false, Double.NaN, oven.longest(), curveTimes, curveValues, runs, unit);
    }
    if (hit == 0) {
      deleteTree(first);
      return new Result(true, 0.0, 0.0, curveTimes, curveValues, runs, unit);
    }
    double lo = curveTimes[hit - 1];
    double hi = curveTimes[hit];
    while (hi - lo > relativeTolerance * hi && runs < 40) {
      double mid = 0.5 * (lo + hi);
      Path trial = work.resolve("bake-trial");
      RunPipeline.run(
          withBake(base, oven, mid, Optional.empty()),
          trial,
          RunProgress.SILENT,
          RunOptions.defaults().withLaws(laws));
      double[] endValues =
          BakeTargets.values(Series.read(trial.resolve(ResultFiles.SERIES)), base, target);
      runs++;
      deleteTree(trial);
      if (endValues[endValues.length - 1] < target.level()) {
        hi = mid;
      } else {
        lo = mid;
      }
    }
    deleteTree(first);
    return new Result(true, hi, lo, curveTimes, curveValues, runs, unit);
  }

  /** The case with the oven as its whole exposure, ending at {@code duration}. */
  static RunPipeline.Prepared withBake(
      RunPipeline.Prepared base, Oven oven, double duration, Optional<StopSpec> stop) {
    CaseSpec spec = base.spec();
    boolean henry = spec.law() == SorptionLaw.HENRY;
    boolean sieverts = spec.law() == SorptionLaw.SIEVERTS;
    ExposureHistory oneSegment =
        new ExposureHistory(
            List.of(
                new ExposureHistory.Segment(
                    0,
                    duration,
                    oven.temperature(),
                    oven.temperature(),
                    henry ? oven.humidity() : Double.NaN,
                    henry ? oven.humidity() : Double.NaN,
                    sieverts ? oven.pressure() : Double.NaN,
                    sieverts ? oven.pressure() : Double.NaN)));
    TimeSpec old = spec.time();
    // the bake time is only as good as the transient: adaptive steps at least as tight as 1e-4
    StepControl steps = old.steps();
    if (steps instanceof StepControl.Adaptive a && a.tolerance() > BAKE_TOLERANCE) {
      steps = new StepControl.Adaptive(BAKE_TOLERANCE, a.initialStep(), a.maxStep());
    }
    TimeSpec time =
        new TimeSpec(
            duration,
            List.of(duration),
            TimeScheme.BACKWARD_EULER,
            old.capacity(),
            steps,
            stop,
            old.balanceLimit(),
            old.maxSteps());
    return new RunPipeline.Prepared(
        spec.withEnvironment(Optional.of(oneSegment), time), base.mesh(), base.warnings());
  }

  private static void deleteTree(Path root) throws IOException {
    if (!Files.exists(root)) {
      return;
    }
    List<Path> all = new ArrayList<>();
    try (Stream<Path> walk = Files.walk(root)) {
      walk.forEach(all::add);
    }
    all.sort(Comparator.reverseOrder());
    for (Path p : all) {
      Files.deleteIfExists(p);
    }
  }
}
