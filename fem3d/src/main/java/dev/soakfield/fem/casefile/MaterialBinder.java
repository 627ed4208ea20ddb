package dev.soakfield.fem.casefile;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;

/** Reads {@code materials}: diffusivity, solubility and source per volume group. */
final class MaterialBinder {
  private static final Set<String> MATERIAL_KEYS = Set.of("diffusivity", "solubility", "source");
  private static final Set<String> TENSOR_KEYS = Set.of("principal", "axes");
  private static final String POSITIVE_D = "a positive number (m²/s)";
  private static final double[][] XYZ = {{1, 0, 0}, {0, 1, 0}, {0, 0, 1}};

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
    fields.onlyKeys(obj.get(), path, MATERIAL_KEYS);
    String dPath = CasePaths.child(path, "diffusivity");
    Optional<Diffusivity> d =
        fields
            .required(obj.get(), path, "diffusivity", POSITIVE_D + " or {principal, axes}")
            .flatMap(n -> diffusivity(n, dPath));
    OptionalDouble s = OptionalDouble.of(1.0);
    Optional<CaseNode> sNode = CaseFields.optional(obj.get(), "solubility");
    if (sNode.isPresent()) {
      s = fields.positive(sNode.get(), CasePaths.child(path, "solubility"), "a positive number");
    }
    Optional<SourceSpec> source =
        CaseFields.optional(obj.get(), "source")
            .map(n -> source(n, CasePaths.child(path, "source")))
            .orElse(Optional.of(new SourceSpec.NoSource()));
    if (d.isEmpty() || s.isEmpty() || source.isEmpty()) {
      return Optional.empty();
    }
    return Optional.of(new MaterialSpec(group, d.get(), s.getAsDouble(), source.get()));
  }

  private Optional<Diffusivity> diffusivity(CaseNode node, String path) {
    if (!(node instanceof CaseNode.Obj obj)) {
      OptionalDouble d =
          fields.positive(node, path, POSITIVE_D + " or {\"principal\": [...], \"axes\": [...]}");
      return d.isPresent() ? Optional.of(Diffusivity.isotropic(d.getAsDouble())) : Optional.empty();
    }
    fields.onlyKeys(obj, path, TENSOR_KEYS);
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
    Optional<double[]> p = fields.numbers(node, path, 3, "[d1, d2, d3] of positive numbers");
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

  private Optional<SourceSpec> source(CaseNode node, String path) {
    Optional<CaseNode.Obj> obj = fields.object(node, path, "an object with kind");
    if (obj.isEmpty()) {
      return Optional.empty();
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
            .map(n -> fields.number(n, ratePath, "a finite number (" + unit + ")"))
            .orElse(OptionalDouble.empty());
    if (rate.isEmpty()) {
      return Optional.empty();
    }
    return Optional.of(
        kind.get() == SourceKind.CONSTANT
            ? new SourceSpec.ConstantRate(rate.getAsDouble())
            : new SourceSpec.FirstOrder(rate.getAsDouble()));
  }
}
