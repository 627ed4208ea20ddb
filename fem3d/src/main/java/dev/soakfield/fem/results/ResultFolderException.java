package dev.soakfield.fem.results;

/**
 * The output folder cannot take this run's results: it holds another case's results or files that
 * are not Soakfield results, or it cannot be written (no permission, disk full). The message names
 * the folder, what was found and what to do; callers show it without a stack trace.
 */
public final class ResultFolderException extends RuntimeException {
  private static final long serialVersionUID = 1L;

  public ResultFolderException(String message) {
    super(message);
  }

  public ResultFolderException(String message, Throwable cause) {
    super(message, cause);
  }
}
