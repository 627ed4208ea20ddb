package dev.soakfield.fem.run;

import dev.soakfield.fem.casefile.CapacityForm;
import dev.soakfield.fem.casefile.CaseChecks;
import dev.soakfield.fem.casefile.CaseReader;
import dev.soakfield.fem.casefile.CaseSpec;
import dev.soakfield.fem.casefile.StepControl;
import dev.soakfield.fem.casefile.TimeScheme;
import dev.soakfield.fem.model.DiffusionModel;
import dev.soakfield.fem.model.ImpermeableParts;
import dev.soakfield.fem.model.LawResolver;
import dev.soakfield.fem.model.ModelBuilder;
import dev.soakfield.fem.results.FolderLock;
import dev.soakfield.fem.results.ResultFiles;
import dev.soakfield.fem.results.ResultFolder;
import dev.soakfield.fem.results.ResultFolderException;
import dev.soakfield.fem.results.RunManifest;
import dev.soakfield.fem.results.StateBundle;
import dev.soakfield.fem.time.RunCursor;
import dev.soakfield.fem.time.RunTotals;
import dev.soakfield.fem.time.ThetaStepper;
import dev.soakfield.fem.time.TimeSettings;
import dev.soakfield.fem.time.TransientRun;
import dev.soakfield.mesh.AtomicFiles;
import dev.soakfield.mesh.MeshFinding;
import dev.soakfield.mesh.MeshImport;
import dev.soakfield.mesh.MeshInputException;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.MidEdgeNodes;
import dev.soakfield.mesh.load.MeshLoader;
import dev.soakfield.mesh.topo.AssemblyOptions;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * {@code run}: case file in, results out — reads and checks the case and its mesh, builds the
 * model, steps through time, and writes series.csv, fields (VTU/PVD), summary.json, run.log,
 * mesh.msh and manifest.json into a {@link ResultFolder}.
 */
public final class RunPipeline {
  /** Relative residual of each linear solve: tight, so the global balance closes to ~1e-10. */
  public static final double SOLVER_TOLERANCE = 1e-11;

  public static final int SOLVER_MAX_ITERATIONS = 5000;

  /** The copy of the mesh the run used, so a result folder stands on its own. */
  public static final String MESH_COPY = ResultFiles.MESH_COPY;

  /** The copy of the case file as it was run (its mesh key still names the original mesh). */
  public static final String CASE_COPY = ResultFiles.CASE_COPY;

  private RunPipeline() {}

  /** The case and mesh, read and checked, and what the checks had to say. */
  public record Prepared(CaseSpec spec, TetMesh mesh, List<String> warnings) {}

  /** Reads the case and its mesh and checks them against each other, solving nothing. */
  public static Prepared prepare(Path caseFile) {
    CaseSpec spec = CaseReader.read(caseFile);
    return prepare(spec, MeshLoader.load(spec.mesh(), AssemblyOptions.defaults()));
  }

  /**
   * Checks a case against its mesh already imported from {@code spec.mesh()} (a sweep imports the
   * mesh once for all its cases); the import itself is not changed.
   */
  public static Prepared prepare(CaseSpec spec, MeshImport imported) {
    List<String> warnings = new ArrayList<>();
    for (MeshFinding f : imported.report().findings()) {
      if (f.severity() == MeshFinding.Severity.ERROR) {
        throw new MeshInputException(
            spec.mesh().toString(),
            "",
            f.message(),
            "a mesh without errors (see 'soakfield info')");
      }
      if (f.severity() == MeshFinding.Severity.WARNING) {
        warnings.add("mesh: " + f.message());
      }
    }
    TetMesh mesh = ImpermeableParts.removedFrom(spec, imported.mesh());
    warnings.addAll(CaseChecks.againstMesh(spec, mesh));
    int order = spec.elements().orderFor(mesh.order());
    if (order == 2 && mesh.order() == 1) {
      mesh = MidEdgeNodes.promote(mesh);
    } else if (order == 1 && mesh.order() == 2) {
      throw new MeshInputException(
          spec.caseFile().toString(),
          "key elements",
          "\"linear\" for a mesh of 10-node tetrahedra",
          "\"quadratic\", or no \"elements\" key, for this mesh");
    }
    return new Prepared(spec, mesh, warnings);
  }

