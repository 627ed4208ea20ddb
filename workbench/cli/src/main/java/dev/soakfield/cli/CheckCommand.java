package dev.soakfield.cli;

import dev.soakfield.app.CaseOverview;
import dev.soakfield.fem.laws.SourceLawCatalog;
import dev.soakfield.fem.run.RunPipeline;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code soakfield check CASE.json}: reads and checks the case and its mesh without solving, lists
 * every problem at once (exit 2), or prints what will run (exit 0).
 */
@Command(
    name = "check",
    mixinStandardHelpOptions = true,
    description = {
      "Checks a case file and its mesh without solving. Every problem is listed at once with its"
          + " line, column and key path, with a close match for misspelt keys and group names"
          + " (exit code 2).",
      "A good case prints what will run: face groups and their face kinds, materials, time span,"
          + " outputs, element order, mesh size, memory and time estimates (exit code 0)."
    })
final class CheckCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Parameters(index = "0", paramLabel = "CASE.json", description = "The case file.")
  Path caseFile;

  @Mixin PluginFolderOption pluginFolders;

  @Override
  public Integer call() {
    RunPipeline.Prepared read = RunPipeline.prepare(caseFile);
    // bind what run binds (source laws, initial.from), so a case check passes cannot fail run
    List<String> warnings = new ArrayList<>(read.warnings());
    SourceLawCatalog laws = pluginFolders.catalog();
    warnings.addAll(RunPipeline.bindAll(read, laws.resolver()));
    RunPipeline.Prepared p = new RunPipeline.Prepared(read.spec(), read.mesh(), warnings);
    PrintWriter out = spec.commandLine().getOut();
    out.print(CaseOverview.of(p, Runtime.getRuntime().maxMemory()));
    out.flush();
    return ExitCodes.OK;
  }
}
