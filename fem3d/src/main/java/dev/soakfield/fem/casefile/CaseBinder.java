package dev.soakfield.fem.casefile;

import dev.soakfield.fem.physics.ExposureHistory;
import dev.soakfield.fem.physics.SorptionLaw;
import dev.soakfield.fem.units.Quantities;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;

/** Turns the tree of a case file into a {@link CaseSpec}, collecting every independent problem. */
final class CaseBinder {
  private static final Set<String> TOP_KEYS =
      Set.of(
          "$schema", // the editor hook of docs/case.schema.json; read by editors, ignored here
          "mesh",
          "elements",
          "law",
          "temperature",
          "exposure",
          "materials",
          "faces",
          "initial",
          "time",
          "probes",
          "threshold",
          "thresholds",
          "permeation",
          "species",
          "units",
          "accuracy");

  private final CaseFields fields;
  private final Path caseFile;

  private CaseBinder(ProblemList problems, Path caseFile) {
    this.fields = new CaseFields(problems);
    this.caseFile = caseFile;
  }

  static CaseSpec bind(CaseNode root, Path caseFile, String source) {
    ProblemList problems = new ProblemList(source);
    CaseBinder binder = new CaseBinder(problems, caseFile);
    Optional<CaseSpec> spec = binder.top(root);
    problems.throwIfAny();
    return spec.orElseThrow(() -> new IllegalStateException("no case and no problem reported"));
  }

  @SuppressWarnings("OptionalMapToOptional") // empty: a problem; inner empty: no such key
  private Optional<CaseSpec> top(CaseNode root) {
    Optional<CaseNode.Obj> found = fields.object(root, "", "a JSON object (the case)");
    if (found.isEmpty()) {
      return Optional.empty();
    }
    CaseNode.Obj obj = found.get();
    fields.onlyKeys(obj, "", TOP_KEYS);
    Optional<Path> mesh =
        fields.required(obj, "", "mesh", "the mesh file name").flatMap(this::mesh);
    Optional<ElementChoice> elements =
        CaseFields.optional(obj, "elements")
            .map(
                n ->
                    fields.word(
                        n,
                        "elements",
                        new ElementChoice[] {ElementChoice.LINEAR, ElementChoice.QUADRATIC},
                        ElementChoice::word))
            .orElse(Optional.of(ElementChoice.AS_MESHED));
    Optional<Map<String, MaterialSpec>> materials =
        fields
            .required(obj, "", "materials", "an object: volume group → material")
            .flatMap(n -> new MaterialBinder(fields).bind(n, "materials"));
    Optional<Map<String, FaceSpec>> faces =
        CaseFields.optional(obj, "faces")
            .map(n -> new FaceBinder(fields).bind(n, "faces"))
            .orElse(Optional.of(Map.of()));
    Optional<InitialSpec> initial =
        CaseFields.optional(obj, "initial")
            .map(n -> initial(n, materials))
            .orElse(Optional.of(InitialSpec.uniform(0)));
    Optional<SorptionLaw> law =
        CaseFields.optional(obj, "law")
            .map(n -> fields.word(n, "law", SorptionLaw.values(), SorptionLaw::word))
            .orElse(Optional.of(SorptionLaw.PLAIN));
    double temperature = Double.NaN;
    boolean temperatureOk = true;
    Optional<CaseNode> tNode = CaseFields.optional(obj, "temperature");
    if (tNode.isPresent()) {
      OptionalDouble t =
          fields.positiveQuantity(
              tNode.get(), "temperature", "K", "a temperature above 0 K (\"85 degC\")");
      temperatureOk = t.isPresent();
      temperature = t.orElse(Double.NaN);
    }
    double startTemperature = temperature;
    Optional<Optional<ExposureHistory>> exposure =
        CaseFields.optional(obj, "exposure")
            .map(
                n ->
                    new ExposureBinder(fields)
                        .bind(n, "exposure", startTemperature)
                        .map(Optional::of))
            .orElse(Optional.of(Optional.empty()));
    OptionalDouble historyEnd =
        exposure
            .flatMap(e -> e)
            .map(e -> OptionalDouble.of(e.end()))
            .orElse(OptionalDouble.empty());
    Optional<TimeSpec> time;
    if (historyEnd.isPresent() && !obj.members().containsKey("time")) {
      double end = historyEnd.getAsDouble();
      time =
          Optional.of(
              new TimeSpec(
                  end,
                  List.of(end),
                  TimeScheme.BACKWARD_EULER,
                  CapacityForm.CONSISTENT,
                  new StepControl.Adaptive(
                      StepControl.DEFAULT_TOLERANCE,
                      OptionalDouble.empty(),
                      OptionalDouble.empty())));
    } else {
      time =
          fields
              .required(obj, "", "time", "an object with end")
              .flatMap(n -> new TimeBinder(fields).bind(n, "time", historyEnd));
    }
    Optional<List<ProbeSpec>> probes =
        CaseFields.optional(obj, "probes").map(this::probes).orElse(Optional.of(List.of()));
    Optional<OptionalDouble> threshold = Optional.of(OptionalDouble.empty());
    Optional<CaseNode> thresholdNode = CaseFields.optional(obj, "threshold");
    if (thresholdNode.isPresent()) {
      OptionalDouble t =
          fields.positive(thresholdNode.get(), "threshold", "a positive concentration");
      threshold = t.isPresent() ? Optional.of(t) : Optional.empty();
    }
    // the relative error estimate above which a run warns (summary.json "accuracy")
    Optional<OptionalDouble> accuracy = Optional.of(OptionalDouble.empty());
    Optional<CaseNode> accuracyNode = CaseFields.optional(obj, "accuracy");
    if (accuracyNode.isPresent()) {
      OptionalDouble a =
          fields.positive(
              accuracyNode.get(), "accuracy", "a positive relative error, such as 0.01 for 1 %");
      accuracy = a.isPresent() ? Optional.of(a) : Optional.empty();
    }
    Optional<Quantities> quantities =
        new UnitsBinder(fields)
            .bind(
                CaseFields.optional(obj, "species"),
                CaseFields.optional(obj, "units"),
                materials,
                CaseFields.optional(obj, "materials"));
    Optional<List<ThresholdSpec>> thresholds = Optional.of(List.of());
    Optional<CaseNode> thresholdsNode = CaseFields.optional(obj, "thresholds");
    if (thresholdsNode.isPresent() && materials.isPresent() && probes.isPresent()) {
      thresholds =
          new ThresholdBinder(fields).bind(thresholdsNode.get(), materials.get(), probes.get());
    }
    OptionalDouble share = OptionalDouble.of(CaseSpec.DEFAULT_BREAKTHROUGH_SHARE);
    Optional<CaseNode> permeation = CaseFields.optional(obj, "permeation");
    if (permeation.isPresent()) {
      share = breakthroughShare(permeation.get());
    }
    if (mesh.isEmpty()
        || share.isEmpty()
        || quantities.isEmpty()
        || thresholds.isEmpty()
        || law.isEmpty()
        || !temperatureOk
        || exposure.isEmpty()
        || elements.isEmpty()
        || materials.isEmpty()
        || faces.isEmpty()
        || initial.isEmpty()
        || time.isEmpty()
        || probes.isEmpty()
        || threshold.isEmpty()
        || accuracy.isEmpty()) {
      return Optional.empty();
    }
    return Optional.of(
        new CaseSpec(
            caseFile,
            mesh.get(),
            elements.get(),
            materials.get(),
            faces.get(),
            initial.get(),
            time.get(),
            probes.get(),
            threshold.get(),
            PlaceIndex.of(root),
            law.get(),
            temperature,
            exposure.get(),
            quantities.get(),
            thresholds.get(),
            share.getAsDouble(),
            accuracy.get()));
  }

