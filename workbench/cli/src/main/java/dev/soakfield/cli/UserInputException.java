package dev.soakfield.cli;

/** A command-line request that cannot be carried out as given; its message is shown as it is. */
public final class UserInputException extends RuntimeException {
  private static final long serialVersionUID = 1L;

  public UserInputException(String message) {
    super(message);
  }
}
