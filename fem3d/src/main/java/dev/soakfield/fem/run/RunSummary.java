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

  /**
   * The figures a finished run's summary.json keeps (for a run finished without being solved
   * again).
   */
  static RunSummary fromFolder(Path folder) throws java.io.IOException {
    com.fasterxml.jackson.databind.JsonNode j =
        new com.fasterxml.jackson.databind.ObjectMapper()
            .readTree(folder.resolve(dev.soakfield.fem.results.ResultFiles.SUMMARY).toFile());
    java.util.List<String> warnings = new java.util.ArrayList<>();
    j.path("warnings").forEach(w -> warnings.add(w.asText()));
    return new RunSummary(
        folder,
        j.path("solver").path("steps").asInt(),
        j.path("solver").path("rejected_steps").asInt(),
        j.path("solver").path("linear_iterations").asLong(),
        j.path("balance").path("relative").asDouble(),
        warnings);
  }
}