  /**
   * Binds everything a run binds before it solves — the materials' source laws and their
   * parameters, the restart folder of {@code initial.from} — so that a case that passes {@code
   * check} cannot fail {@code run} on input; returns the warnings binding adds.
   *
   * @throws dev.soakfield.fem.casefile.CaseInputException for an unknown law, a parameter that does
   *     not fit, or a restart folder without a usable final state (at their place in the case)
   */
  public static List<String> bindAll(Prepared prepared, LawResolver laws) {
    List<String> warnings = new ArrayList<>();
    ModelBuilder.build(prepared.spec(), prepared.mesh(), warnings, laws);
    return warnings;
  }

  /** Runs the case and writes its results into {@code outDir}, with default options. */
  public static RunSummary run(Path caseFile, Path outDir, RunProgress progress)
      throws IOException {
    return run(caseFile, outDir, progress, RunOptions.defaults());
  }

  /** Runs the case with default options and {@code laws} to resolve its source laws. */
  public static RunSummary run(Path caseFile, Path outDir, RunProgress progress, LawResolver laws)
      throws IOException {
    return run(caseFile, outDir, progress, RunOptions.defaults().withLaws(laws));
  }

  /**
   * Runs the case and writes its results into {@code outDir}: the folder exists from the start with
   * a manifest saying "running"; each file appears under its real name only when complete.
   *
   * @throws HeapTooSmallException when the memory estimate exceeds {@code options.maxHeap()}
   * @throws ResultFolderException when the folder holds another case's results, foreign files, or
   *     cannot be written
   */
  public static RunSummary run(Path caseFile, Path outDir, RunProgress progress, RunOptions options)
      throws IOException {
    return run(prepare(caseFile), outDir, progress, options);
  }

  /**
   * Runs a case already read and checked (see {@link #prepare}), holding the folder's lock ({@link
   * FolderLock}) while it writes there.
   */
  public static RunSummary run(
      Prepared prepared, Path outDir, RunProgress progress, RunOptions options) throws IOException {
    TetMesh mesh = prepared.mesh();
    MemoryEstimate memory = MemoryEstimate.of(prepared.spec(), mesh);
    memory.requireHeap(options.maxHeap()); // refused before anything is written
    FolderLock lock = FolderLock.take(outDir);
    try {
      return runLocked(prepared, outDir, progress, options, memory);
    } finally {
      lock.close(); // also when the run fails: the folder is free for the next one
    }
  }

