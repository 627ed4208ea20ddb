package dev.soakfield.fem.time;

/** A transient run that could not go on: the message says when, why and what to try. */
public final class RunFailedException extends RuntimeException {
  private static final long serialVersionUID = 1L;
  private final double simulatedTime;

  public RunFailedException(double simulatedTime, String message, Throwable cause) {
    super(message, cause);
    this.simulatedTime = simulatedTime;
  }

  /** Simulated time reached before the failure, s. */
  public double simulatedTime() {
    return simulatedTime;
  }
}
