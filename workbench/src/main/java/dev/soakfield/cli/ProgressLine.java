package dev.soakfield.cli;

import dev.soakfield.fem.run.RunProgress;
import java.io.PrintWriter;
import java.util.Locale;

/** Progress of a run on stderr: at most one line a second, so logs stay readable. */
final class ProgressLine implements RunProgress {
  private static final long INTERVAL_NANOS = 1_000_000_000L;
  private final PrintWriter err;
  private final boolean quiet;
  private final long start = System.nanoTime();
  private long last = start;

  ProgressLine(PrintWriter err, boolean quiet) {
    this.err = err;
    this.quiet = quiet;
  }

  @Override
  public void step(double time, double endTime, int steps, int rejected) {
    long now = System.nanoTime();
    if (quiet || now - last < INTERVAL_NANOS) {
      return;
    }
    last = now;
    double fraction = time / endTime;
    err.printf(
        Locale.ROOT,
        "soakfield: t = %.4g s of %.4g s (%.0f%%), %d steps, %.0f s elapsed%n",
        time,
        endTime,
        100 * fraction,
        steps,
        (now - start) / 1e9);
    err.flush();
  }

  void done() {
    if (!quiet && System.nanoTime() - start > INTERVAL_NANOS) {
      err.printf(Locale.ROOT, "soakfield: finished in %.1f s%n", (System.nanoTime() - start) / 1e9);
      err.flush();
    }
  }
}
