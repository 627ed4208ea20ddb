package dev.soakfield.fem.casefile;

import java.util.List;
import java.util.Objects;
import java.util.OptionalDouble;

/**
 * The material of one volume group. Diffusivity and solubility follow Arrhenius laws in temperature
 * (value = prefactor·exp(−energy/(R·T))); with energy 0 the prefactor is the constant value.
 *
 * @param volumeGroup the mesh's volume group this material fills
 * @param diffusivity D (its prefactor D0 when {@code diffusivityEnergy} ≠ 0) in m²/s
 * @param solubility S (its prefactor S0 when {@code solubilityEnergy} ≠ 0), positive (1 for plain
 *     diffusion, where the potential is the concentration)
 * @param source the built-in volume source term
 * @param diffusivityEnergy activation energy Q of D, J/mol
 * @param solubilityEnergy heat of solution ΔH of S, J/mol
 * @param density mass density in kg/m³, when given (for mass fractions and weight gain)
 * @param laws source laws from the catalog, summed
 * @param impermeable the part takes no part in the run: its tetrahedra are taken out of the mesh
 *     before the model is built, so faces it shared with other parts are sealed (the other values
 *     are then unused)
 */
public record MaterialSpec(
    String volumeGroup,
    Diffusivity diffusivity,
    double solubility,
    SourceSpec source,
    double diffusivityEnergy,
    double solubilityEnergy,
    OptionalDouble density,
    List<SourceSpec.LawSource> laws,
    boolean impermeable) {
  public MaterialSpec {
    Objects.requireNonNull(volumeGroup, "volumeGroup");
    Objects.requireNonNull(diffusivity, "diffusivity");
    Objects.requireNonNull(source, "source");
    Objects.requireNonNull(density, "density");
    laws = List.copyOf(laws);
    if (!(solubility > 0) || !Double.isFinite(solubility)) {
      throw new IllegalArgumentException("solubility must be positive, got " + solubility);
    }
  }

  /** A material that takes part in the run. */
  public MaterialSpec(
      String volumeGroup,
      Diffusivity diffusivity,
      double solubility,
      SourceSpec source,
      double diffusivityEnergy,
      double solubilityEnergy,
      OptionalDouble density,
      List<SourceSpec.LawSource> laws) {
    this(
        volumeGroup,
        diffusivity,
        solubility,
        source,
        diffusivityEnergy,
        solubilityEnergy,
        density,
        laws,
        false);
  }

  /**
   * A part marked impermeable: no tetrahedron of it reaches the model (see {@code impermeable}).
   */
  public static MaterialSpec impermeable(String volumeGroup) {
    return new MaterialSpec(
        volumeGroup,
        Diffusivity.isotropic(1),
        1,
        new SourceSpec.NoSource(),
        0,
        0,
        OptionalDouble.empty(),
        List.of(),
        true);
  }

  /** A material with constant coefficients and no source law. */
  public MaterialSpec(
      String volumeGroup, Diffusivity diffusivity, double solubility, SourceSpec source) {
    this(volumeGroup, diffusivity, solubility, source, 0, 0, OptionalDouble.empty(), List.of());
  }
}
