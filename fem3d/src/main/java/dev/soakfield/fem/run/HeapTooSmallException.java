package dev.soakfield.fem.run;

/**
 * The Java heap is smaller than the run is estimated to need: refused before the run starts rather
 * than failing hours into it. The message gives the estimate, the heap and how to raise it.
 */
public final class HeapTooSmallException extends RuntimeException {
  private static final long serialVersionUID = 1L;

  public HeapTooSmallException(String message) {
    super(message);
  }
}
