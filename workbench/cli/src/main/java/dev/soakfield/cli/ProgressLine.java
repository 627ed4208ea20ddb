package dev.soakfield.cli;

import dev.soakfield.fem.run.RunProgress;
import dev.soakfield.fem.units.DurationText;
import java.io.PrintWriter;
import java.util.Locale;

/**
 * Progress of a run on stderr. On a terminal, a bar redrawn in place (simulated time with its unit,
 * steps, rejected steps, ETA) at most five times a second; otherwise a plain line every few
 * seconds, so logs stay readable; nothing with {@code --quiet}.
 */
final class ProgressLine implements RunProgress {
  static final long LOG_INTERVAL_NANOS = 5_000_000_000L;
  static final long BAR_INTERVAL_NANOS = 200_000_000L;
  private static final int BAR_WIDTH = 24;

  private final PrintWriter err;
  private final boolean quiet;
  private final boolean terminal;
  private final long start = System.nanoTime();
  private long last = start;
  private boolean barShown;

  // Java 17 (our release) returns no console when stdin or stdout is not a terminal
  @SuppressWarnings("SystemConsoleNull")
  ProgressLine(PrintWriter err, boolean quiet) {
    this(err, quiet, System.console() != null);
  }

  ProgressLine(PrintWriter err, boolean quiet, boolean terminal) {
    this.err = err;
    this.quiet = quiet;
    this.terminal = terminal;
  }

  @Override
  public void step(double time, double endTime, int steps, int rejected) {
    long now = System.nanoTime();
    if (quiet || now - last < (terminal ? BAR_INTERVAL_NANOS : LOG_INTERVAL_NANOS)) {
      return;
    }
    last = now;
    double elapsed = (now - start) / 1e9;
    err.print(
        terminal
            ? bar(time, endTime, steps, rejected, elapsed)
            : line(time, endTime, steps, rejected, elapsed));
    err.flush();
  }

  /** The estimate of the wall time left, from the share of simulated time done so far. */
  static double etaSeconds(double time, double endTime, double elapsed) {
    double f = time / endTime;
    return f > 0 ? elapsed * (1 - f) / f : Double.NaN;
  }

  static String line(double time, double endTime, int steps, int rejected, double elapsed) {
    return String.format(
        Locale.ROOT,
        "soakfield: t = %s of %s (%.0f%%), %d steps, %d rejected, %s elapsed, ETA %s%n",
        DurationText.of(time),
        DurationText.of(endTime),
        100 * time / endTime,
        steps,
        rejected,
        DurationText.of(elapsed),
        DurationText.of(etaSeconds(time, endTime, elapsed)));
  }

  String bar(double time, double endTime, int steps, int rejected, double elapsed) {
    barShown = true;
    double f = Math.min(1, Math.max(0, time / endTime));
    int filled = (int) Math.round(f * BAR_WIDTH);
    return String.format(
        Locale.ROOT,
        "\r[%s%s] %3.0f%%  t = %s of %s  %d steps (%d rejected)  ETA %s   ",
        "#".repeat(filled),
        ".".repeat(BAR_WIDTH - filled),
        100 * f,
        DurationText.of(time),
        DurationText.of(endTime),
        steps,
        rejected,
        DurationText.of(etaSeconds(time, endTime, elapsed)));
  }

  void done() {
    if (quiet) {
      return;
    }
    if (barShown) {
      err.println();
    }
    if (System.nanoTime() - start > LOG_INTERVAL_NANOS) {
      err.printf(
          Locale.ROOT,
          "soakfield: finished in %s%n",
          DurationText.of((System.nanoTime() - start) / 1e9));
    }
    err.flush();
  }
}
