package dev.soakfield.fem.run;

import java.util.Objects;

/**
 * How a run treats its output folder and heap.
 *
 * @param force replace another case's results, or write into a folder that is not a Soakfield
 *     result folder
 * @param toolVersion the version written into the manifest
 * @param maxHeap the heap the memory estimate is held against ({@code Runtime.maxMemory()})
 */
public record RunOptions(boolean force, String toolVersion, long maxHeap) {
  public RunOptions {
    Objects.requireNonNull(toolVersion, "toolVersion");
  }

  /** No force, this JVM's heap, the version of the fem3d package (or "development build"). */
  public static RunOptions defaults() {
    String v = RunOptions.class.getPackage().getImplementationVersion();
    return new RunOptions(
        false, v == null ? "development build" : v, Runtime.getRuntime().maxMemory());
  }

  /** These options with {@code force}. */
  public RunOptions withForce(boolean force) {
    return new RunOptions(force, toolVersion, maxHeap);
  }

  /** These options with {@code version}. */
  public RunOptions withToolVersion(String version) {
    return new RunOptions(force, version, maxHeap);
  }

  /** These options with {@code maxHeap}. */
  public RunOptions withMaxHeap(long maxHeap) {
    return new RunOptions(force, toolVersion, maxHeap);
  }
}
