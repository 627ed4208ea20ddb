package dev.soakfield.fem.casefile;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;

/** Reads {@code materials}: diffusivity, solubility and source per volume group. */
final class MaterialBinder {
  private static final Set<String> MATERIAL_KEYS =
      Set.of("diffusivity", "solubility", "source", "density");
  private static final Set<String> TENSOR_KEYS = Set.of("principal", "axes", "D0", "Q");
  // far above any solid or liquid (gases diffuse at ~1e-5 m²/s): a larger value is a typing mistake
  private static final double MAX_D = 1.0;
  private static final Set<String> SOLUBILITY_KEYS = Set.of("S0", "dH");
  private static final String ENERGY = "an energy in J/mol (or with a unit: \"42 kJ/mol\")";
  private static final String POSITIVE_D = "a positive number (m²/s)";
  private static final double[][] XYZ = {{1, 0, 0}, {0, 1, 0}, {0, 0, 1}};
  private static final String LAW_NAME = "name";
  private static final String REVERSIBLE = "reversible";
  private static final java.util.regex.Pattern LAW_NAME_SPELLING =
      java.util.regex.Pattern.compile("[A-Za-z0-9_-]+");

  private enum SourceKind {
    NONE("none"),
    CONSTANT("constant"),
    FIRST_ORDER("first-order");

    final String word;

    SourceKind(String word) {
      this.word = word;
    }
  }

  private final CaseFields fields;

  MaterialBinder(CaseFields fields) {
    this.fields = fields;
  }

  /** Materials by volume group; empty when the section is unusable (problems recorded). */
  Optional<Map<String, MaterialSpec>> bind(CaseNode node, String path) {
    Optional<CaseNode.Obj> obj = fields.object(node, path, "an object: volume group → material");
    if (obj.isEmpty()) {
      return Optional.empty();
    }
    if (obj.get().members().isEmpty()) {
      fields.problems().found(node, path, "at least one material");
      return Optional.empty();
    }
    Map<String, MaterialSpec> out = new LinkedHashMap<>();
    boolean ok = true;
    for (CaseNode.Member m : obj.get().members().values()) {
      Optional<MaterialSpec> spec = material(m.key(), m.value(), CasePaths.child(path, m.key()));
      ok &= spec.isPresent();
      spec.ifPresent(s -> out.put(m.key(), s));
    }
    return ok ? Optional.of(out) : Optional.empty();
  }

  private Optional<MaterialSpec> material(String group, CaseNode node, String path) {
    Optional<CaseNode.Obj> obj =
        fields.object(node, path, "an object with diffusivity, solubility, source");
    if (obj.isEmpty()) {
      return Optional.empty();
    }
    if (obj.get().members().containsKey("impermeable")) {
      return impermeable(group, obj.get(), path);
    }
    fields.onlyKeys(obj.get(), path, MATERIAL_KEYS);
    String dPath = CasePaths.child(path, "diffusivity");
    double[] dEnergy = {0};
    Optional<Diffusivity> d =
        fields
            .required(obj.get(), path, "diffusivity", POSITIVE_D + " or {principal, axes}")
            .flatMap(n -> diffusivity(n, dPath, dEnergy));
    OptionalDouble s = OptionalDouble.of(1.0);
    double[] sEnergy = {0};
    Optional<CaseNode> sNode = CaseFields.optional(obj.get(), "solubility");
    if (sNode.isPresent()) {
      s = solubility(sNode.get(), CasePaths.child(path, "solubility"), sEnergy);
    }
    OptionalDouble density = OptionalDouble.empty();
    boolean densityOk = true;
    Optional<CaseNode> rhoNode = CaseFields.optional(obj.get(), "density");
    if (rhoNode.isPresent()) {
      density =
          fields.positiveQuantity(
              rhoNode.get(), CasePaths.child(path, "density"), "kg/m^3", "a density in kg/m³");
      densityOk = density.isPresent();
    }
    List<SourceSpec.LawSource> laws = new ArrayList<>();
    Optional<SourceSpec> source =
        CaseFields.optional(obj.get(), "source")
            .map(n -> sources(n, CasePaths.child(path, "source"), laws))
            .orElse(Optional.of(new SourceSpec.NoSource()));
    Optional<List<SourceSpec.LawSource>> named = named(laws);
    if (d.isEmpty() || s.isEmpty() || source.isEmpty() || !densityOk || named.isEmpty()) {
      return Optional.empty();
    }
    return Optional.of(
        new MaterialSpec(
            group,
            d.get(),
            s.getAsDouble(),
            source.get(),
            dEnergy[0],
            sEnergy[0],
            density,
            named.get()));
  }

