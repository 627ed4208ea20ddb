package dev.soakfield.fem.solve;

import java.util.concurrent.ForkJoinTask;
import java.util.function.IntConsumer;

/**
 * Splits row ranges into slices over the cores: the calling thread runs slice 0, the common pool
 * the rest. The slicing depends only on the row and core counts, so parallel sums add up in the
 * same order on every run.
 */
final class RowSlices {
  /** Rows below which one thread is faster than several (hand-off costs more than the work). */
  static final int PARALLEL_ROWS = 20_000;

  private RowSlices() {}

  /** How many slices to cut {@code rows} rows into. */
  static int slicesFor(int rows) {
    return rows < PARALLEL_ROWS ? 1 : Math.max(1, Runtime.getRuntime().availableProcessors());
  }

  /** First row of slice {@code p} of {@code parts} (slice p covers [start(p), start(p + 1))). */
  static int start(int rows, int parts, int p) {
    return (int) ((long) rows * p / parts);
  }

  /** Runs {@code body} for slices 0 .. parts − 1 concurrently and waits for all of them. */
  static void run(int parts, IntConsumer body) {
    if (parts == 1) {
      body.accept(0);
      return;
    }
    ForkJoinTask<?>[] others = new ForkJoinTask<?>[parts - 1];
    for (int p = 1; p < parts; p++) {
      int part = p;
      others[p - 1] = ForkJoinTask.adapt(() -> body.accept(part)).fork();
    }
    body.accept(0);
    for (ForkJoinTask<?> task : others) {
      task.join();
    }
  }
}
