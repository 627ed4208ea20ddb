package dev.soakfield.fem.sweep;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.function.Consumer;

/**
 * Runs a sweep's cases somewhere: on this machine's cores ({@link LocalSweepEngine}) or elsewhere
 * (the Spark engine, an optional module). Engines are found by {@link java.util.ServiceLoader}
 * under their {@link #name()}; each turns cases into rows with a {@link CaseRunner} wherever they
 * run, so every engine gives the same rows for the same plan.
 */
public interface SweepEngine {
  /** What {@code --engine} calls it. */
  String name();

  /**
   * Runs {@code cases} and hands each row to {@code sink} as soon as it is there (from any thread,
   * one call at a time is not promised: the sink is thread-safe). Returns when every case has its
   * row, or throws when the engine itself fails (a failing case is a row, not a throw).
   */
  void run(SweepJob job, List<PlannedCase> cases, EngineSettings settings, Consumer<CaseRow> sink)
      throws IOException;

  /**
   * What the engine adds once the table is complete (the Spark engine: Parquet); the files or
   * folders written.
   */
  default List<Path> finish(CasesTable table, EngineSettings settings) throws IOException {
    return List.of();
  }
}
