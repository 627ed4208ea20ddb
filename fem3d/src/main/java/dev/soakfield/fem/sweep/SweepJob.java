package dev.soakfield.fem.sweep;

import java.io.Serializable;
import java.util.List;

/**
 * What every worker needs to turn a planned case into a row, apart from the mesh file and the
 * source laws: the base case as JSON text (its restart folder made absolute), the varied keys, the
 * collect times, and names for messages. Plain text and numbers, so it travels to other processes.
 *
 * @param sweepName the sweep file's name, for messages
 * @param baseName the base case file's name, for messages
 * @param baseText the base case as JSON text (comments dropped)
 * @param keys the varied key paths in the order of the sweep file
 * @param collectTimes the times (s) at which amounts are collected, increasing
 * @param meshName the mesh file's name, under which it is shipped to other machines
 */
public record SweepJob(
    String sweepName,
    String baseName,
    String baseText,
    List<String> keys,
    List<Double> collectTimes,
    String meshName)
    implements Serializable {
  private static final long serialVersionUID = 1L;

  public SweepJob {
    keys = List.copyOf(keys);
    collectTimes = List.copyOf(collectTimes);
  }
}
