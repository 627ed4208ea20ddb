package dev.soakfield.mesh;

import java.util.Objects;

/**
 * A named set of tetrahedra: one part (or one material region) of the mesh.
 *
 * @param name unique name within the mesh, never blank
 * @param tag the physical tag in the source file (or one assigned on creation); positive
 */
public record VolumeGroup(String name, int tag) {
  public VolumeGroup {
    Objects.requireNonNull(name, "name");
    if (name.isBlank()) {
      throw new IllegalArgumentException("volume group name is blank");
    }
    if (tag <= 0) {
      throw new IllegalArgumentException("volume group tag must be positive, got " + tag);
    }
  }
}
