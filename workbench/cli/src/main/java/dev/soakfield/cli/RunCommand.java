package dev.soakfield.cli;

import dev.soakfield.app.CaseRun;
import dev.soakfield.fem.laws.SourceLawCatalog;
import dev.soakfield.fem.run.RunOptions;
import dev.soakfield.fem.run.RunSummary;
import dev.soakfield.mesh.vtk.VtuEncoding;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
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
          + " summary.json, run.log, mesh.msh, case.json, report.html and report.md into the"
          + " output folder.",
      "manifest.json in the folder says whether the run is running, finished or failed; every"
          + " file appears under its name only when complete. A folder holding another case's"
          + " results, or other files, is not written without --force.",
      "Progress: a bar on a terminal, a line every few seconds otherwise. Heap: set JAVA_OPTS,"
          + " e.g. JAVA_OPTS=-Xmx8g."
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

  @Mixin PluginFolderOption pluginFolders;

  /** The laws this run may use; loaded before the run so that a broken plugin stops it early. */
  SourceLawCatalog laws;

  @Option(
      names = "--force",
      description =
          "Write into the folder even when it holds another case's results or files that are not"
              + " Soakfield results (those other files are left as they are).")
  boolean force;

  @Option(
      names = "--resume",
      description =
          "Go on from the last checkpoint of an interrupted run of the same case in the output"
              + " folder (after a crash, kill or power cut); the results equal an uninterrupted"
              + " run's.")
  boolean resume;

  @Option(
      names = "--checkpoint-steps",
      defaultValue = "500",
      paramLabel = "N",
      description =
          "Save a checkpoint every N accepted steps (default ${DEFAULT-VALUE}; 0: never).")
  int checkpointSteps;

  @Option(
      names = "--checkpoint-every",
      defaultValue = "60 s",
      paramLabel = "TIME",
      description = "Save a checkpoint when this much wall time passed (default ${DEFAULT-VALUE}).")
  String checkpointEvery;

  @Option(
      names = "--compress",
      description =
          "Compress the field frames (fields/*.vtu) with zlib, as VTK's readers understand it:"
              + " smaller files, a little more time to write and read.")
  boolean compress;

  @Option(
      names = "--float64",
      description =
          "Store the frames' fields in double precision (Float64, 16 digits) instead of single"
              + " (Float32, 7 digits, magnitudes 1.2e-38 to 3.4e38). Points are Float64 either way.")
  boolean float64;

  @Override
  public Integer call() throws Exception {
    if (checkpointSteps < 0) {
      throw new UserInputException(
          "--checkpoint-steps: found " + checkpointSteps + ", expected 0 or more");
    }
    double checkpointSeconds = OptionValues.si(checkpointEvery, "s", "--checkpoint-every");
    if (checkpointSeconds < 0) {
      throw new UserInputException(
          "--checkpoint-every: found " + checkpointEvery + ", expected 0 or more");
    }
    PrintWriter err = spec.commandLine().getErr();
    laws = pluginFolders.catalog();
    ProgressLine progress = new ProgressLine(err, quiet);
    RunOptions options =
        RunOptions.defaults()
            .withForce(force)
            .withToolVersion(VersionProvider.version())
            .withLaws(laws.resolver())
            .withCheckpoints(checkpointSteps, checkpointSeconds)
            .withResume(resume)
            .withFrameEncoding(new VtuEncoding(float64, compress));
    CaseRun.Outcome outcome;
    try {
      outcome = CaseRun.run(caseFile, out, progress, options);
    } finally {
      progress.done();
    }
    if (outcome.noPictures().isPresent() && !quiet) {
      err.println("note: the report has no field picture: " + outcome.noPictures().get());
      err.flush();
    }
    if (!quiet) {
      report(spec.commandLine().getOut(), outcome.summary());
    }
    return ExitCodes.OK;
  }

  static void report(PrintWriter out, RunSummary s) {
    out.printf(
        Locale.ROOT,
        "results in %s (report.html): %d steps (%d rejected), %d solver iterations, balance error %.2e%n",
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
