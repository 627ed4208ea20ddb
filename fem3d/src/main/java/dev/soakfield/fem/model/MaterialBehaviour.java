package dev.soakfield.fem.model;

import dev.soakfield.fem.physics.Arrhenius;
import java.util.List;
import java.util.Objects;

/**
 * How one material's coefficients change with temperature and which source laws act in it. The
 * per-tetrahedron coefficients of a {@link DiffusionModel} hold the values at the reference
 * temperature; these laws carry them to other temperatures.
 *
 * @param name the volume group (part) name
 * @param solubilityEnergy heat of solution ΔH of S = S0·exp(−ΔH/(R·T)), J/mol (0: constant)
 * @param diffusivityEnergy activation energy Q of D = D0·exp(−Q/(R·T)), J/mol (0: constant)
 * @param laws source laws acting in the material, summed
 * @param concentrationScale f in c_solve = f·c_declared: the solve's amount per m³ per unit of the
 *     case's concentration in this material (its density for mass fractions; 1 for volumetric
 *     units)
 */
public record MaterialBehaviour(
    String name,
    double solubilityEnergy,
    double diffusivityEnergy,
    List<LawUse> laws,
    double concentrationScale) {
  public MaterialBehaviour {
    Objects.requireNonNull(name, "name");
    laws = List.copyOf(laws);
    if (!(concentrationScale > 0) || Double.isInfinite(concentrationScale)) {
      throw new IllegalArgumentException("concentration scale must be positive and finite");
    }
  }

  /** A material whose concentrations are solved in the unit the case states them in. */
  public MaterialBehaviour(
      String name, double solubilityEnergy, double diffusivityEnergy, List<LawUse> laws) {
    this(name, solubilityEnergy, diffusivityEnergy, laws, 1.0);
  }

  /** A material whose coefficients do not depend on temperature and that has no source law. */
  public static MaterialBehaviour constant(String name) {
    return new MaterialBehaviour(name, 0, 0, List.of());
  }

  /** S(T)/S(T_ref). */
  public double solubilityRatio(double kelvin, double referenceKelvin) {
    return new Arrhenius(1, solubilityEnergy).ratio(kelvin, referenceKelvin);
  }

  /** D(T)/D(T_ref). */
  public double diffusivityRatio(double kelvin, double referenceKelvin) {
    return new Arrhenius(1, diffusivityEnergy).ratio(kelvin, referenceKelvin);
  }

  public boolean dependsOnTemperature() {
    return solubilityEnergy != 0 || diffusivityEnergy != 0;
  }
}
