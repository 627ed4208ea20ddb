package dev.soakfield.cli;

import dev.soakfield.fem.results.ResultFiles;
import dev.soakfield.fem.run.RunPipeline;
import dev.soakfield.fem.run.RunSummary;
import dev.soakfield.report.ReportWriter;
import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code soakfield demo}: runs the bundled scenario of our own and says where the results are. */
@Command(
    name = "demo",
    mixinStandardHelpOptions = true,
    description = {
      "Runs the bundled demo: a moulded sensor pod around a die, a week of exposure.",
      "Copies the case and mesh into OUT/case and writes the results into OUT/results."
    })
final class DemoCommand implements Callable<Integer> {
  static final String[] FILES = {
    "sensor-pod.msh",
    "sensor-pod.case.json",
    "sensor-pod-humid.case.json",
    "sensor-pod-bake.case.json"
  };

  @Spec CommandSpec spec;

  @Option(
      names = "--out",
      defaultValue = "soakfield-demo",
      paramLabel = "DIR",
      description = "Folder for the demo (default: ${DEFAULT-VALUE}).")
  Path out;

  @Override
  public Integer call() throws IOException {
    Path caseDir = out.resolve("case");
    Files.createDirectories(caseDir);
    for (String name : FILES) {
      try (InputStream in = DemoCommand.class.getResourceAsStream("/samples/" + name)) {
        if (in == null) {
          throw new IllegalStateException("the demo file " + name + " is missing from the jar");
        }
        Files.copy(in, caseDir.resolve(name), StandardCopyOption.REPLACE_EXISTING);
      }
    }
    PrintWriter o = spec.commandLine().getOut();
    o.println("demo case: " + caseDir.resolve(FILES[1]));
    o.flush();
    ProgressLine progress = new ProgressLine(spec.commandLine().getErr(), false);
    RunSummary s = RunPipeline.run(caseDir.resolve(FILES[1]), out.resolve("results"), progress);
    progress.done();
    ReportWriter.write(s.outputFolder());
    RunCommand.report(o, s);
    o.println("open " + s.outputFolder().resolve(ResultFiles.FIELDS) + " in a VTK viewer, or read");
    o.println(
        "  "
            + s.outputFolder().resolve(ResultFiles.SERIES)
            + " and "
            + ResultFiles.SUMMARY
            + " beside it");
    o.flush();
    return ExitCodes.OK;
  }
}