  private static RunSummary runLocked(
      Prepared prepared,
      Path outDir,
      RunProgress progress,
      RunOptions options,
      MemoryEstimate memory)
      throws IOException {
    Path caseFile = prepared.spec().caseFile();
    LawResolver laws = options.laws();
    CaseSpec spec = prepared.spec();
    TetMesh mesh = prepared.mesh();
    List<String> warnings = new ArrayList<>(prepared.warnings());
    long modelStart = System.nanoTime();
    DiffusionModel model = ModelBuilder.build(spec, mesh, warnings, laws);
    boolean lumped = spec.time().capacity() == CapacityForm.LUMPED;
    ThetaStepper stepper = new ThetaStepper(model, lumped, SOLVER_TOLERANCE, SOLVER_MAX_ITERATIONS);
    double modelSeconds = (System.nanoTime() - modelStart) * 1e-9;
    continueLawStates(spec, mesh, stepper, warnings);
    TimeSettings settings = settings(spec);

    RunManifest starting = RunManifest.starting(caseFile, spec.mesh(), options.toolVersion());
    if (options.resume()
        && ResultFolder.completeUnreported(
            outDir,
            starting,
            (f, finished) -> options.completion().complete(f, finished, mesh),
            java.util.Set.of(Checkpointer.NAME))) {
      // stopped between its results and its report: only the report was missing
      Files.deleteIfExists(outDir.resolve(Checkpointer.NAME));
      return RunSummary.fromFolder(outDir.toAbsolutePath().normalize());
    }
    boolean resume =
        options.resume() && ResultFolder.canResume(outDir, starting, Checkpointer.NAME);
    if (options.resume() && !resume) {
      warnings.add(
          "--resume: "
              + outDir
              + " holds no checkpoint yet (no run there, or one that stopped before its first"
              + " checkpoint); the run started from the beginning");
    }
    ResultFolder folder =
        resume
            ? ResultFolder.reopen(outDir, starting, Checkpointer.NAME)
            : ResultFolder.open(outDir, starting, options.force());
    Path checkpoint = folder.target().resolve(Checkpointer.NAME);
    String fingerprint = starting.caseSha256() + "/" + starting.meshSha256();
    StateBundle resumeFrom = resume ? readCheckpoint(checkpoint, fingerprint) : null;
    RunLog log;
    try {
      log = new RunLog(folder.work().resolve(RunLog.FILE));
      // the user's file as it is, byte for byte: readers derive the run's mesh from it (MeshAsRun)
      AtomicFiles.write(
          folder.work().resolve(MESH_COPY),
          f -> Files.copy(spec.mesh(), f, StandardCopyOption.REPLACE_EXISTING));
      AtomicFiles.write(
          folder.work().resolve(CASE_COPY),
          f -> Files.copy(caseFile, f, StandardCopyOption.REPLACE_EXISTING));
    } catch (IOException e) {
      folder.fail("could not write into the folder: " + e.getMessage(), false);
      throw ResultFolder.unwritable(folder.target(), e);
    }
    try (log) {
      log.line("soakfield " + options.toolVersion() + ": case " + starting.caseFile());
      log.line(
          String.format(
              Locale.ROOT,
              "mesh %s: %d nodes, %d tetrahedra of order %d; heap estimate %s of %s",
              starting.meshFile(),
              mesh.nodeCount(),
              mesh.tetCount(),
              mesh.order(),
              MemoryEstimate.megabytes(memory.bytes()),
              MemoryEstimate.megabytes(options.maxHeap())));
      RunRecorder recorder;
      ProgressRelay relay;
      RunTotals totals;
      double steppingSeconds;
      try {
        recorder =
            new RunRecorder(
                folder.work(),
                spec,
                model,
                stepper,
                RunProgress.SILENT,
                warnings,
                resumeFrom,
                options.frames()
                    ? java.util.Optional.of(options.frameEncoding())
                    : java.util.Optional.empty());
        RunCursor cursor = null;
        if (resumeFrom != null) {
          stepper.restoreLawStates(Checkpointer.lawStates(resumeFrom));
          cursor = Checkpointer.cursor(resumeFrom);
          log.line(
              String.format(Locale.ROOT, "resumed from the checkpoint at t = %.6g s", cursor.t()));
        }
        Checkpointer checkpoints =
            new Checkpointer(
                folder.target(),
                recorder,
                stepper,
                options.checkpointSteps(),
                options.checkpointSeconds(),
                fingerprint);
        for (String w : warnings) {
          log.line("warning: " + w);
        }
        int warned = warnings.size();
        relay = new ProgressRelay(recorder, spec.time().end(), progress, log);
        long steppingStart = System.nanoTime();
        try (recorder) {
          totals =
              TransientRun.run(stepper, model.initialPhi(), settings, relay, checkpoints, cursor);
        }
        steppingSeconds = (System.nanoTime() - steppingStart) * 1e-9;
        recorder.finish(totals);
        for (String w : warnings.subList(warned, warnings.size())) {
          log.line("warning: " + w); // what the run itself found (e.g. an overshoot)
        }
        BalanceCheck.require(recorder.balanceAgainstAmounts(), spec, totals.endTime());
      } catch (IOException | UncheckedIOException e) {
        IOException cause = e instanceof UncheckedIOException u ? u.getCause() : (IOException) e;
        log.line("failed: writing results: " + cause);
        log.close();
        folder.fail("writing the results failed: " + cause.getMessage(), false);
        throw ResultFolder.unwritable(folder.target(), cause);
      } catch (RuntimeException e) {
        log.line("failed: " + e.getMessage());
        log.close();
        folder.fail(String.valueOf(e.getMessage()), true);
        throw e;
      }
      log.line(
          String.format(
              Locale.ROOT,
              "finished: %d steps (%d rejected), %d linear iterations, %.2f s in linear solves,"
                  + " %.2f s in all; balance error %.3e relative",
              totals.steps(),
              totals.rejectedSteps(),
              totals.linearIterations(),
              relay.solveSeconds(),
              log.elapsedSeconds(),
              recorder.balanceRelative()));
      RunTimes times =
          new RunTimes(
              modelSeconds,
              steppingSeconds,
              relay.solveSeconds(),
              totals.linearIterations(),
              recorder.outputSeconds(),
              Double.NaN);
      log.line(times.line());
      log.close();
      long reportStart = System.nanoTime();
      folder.finish((f, finished) -> options.completion().complete(f, finished, mesh));
      progress.timed(times.withReport((System.nanoTime() - reportStart) * 1e-9));
      Files.deleteIfExists(checkpoint); // the results are complete: nothing left to resume
      return new RunSummary(
          folder.target(),
          totals.steps(),
          totals.rejectedSteps(),
          totals.linearIterations(),
          recorder.balanceRelative(),
          warnings);
    }
  }