  /** {"breakthrough_share": s}: the share of the steady flux that marks breakthrough, 0 < s < 1. */
  private OptionalDouble breakthroughShare(CaseNode node) {
    String expected = "a share of the steady flux between 0 and 1 (e.g. 0.1)";
    Optional<CaseNode.Obj> obj =
        fields.object(node, "permeation", "an object with breakthrough_share");
    if (obj.isEmpty()) {
      return OptionalDouble.empty();
    }
    fields.onlyKeys(obj.get(), "permeation", Set.of("breakthrough_share"));
    Optional<CaseNode> v = CaseFields.optional(obj.get(), "breakthrough_share");
    if (v.isEmpty()) {
      return OptionalDouble.of(CaseSpec.DEFAULT_BREAKTHROUGH_SHARE);
    }
    String path = "permeation.breakthrough_share";
    OptionalDouble s = fields.positive(v.get(), path, expected);
    if (s.isPresent() && !(s.getAsDouble() < 1)) {
      fields.problems().found(v.get(), path, expected);
      return OptionalDouble.empty();
    }
    return s;
  }

  private Optional<Path> mesh(CaseNode node) {
    Optional<String> name = fields.text(node, "mesh", "the mesh file name (a string)");
    if (name.isEmpty()) {
      return Optional.empty();
    }
    try {
      Path folder = caseFile.toAbsolutePath().getParent();
      Path given = Path.of(name.get());
      return Optional.of(folder == null ? given : folder.resolve(given).normalize());
    } catch (InvalidPathException e) {
      String hint =
          e.getReason().contains("unmappable") || e.getReason().contains("Malformed")
              ? "; this system's locale cannot hold its characters: run under a UTF-8 locale"
                  + " (LC_ALL=C.UTF-8) or rename the file in plain ASCII"
              : "";
      fields.problems().found(node, "mesh", "a valid file path (" + e.getReason() + ")" + hint);
      return Optional.empty();
    }
  }

