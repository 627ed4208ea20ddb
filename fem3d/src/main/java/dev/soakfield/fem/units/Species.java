package dev.soakfield.fem.units;

import java.util.Objects;

/**
 * What diffuses: its name, its molar mass and how many of its atoms one molecule of its gas holds
 * (hydrogen diffuses in metals as atoms and stands outside as H₂, so 2; water 1).
 *
 * @param name the case's word for it ({@code water}, {@code hydrogen}) or {@code declared}
 * @param molarMass kg/mol
 * @param atomsPerGasMolecule diffusing units per molecule of the gas (ml/100 g counts gas volume)
 */
public record Species(String name, double molarMass, int atomsPerGasMolecule) {
  /**
   * Water, 18.015 g/mol: 2 × 1.008 + 15.999 from the IUPAC standard atomic weights (conventional
   * values, CIAAW 2021).
   */
  public static final Species WATER = new Species("water", 18.015e-3, 1);

  /** Hydrogen atoms, 1.008 g/mol (IUPAC conventional atomic weight, CIAAW 2021); H₂ outside. */
  public static final Species HYDROGEN = new Species("hydrogen", 1.008e-3, 2);

  public Species {
    Objects.requireNonNull(name, "name");
    if (!(molarMass > 0) || Double.isInfinite(molarMass)) {
      throw new IllegalArgumentException("molar mass must be positive: " + molarMass);
    }
    if (atomsPerGasMolecule < 1) {
      throw new IllegalArgumentException("atoms per gas molecule must be ≥ 1");
    }
  }

  /** A species given only by its molar mass, one unit per gas molecule. */
  public static Species ofMolarMass(double kgPerMol) {
    return new Species("declared", kgPerMol, 1);
  }
}
