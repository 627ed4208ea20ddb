package dev.soakfield.fem.run;

import dev.soakfield.fem.casefile.CapacityForm;
import dev.soakfield.fem.casefile.CaseChecks;
import dev.soakfield.fem.casefile.CaseReader;
import dev.soakfield.fem.casefile.CaseSpec;
import dev.soakfield.fem.casefile.StepControl;
import dev.soakfield.fem.casefile.TimeScheme;
import dev.soakfield.fem.physics.DiffusionModel;
import dev.soakfield.fem.time.RunTotals;
import dev.soakfield.fem.time.ThetaStepper;
import dev.soakfield.fem.time.TimeSettings;
import dev.soakfield.fem.time.TransientRun;
import dev.soakfield.mesh.MeshFinding;
import dev.soakfield.mesh.MeshImport;
import dev.soakfield.mesh.MeshInputException;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.MidEdgeNodes;
import dev.soakfield.mesh.load.MeshLoader;
import dev.soakfield.mesh.topo.AssemblyOptions;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * {@code run}: case file in, results out — reads and checks the case and its mesh, builds the
 * model, steps through time, and writes series.csv, fields (VTU/PVD) and summary.json into a folder
 * that appears only when the run has finished.
 */
public final class RunPipeline {
  /** Relative residual of each linear solve: tight, so the global balance closes to ~1e-10. */
  static final double SOLVER_TOLERANCE = 1e-11;

  static final int SOLVER_MAX_ITERATIONS = 5000;

  private RunPipeline() {}

  /** The case and mesh, read and checked, and what the checks had to say. */
  public record Prepared(CaseSpec spec, TetMesh mesh, List<String> warnings) {}

  /** Reads the case and its mesh and checks them against each other, solving nothing. */
  public static Prepared prepare(Path caseFile) {
    CaseSpec spec = CaseReader.read(caseFile);
    MeshImport imported = MeshLoader.load(spec.mesh(), AssemblyOptions.defaults());
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
    TetMesh mesh = imported.mesh();
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

  /** Runs the case (without source-law plugins) and writes its results into {@code outDir}. */
  public static RunSummary run(Path caseFile, Path outDir, RunProgress progress)
      throws IOException {
    return run(caseFile, outDir, progress, LawResolver.none());
  }

  /** Runs the case and writes its results into {@code outDir}; {@code laws} resolves its laws. */
  public static RunSummary run(Path caseFile, Path outDir, RunProgress progress, LawResolver laws)
      throws IOException {
    Prepared prepared = prepare(caseFile);
    CaseSpec spec = prepared.spec();
    TetMesh mesh = prepared.mesh();
    List<String> warnings = new ArrayList<>(prepared.warnings());
    DiffusionModel model = ModelBuilder.build(spec, mesh, warnings, laws);
    boolean lumped = spec.time().capacity() == CapacityForm.LUMPED;
    ThetaStepper stepper = new ThetaStepper(model, lumped, SOLVER_TOLERANCE, SOLVER_MAX_ITERATIONS);
    continueLawStates(spec, mesh, stepper, warnings);
    TimeSettings settings = settings(spec);

    ResultFolder folder = ResultFolder.open(outDir);
    try {
      RunRecorder recorder =
          new RunRecorder(folder.work(), spec, model, stepper, progress, warnings);
      RunTotals totals;
      try (recorder) {
        totals = TransientRun.run(stepper, model.initialPhi(), settings, recorder);
      }
      recorder.finish(totals);
      folder.commit();
      return new RunSummary(
          folder.target(),
          totals.steps(),
          totals.rejectedSteps(),
          totals.linearIterations(),
          recorder.balanceRelative(),
          warnings);
    } catch (IOException | RuntimeException e) {
      folder.discard();
      throw e;
    }
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
