package dev.soakfield.fem.sweep;

/**
 * A sweep file (or a file it names) that cannot be used as given: the message names the file, the
 * key, what was found and what was expected, and is shown without a stack trace.
 */
public final class SweepInputException extends RuntimeException {
  private static final long serialVersionUID = 1L;

  public SweepInputException(String message) {
    super(message);
  }

  public SweepInputException(String message, Throwable cause) {
    super(message, cause);
  }
}
