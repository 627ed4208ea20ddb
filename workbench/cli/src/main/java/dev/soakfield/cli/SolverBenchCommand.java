package dev.soakfield.cli;

import dev.soakfield.fem.solve.SolverBench;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code soakfield bench solver}: SpMV against a STREAM triad, PCG against MTJ's stock CG. */
@Command(
    name = "solver",
    mixinStandardHelpOptions = true,
    description = {
      "SpMV bandwidth as a share of a STREAM triad on the same threads, and time to solution of"
          + " our PCG (Jacobi, AMG) against MTJ's CG with its diagonal preconditioner, for short"
          + " and long time steps, on the tetrahedral step matrix a run solves (the structured"
          + " mesher's box); all ratios measured in this run."
    })
final class SolverBenchCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Option(
      names = "--grid",
      defaultValue = "65",
      description =
          "Nodes per axis of the test box (65: 64³ cells, 1.57M tetrahedra, 274,625 rows).")
  int grid;

  @Option(
      names = "--order",
      defaultValue = "1",
      description =
          "Element order: 1 (4-node) or 2 (10-node tetrahedra; --grid odd, (grid-1)/2 cells a"
              + " side, the same rows).")
  int order;

  @Override
  public Integer call() {
    if (grid < 4) {
      throw new UserInputException("--grid: found " + grid + ", expected at least 4");
    }
    if (order != 1 && !(order == 2 && grid % 2 == 1)) {
      throw new UserInputException(
          "--order: found "
              + order
              + " with --grid "
              + grid
              + ", expected 1, or 2 with an odd grid");
    }
    SolverBench.run(spec.commandLine().getOut(), grid, order);
    spec.commandLine().getOut().flush();
    return ExitCodes.OK;
  }
}
