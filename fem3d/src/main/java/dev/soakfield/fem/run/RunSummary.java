package dev.soakfield.fem.run;

import java.nio.file.Path;
import java.util.List;

/**
 * What a finished run reports to its caller.
 *
 * @param outputFolder where the results are
 * @param steps accepted steps
 * @param rejectedSteps steps retried shorter
 * @param linearIterations solver iterations in all
 * @param balanceRelative |amount change − inflow − sources| relative to the amounts moved
 * @param warnings everything the user should read
 */
public record RunSummary(
    Path outputFolder,
    int steps,
    int rejectedSteps,
    long linearIterations,
    double balanceRelative,
    List<String> warnings) {
  public RunSummary {
    warnings = List.copyOf(warnings);
  }
}
