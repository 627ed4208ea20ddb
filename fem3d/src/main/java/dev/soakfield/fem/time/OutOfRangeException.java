package dev.soakfield.fem.time;

/**
 * A step's system holds numbers beyond double precision (a held value of 1e300 times a matrix
 * entry): no solver can help, the case's values must be nearer 1.
 */
final class OutOfRangeException extends RuntimeException {
  private static final long serialVersionUID = 1L;

  OutOfRangeException(String message) {
    super(message);
  }
}
