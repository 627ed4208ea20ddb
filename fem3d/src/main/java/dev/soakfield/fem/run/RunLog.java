package dev.soakfield.fem.run;

import dev.soakfield.fem.units.DurationText;
import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.Locale;

/**
 * {@code run.log}: what the run did, line by line with the wall-clock time: the case and mesh, the
 * estimates, every warning, progress every {@value #INTERVAL_SECONDS} s, and the solver figures at
 * the end. Written in the staging folder; every line is flushed, so a failed run's log tells how
 * far it got. A log that cannot be written never stops the run.
 */
final class RunLog implements AutoCloseable {
  static final String FILE = "run.log";
  static final long INTERVAL_SECONDS = 5;

  private final BufferedWriter out;
  private final long start = System.nanoTime();
  private long lastProgress = start;
  private boolean broken;

  RunLog(Path file) throws IOException {
    // appends: a resumed run keeps what the interrupted one logged
    out =
        Files.newBufferedWriter(
            file,
            StandardCharsets.UTF_8,
            java.nio.file.StandardOpenOption.CREATE,
            java.nio.file.StandardOpenOption.APPEND);
  }

  void line(String text) {
    if (broken) {
      return;
    }
    try {
      out.write(Instant.now().truncatedTo(ChronoUnit.MILLIS).toString());
      out.write("  ");
      out.write(text);
      out.write('\n');
      out.flush();
    } catch (IOException e) {
      broken = true; // the run's own outputs report the disk trouble
    }
  }

  void progress(double t, double end, int steps, int rejected) {
    long now = System.nanoTime();
    if (now - lastProgress < INTERVAL_SECONDS * 1_000_000_000L) {
      return;
    }
    lastProgress = now;
    line(
        String.format(
            Locale.ROOT,
            "t = %s of %s (%.1f%%), %d steps, %d rejected, %.1f s elapsed",
            DurationText.of(t),
            DurationText.of(end),
            100 * t / end,
            steps,
            rejected,
            elapsedSeconds()));
  }

  double elapsedSeconds() {
    return (System.nanoTime() - start) / 1e9;
  }

  @Override
  public void close() {
    try {
      out.close();
    } catch (IOException e) {
      broken = true;
    }
  }
}
