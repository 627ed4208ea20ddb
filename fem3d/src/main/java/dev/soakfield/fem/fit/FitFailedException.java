package dev.soakfield.fem.fit;

/** A fit that did not converge or whose data do not determine its parameters; says which. */
public final class FitFailedException extends RuntimeException {
  private static final long serialVersionUID = 1L;

  public FitFailedException(String message) {
    super(message);
  }
}
