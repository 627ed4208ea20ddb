package dev.soakfield.fem.model;

import dev.soakfield.fem.physics.FaceKind;
import dev.soakfield.fem.physics.TimeFunction;
import java.util.Objects;

/** The condition on one face group, with the faces it covers and the solubility next to each. */
public final class FaceCondition {
  private final int group;
  private final String name;
  private final FaceKind kind;
  private final TimeFunction value;
  private final TimeFunction coefficient;
  private final int[] faces;
  private final double[] faceSolubility;
  private final boolean valueIsPotential;
  private final java.util.Optional<FaceLawUse> law;

  /**
   * A condition on the faces of one group.
   *
   * @param group face group index in the mesh
   * @param name face group name
   * @param kind the face kind
   * @param value concentration (CONCENTRATION; EXCHANGE: c_env) or inward flux (FLUX)
   * @param coefficient surface transfer coefficient h in m/s (EXCHANGE only)
   * @param faces the mesh's face indices of the group
   * @param faceSolubility solubility of the material next to each face (c = S·φ)
   */
  public FaceCondition(
      int group,
      String name,
      FaceKind kind,
      TimeFunction value,
      TimeFunction coefficient,
      int[] faces,
      double[] faceSolubility) {
    this(group, name, kind, value, coefficient, faces, faceSolubility, kind == FaceKind.AMBIENT);
  }

  /**
   * A condition whose value may be a potential rather than a concentration.
   *
   * @param valueIsPotential the value is φ_env (the ambient potential; c_env = S·φ_env next to each
   *     face), not c_env; always true for AMBIENT
   */
  public FaceCondition(
      int group,
      String name,
      FaceKind kind,
      TimeFunction value,
      TimeFunction coefficient,
      int[] faces,
      double[] faceSolubility,
      boolean valueIsPotential) {
    this(
        group,
        name,
        kind,
        value,
        coefficient,
        faces,
        faceSolubility,
        valueIsPotential,
        java.util.Optional.empty());
  }

  /**
   * A condition with a face law (kind LAW).
   *
   * @param value the gas pressure outside in Pa (kind LAW)
   * @param law the face law acting on the group
   */
  public FaceCondition(
      int group,
      String name,
      FaceKind kind,
      TimeFunction value,
      TimeFunction coefficient,
      int[] faces,
      double[] faceSolubility,
      boolean valueIsPotential,
      java.util.Optional<FaceLawUse> law) {
    this.law = Objects.requireNonNull(law, "law");
    if (law.isPresent() != (kind == FaceKind.LAW)) {
      throw new IllegalArgumentException("a face law exactly for the kind law");
    }
    this.group = group;
    this.name = Objects.requireNonNull(name, "name");
    this.kind = Objects.requireNonNull(kind, "kind");
    this.value = Objects.requireNonNull(value, "value");
    this.coefficient = Objects.requireNonNull(coefficient, "coefficient");
    this.faces = faces.clone();
    this.faceSolubility = faceSolubility.clone();
    this.valueIsPotential = kind != FaceKind.LAW && (valueIsPotential || kind == FaceKind.AMBIENT);
    if (faceSolubility.length != faces.length) {
      throw new IllegalArgumentException("one solubility per face expected");
    }
  }

  public int group() {
    return group;
  }

  public String name() {
    return name;
  }

  public FaceKind kind() {
    return kind;
  }

  public TimeFunction value() {
    return value;
  }

  /** True when {@link #value()} is a potential φ_env (ambient), false when a concentration. */
  public boolean valueIsPotential() {
    return valueIsPotential;
  }

  public TimeFunction coefficient() {
    return coefficient;
  }

  /** The face indices (a copy). */
  public int[] faces() {
    return faces.clone();
  }

  /** The face law of a LAW condition. */
  public java.util.Optional<FaceLawUse> law() {
    return law;
  }

  /** Solubility next to each face (a copy). */
  public double[] faceSolubility() {
    return faceSolubility.clone();
  }
}
