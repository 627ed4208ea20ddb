package dev.soakfield.cli;

import dev.soakfield.fem.assembly.CsrMatrix;
import dev.soakfield.fem.casefile.TimeScheme;
import dev.soakfield.fem.results.ResultFiles;
import dev.soakfield.fem.results.Series;
import dev.soakfield.fem.run.ModelFromResults;
import dev.soakfield.fem.time.TimeSettings;
import dev.soakfield.mesh.AtomicFiles;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.concurrent.Callable;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code soakfield export DIR --csv OUT.csv | --mtx OUT.mtx [--time T]}: the series with units in
 * the header, or the system matrix of one step in Matrix Market format for cross-checking a solve
 * with another tool.
 */
@Command(
    name = "export",
    mixinStandardHelpOptions = true,
    description = {
      "Exports from a result folder: --csv the series and probe data with units in the header"
          + " (c is the concentration unit of the case: amounts are c*m^3); --mtx the matrix"
          + " M + theta*dt*L(t1) of one step (prescribed rows and columns eliminated) in Matrix Market"
          + " coordinate format, rebuilt from the folder's case.json and mesh.msh."
    })
final class ExportCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Parameters(index = "0", paramLabel = "DIR", description = "A result folder of 'soakfield run'.")
  Path dir;

  static final class Target {
    @Option(names = "--csv", paramLabel = "OUT.csv", description = "Write the series as CSV.")
    Path csv;

    @Option(
        names = "--mtx",
        paramLabel = "OUT.mtx",
        description = "Write one step's system matrix in Matrix Market format.")
    Path mtx;
  }

  @ArgGroup(exclusive = true, multiplicity = "1")
  Target target;

  @Option(
      names = "--time",
      paramLabel = "T",
      description =
          "With --mtx: the step ending at the first recorded time >= T seconds (default: the"
              + " first step).")
  Double time;

  @Override
  public Integer call() throws Exception {
    Path series = dir.resolve(ResultFiles.SERIES);
    if (!Files.isRegularFile(series)) {
      throw new UserInputException(
          dir + ": found no series.csv, expected a result folder written by 'soakfield run'");
    }
    PrintWriter out = spec.commandLine().getOut();
    if (target.csv != null) {
      if (time != null) {
        throw new UserInputException("--time: found with --csv, expected it only with --mtx");
      }
      int rows = writeCsv(series, target.csv);
      out.printf(Locale.ROOT, "wrote %d rows to %s%n", rows, target.csv);
    } else {
      out.println(writeMatrix(Series.read(series), target.mtx));
    }
    out.flush();
    return ExitCodes.OK;
  }

  /** The column name with its unit, as {@link Series#withUnit} gives it. */
  static String withUnit(String name) {
    return Series.withUnit(name);
  }

  private static int writeCsv(Path series, Path csv) throws IOException {
    Series.read(series); // a bad cell is refused here, with its line and column, before writing
    List<String> lines = Files.readAllLines(series, StandardCharsets.UTF_8);
    List<String> header = Series.split(lines.get(0));
    List<String> named = new ArrayList<>();
    for (String h : header) {
      String u = withUnit(h);
      named.add(u.contains(",") || u.contains("\"") ? "\"" + u.replace("\"", "\"\"") + "\"" : u);
    }
    AtomicFiles.write(
        csv,
        f -> {
          try (Writer w = Files.newBufferedWriter(f, StandardCharsets.UTF_8)) {
            w.write(String.join(",", named));
            w.write('\n');
            for (int i = 1; i < lines.size(); i++) {
              w.write(lines.get(i));
              w.write('\n');
            }
          }
        });
    return lines.size() - 1;
  }

  private String writeMatrix(Series series, Path mtx) throws IOException {
    double[] t =
        series
            .column("time")
            .orElseThrow(
                () ->
                    new UserInputException(
                        dir + "/series.csv: found no column 'time', expected the series of a run"));
    if (t.length < 2) {
      throw new UserInputException(
          dir + "/series.csv: found no step after t = 0, expected at least one step");
    }
    int k = stepIndex(t, time == null ? OptionalDouble.empty() : OptionalDouble.of(time));
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

  private int stepIndex(double[] t, OptionalDouble wanted) {
    if (wanted.isEmpty()) {
      return 1;
    }
    double w = wanted.getAsDouble();
    for (int k = 1; k < t.length; k++) {
      if (t[k] >= w * (1 - 1e-12)) {
        return k;
      }
    }
    throw new UserInputException(
        String.format(
            Locale.ROOT,
            "--time: found %s s, expected a time up to the last recorded time %s s",
            w,
            t[t.length - 1]));
  }
}
