package dev.soakfield.fem.run;

import dev.soakfield.fem.assembly.SystemAssembler;
import dev.soakfield.fem.casefile.CaseSpec;
import dev.soakfield.fem.model.DiffusionModel;
import dev.soakfield.fem.post.GroupMonitor;
import dev.soakfield.fem.post.NodalSolubility;
import dev.soakfield.fem.post.ThresholdClock;
import dev.soakfield.fem.results.FrameWriter;
import dev.soakfield.fem.results.ResultFiles;
import dev.soakfield.fem.results.SeriesWriter;
import dev.soakfield.fem.results.StateBundle;
import dev.soakfield.fem.results.StateFile;
import dev.soakfield.fem.results.SummaryFile;
import dev.soakfield.fem.time.RunTotals;
import dev.soakfield.fem.time.StepListener;
import dev.soakfield.fem.time.StepOutcome;
import dev.soakfield.fem.time.ThetaStepper;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.vtk.VtuEncoding;
import dev.soakfield.mesh.vtk.VtuWriter;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/**
 * Listens to the stepper and hands every accepted step to the parts that each keep one record: the
 * balance ({@link BalanceLedger}), the parts' amounts and maxima ({@link GroupMonitor}), the
 * threshold times per node ({@link ThresholdClock}), the probes ({@link ProbeWatch}), the series
 * rows ({@link SeriesRows} into {@link SeriesWriter}), the field frames ({@link FrameWriter}) and
 * the stop condition ({@link StopRule}); it follows the temperature for c = S(T)·φ, gathers their
 * state for checkpoints, and writes the final state and the summary at the end.
 */
final class RunRecorder implements StepListener, AutoCloseable {
  private final Path dir;
  private final CaseSpec spec;
  private final DiffusionModel model;
  private final TetMesh mesh;
  private final RunProgress progress;
  private final List<String> warnings;
  private final ThetaStepper stepper;
  private final BalanceLedger balance;
  private final GroupMonitor parts;
  private final ThresholdClock clock;
  private final ProbeWatch probes;
  private final SeriesRows rows;
  private final SeriesWriter series;
  private final Optional<FrameWriter> frames; // empty: a run that keeps no field frames
  private double outputSeconds;
  private final StopRule stop;
  private final double[] partAmounts0;
  private final double end;
  private final ThresholdWatch watch;
  private final AccuracyWatch accuracy;
  private final Optional<RangeWatch> range;
  private final double[] partVolume;
  private final double[] scales;
  private double[] tetS;
  private double[] shownS;
  private double[] nodalS;
  private double temperatureNow;
  private double[] lastMaxima;
  private double lastTime;
  private int steps;

  RunRecorder(
      Path dir,
      CaseSpec spec,
      DiffusionModel model,
      ThetaStepper stepper,
      RunProgress progress,
      List<String> warnings)
      throws IOException {
    this(dir, spec, model, stepper, progress, warnings, null, Optional.of(VtuEncoding.DEFAULT));
  }

