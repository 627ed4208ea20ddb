package dev.soakfield.cli;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** {@code soakfield bench ...}: measurements of the program's own speed, reported as ratios. */
@Command(
    name = "bench",
    mixinStandardHelpOptions = true,
    description = "Measures speed against a reference in the same run and prints ratios.",
    subcommands = {
      MeshImportBench.class,
      SolverBenchCommand.class,
      RunBenchCommand.class,
      RenderBenchCommand.class,
      OutputBench.class,
      SweepBench.class
    })
final class BenchCommand implements Runnable {
  @Spec CommandSpec spec;

  @Override
  public void run() {
    spec.commandLine().usage(spec.commandLine().getOut());
  }
}
