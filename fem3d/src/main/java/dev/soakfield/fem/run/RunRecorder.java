package dev.soakfield.fem.run;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import dev.soakfield.fem.assembly.PointLocator;
import dev.soakfield.fem.assembly.SystemAssembler;
import dev.soakfield.fem.casefile.CaseSpec;
import dev.soakfield.fem.casefile.ProbeSpec;
import dev.soakfield.fem.model.DiffusionModel;
import dev.soakfield.fem.post.GroupMonitor;
import dev.soakfield.fem.post.NodalSolubility;
import dev.soakfield.fem.post.ThresholdClock;
import dev.soakfield.fem.results.ResultFiles;
import dev.soakfield.fem.results.SeriesWriter;
import dev.soakfield.fem.results.StateBundle;
import dev.soakfield.fem.results.StateFile;
import dev.soakfield.fem.time.RunTotals;
import dev.soakfield.fem.time.ThetaStepper;
import dev.soakfield.mesh.FaceGroupKind;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.vtk.PvdEntry;
import dev.soakfield.mesh.vtk.PvdWriter;
import dev.soakfield.mesh.vtk.VtuFormat;
import dev.soakfield.mesh.vtk.VtuWriter;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

/** Writes the series row by row, the fields at output times, and the summary at the end. */
final class RunRecorder implements dev.soakfield.fem.time.StepListener, AutoCloseable {
  private final Path dir;
  private final CaseSpec spec;
  private final DiffusionModel model;
  private final TetMesh mesh;
  private final RunProgress progress;
  private final List<String> warnings;
  private final SeriesWriter series;
  private final GroupMonitor groups;
  private final ThresholdClock clock;
  private final ThetaStepper stepper;
  private double[] tetS;
  private double[] nodalS;
  private double temperatureNow;
  private final double[] groupVolume;
  private final double[] groupDensity; // NaN where a material gives none
  private final double[] groupAmount0;
  private double lastTime;
  private double stoppedAt = Double.NaN;
  private double[] lastMaxima;
  private double[] lastProbes;
  private final List<Optional<PointLocator.Probe>> probes = new ArrayList<>();
  private final double[] probeFirst;
  private final double[] probePrevious;
  private final int[] exteriorGroups;
  private final double[] cumulativeInflow;
  private final List<PvdEntry> frames = new ArrayList<>();
  private final double amount0;
  private final double end;
  private double amountNow;
  private double sources;
  private double moved;
  private int steps;

  RunRecorder(
      Path dir,
      CaseSpec spec,
      DiffusionModel model,
      ThetaStepper stepper,
      RunProgress progress,
      List<String> warnings)
      throws IOException {
    this(dir, spec, model, stepper, progress, warnings, null);
  }

