package dev.soakfield.mesh.topo;

/**
 * Choices that shape how {@link MeshAssembler} turns raw file contents into a mesh.
 *
 * @param featureAngleDeg when a mesh has no tagged triangles, its exterior is split into patches
 *     wherever the outward normals of two neighbouring faces differ by this angle or more; degrees,
 *     strictly between 0 and 180
 */
public record AssemblyOptions(double featureAngleDeg) {
  /** Feature angle used by {@link #defaults()}, degrees. */
  public static final double DEFAULT_FEATURE_ANGLE_DEG = 30.0;

  public AssemblyOptions {
    if (!(featureAngleDeg > 0.0 && featureAngleDeg < 180.0)) {
      throw new IllegalArgumentException(
          "feature angle must lie strictly between 0 and 180 degrees, got " + featureAngleDeg);
    }
  }

  /** A 30 degree feature angle. */
  public static AssemblyOptions defaults() {
    return new AssemblyOptions(DEFAULT_FEATURE_ANGLE_DEG);
  }
}
