package dev.soakfield.fem.casefile;

import dev.soakfield.fem.physics.FaceKind;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/** Reads {@code faces}: the boundary condition per face group. */
final class FaceBinder {
  private final CaseFields fields;

  FaceBinder(CaseFields fields) {
    this.fields = fields;
  }

  /** Face specs by group; empty when some entry is unusable (problems recorded). */
  Optional<Map<String, FaceSpec>> bind(CaseNode node, String path) {
    Optional<CaseNode.Obj> obj = fields.object(node, path, "an object: face group → condition");
    if (obj.isEmpty()) {
      return Optional.empty();
    }
    Map<String, FaceSpec> out = new LinkedHashMap<>();
    boolean ok = true;
    for (CaseNode.Member m : obj.get().members().values()) {
      Optional<FaceSpec> spec = face(m.key(), m.value(), CasePaths.child(path, m.key()));
      ok &= spec.isPresent();
      spec.ifPresent(s -> out.put(m.key(), s));
    }
    return ok ? Optional.of(out) : Optional.empty();
  }

  private Optional<FaceSpec> face(String group, CaseNode node, String path) {
    Optional<CaseNode.Obj> obj = fields.object(node, path, "an object with kind");
    if (obj.isEmpty()) {
      return Optional.empty();
    }
    String kindPath = CasePaths.child(path, "kind");
    Optional<FaceKind> kind =
        fields
            .required(
                obj.get(), path, "kind", "concentration, flux, exchange, ambient, sealed or law")
            .flatMap(n -> fields.word(n, kindPath, FaceKind.values(), FaceKind::word));
    if (kind.isEmpty()) {
      fields.onlyKeys(obj.get(), path, Set.of("kind", "value", "coefficient"));
      return Optional.empty();
    }
    return switch (kind.get()) {
      case SEALED -> {
        fields.onlyKeys(obj.get(), path, Set.of("kind"));
        yield Optional.of(FaceSpec.sealed(group));
      }
      case CONCENTRATION -> {
        fields.onlyKeys(obj.get(), path, Set.of("kind", "value"));
        yield value(obj.get(), path, 0, "a concentration")
            .map(v -> new FaceSpec(group, FaceKind.CONCENTRATION, v, TimeTable.constant(0)));
      }
      case FLUX -> {
        fields.onlyKeys(obj.get(), path, Set.of("kind", "value"));
        yield value(obj.get(), path, Double.NEGATIVE_INFINITY, "an inward flux (amount/(m²·s))")
            .map(v -> new FaceSpec(group, FaceKind.FLUX, v, TimeTable.constant(0)));
      }
      case EXCHANGE -> exchange(group, obj.get(), path);
      case LAW -> law(group, obj.get(), path);
      case AMBIENT -> {
        fields.onlyKeys(obj.get(), path, Set.of("kind"));
        yield Optional.of(
            new FaceSpec(
                group, FaceKind.AMBIENT, TimeTable.constant(0), TimeTable.constant(0), true));
      }
    };
  }

  private Optional<FaceSpec> exchange(String group, CaseNode.Obj obj, String path) {
    fields.onlyKeys(obj, path, Set.of("kind", "value", "coefficient"));
    CaseNode.Member v = obj.members().get("value");
    boolean ambient =
        v != null && v.value() instanceof CaseNode.Text t && t.value().equals("ambient");
    Optional<TimeTable> value =
        ambient
            ? Optional.of(TimeTable.constant(0))
            : value(obj, path, 0, "an environment concentration (or \"ambient\")");
    String hPath = CasePaths.child(path, "coefficient");
    Optional<TimeTable> h =
        fields
            .required(obj, path, "coefficient", "a transfer coefficient (m/s)")
            .flatMap(n -> fields.table(n, hPath, 0, "a transfer coefficient (m/s)", "m/s"));
    if (value.isEmpty() || h.isEmpty()) {
      return Optional.empty();
    }
    return Optional.of(new FaceSpec(group, FaceKind.EXCHANGE, value.get(), h.get(), ambient));
  }

  /**
   * {"kind": "law", "law": id, "pressure": p (Pa, or a table; default: the exposure's), parameter:
   * value, ...}: parameter values stay as given, checked when the run binds the law.
   */
  private Optional<FaceSpec> law(String group, CaseNode.Obj obj, String path) {
    String lawPath = CasePaths.child(path, "law");
    Optional<String> id =
        fields
            .required(obj, path, "law", "a face law id (soakfield plugins lists them)")
            .flatMap(n -> fields.text(n, lawPath, "a face law id (soakfield plugins lists them)"));
    Optional<TimeTable> pressure = Optional.of(TimeTable.constant(0));
    CaseNode.Member p = obj.members().get("pressure");
    if (p != null) {
      pressure =
          fields.table(
              p.value(), CasePaths.child(path, "pressure"), 0, "a gas pressure (Pa)", "Pa");
    }
    java.util.Map<String, Object> params = new java.util.LinkedHashMap<>();
    boolean ok = id.isPresent() && pressure.isPresent();
    for (CaseNode.Member m : obj.members().values()) {
      if (Set.of("kind", "law", "pressure").contains(m.key())) {
        continue;
      }
      if (m.value() instanceof CaseNode.Num num && Double.isFinite(num.value())) {
        params.put(m.key(), num.value());
      } else if (m.value() instanceof CaseNode.Text t) {
        params.put(m.key(), t.value());
      } else {
        fields
            .problems()
            .found(m.value(), CasePaths.child(path, m.key()), "a number or a value with a unit");
        ok = false;
      }
    }
    if (!ok) {
      return Optional.empty();
    }
    SourceSpec.LawSource law =
        new SourceSpec.LawSource(id.get(), params, path, obj.line(), obj.column());
    return Optional.of(
        new FaceSpec(
            group,
            FaceKind.LAW,
            pressure.get(),
            TimeTable.constant(0),
            p == null,
            Optional.of(law)));
  }

  private Optional<TimeTable> value(CaseNode.Obj obj, String path, double minimum, String what) {
    String valuePath = CasePaths.child(path, "value");
    return fields
        .required(obj, path, "value", what + " or a time table [[t, value], ...]")
        .flatMap(n -> fields.table(n, valuePath, minimum, what));
  }
}
