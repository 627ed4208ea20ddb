package dev.soakfield.cli;

import dev.soakfield.app.StepMatrixExport;
import dev.soakfield.fem.results.ResultFiles;
import dev.soakfield.fem.results.ResultUnits;
import dev.soakfield.fem.results.Series;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
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
          + " (in the units the case declared; c and c*m^3 where it declared none); --mtx the"
          + " matrix"
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
      int rows = Series.copyWithUnits(series, target.csv, ResultUnits.of(dir));
      out.printf(Locale.ROOT, "wrote %d rows to %s%n", rows, target.csv);
    } else {
      OptionalDouble at = time == null ? OptionalDouble.empty() : OptionalDouble.of(time);
      out.println(StepMatrixExport.write(dir, Series.read(series), at, target.mtx));
    }
    out.flush();
    return ExitCodes.OK;
  }
}
