package dev.soakfield.cli;

import dev.soakfield.app.CaseRun;
import dev.soakfield.fem.results.ResultFiles;
import dev.soakfield.fem.run.RunOptions;
import dev.soakfield.fem.run.RunSummary;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
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

  @Spec CommandSpec spec;

  @Option(
      names = "--out",
      defaultValue = "soakfield-demo",
      paramLabel = "DIR",
      description = "Folder for the demo (default: ${DEFAULT-VALUE}).")
  Path out;

  @Override
  public Integer call() throws IOException {
    PrintWriter o = spec.commandLine().getOut();
    Path demoCase = DemoFiles.copyInto(out.resolve("case"), false, o::println);
    o.println("demo case: " + demoCase);
    o.flush();
    ProgressLine progress = new ProgressLine(spec.commandLine().getErr(), false);
    RunSummary s =
        CaseRun.run(demoCase, out.resolve("results"), progress, RunOptions.defaults()).summary();
    progress.done();
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
