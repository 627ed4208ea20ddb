package dev.soakfield.app;

import dev.soakfield.fem.run.RunOptions;
import dev.soakfield.fem.run.RunPipeline;
import dev.soakfield.fem.run.RunProgress;
import dev.soakfield.fem.run.RunSummary;
import dev.soakfield.fem.solve.SolverStalledException;
import dev.soakfield.fem.time.RunFailedException;
import dev.soakfield.report.FieldPictures;
import dev.soakfield.report.ReportWriter;
import java.io.IOException;
import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicReference;

/**
 * A whole analysis of a case, as the command line and the window run it: the run, then the field
 * pictures and the report. A run that fails numerically still gets a report of what it completed.
 */
public final class CaseRun {
  private CaseRun() {}

  /**
   * What came of a finished run.
   *
   * @param summary the run's figures
   * @param noPictures why the report has no field pictures, when it has none
   */
  public record Outcome(RunSummary summary, Optional<String> noPictures) {}

  /**
   * Runs the case into {@code out} and writes its report.
   *
   * @throws RunFailedException or {@link SolverStalledException} when the run cannot go on (the
   *     folder is marked failed and its report written)
   */
  public static Outcome run(Path caseFile, Path out, RunProgress progress, RunOptions options)
      throws IOException {
    RunSummary s;
    AtomicReference<Optional<String>> noPictures = new AtomicReference<>(Optional.empty());
    // the renderer sets itself up on its own thread while the run goes on
    Optional<PictureWorker> pictures = FieldPictures.start();
    // pictures and report are made before the folder says finished (see ResultFolder.finish)
    RunOptions reported =
        options.withCompletion(
            (folder, finished, mesh) -> {
              noPictures.set(
                  pictures.isEmpty()
                      ? Optional.of(GraphicsServices.NO_WINDOW)
                      : FieldPictures.draw(folder, mesh, pictures.get()));
              return ReportWriter.writeFiles(folder, finished);
            });
    try {
      s = RunPipeline.run(caseFile, out, progress, reported);
    } catch (RunFailedException | SolverStalledException e) {
      // the folder says "failed" and holds what was complete: a report of that part helps
      ReportWriter.write(out);
      throw e;
    } finally {
      pictures.ifPresent(PictureWorker::close);
    }
    return new Outcome(s, noPictures.get());
  }
}