  /**
   * A recorder that goes on from a checkpoint when {@code resume} is given: the series keeps the
   * rows the checkpoint saw, and every accumulated figure comes back from it; frames are stored as
   * {@code frameEncoding} says (none when it is empty).
   */
  RunRecorder(
      Path dir,
      CaseSpec spec,
      DiffusionModel model,
      ThetaStepper stepper,
      RunProgress progress,
      List<String> warnings,
      StateBundle resume,
      Optional<VtuEncoding> frameEncoding)
      throws IOException {
    this.dir = dir;
    this.spec = spec;
    this.model = model;
    this.mesh = model.space().mesh();
    this.progress = progress;
    this.warnings = warnings;
    this.end = spec.time().end();
    this.stepper = stepper;
    double[] phi0 = model.initialPhi();
    stepper.applyPrescribed(phi0, 0.0);
    SystemAssembler asm = stepper.assembler();
    double threshold = spec.threshold().orElse(Double.NaN);
    temperatureNow = model.referenceTemperature();
    tetS = model.solubility();
    shownS = model.declaredSolubility(tetS);
    scales = model.concentrationScales();
    parts = new GroupMonitor(asm, tetS, scales, threshold, phi0, stepper.prescribedNodes());
    nodalS = NodalSolubility.of(mesh, shownS);
    clock = new ThresholdClock(spec.threshold().orElse(Double.POSITIVE_INFINITY), nodalS, phi0);
    probes = new ProbeWatch(spec.probes(), model.space(), threshold, shownS, phi0, warnings);
    double[] ones = new double[mesh.tetCount()];
    Arrays.fill(ones, 1.0);
    double[] nodalOnes = new double[mesh.nodeCount()];
    Arrays.fill(nodalOnes, 1.0);
    double[] partDensity = new double[mesh.volumeGroups().size()];
    for (int g = 0; g < partDensity.length; g++) {
      var m = spec.materials().get(mesh.volumeGroups().get(g).name());
      partDensity[g] = m.density().orElse(Double.NaN);
    }
    rows =
        new SeriesRows(
            mesh,
            spec.probes(),
            stepper.hasSourceLaws(),
            stepper.trapInstances(),
            stepper.reversibleTraps(),
            asm.integratePerGroup(nodalOnes, ones),
            partDensity,
            spec.quantities().massPerAmount().orElse(Double.NaN));
    partVolume = asm.integratePerGroup(nodalOnes, ones);
    watch = new ThresholdWatch(spec.thresholds(), mesh, spec.probes());
    accuracy = new AccuracyWatch(spec, mesh, probes.tets(), partVolume, scales);
    range = RangeWatch.of(model, end);
    // the amount before prescribed faces are raised
    balance = new BalanceLedger(mesh.faceGroups().size(), stepper.amount(model.initialPhi(), 0.0));
    partAmounts0 = totalAmounts(model.initialPhi(), 0.0);
    stop = new StopRule(spec, mesh);
    frames =
        frameEncoding.isPresent()
            ? Optional.of(new FrameWriter(dir, mesh, frameEncoding.get()))
            : Optional.empty();
    series =
        new SeriesWriter(
            dir.resolve(ResultFiles.SERIES),
            rows.header(),
            resume == null ? -1 : (int) resume.scalar("rec.rows"));
    if (resume != null) {
      restore(resume);
    }
  }

