package dev.soakfield.fem.run;

import dev.soakfield.fem.model.LawResolver;
import dev.soakfield.mesh.vtk.VtuEncoding;
import java.util.Objects;

/**
 * How a run treats its output folder and heap.
 *
 * @param force replace another case's results, or write into a folder that is not a Soakfield
 *     result folder
 * @param toolVersion the version written into the manifest
 * @param maxHeap the heap the memory estimate is held against ({@code Runtime.maxMemory()})
 * @param laws resolves the case's source laws (the plugin catalog)
 * @param checkpointSteps save a checkpoint every so many accepted steps (0: not by steps)
 * @param checkpointSeconds save a checkpoint when this much wall time passed (0: not by time)
 * @param resume go on from the checkpoint of an interrupted run in the output folder
 * @param completion what is made of the results before the folder says finished (the report and its
 *     pictures), so that "finished" means all of it is there
 * @param frameEncoding how the field frames store their numbers (Float32 fields by default)
 * @param frames write the field frames (fields.pvd, fields/*.vtu); a sweep's cases keep only their
 *     series and summary, so they skip them
 */
public record RunOptions(
    boolean force,
    String toolVersion,
    long maxHeap,
    LawResolver laws,
    int checkpointSteps,
    double checkpointSeconds,
    boolean resume,
    RunCompletion completion,
    VtuEncoding frameEncoding,
    boolean frames) {
  /** Checkpoints by default: every 500 steps or 60 s of wall time, whichever comes first. */
  public static final int DEFAULT_CHECKPOINT_STEPS = 500;

  public static final double DEFAULT_CHECKPOINT_SECONDS = 60;

  public RunOptions {
    Objects.requireNonNull(toolVersion, "toolVersion");
    Objects.requireNonNull(laws, "laws");
    Objects.requireNonNull(completion, "completion");
    Objects.requireNonNull(frameEncoding, "frameEncoding");
    if (checkpointSteps < 0 || !(checkpointSeconds >= 0)) {
      throw new IllegalArgumentException("checkpoint intervals must not be negative");
    }
  }

  /** These options with {@code laws}. */
  public RunOptions withLaws(LawResolver laws) {
    return new RunOptions(
        force,
        toolVersion,
        maxHeap,
        laws,
        checkpointSteps,
        checkpointSeconds,
        resume,
        completion,
        frameEncoding,
        frames);
  }

  /** These options with {@code resume}. */
  public RunOptions withResume(boolean resume) {
    return new RunOptions(
        force,
        toolVersion,
        maxHeap,
        laws,
        checkpointSteps,
        checkpointSeconds,
        resume,
        completion,
        frameEncoding,
        frames);
  }

  /** These options with checkpoint intervals. */
  public RunOptions withCheckpoints(int steps, double seconds) {
    return new RunOptions(
        force,
        toolVersion,
        maxHeap,
        laws,
        steps,
        seconds,
        resume,
        completion,
        frameEncoding,
        frames);
  }

  /** No force, this JVM's heap, the version of the fem3d package (or "development build"). */
  public static RunOptions defaults() {
    String v = RunOptions.class.getPackage().getImplementationVersion();
    return new RunOptions(
        false,
        v == null ? "development build" : v,
        Runtime.getRuntime().maxMemory(),
        LawResolver.none(),
        DEFAULT_CHECKPOINT_STEPS,
        DEFAULT_CHECKPOINT_SECONDS,
        false,
        RunCompletion.NONE,
        VtuEncoding.DEFAULT,
        true);
  }

  /** These options with {@code force}. */
  public RunOptions withForce(boolean force) {
    return new RunOptions(
        force,
        toolVersion,
        maxHeap,
        laws,
        checkpointSteps,
        checkpointSeconds,
        resume,
        completion,
        frameEncoding,
        frames);
  }

  /** These options with {@code version}. */
  public RunOptions withToolVersion(String version) {
    return new RunOptions(
        force,
        version,
        maxHeap,
        laws,
        checkpointSteps,
        checkpointSeconds,
        resume,
        completion,
        frameEncoding,
        frames);
  }

  /** These options with {@code completion} run before the folder says finished. */
  public RunOptions withCompletion(RunCompletion completion) {
    return new RunOptions(
        force,
        toolVersion,
        maxHeap,
        laws,
        checkpointSteps,
        checkpointSeconds,
        resume,
        completion,
        frameEncoding,
        frames);
  }

  /** These options with {@code maxHeap}. */
  public RunOptions withMaxHeap(long maxHeap) {
    return new RunOptions(
        force,
        toolVersion,
        maxHeap,
        laws,
        checkpointSteps,
        checkpointSeconds,
        resume,
        completion,
        frameEncoding,
        frames);
  }

  /** These options with the frames stored as {@code encoding} says (precision, compression). */
  public RunOptions withFrameEncoding(VtuEncoding encoding) {
    return new RunOptions(
        force,
        toolVersion,
        maxHeap,
        laws,
        checkpointSteps,
        checkpointSeconds,
        resume,
        completion,
        encoding,
        frames);
  }

  /** These options with field frames written or not ({@code false}: series and summary only). */
  public RunOptions withFrames(boolean frames) {
    return new RunOptions(
        force,
        toolVersion,
        maxHeap,
        laws,
        checkpointSteps,
        checkpointSeconds,
        resume,
        completion,
        frameEncoding,
        frames);
  }
}
