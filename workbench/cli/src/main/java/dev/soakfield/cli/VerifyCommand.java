package dev.soakfield.cli;

import dev.soakfield.fem.verify.Check;
import dev.soakfield.fem.verify.Verification;
import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** {@code soakfield verify}: the built-in verification cases, as a table, on this machine. */
@Command(
    name = "verify",
    mixinStandardHelpOptions = true,
    description = {
      "Runs the built-in verification cases (published solutions, exact conservation, the discrete"
          + " maximum principle, orders of convergence on jittered and curved meshes) on modest"
          + " meshes and prints case, source, reference, computed value, error and verdict, then"
          + " each observed order of convergence beside the expected one.",
      "Exit code 3 when any check fails."
    })
final class VerifyCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  private static String reference(Check c) {
    String v = String.format(Locale.ROOT, "%.7g", c.reference());
    return switch (c.mode()) {
      case NEAR -> v;
      case AT_MOST -> "<= " + v;
      case AT_LEAST -> ">= " + v;
      case ORDER -> expected(c.reference()) + String.format(Locale.ROOT, " +- %.2f", c.tolerance());
    };
  }

  /** An expected order: 2, or 0.5. */
  private static String expected(double order) {
    return order == Math.rint(order)
        ? String.valueOf((long) order)
        : String.format(Locale.ROOT, "%.2g", order);
  }

  /** The observed orders of convergence beside the expected ones, one line each. */
  private static void orders(PrintWriter out, List<Check> checks) {
    List<Check> orders = checks.stream().filter(c -> c.mode() == Check.Mode.ORDER).toList();
    if (orders.isEmpty()) {
      return;
    }
    out.println();
    out.printf(Locale.ROOT, "%-9s %-9s %-12s %s%n", "observed", "expected", "allowed", "order of");
    for (Check c : orders) {
      out.printf(
          Locale.ROOT,
          "%-9.2f %-9s %-12s %s%s%n",
          c.computed(),
          expected(c.reference()),
          String.format(
              Locale.ROOT,
              "%.2f..%.2f",
              c.reference() - c.tolerance(),
              c.reference() + c.tolerance()),
          c.caseName(),
          c.passed() ? "" : "  FAIL");
    }
  }

  @Override
  public Integer call() {
    List<Check> checks = Verification.all();
    PrintWriter out = spec.commandLine().getOut();
    out.printf(
        Locale.ROOT,
        "%-62s %-52s %14s %12s %10s %s%n",
        "case",
        "source",
        "reference",
        "computed",
        "error",
        "result");
    int failed = 0;
    for (Check c : checks) {
      out.printf(
          Locale.ROOT,
          "%-62s %-52s %14s %12.7g %10.2e %s%n",
          c.caseName(),
          c.source(),
          reference(c),
          c.computed(),
          c.error(),
          c.passed() ? "pass" : "FAIL");
      failed += c.passed() ? 0 : 1;
    }
    orders(out, checks);
    out.printf(Locale.ROOT, "%d passed, %d failed%n", checks.size() - failed, failed);
    out.flush();
    return failed == 0 ? ExitCodes.OK : ExitCodes.NUMERICAL_FAILURE;
  }
}