  private static StateBundle readCheckpoint(Path file, String fingerprint) {
    StateBundle b;
    try {
      b = StateBundle.read(file);
    } catch (IOException e) {
      throw new ResultFolderException(
          e.getMessage() + "; this run cannot go on from it: run without --resume to start afresh",
          e);
    }
    if (!b.text("fingerprint").equals(fingerprint)) {
      throw new ResultFolderException(
          file + ": found the checkpoint of another case or mesh, expected one of this run");
    }
    return b;
  }

  /** A run that starts from an earlier one carries its source-law states over when they fit. */
  private static void continueLawStates(
      CaseSpec spec, TetMesh mesh, ThetaStepper stepper, List<String> warnings) {
    if (spec.initial().from().isEmpty() || !stepper.hasSourceLaws()) {
      return;
    }
    double[][] earlier =
        ModelBuilder.earlierRun(spec, mesh, spec.initial().from().get()).lawStates();
    double[][] now = stepper.lawStates();
    boolean fits = earlier.length == now.length;
    for (int k = 0; fits && k < now.length; k++) {
      fits = earlier[k].length == now[k].length;
    }
    if (fits) {
      stepper.restoreLawStates(earlier);
    } else {
      warnings.add(
          "the earlier run's source-law states do not match this case's laws; they start in"
              + " equilibrium with the initial concentration");
    }
  }

  static TimeSettings settings(CaseSpec spec) {
    double end = spec.time().end();
    boolean crank = spec.time().scheme() == TimeScheme.CRANK_NICOLSON;
    double[] outputs = spec.time().outputTimes();
    if (spec.time().steps() instanceof StepControl.Fixed f) {
      return new TimeSettings(end, outputs, crank, Double.NaN, f.step(), f.step(), f.step());
    }
    StepControl.Adaptive a = (StepControl.Adaptive) spec.time().steps();
    double first = a.initialStep().orElse(end * 1e-6);
    double max = a.maxStep().orElse(end);
    return new TimeSettings(end, outputs, crank, a.tolerance(), Double.NaN, first, max);
  }
}
