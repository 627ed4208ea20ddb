package dev.soakfield.fem.casefile;

import dev.soakfield.fem.units.ConcentrationUnit;
import dev.soakfield.fem.units.Quantities;
import dev.soakfield.fem.units.Species;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;

/**
 * Reads {@code "species"} ({@code water}, {@code hydrogen} or {@code {"molar_mass": "44 g/mol"}})
 * and {@code "units": {"concentration": ..., "molar_volume": ...}} into {@link Quantities}, and
 * checks that every part has the density a mass-based unit needs.
 */
final class UnitsBinder {
  private final CaseFields fields;

  UnitsBinder(CaseFields fields) {
    this.fields = fields;
  }

  /** Empty when a problem was reported. */
  @SuppressWarnings("OptionalMapToOptional") // empty: a problem; inner empty: not declared
  Optional<Quantities> bind(
      Optional<CaseNode> speciesNode,
      Optional<CaseNode> unitsNode,
      Optional<Map<String, MaterialSpec>> materials,
      Optional<CaseNode> materialsNode) {
    Optional<Optional<Species>> species =
        speciesNode.map(n -> species(n).map(Optional::of)).orElse(Optional.of(Optional.empty()));
    ConcentrationUnit unit = ConcentrationUnit.UNDECLARED;
    double molarVolume = Quantities.STP_MOLAR_VOLUME;
    boolean ok = species.isPresent();
    if (unitsNode.isPresent()) {
      Optional<CaseNode.Obj> obj =
          fields.object(unitsNode.get(), "units", "an object with concentration");
      if (obj.isEmpty()) {
        return Optional.empty();
      }
      fields.onlyKeys(obj.get(), "units", Set.of("concentration", "molar_volume"));
      Optional<ConcentrationUnit> u =
          fields
              .required(obj.get(), "units", "concentration", ConcentrationUnit.spellings())
              .flatMap(this::unit);
      ok &= u.isPresent();
      unit = u.orElse(unit);
      Optional<CaseNode> vm = CaseFields.optional(obj.get(), "molar_volume");
      if (vm.isPresent()) {
        OptionalDouble v =
            fields.positiveQuantity(
                vm.get(), "units.molar_volume", "m^3/mol", "a molar volume (\"22.414 L/mol\")");
        ok &= v.isPresent();
        molarVolume = v.orElse(molarVolume);
      }
      if (u.isPresent() && species.isPresent()) {
        ok &= gasUnitFits(unitsNode.get(), u.get(), species.get());
      }
    }
    if (materials.isPresent()
        && materialsNode.orElse(null) instanceof CaseNode.Obj where
        && unit.needsDensity()) {
      ok &= densitiesGiven(materials.get(), where, unit);
    }
    return ok
        ? Optional.of(new Quantities(unit, species.orElseThrow(), molarVolume))
        : Optional.empty();
  }

  private Optional<Species> species(CaseNode node) {
    String expected = "water, hydrogen, or {\"molar_mass\": \"... g/mol\"}";
    if (node instanceof CaseNode.Obj o) {
      fields.onlyKeys(o, "species", Set.of("molar_mass"));
      OptionalDouble m =
          fields
              .required(o, "species", "molar_mass", "a molar mass (\"44.01 g/mol\")")
              .map(
                  n ->
                      fields.positiveQuantity(
                          n, "species.molar_mass", "kg/mol", "a molar mass (\"44.01 g/mol\")"))
              .orElse(OptionalDouble.empty());
      return m.isPresent() ? Optional.of(Species.ofMolarMass(m.getAsDouble())) : Optional.empty();
    }
    Optional<String> word = fields.text(node, "species", expected);
    if (word.isEmpty()) {
      return Optional.empty();
    }
    return switch (word.get()) {
      case "water" -> Optional.of(Species.WATER);
      case "hydrogen" -> Optional.of(Species.HYDROGEN);
      default -> {
        fields.problems().found(node, "species", expected);
        yield Optional.empty();
      }
    };
  }

  private Optional<ConcentrationUnit> unit(CaseNode node) {
    Optional<String> text = fields.text(node, "units.concentration", ConcentrationUnit.spellings());
    if (text.isEmpty()) {
      return Optional.empty();
    }
    Optional<ConcentrationUnit> u = ConcentrationUnit.parse(text.get());
    if (u.isEmpty()) {
      fields.problems().found(node, "units.concentration", ConcentrationUnit.spellings());
    }
    return u;
  }

  /** Gas volume per mass needs to know how many diffusing atoms one gas molecule gives. */
  private boolean gasUnitFits(CaseNode node, ConcentrationUnit unit, Optional<Species> species) {
    if (unit == ConcentrationUnit.ML_PER_100G && !species.equals(Optional.of(Species.HYDROGEN))) {
      fields
          .problems()
          .add(
              node,
              "units.concentration",
              "found ml/100g without \"species\": \"hydrogen\", expected hydrogen (the unit counts"
                  + " H₂ gas, two diffusing atoms a molecule) or another unit");
      return false;
    }
    return true;
  }

  private boolean densitiesGiven(
      Map<String, MaterialSpec> materials, CaseNode.Obj where, ConcentrationUnit unit) {
    boolean ok = true;
    for (var e : materials.entrySet()) {
      MaterialSpec m = e.getValue();
      if (m.density().isEmpty() && !m.impermeable()) {
        fields
            .problems()
            .add(
                where.members().get(e.getKey()).keyLine(),
                where.members().get(e.getKey()).keyColumn(),
                CasePaths.child("materials", e.getKey()),
                "found no density, expected one (\"density\": \"7850 kg/m^3\"): concentrations in "
                    + unit.label()
                    + " are mass fractions of the part");
        ok = false;
      }
    }
    return ok;
  }
}
