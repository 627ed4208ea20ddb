package dev.soakfield.fem.sweep;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.function.Consumer;

/**
 * Where and how an engine runs a sweep.
 *
 * @param outDir the sweep's folder (rows, table, statistics, plots)
 * @param meshFile the mesh every case runs on, on this machine
 * @param pluginFolders the folders of source-law plugin jars, as the command line gave them
 * @param workers cases run at once on this machine (the local engine; 0: one per core)
 * @param master where a cluster engine sends the cases (Spark's master URL); empty: its default
 * @param log where engines write what the user should read (a line at a time)
 */
public record EngineSettings(
    Path outDir,
    Path meshFile,
    List<Path> pluginFolders,
    int workers,
    Optional<String> master,
    Consumer<String> log) {
  public EngineSettings {
    pluginFolders = List.copyOf(pluginFolders);
    if (workers < 0) {
      throw new IllegalArgumentException("workers must not be negative, found " + workers);
    }
  }

  /** The worker count, one per core when none was given. */
  public int workersOrCores() {
    return workers > 0 ? workers : Runtime.getRuntime().availableProcessors();
  }
}
