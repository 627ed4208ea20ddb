package dev.soakfield.app.fit;

/**
 * Fit data or options that cannot be used; the message names the place, what was found and what was
 * expected.
 */
public final class FitInputException extends RuntimeException {
  private static final long serialVersionUID = 1L;

  public FitInputException(String message) {
    super(message);
  }
}
