package dev.soakfield.mesh;

/**
 * A mesh file (or a mesh request) that cannot be used, caused by the user's input rather than a
 * defect of the program. The message names the file, the place, what was found and what was
 * expected; callers show it as it is, without a stack trace.
 */
public final class MeshInputException extends RuntimeException {
  private static final long serialVersionUID = 1L;

  private final String source;
  private final String location;
  private final String found;
  private final String expected;

  /**
   * @param source the file name (or "command line" for an option)
   * @param location "line 12", "byte 4096" or an option name; empty when the whole file is meant
   * @param found what was there, in the user's words
   * @param expected what would have been accepted
   */
  public MeshInputException(String source, String location, String found, String expected) {
    super(format(source, location, found, expected));
    this.source = source;
    this.location = location;
    this.found = found;
    this.expected = expected;
  }

  private static String format(String source, String location, String found, String expected) {
    StringBuilder sb = new StringBuilder(source);
    if (location != null && !location.isEmpty()) {
      sb.append(", ").append(location);
    }
    sb.append(": found ").append(found).append(", expected ").append(expected);
    return sb.toString();
  }

  public String source() {
    return source;
  }

  public String location() {
    return location;
  }

  public String found() {
    return found;
  }

  public String expected() {
    return expected;
  }
}
