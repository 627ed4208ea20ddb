package dev.soakfield.cli;

import dev.soakfield.fem.laws.PluginFolders;
import dev.soakfield.fem.laws.SourceLawCatalog;
import dev.soakfield.fem.run.RunPipeline;
import dev.soakfield.fem.run.RunSummary;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code soakfield run CASE.json --out DIR}: the transient analysis of one case. */
@Command(
    name = "run",
    mixinStandardHelpOptions = true,
    description = {
      "Solves the case's transient diffusion and writes series.csv, fields.pvd with fields/*.vtu,"
          + " and summary.json into the output folder.",
      "The folder appears when the run has finished; an earlier run's folder is replaced only then."
    })
final class RunCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Parameters(index = "0", paramLabel = "CASE.json", description = "The case file.")
  Path caseFile;

  @Option(
      names = "--out",
      required = true,
      paramLabel = "DIR",
      description = "Folder for the results.")
  Path out;

  @Option(names = "--quiet", description = "Print nothing but errors.")
  boolean quiet;

  @Option(
      names = "--plugins",
      paramLabel = "DIR",
      description =
          "A folder of source-law plugin jars, searched after ~/.soakfield/plugins; repeatable."
              + " Plugins are code with full trust.")
  List<Path> plugins = new ArrayList<>();

  /** The laws this run may use; loaded before the run so that a broken plugin stops it early. */
  SourceLawCatalog laws;

  @Override
  public Integer call() throws Exception {
    PrintWriter err = spec.commandLine().getErr();
    laws = SourceLawCatalog.load(PluginFolders.withDefault(plugins));
    ProgressLine progress = new ProgressLine(err, quiet);
    RunSummary s = RunPipeline.run(caseFile, out, progress, laws.resolver());
    progress.done();
    if (!quiet) {
      report(spec.commandLine().getOut(), s);
    }
    return ExitCodes.OK;
  }

  static void report(PrintWriter out, RunSummary s) {
    out.printf(
        Locale.ROOT,
        "results in %s: %d steps (%d rejected), %d solver iterations, balance error %.2e%n",
        s.outputFolder(),
        s.steps(),
        s.rejectedSteps(),
        s.linearIterations(),
        s.balanceRelative());
    for (String w : s.warnings()) {
      out.println("warning: " + w);
    }
    out.println(
        "caution: model estimates from the data given; where results bear on safety, check them"
            + " against the applicable standards and a qualified engineer's review.");
    out.flush();
  }
}
