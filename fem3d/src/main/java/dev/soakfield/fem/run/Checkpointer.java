package dev.soakfield.fem.run;

import dev.soakfield.fem.results.ResultFiles;
import dev.soakfield.fem.results.StateBundle;
import dev.soakfield.fem.time.CheckpointSink;
import dev.soakfield.fem.time.RunCursor;
import dev.soakfield.fem.time.ThetaStepper;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;

/**
 * Saves the whole state of a run (step controller, field, source-law states, everything the
 * recorder accumulated) to {@code checkpoint.bin} in the output folder, every so many steps or
 * seconds of wall time, atomically: a run killed at any moment leaves the previous complete
 * checkpoint. {@link RunPipeline} resumes from it.
 */
final class Checkpointer implements CheckpointSink {
  /** The checkpoint's file name in a result folder. */
  static final String NAME = ResultFiles.CHECKPOINT;

  private final Path file;
  private final RunRecorder recorder;
  private final ThetaStepper stepper;
  private final int everySteps;
  private final long everyNanos;
  private final String fingerprint;
  private int sinceSave;
  private long lastSave = System.nanoTime();

  /**
   * @param everySteps save after this many accepted steps (0: never by steps)
   * @param everySeconds save when this much wall time passed since the last save (0: never)
   * @param fingerprint what the checkpoint belongs to (case and mesh hashes), checked on resume
   */
  Checkpointer(
      Path folder,
      RunRecorder recorder,
      ThetaStepper stepper,
      int everySteps,
      double everySeconds,
      String fingerprint) {
    this.file = folder.resolve(NAME);
    this.recorder = recorder;
    this.stepper = stepper;
    this.everySteps = everySteps;
    this.everyNanos = (long) (everySeconds * 1e9);
    this.fingerprint = fingerprint;
  }

  @Override
  public void accepted(RunCursor c) {
    sinceSave++;
    long now = System.nanoTime();
    boolean bySteps = everySteps > 0 && sinceSave >= everySteps;
    boolean byTime = everyNanos > 0 && now - lastSave >= everyNanos;
    if (!bySteps && !byTime) {
      return;
    }
    try {
      save(c);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    sinceSave = 0;
    lastSave = now;
  }

  private void save(RunCursor c) throws IOException {
    StateBundle b = new StateBundle();
    b.putText("fingerprint", fingerprint);
    b.put(
        "cursor",
        c.t(),
        c.dt(),
        c.ladderBase(),
        c.previousDt(),
        c.scale(),
        c.steps(),
        c.rejected(),
        c.sinceRestart(),
        (double) c.iterations());
    b.put("cursor.phi", c.phi());
    if (c.previous() != null) {
      b.put("cursor.previous", c.previous());
    }
    double[][] laws = stepper.lawStates();
    b.put("laws.count", laws.length);
    for (int k = 0; k < laws.length; k++) {
      b.put("laws." + k, laws[k]);
    }
    recorder.snapshot(b);
    b.write(file);
  }

  /** The cursor a checkpoint holds. */
  static RunCursor cursor(StateBundle b) {
    double[] v = b.get("cursor");
    return new RunCursor(
        v[0],
        v[1],
        v[2],
        b.get("cursor.phi"),
        b.has("cursor.previous") ? b.get("cursor.previous") : null,
        v[3],
        v[4],
        (int) v[5],
        (int) v[6],
        (int) v[7],
        (long) v[8]);
  }

  /** The source-law states a checkpoint holds. */
  static double[][] lawStates(StateBundle b) {
    int n = (int) b.scalar("laws.count");
    double[][] s = new double[n][];
    for (int k = 0; k < n; k++) {
      s[k] = b.get("laws." + k);
    }
    return s;
  }
}
