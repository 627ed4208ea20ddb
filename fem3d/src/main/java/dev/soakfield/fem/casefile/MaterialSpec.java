package dev.soakfield.fem.casefile;

import java.util.Objects;

/**
 * The material of one volume group.
 *
 * @param volumeGroup the mesh's volume group this material fills
 * @param diffusivity D in m²/s
 * @param solubility S, positive (1 for plain diffusion, where the potential is the concentration)
 * @param source the volume source term
 */
public record MaterialSpec(
    String volumeGroup, Diffusivity diffusivity, double solubility, SourceSpec source) {
  public MaterialSpec {
    Objects.requireNonNull(volumeGroup, "volumeGroup");
    Objects.requireNonNull(diffusivity, "diffusivity");
    Objects.requireNonNull(source, "source");
    if (!(solubility > 0) || !Double.isFinite(solubility)) {
      throw new IllegalArgumentException("solubility must be positive, got " + solubility);
    }
  }
}
