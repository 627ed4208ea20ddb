package dev.soakfield.fem.assembly;

import java.util.concurrent.ForkJoinTask;
import java.util.concurrent.RecursiveAction;

/** Splits an index range into one contiguous part per thread and runs the parts in parallel. */
final class ParallelRanges {
  /**
   * Default smallest part: below this many items, handing work to another thread costs more than it
   * saves.
   */
  static final int MIN_RANGE = 2048;

  /** The work on one part [from, to). */
  interface Body {
    void run(int from, int to);
  }

  private ParallelRanges() {}

  static void run(int from, int to, int threads, int minPart, Body body) {
    int n = to - from;
    int parts = Math.max(1, Math.min(threads, n / minPart));
    if (parts == 1) {
      if (n > 0) {
        body.run(from, to);
      }
      return;
    }
    RecursiveAction[] tasks = new RecursiveAction[parts];
    for (int p = 0; p < parts; p++) {
      int a = from + (int) ((long) n * p / parts);
      int b = from + (int) ((long) n * (p + 1) / parts);
      tasks[p] =
          new RecursiveAction() {
            @Override
            protected void compute() {
              body.run(a, b);
            }
          };
    }
    ForkJoinTask.invokeAll(tasks);
  }
}
