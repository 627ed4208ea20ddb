package dev.soakfield.fem.units;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * What a case's concentrations mean: the declared unit, the species and, for gas volume per mass,
 * the molar volume of the gas. The solve works in an amount per m³ ({@link
 * ConcentrationUnit#amountUnit()} per m³); {@link #perPart} converts a declared concentration to
 * it, so c_solve = f·c_declared with f constant per part.
 *
 * @param unit the declared concentration unit
 * @param species what diffuses, when declared
 * @param molarVolume m³/mol of the gas at the standard conditions ml/100 g refers to
 */
public record Quantities(ConcentrationUnit unit, Optional<Species> species, double molarVolume) {
  /**
   * 22.414 L/mol: molar volume of an ideal gas at 0 °C and 101.325 kPa (from memory; CODATA gives
   * 22.413 969 54 L/mol), the conditions hydrogen-in-steel figures in ml/100 g use.
   */
  public static final double STP_MOLAR_VOLUME = 22.414e-3;

  /** A case that declares nothing. */
  public static final Quantities UNDECLARED =
      new Quantities(ConcentrationUnit.UNDECLARED, Optional.empty(), STP_MOLAR_VOLUME);

  public Quantities {
    Objects.requireNonNull(unit, "unit");
    Objects.requireNonNull(species, "species");
  }

  /**
   * The factor f from this unit to the solve's amount per m³ in a part of this density: kg/m³ per
   * wt% or wppm, mol/m³ per ml/100 g (gas volume → molecules → diffusing atoms); 1 for volumetric
   * units.
   *
   * @param density kg/m³ (NaN when the part has none; then only volumetric units convert)
   */
  public double perPart(double density) {
    return switch (unit) {
      case UNDECLARED, MOL_PER_M3, KG_PER_M3 -> 1.0;
      case WPPM -> 1e-6 * density;
      case WT_PERCENT -> 1e-2 * density;
      case ML_PER_100G ->
          // 1 ml = 1e-6 m³ of gas per 0.1 kg of part; n = V/Vm molecules, atoms per molecule each
          1e-6 / 0.1 * density / molarVolume * species.orElseThrow().atomsPerGasMolecule();
    };
  }

  /**
   * kg per unit of amount, when known: 1 for kg, the molar mass for mol. An undeclared unit is
   * taken as kg (what cases written before units were declared meant; runs warn about it).
   */
  public OptionalDouble massPerAmount() {
    return switch (unit.amountUnit()) {
      case "kg", "c*m^3" -> OptionalDouble.of(1.0);
      case "mol" ->
          species.isPresent()
              ? OptionalDouble.of(species.get().molarMass())
              : OptionalDouble.empty();
      default -> OptionalDouble.empty();
    };
  }

  /** The amount unit (kg, mol, or c*m^3 when undeclared). */
  public String amount() {
    return unit.amountUnit();
  }

  /** The concentration unit as outputs write it. */
  public String concentration() {
    return unit.label();
  }

  /** The unit of an inward flux: amount per m² and second. */
  public String flux() {
    return amount() + "/(m^2*s)";
  }

  /** Every unit the outputs use, by quantity, for summary.json and export headers. */
  public Map<String, String> describe() {
    Map<String, String> m = new LinkedHashMap<>();
    m.put("concentration", concentration());
    m.put("amount", amount());
    m.put("flux", flux());
    m.put("time", "s");
    m.put("temperature", "K");
    m.put("weight_gain", "%");
    species.ifPresent(
        s -> {
          m.put("species", s.name());
          m.put("molar_mass", s.molarMass() * 1e3 + " g/mol");
        });
    if (unit == ConcentrationUnit.ML_PER_100G) {
      m.put("molar_volume", molarVolume * 1e3 + " L/mol (gas at 0 degC, 101.325 kPa)");
    }
    return m;
  }
}
