package dev.soakfield.cli;

import dev.soakfield.report.ReportWriter;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code soakfield report DIR}: rewrites report.html and report.md from a result folder. */
@Command(
    name = "report",
    mixinStandardHelpOptions = true,
    description = {
      "Rewrites report.html (self-contained) and report.md (with PNG files beside it) from a"
          + " result folder's manifest.json, summary.json, series.csv and case copy.",
      "PNG pictures placed in the folder's pictures/ join the report."
    })
final class ReportCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Parameters(index = "0", paramLabel = "DIR", description = "A result folder of 'soakfield run'.")
  Path dir;

  @Override
  public Integer call() throws Exception {
    List<String> files = ReportWriter.write(dir);
    PrintWriter out = spec.commandLine().getOut();
    out.println("wrote " + String.join(", ", files) + " in " + dir);
    out.flush();
    return ExitCodes.OK;
  }
}
