package dev.soakfield.fem.casefile;

import dev.soakfield.fem.physics.FaceKind;
import java.util.Objects;

/**
 * The boundary condition on one face group.
 *
 * @param faceGroup the mesh's face group
 * @param kind the face kind
 * @param value concentration (CONCENTRATION), inward flux in amount/(m²·s) (FLUX) or environment
 *     concentration (EXCHANGE); the constant 0 for SEALED
 * @param coefficient transfer coefficient h in m/s for EXCHANGE; the constant 0 for every other
 *     kind
 * @param ambientValue the environment is the exposure's ambient (AMBIENT always; EXCHANGE with
 *     {@code "value": "ambient"}), and {@code value} is unused
 */
public record FaceSpec(
    String faceGroup,
    FaceKind kind,
    TimeTable value,
    TimeTable coefficient,
    boolean ambientValue,
    java.util.Optional<SourceSpec.LawSource> law) {
  /** A face condition with its own value (not the ambient's). */
  public FaceSpec(String faceGroup, FaceKind kind, TimeTable value, TimeTable coefficient) {
    this(faceGroup, kind, value, coefficient, kind == FaceKind.AMBIENT);
  }

  /** A face condition without a face law. */
  public FaceSpec(
      String faceGroup,
      FaceKind kind,
      TimeTable value,
      TimeTable coefficient,
      boolean ambientValue) {
    this(faceGroup, kind, value, coefficient, ambientValue, java.util.Optional.empty());
  }

  public FaceSpec {
    Objects.requireNonNull(faceGroup, "faceGroup");
    Objects.requireNonNull(kind, "kind");
    Objects.requireNonNull(value, "value");
    Objects.requireNonNull(coefficient, "coefficient");
    Objects.requireNonNull(law, "law");
    if (law.isPresent() != (kind == FaceKind.LAW)) {
      throw new IllegalArgumentException("a face law exactly for the kind law");
    }
  }

  /** A sealed face group: no flux. */
  public static FaceSpec sealed(String faceGroup) {
    return new FaceSpec(faceGroup, FaceKind.SEALED, TimeTable.constant(0), TimeTable.constant(0));
  }
}