  /** A number, or {S0, dH}: the prefactor and the heat of solution into {@code energy[0]}. */
  private OptionalDouble solubility(CaseNode node, String path, double[] energy) {
    String expected = "a positive number, or {\"S0\": ..., \"dH\": ...}";
    if (!(node instanceof CaseNode.Obj obj)) {
      return fields.positive(node, path, expected);
    }
    fields.onlyKeys(obj, path, SOLUBILITY_KEYS);
    OptionalDouble s0 =
        fields
            .required(obj, path, "S0", "a positive prefactor")
            .map(n -> fields.positive(n, CasePaths.child(path, "S0"), "a positive prefactor"))
            .orElse(OptionalDouble.empty());
    OptionalDouble dh =
        fields
            .required(obj, path, "dH", ENERGY)
            .map(n -> fields.quantity(n, CasePaths.child(path, "dH"), "J/mol", ENERGY))
            .orElse(OptionalDouble.empty());
    if (s0.isEmpty() || dh.isEmpty()) {
      return OptionalDouble.empty();
    }
    energy[0] = dh.getAsDouble();
    return s0;
  }

  /** {@code {"impermeable": true}}: the part is taken out of the run; nothing else goes with it. */
  private Optional<MaterialSpec> impermeable(String group, CaseNode.Obj obj, String path) {
    fields.onlyKeys(obj, path, Set.of("impermeable"));
    CaseNode v = obj.members().get("impermeable").value();
    if (!(v instanceof CaseNode.Bool b) || !b.value() || obj.members().size() != 1) {
      if (obj.members().size() == 1) {
        fields.problems().found(v, CasePaths.child(path, "impermeable"), "true, alone");
      }
      return Optional.empty();
    }
    return Optional.of(MaterialSpec.impermeable(group));
  }

  /** One source object or an array of them: built-in kinds and catalog laws. */
  private Optional<SourceSpec> sources(
      CaseNode node, String path, List<SourceSpec.LawSource> laws) {
    if (!(node instanceof CaseNode.Arr arr)) {
      return source(node, path, laws);
    }
    SourceSpec builtIn = new SourceSpec.NoSource();
    boolean ok = true;
    for (int i = 0; i < arr.items().size(); i++) {
      String itemPath = CasePaths.item(path, i);
      Optional<SourceSpec> one = source(arr.items().get(i), itemPath, laws);
      ok &= one.isPresent();
      if (one.isPresent() && !(one.get() instanceof SourceSpec.NoSource)) {
        if (!(builtIn instanceof SourceSpec.NoSource)) {
          fields
              .problems()
              .found(
                  arr.items().get(i),
                  itemPath,
                  "at most one built-in kind (constant, first-order)"
                      + " per material; further sources as laws");
          ok = false;
        }
        builtIn = one.get();
      }
    }
    return ok ? Optional.of(builtIn) : Optional.empty();
  }