  /**
   * A recorder that goes on from a checkpoint when {@code resume} is given: the series keeps the
   * rows the checkpoint saw, and every accumulated figure comes back from it.
   */
  RunRecorder(
      Path dir,
      CaseSpec spec,
      DiffusionModel model,
      ThetaStepper stepper,
      RunProgress progress,
      List<String> warnings,
      StateBundle resume)
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
    SystemAssembler asm = new SystemAssembler(model.space());
    double threshold = spec.threshold().orElse(Double.NaN);
    temperatureNow = model.referenceTemperature();
    tetS = model.solubility();
    groups = new GroupMonitor(asm, tetS, threshold, phi0);
    nodalS = NodalSolubility.of(mesh, tetS);
    double[] ones = new double[mesh.tetCount()];
    java.util.Arrays.fill(ones, 1.0);
    groupVolume = asm.integratePerGroup(filled(mesh.nodeCount(), 1.0), ones);
    groupDensity = new double[mesh.volumeGroups().size()];
    for (int g = 0; g < groupDensity.length; g++) {
      var m = spec.materials().get(mesh.volumeGroups().get(g).name());
      groupDensity[g] = m.density().orElse(Double.NaN);
    }
    clock = new ThresholdClock(spec.threshold().orElse(Double.POSITIVE_INFINITY), nodalS, phi0);
    PointLocator locator = new PointLocator(model.space());
    for (ProbeSpec p : spec.probes()) {
      Optional<PointLocator.Probe> found = locator.locate(p.x(), p.y(), p.z());
      if (found.isEmpty()) {
        warnings.add("probe '" + p.name() + "' lies outside the mesh; its column is empty");
      }
      probes.add(found);
    }
    probeFirst = new double[probes.size()];
    java.util.Arrays.fill(probeFirst, -1);
    probePrevious = probeValues(phi0);
    for (int i = 0; i < probeFirst.length; i++) {
      if (probePrevious[i] >= threshold) {
        probeFirst[i] = 0;
      }
    }
    exteriorGroups =
        java.util.stream.IntStream.range(0, mesh.faceGroups().size())
            .filter(g -> mesh.faceGroups().get(g).kind() == FaceGroupKind.EXTERIOR)
            .toArray();
    cumulativeInflow = new double[mesh.faceGroups().size()];
    amount0 = stepper.amount(model.initialPhi(), 0.0); // before held faces are raised
    amountNow = amount0;
    groupAmount0 = totalAmounts(model.initialPhi(), 0.0);
    Files.createDirectories(dir.resolve("fields"));
    series =
        new SeriesWriter(
            dir.resolve(ResultFiles.SERIES),
            header(),
            resume == null ? -1 : (int) resume.scalar("rec.rows"));
    if (resume != null) {
      restore(resume);
    }
  }

  @Override
  public void started(dev.soakfield.fem.time.StepOutcome initial) {
    try {
      double[] raised = initial.faceInflow();
      for (int g = 0; g < raised.length; g++) {
        cumulativeInflow[g] += raised[g];
        moved += Math.abs(raised[g]);
      }
      amountNow = initial.amount();
      lastMaxima = groups.maxima(initial.phi());
      series.row(row(0.0, 0.0, initial.phi(), raised, lastMaxima));
      writeFrame(0.0, initial.phi());
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  private List<String> header() {
    List<String> h = new ArrayList<>();
    h.add("time");
    h.add("amount");
    for (var g : mesh.volumeGroups()) {
      h.add("amount:" + g.name());
    }
    for (var g : mesh.volumeGroups()) {
      h.add("max:" + g.name());
    }
    for (int g : exteriorGroups) {
      h.add("inflow_rate:" + mesh.faceGroups().get(g).name());
    }
    for (int g : exteriorGroups) {
      h.add("inflow:" + mesh.faceGroups().get(g).name());
    }
    for (ProbeSpec p : spec.probes()) {
      h.add("probe:" + p.name());
    }
    h.add("balance_error");
    h.add("temperature");
    if (stepper.hasSourceLaws()) {
      h.add("lattice_amount");
      h.add("trapped_amount");
      for (var g : mesh.volumeGroups()) {
        h.add("trapped:" + g.name());
      }
    }
    if (hasDensities()) {
      h.add("weight_gain_percent");
      for (var g : mesh.volumeGroups()) {
        h.add("weight_gain_percent:" + g.name());
      }
    }
    return h;
  }

  private double[] probeValues(double[] phi) {
    double[] v = new double[probes.size()];
    for (int i = 0; i < v.length; i++) {
      Optional<PointLocator.Probe> p = probes.get(i);
      v[i] = p.isPresent() ? tetS[p.get().tet()] * p.get().value(phi) : Double.NaN;
    }
    return v;
  }

  private double[] row(double t, double dt, double[] phi, double[] stepInflow, double[] maxima) {
    List<Double> r = new ArrayList<>();
    r.add(t);
    double[] amounts = totalAmounts(phi, t);
    double total = 0;
    for (double a : amounts) {
      total += a;
    }
    r.add(total);
    for (double a : amounts) {
      r.add(a);
    }
    for (double m : maxima) {
      r.add(m);
    }
    for (int g : exteriorGroups) {
      r.add(dt > 0 ? stepInflow[g] / dt : 0.0);
    }
    for (int g : exteriorGroups) {
      r.add(cumulativeInflow[g]);
    }
    for (double p : probeValues(phi)) {
      r.add(p);
    }
    r.add(balanceError());
    r.add(temperatureNow);
    if (stepper.hasSourceLaws()) {
      double[] held = stepper.heldPerGroup(t);
      double heldTotal = 0;
      for (double v : held) {
        heldTotal += v;
      }
      r.add(total - heldTotal);
      r.add(heldTotal);
      for (double v : held) {
        r.add(v);
      }
    }
    if (hasDensities()) {
      double gained = 0;
      double mass = 0;
      for (int g = 0; g < amounts.length; g++) {
        gained += amounts[g] - groupAmount0[g];
        mass += groupDensity[g] * groupVolume[g];
      }
      r.add(100 * gained / mass);
      for (int g = 0; g < amounts.length; g++) {
        r.add(100 * (amounts[g] - groupAmount0[g]) / (groupDensity[g] * groupVolume[g]));
      }
    }
    return r.stream().mapToDouble(Double::doubleValue).toArray();
  }

  private double balanceError() {
    double in = 0;
    for (double v : cumulativeInflow) {
      in += v;
    }
    return amountNow - amount0 - in - sources;
  }

  double balanceRelative() {
    double scale = Math.max(moved, Math.abs(amountNow - amount0));
    return scale > 0 ? Math.abs(balanceError()) / scale : 0.0;
  }

  @Override
  public void accepted(
      double t, double dt, dev.soakfield.fem.time.StepOutcome out, boolean output) {
    try {
      double[] phi = out.phi();
      double[] inflow = out.faceInflow();
      for (int g = 0; g < inflow.length; g++) {
        cumulativeInflow[g] += inflow[g];
        moved += Math.abs(inflow[g]);
      }
      sources += out.sourceAmount();
      moved += Math.abs(out.sourceAmount());
      amountNow = out.amount();
      followTemperature(t);
      double[] maxima = groups.step(t, dt, phi);
      lastMaxima = maxima;
      lastTime = t;
      clock.step(t, dt, phi);
      double[] pv = probeValues(phi);
      for (int i = 0; i < pv.length; i++) {
        double thr = spec.threshold().orElse(Double.NaN);
        if (probeFirst[i] < 0 && pv[i] >= thr) {
          probeFirst[i] = ThresholdClock.crossing(t - dt, probePrevious[i], t, pv[i], thr);
        }
      }
      System.arraycopy(pv, 0, probePrevious, 0, pv.length);
      lastProbes = pv;
      series.row(row(t, dt, phi, inflow, maxima));
      if (output) {
        writeFrame(t, phi);
      }
      steps++;
      progress.step(t, end, steps, 0);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  /** Everything accumulated so far, into a checkpoint bundle (names start with "rec."). */
  void snapshot(StateBundle b) throws IOException {
    series.flush();
    b.put("rec.rows", series.rows());
    b.put("rec.inflow", cumulativeInflow);
    b.put("rec.totals", amountNow, sources, moved, steps, temperatureNow, lastTime, stoppedAt);
    double[][] g = groups.snapshot();
    b.put("rec.group.first", g[0]).put("rec.group.max", g[1]);
    double[][] c = clock.snapshot();
    b.put("rec.clock.first", c[0]).put("rec.clock.previous", c[1]);
    b.put("rec.probe.first", probeFirst).put("rec.probe.previous", probePrevious);
    if (lastMaxima != null) {
      b.put("rec.last.maxima", lastMaxima);
    }
    if (lastProbes != null) {
      b.put("rec.last.probes", lastProbes);
    }
    double[] frameTimes = new double[frames.size()];
    StringBuilder names = new StringBuilder();
    for (int i = 0; i < frameTimes.length; i++) {
      frameTimes[i] = frames.get(i).time();
      names.append(i > 0 ? "\n" : "").append(frames.get(i).relativeFile());
    }
    b.put("rec.frames", frameTimes).putText("rec.frame.files", names.toString());
  }

  private void restore(StateBundle b) {
    double[] inflow = b.get("rec.inflow");
    System.arraycopy(inflow, 0, cumulativeInflow, 0, cumulativeInflow.length);
    double[] t = b.get("rec.totals");
    amountNow = t[0];
    sources = t[1];
    moved = t[2];
    steps = (int) t[3];
    followTemperature(t[5]);
    lastTime = t[5];
    stoppedAt = t[6];
    groups.restore(new double[][] {b.get("rec.group.first"), b.get("rec.group.max")});
    clock.restore(new double[][] {b.get("rec.clock.first"), b.get("rec.clock.previous")});
    System.arraycopy(b.get("rec.probe.first"), 0, probeFirst, 0, probeFirst.length);
    System.arraycopy(b.get("rec.probe.previous"), 0, probePrevious, 0, probePrevious.length);
    lastMaxima = b.has("rec.last.maxima") ? b.get("rec.last.maxima") : null;
    lastProbes = b.has("rec.last.probes") ? b.get("rec.last.probes") : null;
    double[] times = b.get("rec.frames");
    String[] files = b.text("rec.frame.files").split("\n", -1);
    frames.clear();
    for (int i = 0; i < times.length; i++) {
      frames.add(new PvdEntry(times[i], files[i]));
    }
  }

  /** Mobile plus held amount per volume group at time t. */
  private double[] totalAmounts(double[] phi, double t) {
    double[] a = groups.amounts(phi);
    if (stepper.hasSourceLaws()) {
      double[] held = stepper.heldPerGroup(t);
      for (int g = 0; g < a.length; g++) {
        a[g] += held[g];
      }
    }
    return a;
  }

  private boolean hasDensities() {
    for (double d : groupDensity) {
      if (Double.isNaN(d)) {
        return false;
      }
    }
    return groupDensity.length > 0;
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
      nodalS = NodalSolubility.of(mesh, tetS);
      groups.updateSolubility(tetS);
      clock.updateSolubility(nodalS);
    }
  }

  @Override
  public boolean stopRequested() {
    if (spec.time().stop().isEmpty() || lastMaxima == null) {
      return false;
    }
    var stop = spec.time().stop().get();
    double value;
    if (stop.target().equals("group")) {
      value = lastMaxima[mesh.volumeGroupIndex(stop.name())];
    } else {
      int i = 0;
      while (i < spec.probes().size() && !spec.probes().get(i).name().equals(stop.name())) {
        i++;
      }
      if (lastProbes == null || i >= lastProbes.length) {
        return false;
      }
      value = lastProbes[i];
    }
    if (stop.met(value) && lastTime > 0) {
      stoppedAt = lastTime;
      return true;
    }
    return false;
  }

  private static double[] filled(int n, double v) {
    double[] a = new double[n];
    java.util.Arrays.fill(a, v);
    return a;
  }

  private List<VtuWriter.Field> pointFields(double[] c, double[] phi, double t) {
    List<VtuWriter.Field> f = new ArrayList<>();
    f.add(new VtuWriter.Field("c", 1, c));
    f.add(new VtuWriter.Field("phi", 1, phi.clone()));
    f.add(new VtuWriter.Field("first_exceed", 1, clock.firstTimes()));
    if (stepper.hasSourceLaws()) {
      f.add(new VtuWriter.Field("trapped", 1, stepper.heldField(t)));
    }
    return f;
  }

  private void writeFrame(double t, double[] phi) throws IOException {
    String name = String.format(Locale.ROOT, "fields/c_%04d.vtu", frames.size());
    double[] c = new double[phi.length];
    for (int i = 0; i < c.length; i++) {
      c[i] = nodalS[i] * phi[i];
    }
    double[] group = new double[mesh.tetCount()];
    for (int e = 0; e < group.length; e++) {
      group[e] = mesh.tetGroup(e);
    }
    VtuWriter.write(
        dir.resolve(name),
        mesh,
        pointFields(c, phi, t),
        List.of(new VtuWriter.Field("group", 1, group)),
        VtuFormat.APPENDED_BASE64,
        false);
    frames.add(new PvdEntry(t, name));
  }

  void finish(RunTotals totals) throws IOException {
    if (!frames.isEmpty() && frames.get(frames.size() - 1).time() != totals.endTime()) {
      writeFrame(totals.endTime(), totals.finalPhi()); // a stop condition ended the run early
    }
    PvdWriter.write(dir.resolve(ResultFiles.FIELDS), frames);
    StateFile.write(
        dir.resolve(StateFile.NAME),
        new StateFile.State(totals.endTime(), totals.finalPhi(), stepper.lawStates()));
    Map<String, Object> root = new LinkedHashMap<>();
    root.put("case", spec.caseFile().toString());
    Map<String, Object> m = new LinkedHashMap<>();
    m.put("file", spec.mesh().toString());
    m.put("nodes", mesh.nodeCount());
    m.put("tets", mesh.tetCount());
    m.put("order", mesh.order());
    root.put("mesh", m);
    Map<String, Object> solver = new LinkedHashMap<>();
    solver.put("steps", totals.steps());
    solver.put("rejected_steps", totals.rejectedSteps());
    solver.put("linear_iterations", totals.linearIterations());
    solver.put("end_time", totals.endTime());
    root.put("solver", solver);
    Map<String, Object> balance = new LinkedHashMap<>();
    balance.put("relative", balanceRelative());
    balance.put("error", balanceError());
    balance.put("amount_start", amount0);
    balance.put("amount_end", amountNow);
    root.put("balance", balance);
    Map<String, Object> threshold = new LinkedHashMap<>();
    threshold.put("value", spec.threshold().isPresent() ? spec.threshold().getAsDouble() : null);
    Map<String, Object> perGroup = new LinkedHashMap<>();
    double[] gt = groups.firstTimes();
    for (int g = 0; g < gt.length; g++) {
      perGroup.put(mesh.volumeGroups().get(g).name(), gt[g] < 0 ? null : gt[g]);
    }
    Map<String, Object> perProbe = new LinkedHashMap<>();
    for (int i = 0; i < probeFirst.length; i++) {
      perProbe.put(spec.probes().get(i).name(), probeFirst[i] < 0 ? null : probeFirst[i]);
    }
    Map<String, Object> first = new LinkedHashMap<>();
    first.put("volume_groups", perGroup);
    first.put("probes", perProbe);
    threshold.put("first_time", first);
    root.put("threshold", spec.threshold().isPresent() ? threshold : null);
    if (spec.time().stop().isPresent()) {
      Map<String, Object> stop = new LinkedHashMap<>();
      stop.put("condition", spec.time().stop().get().describe());
      stop.put("met", !Double.isNaN(stoppedAt));
      stop.put("time", Double.isNaN(stoppedAt) ? null : stoppedAt);
      root.put("stop", stop);
    }
    root.put("law", model.law().word());
    root.put("temperature_start", model.referenceTemperature());
    root.put("warnings", warnings);
    root.put(
        "caution",
        "Model estimates from the data given. Where results bear on safety, check them against"
            + " the applicable standards and have them reviewed by a qualified engineer.");
    new ObjectMapper()
        .enable(SerializationFeature.INDENT_OUTPUT)
        .writeValue(dir.resolve(ResultFiles.SUMMARY).toFile(), root);
  }

  @Override
  public void close() throws IOException {
    series.close();
  }
}
