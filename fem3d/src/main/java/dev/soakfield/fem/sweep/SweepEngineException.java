package dev.soakfield.fem.sweep;

/**
 * An engine that could not go on (a cluster job that failed, workers lost): the rows of the cases
 * that finished are stored, and running the same sweep again runs the others.
 */
public final class SweepEngineException extends RuntimeException {
  private static final long serialVersionUID = 1L;

  public SweepEngineException(String message, Throwable cause) {
    super(message, cause);
  }
}
