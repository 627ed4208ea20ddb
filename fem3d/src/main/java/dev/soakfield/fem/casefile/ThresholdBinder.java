package dev.soakfield.fem.casefile;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;

/**
 * Reads {@code "thresholds": [{"name", "level", "where", "when"}]}: {@code where} is a part, a
 * probe or {@code mean:PART}; {@code when} is {@code rises} (the default) or {@code falls}.
 */
final class ThresholdBinder {
  private final CaseFields fields;

  ThresholdBinder(CaseFields fields) {
    this.fields = fields;
  }

  /** Empty when a problem was reported. */
  Optional<List<ThresholdSpec>> bind(
      CaseNode node, Map<String, MaterialSpec> materials, List<ProbeSpec> probes) {
    if (!(node instanceof CaseNode.Arr arr)) {
      fields
          .problems()
          .found(node, "thresholds", "a list of {\"name\", \"level\", \"where\", \"when\"}");
      return Optional.empty();
    }
    List<ThresholdSpec> out = new ArrayList<>();
    Set<String> names = new HashSet<>();
    boolean ok = true;
    for (int i = 0; i < arr.items().size(); i++) {
      String path = CasePaths.item("thresholds", i);
      Optional<ThresholdSpec> t = one(arr.items().get(i), path, materials, probes);
      ok &= t.isPresent();
      if (t.isPresent() && !names.add(t.get().name())) {
        fields
            .problems()
            .add(
                arr.items().get(i),
                path,
                "found a second threshold named '" + t.get().name() + "', expected unique names");
        ok = false;
      }
      t.ifPresent(out::add);
    }
    return ok ? Optional.of(out) : Optional.empty();
  }

  private Optional<ThresholdSpec> one(
      CaseNode node, String path, Map<String, MaterialSpec> materials, List<ProbeSpec> probes) {
    Optional<CaseNode.Obj> obj =
        fields.object(node, path, "an object {\"name\", \"level\", \"where\", \"when\"}");
    if (obj.isEmpty()) {
      return Optional.empty();
    }
    CaseNode.Obj o = obj.get();
    fields.onlyKeys(o, path, Set.of("name", "level", "where", "when"));
    Optional<String> name =
        fields
            .required(o, path, "name", "a name for the threshold")
            .flatMap(n -> fields.text(n, CasePaths.child(path, "name"), "a name (a string)"));
    OptionalDouble level =
        fields
            .required(o, path, "level", "a concentration ≥ 0 in the case's unit")
            .map(
                n ->
                    fields.nonNegative(
                        n,
                        CasePaths.child(path, "level"),
                        "a concentration ≥ 0 in the case's unit"))
            .orElse(OptionalDouble.empty());
    Optional<ThresholdSpec.Where> where =
        fields
            .required(o, path, "where", "a part, a probe or mean:PART")
            .flatMap(n -> where(n, CasePaths.child(path, "where"), materials, probes));
    Optional<Boolean> rises =
        CaseFields.optional(o, "when")
            .map(
                n ->
                    fields.word(
                        n,
                        CasePaths.child(path, "when"),
                        new Boolean[] {true, false},
                        b -> b ? "rises" : "falls"))
            .orElse(Optional.of(true));
    if (name.isEmpty() || level.isEmpty() || where.isEmpty() || rises.isEmpty()) {
      return Optional.empty();
    }
    return Optional.of(
        new ThresholdSpec(name.get(), level.getAsDouble(), where.get(), rises.get()));
  }

  private Optional<ThresholdSpec.Where> where(
      CaseNode node, String path, Map<String, MaterialSpec> materials, List<ProbeSpec> probes) {
    Optional<String> text = fields.text(node, path, "a part, a probe or mean:PART");
    if (text.isEmpty()) {
      return Optional.empty();
    }
    String w = text.get();
    List<String> probeNames = probes.stream().map(ProbeSpec::name).toList();
    if (w.startsWith("mean:") && materials.containsKey(w.substring(5))) {
      return Optional.of(new ThresholdSpec.Where(ThresholdSpec.Kind.MEAN, w.substring(5)));
    }
    if (materials.containsKey(w)) {
      return Optional.of(new ThresholdSpec.Where(ThresholdSpec.Kind.PART, w));
    }
    if (probeNames.contains(w)) {
      return Optional.of(new ThresholdSpec.Where(ThresholdSpec.Kind.PROBE, w));
    }
    List<String> choices = new ArrayList<>(materials.keySet());
    materials.keySet().forEach(p -> choices.add("mean:" + p));
    choices.addAll(probeNames);
    Optional<String> guess = NameSuggestion.likely(w, choices);
    fields
        .problems()
        .found(
            node,
            path,
            "a part, a probe or mean:PART: one of "
                + String.join(", ", choices)
                + guess.map(g -> " (did you mean '" + g + "'?)").orElse(""));
    return Optional.empty();
  }
}