  private Optional<InitialSpec> initial(
      CaseNode node, Optional<Map<String, MaterialSpec>> materials) {
    String expected = "a concentration ≥ 0, or an object: volume group → concentration";
    if (node instanceof CaseNode.Num) {
      OptionalDouble c = fields.nonNegative(node, "initial", expected);
      return c.isPresent() ? Optional.of(InitialSpec.uniform(c.getAsDouble())) : Optional.empty();
    }
    Optional<CaseNode.Obj> obj = fields.object(node, "initial", expected);
    if (obj.isEmpty()) {
      return Optional.empty();
    }
    if (obj.get().members().containsKey("from")) {
      fields.onlyKeys(obj.get(), "initial", Set.of("from"));
      Optional<String> from =
          fields.text(
              obj.get().members().get("from").value(),
              "initial.from",
              "the result folder of an earlier run (a string)");
      if (from.isEmpty()) {
        return Optional.empty();
      }
      Path folder = caseFile.toAbsolutePath().getParent();
      Path given = Path.of(from.get());
      return Optional.of(
          InitialSpec.fromResults(folder == null ? given : folder.resolve(given).normalize()));
    }
    Map<String, Double> values = new LinkedHashMap<>();
    boolean ok = true;
    for (CaseNode.Member m : obj.get().members().values()) {
      String path = CasePaths.child("initial", m.key());
      OptionalDouble c = fields.nonNegative(m.value(), path, "a concentration ≥ 0");
      ok &= c.isPresent();
      c.ifPresent(v -> values.put(m.key(), v));
      if (materials.isPresent() && !materials.get().containsKey(m.key())) {
        fields
            .problems()
            .add(
                m.keyLine(),
                m.keyColumn(),
                path,
                "found a volume group with no material, expected one of "
                    + String.join(", ", materials.get().keySet()));
        ok = false;
      }
    }
    if (materials.isPresent()) {
      List<String> missing = new ArrayList<>();
      for (String group : materials.get().keySet()) {
        if (!obj.get().members().containsKey(group)) {
          missing.add(group);
        }
      }
      if (!missing.isEmpty()) {
        fields
            .problems()
            .add(
                node,
                "initial",
                "found no value for volume group(s) "
                    + String.join(", ", missing)
                    + ", expected a value for every material");
        ok = false;
      }
    }
    if (obj.get().members().isEmpty() && materials.isEmpty()) {
      fields.problems().found(node, "initial", expected);
      ok = false;
    }
    return ok ? Optional.of(new InitialSpec(OptionalDouble.empty(), values)) : Optional.empty();
  }

  /** {@code [x, y, z]}, or {@code {"at": [x, y, z], "part": NAME}} for a point where parts meet. */
  private Optional<ProbeSpec> probe(String name, CaseNode node, String path) {
    String point = "a point [x, y, z] in metres";
    if (!(node instanceof CaseNode.Obj o)) {
      return fields
          .numbers(node, path, 3, point + ", or {\"at\": [x, y, z], \"part\": NAME}")
          .map(xyz -> new ProbeSpec(name, xyz[0], xyz[1], xyz[2]));
    }
    fields.onlyKeys(o, path, java.util.Set.of("at", "part"));
    Optional<double[]> at =
        fields
            .required(o, path, "at", point)
            .flatMap(n -> fields.numbers(n, CasePaths.child(path, "at"), 3, point));
    Optional<String> part =
        CaseFields.optional(o, "part")
            .flatMap(n -> fields.text(n, CasePaths.child(path, "part"), "a part's name"));
    boolean partOk = !o.members().containsKey("part") || part.isPresent();
    return at.isPresent() && partOk
        ? Optional.of(new ProbeSpec(name, at.get()[0], at.get()[1], at.get()[2], part))
        : Optional.empty();
  }

  private Optional<List<ProbeSpec>> probes(CaseNode node) {
    Optional<CaseNode.Obj> obj = fields.object(node, "probes", "an object: name → [x, y, z]");
    if (obj.isEmpty()) {
      return Optional.empty();
    }
    List<ProbeSpec> out = new ArrayList<>();
    boolean ok = true;
    for (CaseNode.Member m : obj.get().members().values()) {
      String path = CasePaths.child("probes", m.key());
      Optional<ProbeSpec> p = probe(m.key(), m.value(), path);
      ok &= p.isPresent();
      p.ifPresent(out::add);
    }
    return ok ? Optional.of(out) : Optional.empty();
  }
}
