package dev.soakfield.cli;

import dev.soakfield.fem.laws.PluginFolders;
import dev.soakfield.fem.laws.SourceLawCatalog;
import dev.soakfield.fem.sweep.CasesTable;
import dev.soakfield.fem.sweep.EngineSettings;
import dev.soakfield.fem.sweep.SweepEngine;
import dev.soakfield.fem.sweep.SweepEngines;
import dev.soakfield.fem.sweep.SweepFile;
import dev.soakfield.fem.sweep.SweepPlan;
import dev.soakfield.fem.sweep.SweepRun;
import dev.soakfield.fem.sweep.SweepStatistics;
import dev.soakfield.report.SweepPlots;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code soakfield sweep SWEEP.json --out DIR}: a parameter study or Monte Carlo run of a case. */
@Command(
    name = "sweep",
    mixinStandardHelpOptions = true,
    description = {
      "Runs every case of a sweep file (a base case, the keys it varies by lists, ranges or"
          + " distributions, the samples and seed) and writes cases.csv (a row per case),"
          + " statistics.csv and plots/*.png into the output folder.",
      "Each case's row is stored as soon as it finishes: running the same command again runs"
          + " only the cases that are missing. A case that fails is recorded with its reason in"
          + " the status column; the sweep goes on, and exits 3 at the end.",
      "--engine spark sends the cases to Apache Spark (an optional module the ./soakfield"
          + " launcher adds for that command)."
    })
final class SweepCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Parameters(index = "0", paramLabel = "SWEEP.json", description = "The sweep file.")
  Path sweepFile;

  @Option(
      names = "--out",
      required = true,
      paramLabel = "DIR",
      description = "Folder for the table, statistics and plots.")
  Path out;

  @Option(
      names = "--engine",
      defaultValue = "local",
      paramLabel = "NAME",
      description = "Where the cases run: local (this machine's cores, the default) or spark.")
  String engine;

  @Option(
      names = "--master",
      paramLabel = "URL",
      description =
          "Spark's master URL (local[2], spark://host:7077, ...); without it, Spark's own"
              + " setting (what spark-submit passes).")
  String master;

  @Option(
      names = "--workers",
      defaultValue = "0",
      paramLabel = "N",
      description = "Cases at once on this machine (local engine; default: one per core).")
  int workers;

  @Option(
      names = "--force",
      description =
          "Replace the results of another sweep in the folder (or write into a folder with other"
              + " files, which stay).")
  boolean force;

  @Option(names = "--retry-failed", description = "Run again the cases that failed before.")
  boolean retryFailed;

  @Option(names = "--no-plots", description = "Write the table and statistics only.")
  boolean noPlots;

  @Option(names = "--quiet", description = "Print nothing but errors.")
  boolean quiet;

  @Mixin PluginFolderOption pluginFolders;

  @Override
  public Integer call() throws Exception {
    if (workers < 0) {
      throw new UserInputException("--workers: found " + workers + ", expected 0 or more");
    }
    if (master != null && !engine.equals("spark")) {
      throw new UserInputException(
          "--master: found it with --engine " + engine + ", expected it with --engine spark only");
    }
    PrintWriter err = spec.commandLine().getErr();
    PrintWriter stdout = spec.commandLine().getOut();
    SweepEngine chosen = SweepEngines.named(engine);
    List<Path> folders = PluginFolders.withDefault(pluginFolders.plugins);
    SourceLawCatalog.load(folders); // a broken plugin stops the sweep before any case runs
    SweepPlan plan = SweepPlan.of(SweepFile.read(sweepFile));
    if (!quiet) {
      plan.warnings().forEach(w -> err.println("warning: " + w));
    }
    EngineSettings settings =
        new EngineSettings(
            out,
            plan.mesh(),
            folders,
            workers,
            Optional.ofNullable(master),
            line -> {
              if (!quiet) {
                synchronized (err) {
                  err.println(line);
                  err.flush();
                }
              }
            });
    SweepRun.Outcome outcome = SweepRun.run(plan, chosen, settings, force, retryFailed);
    List<Path> plots = noPlots ? List.of() : SweepPlots.write(outcome.table(), outcome.folder());
    if (!quiet) {
      report(stdout, outcome, plots.size());
    }
    int failed = outcome.failures().size();
    if (failed > 0) {
      err.printf(
          Locale.ROOT,
          "soakfield: %d of %d cases failed; their rows in %s say why (status column);"
              + " statistics and plots use the %d that finished%n",
          failed,
          outcome.table().rows().size(),
          outcome.folder().resolve(CasesTable.FILE),
          outcome.table().rows().size() - failed);
      err.flush();
      return ExitCodes.NUMERICAL_FAILURE;
    }
    return ExitCodes.OK;
  }

  /** A statistic for the terminal; a threshold percentile beyond the crossed cases says so. */
  private static String figure(double v, String unit) {
    return Double.isInfinite(v) ? "not crossed" : String.format(Locale.ROOT, "%.4g%s", v, unit);
  }

  static void report(PrintWriter out, SweepRun.Outcome o, int plots) {
    int n = o.table().rows().size();
    out.printf(
        Locale.ROOT,
        "%d cases (%d run now, %d kept from before), %d finished: %s, %s%s%n",
        n,
        o.ran(),
        o.kept(),
        n - o.failures().size(),
        o.folder().resolve(CasesTable.FILE),
        o.folder().resolve(SweepStatistics.FILE),
        plots > 0 ? ", " + plots + " plots in " + o.folder().resolve(SweepPlots.FOLDER) : "");
    for (Path p : o.engineFiles()) {
      out.println("also written: " + p);
    }
    for (SweepStatistics.Column c : o.statistics().columns()) {
      boolean time = c.name().startsWith("threshold:");
      if (!time && !c.name().startsWith("max:")) {
        continue;
      }
      if (c.cases() == 0) {
        out.printf(Locale.ROOT, "  %-28s no case has a value (never crossed)%n", c.name());
        continue;
      }
      String unit = time ? " s" : "";
      out.printf(
          Locale.ROOT,
          "  %-28s %d cases: min %s, 5%% %s, median %s, 95%% %s, max %s%s%n",
          c.name(),
          c.cases(),
          figure(c.min(), unit),
          figure(c.p5(), unit),
          figure(c.p50(), unit),
          figure(c.p95(), unit),
          figure(c.max(), unit),
          c.missing() > 0
              ? " (" + c.missing() + " cases never crossed: counted as crossing after the end)"
              : "");
    }
    out.println(
        "caution: model estimates from the data and distributions given; percentiles of a sweep"
            + " carry its sampling error. Where results bear on safety, check them against the"
            + " applicable standards and a qualified engineer's review.");
    out.flush();
  }
}
