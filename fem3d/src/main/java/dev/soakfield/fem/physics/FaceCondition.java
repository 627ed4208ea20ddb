package dev.soakfield.fem.physics;

import java.util.Objects;

/**
 * The condition on one face group.
 *
 * @param group face group index in the mesh
 * @param name face group name
 * @param kind the partition
 * @param value concentration (CONCENTRATION, EXCHANGE: c_env) or inward flux (FLUX); unused for SEALED
 * @param coefficient surface transfer coefficient h in m/s (EXCHANGE only)
 * @param faces the mesh's face indices of the group
 * @param faceSolubility solubility of the material next to each face (converts c to the potential)
 */
public record FaceCondition(
    int group,
    String name,
    FaceKind kind,
    TimeFunction value,
    TimeFunction coefficient,
    int[] faces,
    double[] faceSolubility) {
  public FaceCondition {
    Objects.requireNonNull(name, "name");
    Objects.requireNonNull(kind, "kind");
    Objects.requireNonNull(value, "value");
    Objects.requireNonNull(coefficient, "coefficient");
    faces = faces.clone();
    faceSolubility = faceSolubility.clone();
    if (faceSolubility.length != faces.length) {
      throw new IllegalArgumentException("one solubility per face expected");
    }
  }

  @Override
  public double[] faceSolubility() {
    return faceSolubility.clone();
  }

  @Override
  public int[] faces() {
    return faces.clone();
  }
}
