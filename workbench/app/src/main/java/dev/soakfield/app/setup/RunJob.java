package dev.soakfield.app.setup;

import dev.soakfield.app.CaseRun;
import dev.soakfield.fem.results.ResultFolderException;
import dev.soakfield.fem.results.RunManifest;
import dev.soakfield.fem.run.RunOptions;
import dev.soakfield.fem.run.RunProgress;
import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicBoolean;

/**
 * A run started from the window: on a worker thread of its own so the window stays responsive, with
 * progress the window reads each frame and a cancel that stops it at the next step (the result
 * folder then says "failed: cancelled", and nothing in it is presented as complete).
 */
public final class RunJob {
  /** Where a run stands. */
  public enum Status {
    RUNNING,
    FINISHED,
    FAILED,
    CANCELLED
  }

  /**
   * Progress as last told.
   *
   * @param time simulated time reached, s
   * @param end simulated end time, s
   * @param steps accepted steps
   * @param iterations linear solver iterations so far
   * @param elapsed wall-clock seconds since the start
   */
  public record Progress(double time, double end, int steps, long iterations, double elapsed) {
    /** Wall-clock seconds left at the rate so far, or NaN before the first step. */
    public double secondsLeft() {
      return time > 0 && end > time ? elapsed * (end - time) / time : time >= end ? 0 : Double.NaN;
    }

    public double fraction() {
      return end > 0 ? Math.min(1, time / end) : 0;
    }
  }

  /** Thrown from the progress callback to stop the run at a step. */
  static final class Cancelled extends RuntimeException {
    private static final long serialVersionUID = 1L;

    Cancelled() {
      super("cancelled in the window");
    }
  }

  private final Path caseFile;
  private final Path folder;
  private final AtomicBoolean cancel = new AtomicBoolean();
  private final long startNanos = System.nanoTime();
  private final Thread worker;
  private volatile Progress progress = new Progress(0, 0, 0, 0, 0);
  private volatile Status status = Status.RUNNING;
  private volatile String message = "";
  private volatile Optional<CaseRun.Outcome> outcome = Optional.empty();

  private RunJob(Path caseFile, Path folder, RunOptions options) {
    this.caseFile = caseFile;
    this.folder = folder;
    this.worker = new Thread(() -> work(options), "soakfield-run");
    worker.setDaemon(true);
  }

  /**
   * Starts a run of the saved case into {@code folder}. A folder holding an earlier run of this
   * same case file is replaced; one holding another case's results is refused, as {@code run}
   * refuses it.
   */
  public static RunJob start(Path caseFile, Path folder, RunOptions options) {
    boolean sameCase =
        earlierCase(folder).map(c -> c.equals(caseFile.toAbsolutePath().normalize())).orElse(false);
    RunJob job = new RunJob(caseFile, folder, options.withForce(sameCase));
    job.worker.start();
    return job;
  }

  private static Optional<Path> earlierCase(Path folder) {
    try {
      return RunManifest.readFrom(folder).map(RunManifest::caseFile);
    } catch (ResultFolderException e) {
      return Optional.empty(); // not ours to replace: the run refuses it with the reason
    }
  }

  private void work(RunOptions options) {
    RunProgress relay =
        new RunProgress() {
          private long iterations;

          @Override
          public void linearIterations(long total) {
            iterations = total;
          }

          @Override
          public void step(double t, double end, int steps, int rejected) {
            progress =
                new Progress(t, end, steps, iterations, (System.nanoTime() - startNanos) * 1e-9);
            if (cancel.get()) {
              throw new Cancelled();
            }
          }
        };
    try {
      outcome = Optional.of(CaseRun.run(caseFile, folder, relay, options));
      status = Status.FINISHED;
      message = "finished: results in " + folder;
    } catch (Cancelled e) {
      status = Status.CANCELLED;
      message = "cancelled at t = " + dev.soakfield.fem.units.DurationText.of(progress.time());
    } catch (Exception e) { // every failure is the user's to read: the message says what and where
      status = Status.FAILED;
      message = e.getMessage() != null ? e.getMessage() : e.toString();
    }
  }

  /** Asks the run to stop at its next step. */
  public void cancel() {
    cancel.set(true);
  }

  /** Waits for the run to end (tests and closing the window). */
  public void join() throws InterruptedException {
    worker.join();
  }

  public Status status() {
    return status;
  }

  public Progress progress() {
    return progress;
  }

  public String message() {
    return message;
  }

  public Path folder() {
    return folder;
  }

  public Optional<CaseRun.Outcome> outcome() {
    return outcome;
  }
}
