package dev.soakfield.mesh;

import java.util.Objects;

/**
 * A named set of boundary or interface triangles, the unit that receives a boundary condition.
 *
 * @param name unique name within the mesh, never blank
 * @param tag the physical tag in the source file (or one assigned on creation); positive
 * @param kind whether the faces lie on the exterior or between two tetrahedra
 */
public record FaceGroup(String name, int tag, FaceGroupKind kind) {
  /** Name of the group that collects exterior faces no tag in the source covers. */
  public static final String UNTAGGED = "untagged";

  public FaceGroup {
    Objects.requireNonNull(name, "name");
    Objects.requireNonNull(kind, "kind");
    if (name.isBlank()) {
      throw new IllegalArgumentException("face group name is blank");
    }
    if (tag <= 0) {
      throw new IllegalArgumentException("face group tag must be positive, got " + tag);
    }
  }
}
