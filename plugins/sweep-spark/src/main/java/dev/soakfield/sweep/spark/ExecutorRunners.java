package dev.soakfield.sweep.spark;

import dev.soakfield.fem.laws.SourceLawCatalog;
import dev.soakfield.fem.sweep.CaseRunner;
import dev.soakfield.fem.sweep.SweepJob;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.spark.SparkFiles;

/**
 * The case runner of the sweep an executor works on, made once per executor process: its mesh
 * imported once and its plugin laws loaded once however many tasks the executor runs. A new sweep
 * replaces it.
 */
final class ExecutorRunners {
  private static Object current;
  private static CaseRunner runner;

  private ExecutorRunners() {}

  static synchronized CaseRunner forSweep(SweepJob job, ShippedFiles files) {
    // the shipped files' folder belongs to one Spark context: a later sweep in the same process
    // (a bench, a test) finds its files elsewhere even when their names are the same
    Object key = java.util.List.of(job, files, SparkFiles.getRootDirectory());
    if (runner == null || !key.equals(current)) {
      try {
        Path scratch = Files.createTempDirectory("soakfield-sweep-");
        scratch.toFile().deleteOnExit();
        SourceLawCatalog laws = SourceLawCatalog.load(files.pluginFoldersHere(scratch));
        int slots = Math.max(1, Runtime.getRuntime().availableProcessors());
        runner =
            new CaseRunner(
                job,
                files.meshHere(),
                scratch.resolve("cases"),
                laws.resolver(),
                Runtime.getRuntime().maxMemory() / slots);
        current = key;
      } catch (IOException e) {
        throw new UncheckedIOException(e);
      }
    }
    return runner;
  }
}
