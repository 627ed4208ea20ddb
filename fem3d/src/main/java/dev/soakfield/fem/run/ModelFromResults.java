package dev.soakfield.fem.run;

import dev.soakfield.fem.casefile.CapacityForm;
import dev.soakfield.fem.casefile.CaseInputException;
import dev.soakfield.fem.casefile.CaseReader;
import dev.soakfield.fem.casefile.CaseSpec;
import dev.soakfield.fem.model.DiffusionModel;
import dev.soakfield.fem.model.ModelBuilder;
import dev.soakfield.fem.results.MeshAsRun;
import dev.soakfield.fem.results.ResultFolderException;
import dev.soakfield.fem.time.ThetaStepper;
import dev.soakfield.mesh.TetMesh;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * The model of a finished run rebuilt from its result folder alone (the copies {@code case.json}
 * and {@code mesh.msh}), for exports that need the matrices rather than the recorded numbers.
 *
 * @param spec the case as run, with its mesh pointing at the folder's copy
 * @param mesh the mesh as run (already promoted when the run was quadratic)
 * @param model the model built from both
 * @param stepper the stepper with the case's capacity form
 */
public record ModelFromResults(
    CaseSpec spec, TetMesh mesh, DiffusionModel model, ThetaStepper stepper) {
  /**
   * Rebuilds the run recorded in {@code folder}.
   *
   * @throws ResultFolderException when the folder lacks its case or mesh copy
   */
  public static ModelFromResults from(Path folder) {
    Path caseCopy = folder.resolve(RunPipeline.CASE_COPY);
    Path meshCopy = folder.resolve(RunPipeline.MESH_COPY);
    for (Path p : List.of(caseCopy, meshCopy)) {
      if (!Files.isRegularFile(p)) {
        throw new ResultFolderException(
            folder
                + ": found no "
                + p.getFileName()
                + ", expected a result folder written by 'soakfield run' (which copies the case"
                + " and mesh into it)");
      }
    }
    CaseSpec read;
    try {
      read = CaseReader.read(caseCopy);
    } catch (CaseInputException e) {
      throw new ResultFolderException(
          folder + ": its case copy no longer reads: " + e.getMessage());
    }
    CaseSpec spec = read.withMesh(meshCopy);
    TetMesh mesh = MeshAsRun.inFolder(folder);
    DiffusionModel model = ModelBuilder.build(spec, mesh, new ArrayList<>());
    boolean lumped = spec.time().capacity() == CapacityForm.LUMPED;
    ThetaStepper stepper =
        new ThetaStepper(
            model, lumped, RunPipeline.SOLVER_TOLERANCE, RunPipeline.SOLVER_MAX_ITERATIONS);
    return new ModelFromResults(spec, mesh, model, stepper);
  }
}