  @Override
  public void started(StepOutcome initial) {
    try {
      double[] raised = initial.faceInflow();
      balance.start(raised, initial.amount());
      lastMaxima = parts.maxima(initial.phi());
      ThresholdWatch.Reading r = reading(0.0, initial.phi());
      watch.start(r);
      accuracy.start(initial.amount(), probes.values(initial.phi(), shownS), r);
      series.row(rows.row(figures(0.0, 0.0, initial.phi(), raised, lastMaxima)));
      writeFrame(0.0, initial.phi());
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  @Override
  public void accepted(double t, double dt, StepOutcome out, boolean output) {
    try {
      double[] phi = out.phi();
      double[] inflow = out.faceInflow();
      balance.add(inflow, out.sourceAmount(), out.amount());
      followTemperature(t);
      double[] maxima = parts.step(t, dt, phi);
      lastMaxima = maxima;
      lastTime = t;
      clock.step(t, dt, phi);
      probes.step(t, dt, phi, shownS);
      ThresholdWatch.Reading now = reading(t, phi);
      watch.step(now);
      boolean crank = spec.time().scheme() == dev.soakfield.fem.casefile.TimeScheme.CRANK_NICOLSON;
      accuracy.step(
          dt,
          dev.soakfield.fem.time.TimeSettings.thetaOfStep(crank, steps),
          out.amount(),
          probes.values(phi, shownS),
          now,
          phi,
          tetS);
      range.ifPresent(r -> r.step(t, phi, output, nodalS));
      series.row(rows.row(figures(t, dt, phi, inflow, maxima)));
      if (output) {
        writeFrame(t, phi);
      }
      steps++;
      if (steps >= spec.time().maxSteps() && t < end) {
        throw new dev.soakfield.fem.time.RunFailedException(
            t,
            "the run took "
                + steps
                + " steps and reached only t = "
                + t
                + " s of "
                + end
                + " s; the steps are too small for the time asked (an error tolerance too"
                + " tight, a step too short, an end too far) — loosen them, or raise"
                + " time.max_steps if this is meant",
            null);
      }
      progress.step(t, end, steps, 0);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  private SeriesRows.Figures figures(
      double t, double dt, double[] phi, double[] stepInflow, double[] maxima) {
    return new SeriesRows.Figures(
        t,
        dt,
        totalAmounts(phi, t),
        partAmounts0,
        maxima,
        stepInflow,
        balance,
        probes.values(phi, shownS),
        temperatureNow,
        stepper.hasSourceLaws() ? stepper.trappedPerGroup(t) : new double[0],
        stepper.trappedPerInstance(t));
  }

  private ThresholdWatch.Reading reading(double t, double[] phi) {
    double[] means = totalAmounts(phi, t);
    for (int g = 0; g < means.length; g++) {
      means[g] /= partVolume[g] * scales[g];
    }
    return new ThresholdWatch.Reading(t, parts.freeMaxima(phi), means, probes.values(phi, shownS));
  }

  double balanceRelative() {
    return balance.relative();
  }

  /** The balance error against the amounts moved or present (what the final guard reads). */
  double balanceAgainstAmounts() {
    return balance.relativeToAmounts();
  }

  @Override
  public boolean stopRequested() {
    return stop.met(lastTime, lastMaxima, probes.last());
  }

  /** Everything accumulated so far, into a checkpoint bundle (names start with "rec."). */
  void snapshot(StateBundle b) throws IOException {
    series.flush();
    b.put("rec.rows", series.rows());
    balance.snapshot(b);
    b.put(
        "rec.totals",
        balance.amountNow(),
        balance.sources(),
        balance.moved(),
        steps,
        temperatureNow,
        lastTime,
        stop.stoppedAt());
    double[][] g = parts.snapshot();
    b.put("rec.group.first", g[0]).put("rec.group.max", g[1]);
    double[][] c = clock.snapshot();
    b.put("rec.clock.first", c[0]).put("rec.clock.previous", c[1]);
    probes.snapshot(b);
    watch.snapshot(b);
    range.ifPresent(r -> r.snapshot(b));
    accuracy.snapshot(b);
    if (lastMaxima != null) {
      b.put("rec.last.maxima", lastMaxima);
    }
    frames.ifPresent(f -> f.snapshot(b));
  }

  private void restore(StateBundle b) {
    double[] t = b.get("rec.totals");
    balance.restore(b, t[0], t[1], t[2]);
    steps = (int) t[3];
    followTemperature(t[5]);
    lastTime = t[5];
    stop.restore(t[6]);
    parts.restore(new double[][] {b.get("rec.group.first"), b.get("rec.group.max")});
    clock.restore(new double[][] {b.get("rec.clock.first"), b.get("rec.clock.previous")});
    probes.restore(b);
    watch.restore(b);
    range.ifPresent(r -> r.restore(b));
    accuracy.restore(b);
    lastMaxima = b.has("rec.last.maxima") ? b.get("rec.last.maxima") : null;
    frames.ifPresent(f -> f.restore(b));
  }

  /** Mobile plus trapped amount per part at time t. */
  private double[] totalAmounts(double[] phi, double t) {
    double[] a = parts.amounts(phi);
    if (stepper.hasSourceLaws()) {
      double[] trapped = stepper.trappedPerGroup(t);
      for (int g = 0; g < a.length; g++) {
        a[g] += trapped[g];
      }
    }
    return a;
  }

  /** Carries the solubility to the temperature at t when it changed (c = S(T)·φ). */
  private void followTemperature(double t) {
    double kelvin = model.temperature().at(t);
    if (kelvin == temperatureNow) {
      return;
    }
    temperatureNow = kelvin;
    if (model.coefficientsVary()) {
      tetS = model.solubilityAt(kelvin);
      shownS = model.declaredSolubility(tetS);
      nodalS = NodalSolubility.of(mesh, shownS);
      parts.updateSolubility(tetS);
      clock.updateSolubility(nodalS);
    }
  }

  private void writeFrame(double t, double[] phi) throws IOException {
    if (frames.isEmpty()) {
      return;
    }
    double[] c = new double[phi.length];
    for (int i = 0; i < c.length; i++) {
      c[i] = nodalS[i] * phi[i];
    }
    List<VtuWriter.Field> f = new ArrayList<>();
    f.add(new VtuWriter.Field("c", 1, c, spec.quantities().concentration()));
    String potential =
        switch (model.law()) {
          case HENRY -> "Pa";
          case SIEVERTS -> "Pa^0.5";
          case PLAIN -> spec.quantities().concentration();
        };
    f.add(new VtuWriter.Field("phi", 1, phi.clone(), potential));
    f.add(new VtuWriter.Field("first_exceed", 1, clock.firstTimes(), "s"));
    if (stepper.hasSourceLaws()) {
      f.add(
          new VtuWriter.Field(
              "trapped", 1, stepper.trappedField(t), spec.quantities().amount() + "/m^3"));
      List<String> instances = stepper.trapInstances();
      for (int k = 0; k < instances.size(); k++) {
        f.add(
            new VtuWriter.Field(
                "trapped:" + instances.get(k),
                1,
                stepper.trappedField(k, t),
                spec.quantities().amount() + "/m^3"));
      }
    }
    long start = System.nanoTime();
    // where refinement would help: the estimated mean |c − c_h| per tetrahedron
    List<VtuWriter.Field> cells =
        List.of(
            new VtuWriter.Field(
                AccuracyWatch.FIELD,
                1,
                accuracy.atOutput(phi, tetS),
                spec.quantities().concentration()));
    frames.get().write(t, f, cells);
    outputSeconds += (System.nanoTime() - start) * 1e-9;
  }

  /** Wall seconds spent writing field outputs so far. */
  double outputSeconds() {
    return outputSeconds;
  }

  void finish(RunTotals totals) throws IOException {
    if (frames.isPresent()) {
      double lastFrame = frames.get().lastTime();
      if (!Double.isNaN(lastFrame) && lastFrame != totals.endTime()) {
        writeFrame(totals.endTime(), totals.finalPhi()); // a stop condition ended the run early
      }
      frames.get().finish();
    }
    boolean lumped = spec.time().capacity() == dev.soakfield.fem.casefile.CapacityForm.LUMPED;
    range.flatMap(r -> r.warning(lumped)).ifPresent(warnings::add);
    // the series is complete and closed by now (the run's try-with-resources)
    java.util.Map<String, Object> permeation =
        PermeationSummary.of(
            dev.soakfield.fem.results.Series.read(dir.resolve(ResultFiles.SERIES)),
            mesh,
            spec.breakthroughShare());
    accuracy.crossings(watch.firstTimes());
    warnings.addAll(accuracy.warnings());
    StateFile.write(
        dir.resolve(StateFile.NAME),
        new StateFile.State(totals.endTime(), totals.finalPhi(), stepper.lawStates()));
    SummaryFile.write(
        dir,
        SummaryContents.of(
            spec,
            model,
            totals,
            balance,
            parts.firstTimes(),
            probes,
            stop,
            warnings,
            watch,
            range.map(RangeWatch::outputs).orElse(List.of()),
            permeation,
            accuracy.summary()));
  }

  @Override
  public void close() throws IOException {
    series.close();
  }
}
