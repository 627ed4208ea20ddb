package dev.soakfield.cli;

import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code soakfield bench run}: a whole transient run against its pure solve time. */
@Command(
    name = "run",
    mixinStandardHelpOptions = true,
    description = {
      "Times a whole run of a flux-fed box of 6*N^3 linear tetrahedra (N = 64: 1.57M) with fixed"
          + " backward-Euler steps, phase by phase (reading the MSH file, model, solves, per-step"
          + " rest, outputs, report), against the time of its linear solves; checks the amount"
          + " against flux x area x time and reports the peak heap per tetrahedron. Give the JVM"
          + " heap with SOAKFIELD_JAVA_OPTS=-Xmx..."
    })
final class RunBenchCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Option(names = "--cells", defaultValue = "64", description = "Cells per axis (default 64).")
  int cells;

  @Option(names = "--steps", defaultValue = "100", description = "Steps (default 100).")
  int steps;

  @Option(
      names = "--ratio",
      defaultValue = "1",
      description = "Step length as dt*D/h^2 (default 1).")
  double ratio;

  @Option(
      names = "--order",
      defaultValue = "1",
      description = "Element order: 1 (4-node) or 2 (10-node tetrahedra) (default 1).")
  int order;

  @Override
  public Integer call() throws java.io.IOException {
    if (cells < 2 || steps < 1 || !(ratio > 0) || (order != 1 && order != 2)) {
      throw new UserInputException(
          "--cells at least 2, --steps at least 1, --ratio positive and --order 1 or 2 expected");
    }
    WholeRunBench.run(spec.commandLine().getOut(), cells, steps, ratio, order);
    return ExitCodes.OK;
  }
}
