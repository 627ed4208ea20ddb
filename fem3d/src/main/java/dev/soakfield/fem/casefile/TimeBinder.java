package dev.soakfield.fem.casefile;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;

/** Reads {@code time}: end, output times, scheme, capacity and step control. */
final class TimeBinder {
  /**
   * The most fixed steps a case may ask for: 10⁷ steps write a series of about a gigabyte and
   * mostly mean a unit slip (a step in s meant in h), not a wish.
   */
  private static final Set<String> KEYS =
      Set.of(
          "end",
          "outputs",
          "scheme",
          "capacity",
          "tolerance",
          "step",
          "initial_step",
          "max_step",
          "stop",
          "balance_limit",
          "max_steps");

  private static final String SECONDS = "a positive duration (seconds, or with a unit: \"168 h\")";

  private final CaseFields fields;

  TimeBinder(CaseFields fields) {
    this.fields = fields;
  }

  /**
   * @param historyEnd the end of the exposure history, the default end time when present
   */
  @SuppressWarnings("OptionalMapToOptional") // empty: a problem; inner empty: no such key
  Optional<TimeSpec> bind(CaseNode node, String path, OptionalDouble historyEnd) {
    Optional<CaseNode.Obj> found = fields.object(node, path, "an object with end");
    if (found.isEmpty()) {
      return Optional.empty();
    }
    CaseNode.Obj obj = found.get();
    fields.onlyKeys(obj, path, KEYS);
    String endPath = CasePaths.child(path, "end");
    OptionalDouble end;
    if (historyEnd.isPresent() && !obj.members().containsKey("end")) {
      end = historyEnd;
    } else {
      end =
          fields
              .required(obj, path, "end", SECONDS)
              .map(n -> fields.positiveQuantity(n, endPath, "s", SECONDS))
              .orElse(OptionalDouble.empty());
    }
    Optional<List<Double>> outputs = Optional.empty();
    if (end.isPresent()) {
      outputs =
          CaseFields.optional(obj, "outputs")
              .map(n -> outputs(n, CasePaths.child(path, "outputs"), end.getAsDouble()))
              .orElse(Optional.of(List.of(end.getAsDouble())));
    }
    Optional<TimeScheme> scheme =
        CaseFields.optional(obj, "scheme")
            .map(
                n ->
                    fields.word(
                        n, CasePaths.child(path, "scheme"), TimeScheme.values(), TimeScheme::word))
            .orElse(Optional.of(TimeScheme.BACKWARD_EULER));
    Optional<CapacityForm> capacity =
        CaseFields.optional(obj, "capacity")
            .map(
                n ->
                    fields.word(
                        n,
                        CasePaths.child(path, "capacity"),
                        CapacityForm.values(),
                        CapacityForm::word))
            .orElse(Optional.of(CapacityForm.CONSISTENT));
    Optional<StepControl> steps = steps(obj, path);
    Optional<Optional<StopSpec>> stop =
        CaseFields.optional(obj, "stop")
            .map(n -> stop(n, CasePaths.child(path, "stop")).map(Optional::of))
            .orElse(Optional.of(Optional.empty()));
    long maxSteps = TimeSpec.DEFAULT_MAX_STEPS;
    boolean maxStepsOk = true;
    Optional<CaseNode> maxNode = CaseFields.optional(obj, "max_steps");
    if (maxNode.isPresent()) {
      String maxPath = CasePaths.child(path, "max_steps");
      OptionalDouble m = fields.number(maxNode.get(), maxPath, "a whole number of steps ≥ 1");
      maxStepsOk =
          m.isPresent()
              && m.getAsDouble() >= 1
              && m.getAsDouble() <= 1e15
              && m.getAsDouble() == Math.rint(m.getAsDouble());
      if (m.isPresent() && !maxStepsOk) {
        fields.problems().found(maxNode.get(), maxPath, "a whole number of steps from 1 to 1e15");
      }
      maxSteps = maxStepsOk ? (long) m.getAsDouble() : maxSteps;
    }
    if (end.isPresent()
        && steps.isPresent()
        && steps.get() instanceof StepControl.Fixed fixed
        && !(end.getAsDouble() / fixed.step() <= maxSteps)) {
      fields
          .problems()
          .found(
              obj.members().get("step").value(),
              CasePaths.child(path, "step"),
              "a step giving at most "
                  + maxSteps
                  + " steps up to the end ("
                  + CaseFields.plain(end.getAsDouble())
                  + " s needs "
                  + String.format(java.util.Locale.ROOT, "%.3g", end.getAsDouble() / fixed.step())
                  + "); take a longer step or adaptive steps, or raise time.max_steps");
      steps = Optional.empty();
    }
    OptionalDouble limit = OptionalDouble.of(TimeSpec.DEFAULT_BALANCE_LIMIT);
    Optional<CaseNode> limitNode = CaseFields.optional(obj, "balance_limit");
    if (limitNode.isPresent()) {
      String limitPath = CasePaths.child(path, "balance_limit");
      limit = fields.number(limitNode.get(), limitPath, "a relative balance error in (0, 1]");
      if (limit.isPresent() && !(limit.getAsDouble() > 0 && limit.getAsDouble() <= 1)) {
        fields.problems().found(limitNode.get(), limitPath, "a relative balance error in (0, 1]");
        limit = OptionalDouble.empty();
      }
    }
    if (stop.isEmpty()
        || !maxStepsOk
        || limit.isEmpty()
        || end.isEmpty()
        || outputs.isEmpty()
        || scheme.isEmpty()
        || capacity.isEmpty()
        || steps.isEmpty()) {
      return Optional.empty();
    }
    return Optional.of(
        new TimeSpec(
            end.getAsDouble(),
            outputs.get(),
            scheme.get(),
            capacity.get(),
            steps.get(),
            stop.get(),
            limit.getAsDouble(),
            maxSteps));
  }