  private Optional<Diffusivity> diffusivity(CaseNode node, String path, double[] energy) {
    if (!(node instanceof CaseNode.Obj obj)) {
      OptionalDouble d =
          fields.positiveQuantity(
              node,
              path,
              "m^2/s",
              POSITIVE_D + " or {\"principal\": [...], \"axes\": [...]} or {\"D0\", \"Q\"}");
      if (d.isPresent() && d.getAsDouble() > MAX_D) {
        fields.problems().found(node, path, POSITIVE_D + " up to " + MAX_D + " m²/s");
        return Optional.empty();
      }
      return d.isPresent() ? Optional.of(Diffusivity.isotropic(d.getAsDouble())) : Optional.empty();
    }
    fields.onlyKeys(obj, path, TENSOR_KEYS);
    if (obj.members().containsKey("Q")) {
      OptionalDouble q =
          fields.quantity(
              obj.members().get("Q").value(), CasePaths.child(path, "Q"), "J/mol", ENERGY);
      if (q.isEmpty()) {
        return Optional.empty();
      }
      energy[0] = q.getAsDouble();
    }
    if (obj.members().containsKey("D0") || !obj.members().containsKey("principal")) {
      if (obj.members().containsKey("principal")) {
        fields.problems().found(obj, path, "either D0 (isotropic) or principal (orthotropic)");
        return Optional.empty();
      }
      String d0Path = CasePaths.child(path, "D0");
      OptionalDouble d0 =
          fields
              .required(obj, path, "D0", POSITIVE_D)
              .map(n -> fields.positiveQuantity(n, d0Path, "m^2/s", POSITIVE_D))
              .orElse(OptionalDouble.empty());
      return d0.isPresent()
          ? Optional.of(Diffusivity.isotropic(d0.getAsDouble()))
          : Optional.empty();
    }
    String pPath = CasePaths.child(path, "principal");
    Optional<double[]> principal =
        fields.required(obj, path, "principal", "[d1, d2, d3]").flatMap(n -> principal(n, pPath));
    Optional<double[][]> axes = Optional.of(XYZ);
    Optional<CaseNode> axesNode = CaseFields.optional(obj, "axes");
    if (axesNode.isPresent()) {
      axes = axes(axesNode.get(), CasePaths.child(path, "axes"));
    }
    if (principal.isEmpty() || axes.isEmpty()) {
      return Optional.empty();
    }
    return Optional.of(Diffusivity.orthotropic(principal.get(), axes.get()));
  }

  private Optional<double[]> principal(CaseNode node, String path) {
    Optional<double[]> p =
        fields.numbers(
            node,
            path,
            3,
            "[d1, d2, d3] of positive numbers",
            new String[] {"m^2/s", "m^2/s", "m^2/s"});
    if (p.isEmpty()) {
      return p;
    }
    boolean ok = true;
    CaseNode.Arr arr = (CaseNode.Arr) node;
    for (int i = 0; i < 3; i++) {
      if (!(p.get()[i] > 0)) {
        fields.problems().found(arr.items().get(i), CasePaths.item(path, i), POSITIVE_D);
        ok = false;
      }
    }
    return ok ? p : Optional.empty();
  }

  private Optional<double[][]> axes(CaseNode node, String path) {
    String expected = "three axes [[x, y, z], [x, y, z], [x, y, z]]";
    if (!(node instanceof CaseNode.Arr arr) || arr.items().size() != 3) {
      fields.problems().found(node, path, expected);
      return Optional.empty();
    }
    double[][] axes = new double[3][];
    boolean ok = true;
    for (int k = 0; k < 3; k++) {
      Optional<double[]> a =
          fields.numbers(arr.items().get(k), CasePaths.item(path, k), 3, "an axis [x, y, z]");
      ok &= a.isPresent();
      axes[k] = a.orElse(new double[3]);
    }
    if (!ok) {
      return Optional.empty();
    }
    Optional<String> defect = Diffusivity.axisDefect(axes);
    if (defect.isPresent()) {
      fields
          .problems()
          .add(
              node,
              path,
              "found "
                  + defect.get()
                  + " after normalizing each axis, expected orthonormal axes (|aᵢ·aⱼ| ≤ "
                  + Diffusivity.AXIS_TOLERANCE
                  + ")");
      return Optional.empty();
    }
    return Optional.of(axes);
  }

