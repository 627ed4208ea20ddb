package dev.soakfield.fem.casefile;

import dev.soakfield.fem.physics.FaceKind;
import java.util.Objects;

/**
 * The boundary condition on one face group.
 *
 * @param faceGroup the mesh's face group
 * @param kind the partition
 * @param value concentration (CONCENTRATION), inward flux in amount/(m²·s) (FLUX) or environment
 *     concentration (EXCHANGE); the constant 0 for SEALED
 * @param coefficient transfer coefficient h in m/s for EXCHANGE; the constant 0 for every other
 *     kind
 */
public record FaceSpec(String faceGroup, FaceKind kind, TimeTable value, TimeTable coefficient) {
  public FaceSpec {
    Objects.requireNonNull(faceGroup, "faceGroup");
    Objects.requireNonNull(kind, "kind");
    Objects.requireNonNull(value, "value");
    Objects.requireNonNull(coefficient, "coefficient");
  }

  /** A sealed face group: no flux. */
  public static FaceSpec sealed(String faceGroup) {
    return new FaceSpec(faceGroup, FaceKind.SEALED, TimeTable.constant(0), TimeTable.constant(0));
  }
}
