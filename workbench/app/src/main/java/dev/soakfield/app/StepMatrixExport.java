package dev.soakfield.app;

import dev.soakfield.fem.assembly.CsrMatrix;
import dev.soakfield.fem.casefile.TimeScheme;
import dev.soakfield.fem.results.ResultFolderException;
import dev.soakfield.fem.results.Series;
import dev.soakfield.fem.run.ModelFromResults;
import dev.soakfield.fem.time.TimeSettings;
import dev.soakfield.mesh.AtomicFiles;
import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

/**
 * One step's system matrix M + θ·dt·L(t₁) of a finished run, rebuilt from its result folder and
 * written in Matrix Market format, for users who cross-check a solve with another tool.
 */
public final class StepMatrixExport {
  private StepMatrixExport() {}

  /**
   * Writes the matrix of the step ending at the first recorded time at or after {@code time}
   * (default: the first step) and says what it wrote.
   *
   * @throws ResultFolderException when the series has no step or no such time (the message names
   *     the file or the option)
   */
  public static String write(Path dir, Series series, OptionalDouble time, Path mtx)
      throws IOException {
    double[] t =
        series
            .column("time")
            .orElseThrow(
                () ->
                    new ResultFolderException(
                        dir + "/series.csv: found no column 'time', expected the series of a run"));
    if (t.length < 2) {
      throw new ResultFolderException(
          dir + "/series.csv: found no step after t = 0, expected at least one step");
    }
    int k = stepIndex(t, time);
    ModelFromResults run = ModelFromResults.from(dir);
    double dt = t[k] - t[k - 1];
    // step k follows k - 1 steps; restarts after breakpoints are not recorded in the series, so
    // the count runs from the start
    double theta =
        TimeSettings.thetaOfStep(run.spec().time().scheme() == TimeScheme.CRANK_NICOLSON, k - 1);
    CsrMatrix a = run.stepper().systemMatrix(dt, theta, t[k]);
    List<String> comments =
        List.of(
            "Soakfield system matrix M + theta*dt*L(t1), prescribed rows and columns eliminated",
            "result folder " + dir.toAbsolutePath(),
            String.format(
                Locale.ROOT,
                "step %d: t0 = %s s, t1 = %s s, dt = %s s, theta = %s",
                k,
                t[k - 1],
                t[k],
                dt,
                theta));
    long[] entries = {0};
    AtomicFiles.write(
        mtx,
        f -> {
          try (Writer w = Files.newBufferedWriter(f, StandardCharsets.UTF_8)) {
            entries[0] = MatrixMarketFile.write(w, a, comments);
          }
        });
    return String.format(
        Locale.ROOT,
        "wrote the %d x %d matrix of step %d (t = %s s to %s s, %d stored entries) to %s",
        a.size(),
        a.size(),
        k,
        t[k - 1],
        t[k],
        entries[0],
        mtx);
  }

  private static int stepIndex(double[] t, OptionalDouble wanted) {
    if (wanted.isEmpty()) {
      return 1;
    }
    double w = wanted.getAsDouble();
    for (int k = 1; k < t.length; k++) {
      if (t[k] >= w * (1 - 1e-12)) {
        return k;
      }
    }
    throw new ResultFolderException(
        String.format(
            Locale.ROOT,
            "--time: found %s s, expected a time up to the last recorded time %s s",
            w,
            t[t.length - 1]));
  }
}
