package dev.soakfield.fem.time;

/** Hears of the run's state after every accepted step and decides whether to save it. */
@FunctionalInterface
public interface CheckpointSink {
  /** No checkpoints. */
  CheckpointSink NONE = cursor -> {};

  /** Called after the listener heard of the step; {@code cursor} is the state to save. */
  void accepted(RunCursor cursor);
}
