package dev.soakfield.fem.tds;

import dev.soakfield.fem.model.LawResolver;
import dev.soakfield.fem.results.ResultFiles;
import dev.soakfield.fem.results.Series;
import dev.soakfield.fem.results.SummaryFile;
import dev.soakfield.fem.run.RunOptions;
import dev.soakfield.fem.run.RunPipeline;
import dev.soakfield.fem.run.RunProgress;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

/**
 * One thermal desorption run: the case's specimen, charged as its initial state says (or as an
 * earlier run left it), heated along a {@link TdsRamp} in vacuum; the run's result folder, the
 * desorption curve and its peaks.
 */
public final class TdsRun {
  private TdsRun() {}

  /**
   * What one ramp gave.
   *
   * @param ramp the programme
   * @param curve the desorption curve
   * @param peaks its peaks on the ramp, in order of temperature
   * @param folder the run's result folder
   */
  public record Result(TdsRamp ramp, TdsCurve curve, List<TdsPeaks.Peak> peaks, Path folder) {}

  /**
   * Runs the ramp into {@code folder} (a result folder, as {@code soakfield run} writes).
   *
   * @param from an earlier run's result folder whose final state (traps included) is the start
   * @throws IllegalArgumentException when the specimen holds nothing at the start
   */
  public static Result run(
      Path caseFile,
      TdsRamp ramp,
      Optional<Path> from,
      LawResolver laws,
      Path folder,
      RunProgress progress)
      throws IOException {
    RunPipeline.Prepared base = RunPipeline.prepare(caseFile);
    RunPipeline.run(
        TdsCase.of(base, ramp, from), folder, progress, RunOptions.defaults().withLaws(laws));
    double charged =
        SummaryFile.readOrMissing(folder).path("balance").path("amount_start").asDouble(0);
    if (!(charged > 0)) {
      throw new IllegalArgumentException(
          caseFile
              + ": found a specimen holding nothing at the start of the ramp, expected a charged"
              + " one (an \"initial\" concentration, or --from an earlier run's result folder)");
    }
    TdsCurve curve =
        TdsCurve.of(
            Series.read(folder.resolve(ResultFiles.SERIES)),
            base.spec(),
            base.mesh(),
            charged,
            ramp.rest());
    List<TdsPeaks.Peak> peaks =
        TdsPeaks.find(curve.stepTemperatures(), curve.rate(), curve.rampIndex());
    return new Result(ramp, curve, peaks, folder);
  }
}