  private Optional<StopSpec> stop(CaseNode node, String path) {
    String expected = "an object {\"group\" or \"probe\": name, \"below\" or \"above\": level}";
    Optional<CaseNode.Obj> obj = fields.object(node, path, expected);
    if (obj.isEmpty()) {
      return Optional.empty();
    }
    fields.onlyKeys(obj.get(), path, Set.of("group", "probe", "below", "above"));
    var m = obj.get().members();
    if (m.containsKey("group") == m.containsKey("probe")
        || m.containsKey("below") == m.containsKey("above")) {
      fields.problems().found(node, path, expected);
      return Optional.empty();
    }
    String target = m.containsKey("group") ? "group" : "probe";
    String direction = m.containsKey("below") ? "below" : "above";
    Optional<String> name =
        fields.text(m.get(target).value(), CasePaths.child(path, target), "a name");
    OptionalDouble level =
        fields.number(
            m.get(direction).value(), CasePaths.child(path, direction), "a concentration level");
    if (name.isEmpty() || level.isEmpty()) {
      return Optional.empty();
    }
    return Optional.of(
        new StopSpec(target, name.get(), direction.equals("below"), level.getAsDouble()));
  }

  private Optional<List<Double>> outputs(CaseNode node, String path, double end) {
    String expected = "an array of increasing times in (0, " + CaseFields.plain(end) + "]";
    if (!(node instanceof CaseNode.Arr arr) || arr.items().isEmpty()) {
      fields.problems().found(node, path, expected);
      return Optional.empty();
    }
    List<Double> out = new ArrayList<>();
    double previous = 0;
    for (int i = 0; i < arr.items().size(); i++) {
      CaseNode item = arr.items().get(i);
      String itemPath = CasePaths.item(path, i);
      String bounds =
          "a time in (" + CaseFields.plain(previous) + ", " + CaseFields.plain(end) + "]";
      OptionalDouble t = fields.quantity(item, itemPath, "s", bounds);
      if (t.isEmpty()) {
        return Optional.empty();
      }
      if (!(t.getAsDouble() > previous) || t.getAsDouble() > end) {
        fields
            .problems()
            .found(
                item,
                itemPath,
                i == 0 ? bounds : bounds + " (output times must increase strictly)");
        return Optional.empty();
      }
      previous = t.getAsDouble();
      out.add(previous);
    }
    return Optional.of(out);
  }

  private Optional<StepControl> steps(CaseNode.Obj obj, String path) {
    Optional<CaseNode.Member> tolerance = Optional.ofNullable(obj.members().get("tolerance"));
    Optional<CaseNode.Member> step = Optional.ofNullable(obj.members().get("step"));
    Optional<CaseNode.Member> initial = Optional.ofNullable(obj.members().get("initial_step"));
    Optional<CaseNode.Member> max = Optional.ofNullable(obj.members().get("max_step"));
    if (tolerance.isPresent() && step.isPresent()) {
      CaseNode.Member first = tolerance.get();
      CaseNode.Member second = step.get();
      if (second.keyLine() < first.keyLine()
          || (second.keyLine() == first.keyLine() && second.keyColumn() < first.keyColumn())) {
        first = step.get();
        second = tolerance.get();
      }
      fields
          .problems()
          .add(
              second.keyLine(),
              second.keyColumn(),
              CasePaths.child(path, second.key()),
              "found both 'tolerance' and 'step' ('"
                  + first.key()
                  + "' on line "
                  + first.keyLine()
                  + "), expected one of them: tolerance for adaptive steps or step for fixed"
                  + " steps");
      return Optional.empty();
    }
    if (step.isPresent()) {
      boolean ok = true;
      for (Optional<CaseNode.Member> adaptiveOnly : List.of(initial, max)) {
        if (adaptiveOnly.isPresent()) {
          CaseNode.Member m = adaptiveOnly.get();
          fields
              .problems()
              .add(
                  m.keyLine(),
                  m.keyColumn(),
                  CasePaths.child(path, m.key()),
                  "found with fixed steps ('step'), expected only with adaptive steps"
                      + " ('tolerance')");
          ok = false;
        }
      }
      OptionalDouble length =
          fields.positiveQuantity(step.get().value(), CasePaths.child(path, "step"), "s", SECONDS);
      return ok && length.isPresent()
          ? Optional.of(new StepControl.Fixed(length.getAsDouble()))
          : Optional.empty();
    }
    OptionalDouble tol = OptionalDouble.of(StepControl.DEFAULT_TOLERANCE);
    if (tolerance.isPresent()) {
      tol =
          fields.positive(
              tolerance.get().value(), CasePaths.child(path, "tolerance"), "a positive number");
    }
    OptionalDouble first = seconds(initial, path);
    OptionalDouble largest = seconds(max, path);
    boolean ok = tol.isPresent() && (initial.isEmpty() || first.isPresent());
    ok &= max.isEmpty() || largest.isPresent();
    if (first.isPresent() && largest.isPresent() && first.getAsDouble() > largest.getAsDouble()) {
      fields
          .problems()
          .found(
              initial.get().value(),
              CasePaths.child(path, "initial_step"),
              "at most max_step (" + CaseFields.plain(largest.getAsDouble()) + ")");
      ok = false;
    }
    return ok
        ? Optional.of(new StepControl.Adaptive(tol.getAsDouble(), first, largest))
        : Optional.empty();
  }

  private OptionalDouble seconds(Optional<CaseNode.Member> member, String path) {
    if (member.isEmpty()) {
      return OptionalDouble.empty();
    }
    return fields.positiveQuantity(
        member.get().value(), CasePaths.child(path, member.get().key()), "s", SECONDS);
  }
}
