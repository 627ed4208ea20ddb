package dev.soakfield.mesh;

import java.util.Objects;

/**
 * One observation of an import or a mesh check.
 *
 * @param severity how much it matters
 * @param code a short stable identifier for scripts, e.g. {@code inverted-tets}
 * @param message a sentence for people, with counts and element ids where they help
 */
public record MeshFinding(Severity severity, String code, String message) {
  /** How much a finding matters. */
  public enum Severity {
    /** Worth knowing, nothing to act on. */
    INFO,
    /** The mesh is usable but the user should look. */
    WARNING,
    /** The mesh must not be used for analysis as it is. */
    ERROR
  }

  public MeshFinding {
    Objects.requireNonNull(severity, "severity");
    Objects.requireNonNull(code, "code");
    Objects.requireNonNull(message, "message");
  }

  public static MeshFinding info(String code, String message) {
    return new MeshFinding(Severity.INFO, code, message);
  }

  public static MeshFinding warning(String code, String message) {
    return new MeshFinding(Severity.WARNING, code, message);
  }

  public static MeshFinding error(String code, String message) {
    return new MeshFinding(Severity.ERROR, code, message);
  }
}