  private Optional<SourceSpec> source(CaseNode node, String path, List<SourceSpec.LawSource> laws) {
    Optional<CaseNode.Obj> obj = fields.object(node, path, "an object with kind or law");
    if (obj.isEmpty()) {
      return Optional.empty();
    }
    if (obj.get().members().containsKey("law")) {
      return law(obj.get(), path)
          .map(
              l -> {
                laws.add(l);
                return new SourceSpec.NoSource();
              });
    }
    String kindPath = CasePaths.child(path, "kind");
    Optional<SourceKind> kind =
        fields
            .required(obj.get(), path, "kind", "none, constant or first-order")
            .flatMap(n -> fields.word(n, kindPath, SourceKind.values(), k -> k.word));
    if (kind.isEmpty()) {
      fields.onlyKeys(obj.get(), path, Set.of("kind", "rate"));
      return Optional.empty();
    }
    if (kind.get() == SourceKind.NONE) {
      fields.onlyKeys(obj.get(), path, Set.of("kind"));
      return Optional.of(new SourceSpec.NoSource());
    }
    fields.onlyKeys(obj.get(), path, Set.of("kind", "rate"));
    String unit = kind.get() == SourceKind.CONSTANT ? "amount/(m³·s)" : "1/s";
    String ratePath = CasePaths.child(path, "rate");
    OptionalDouble rate =
        fields
            .required(obj.get(), path, "rate", "a number (" + unit + ")")
            .map(
                n ->
                    kind.get() == SourceKind.CONSTANT
                        ? fields.number(n, ratePath, "a finite number (" + unit + ")")
                        : fields.quantity(n, ratePath, "1/s", "a finite number (" + unit + ")"))
            .orElse(OptionalDouble.empty());
    if (rate.isEmpty()) {
      return Optional.empty();
    }
    return Optional.of(
        kind.get() == SourceKind.CONSTANT
            ? new SourceSpec.ConstantRate(rate.getAsDouble())
            : new SourceSpec.FirstOrder(rate.getAsDouble()));
  }

  /**
   * {"law": id, "name": ..., "reversible": ..., parameter: value, ...}: parameter values stay as
   * given (numbers or unit strings); "name" and "reversible" describe the instance and are no
   * parameters.
   */
  private Optional<SourceSpec.LawSource> law(CaseNode.Obj obj, String path) {
    String lawPath = CasePaths.child(path, "law");
    Optional<String> id =
        fields.text(
            obj.members().get("law").value(), lawPath, "a law id (soakfield plugins lists them)");
    Map<String, Object> params = new LinkedHashMap<>();
    boolean ok = id.isPresent();
    String name = "";
    boolean reversible = true;
    for (CaseNode.Member m : obj.members().values()) {
      if (m.key().equals("law")) {
        continue;
      }
      if (m.key().equals(LAW_NAME)) {
        if (m.value() instanceof CaseNode.Text t
            && LAW_NAME_SPELLING.matcher(t.value()).matches()) {
          name = t.value();
        } else {
          fields
              .problems()
              .found(
                  m.value(),
                  CasePaths.child(path, LAW_NAME),
                  "a name of letters, digits, '-' and '_' (e.g. \"dislocations\")");
          ok = false;
        }
        continue;
      }
      if (m.key().equals(REVERSIBLE)) {
        if (m.value() instanceof CaseNode.Bool b) {
          reversible = b.value();
        } else {
          fields.problems().found(m.value(), CasePaths.child(path, REVERSIBLE), "true or false");
          ok = false;
        }
        continue;
      }
      String p = CasePaths.child(path, m.key());
      if (m.value() instanceof CaseNode.Num num && Double.isFinite(num.value())) {
        params.put(m.key(), num.value());
      } else if (m.value() instanceof CaseNode.Text t) {
        params.put(m.key(), t.value());
      } else {
        fields.problems().found(m.value(), p, "a number or a value with a unit");
        ok = false;
      }
    }
    return ok
        ? Optional.of(
            new SourceSpec.LawSource(
                id.get(), name, reversible, params, path, obj.line(), obj.column()))
        : Optional.empty();
  }

  /**
   * Gives every law instance of a material its name: the case's, or the law's id (then "-2", "-3" …
   * for further unnamed instances of the same law). Two instances with one name are a problem at
   * the second.
   */
  private Optional<List<SourceSpec.LawSource>> named(List<SourceSpec.LawSource> laws) {
    Set<String> taken = new java.util.HashSet<>();
    for (SourceSpec.LawSource l : laws) {
      if (!l.name().isEmpty() && !taken.add(l.name())) {
        fields
            .problems()
            .add(
                l.line(),
                l.column(),
                CasePaths.child(l.path(), LAW_NAME),
                "found a second source named '"
                    + l.name()
                    + "' in this material, expected a name of its own");
        return Optional.empty();
      }
    }
    List<SourceSpec.LawSource> out = new ArrayList<>();
    for (SourceSpec.LawSource l : laws) {
      if (!l.name().isEmpty()) {
        out.add(l);
        continue;
      }
      String n = l.id();
      for (int k = 2; taken.contains(n); k++) {
        n = l.id() + "-" + k;
      }
      taken.add(n);
      out.add(l.named(n));
    }
    return Optional.of(out);
  }
}
