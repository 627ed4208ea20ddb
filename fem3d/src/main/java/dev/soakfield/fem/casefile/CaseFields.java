package dev.soakfield.fem.casefile;

import dev.soakfield.fem.units.SiValue;
import dev.soakfield.fem.units.UnitException;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.function.Function;

/**
 * Typed reads of case-file values. A read that fails records a problem and returns empty, so the
 * caller can go on and report independent problems too; callers throw once at the end.
 */
final class CaseFields {
  private final ProblemList problems;

  CaseFields(ProblemList problems) {
    this.problems = problems;
  }

  ProblemList problems() {
    return problems;
  }

  Optional<CaseNode.Obj> object(CaseNode node, String path, String expected) {
    if (node instanceof CaseNode.Obj obj) {
      return Optional.of(obj);
    }
    problems.found(node, path, expected);
    return Optional.empty();
  }

  /**
   * Reports every key of {@code obj} outside {@code allowed}, with a close match if there is one.
   */
  void onlyKeys(CaseNode.Obj obj, String path, Set<String> allowed) {
    for (CaseNode.Member m : obj.members().values()) {
      if (!allowed.contains(m.key())) {
        Optional<String> guess = NameSuggestion.likely(m.key(), allowed);
        guess.ifPresent(g -> problems.suggested(CasePaths.child(path, g)));
        String message =
            guess.isPresent()
                ? "unknown key; did you mean '" + guess.get() + "'?"
                : "unknown key; expected one of " + String.join(", ", sortedNames(allowed));
        problems.add(m.keyLine(), m.keyColumn(), CasePaths.child(path, m.key()), message);
      }
    }
  }

  private static List<String> sortedNames(Set<String> names) {
    List<String> list = new ArrayList<>(names);
    list.sort(null);
    return list;
  }

  /** The value of {@code key}, or a "missing" problem at the object. */
  Optional<CaseNode> required(CaseNode.Obj obj, String path, String key, String expected) {
    CaseNode.Member m = obj.members().get(key);
    if (m == null) {
      problems.missing(obj, CasePaths.child(path, key), expected);
      return Optional.empty();
    }
    return Optional.of(m.value());
  }

  static Optional<CaseNode> optional(CaseNode.Obj obj, String key) {
    CaseNode.Member m = obj.members().get(key);
    return m == null ? Optional.empty() : Optional.of(m.value());
  }

  OptionalDouble number(CaseNode node, String path, String expected) {
    if (node instanceof CaseNode.Num num && Double.isFinite(num.value())) {
      return OptionalDouble.of(num.value());
    }
    problems.found(node, path, expected);
    return OptionalDouble.empty();
  }

  /**
   * A number in SI, or a string with a unit ("168 h", "85 degC") converted to {@code siUnit}; a
   * wrong or unknown unit is a problem that names both.
   */
  OptionalDouble quantity(CaseNode node, String path, String siUnit, String expected) {
    if (node instanceof CaseNode.Text t) {
      try {
        double v = SiValue.parse(t.value(), siUnit);
        if (Double.isFinite(v)) {
          return OptionalDouble.of(v);
        }
      } catch (UnitException e) {
        problems.found(
            node,
            path,
            expected
                + " (a number in "
                + siUnit
                + " or a value with a unit"
                + " of the same kind: "
                + e.expected()
                + ")");
        return OptionalDouble.empty();
      }
    }
    return number(node, path, expected);
  }

  /** A positive {@link #quantity}. */
  OptionalDouble positiveQuantity(CaseNode node, String path, String siUnit, String expected) {
    OptionalDouble v = quantity(node, path, siUnit, expected);
    if (v.isPresent() && !(v.getAsDouble() > 0)) {
      problems.found(node, path, expected);
      return OptionalDouble.empty();
    }
    return v;
  }

  /** A non-negative {@link #quantity}. */
  OptionalDouble nonNegativeQuantity(CaseNode node, String path, String siUnit, String expected) {
    OptionalDouble v = quantity(node, path, siUnit, expected);
    if (v.isPresent() && v.getAsDouble() < 0) {
      problems.found(node, path, expected);
      return OptionalDouble.empty();
    }
    return v;
  }

  OptionalDouble positive(CaseNode node, String path, String expected) {
    OptionalDouble v = number(node, path, expected);
    if (v.isPresent() && !(v.getAsDouble() > 0)) {
      problems.found(node, path, expected);
      return OptionalDouble.empty();
    }
    return v;
  }

  OptionalDouble nonNegative(CaseNode node, String path, String expected) {
    OptionalDouble v = number(node, path, expected);
    if (v.isPresent() && v.getAsDouble() < 0) {
      problems.found(node, path, expected);
      return OptionalDouble.empty();
    }
    return v;
  }

  Optional<String> text(CaseNode node, String path, String expected) {
    if (node instanceof CaseNode.Text t && !t.value().isBlank()) {
      return Optional.of(t.value());
    }
    problems.found(node, path, expected);
    return Optional.empty();
  }

  /** One of a fixed set of words (an enum constant), with a suggestion when misspelt. */
  <E> Optional<E> word(CaseNode node, String path, E[] choices, Function<E, String> spelling) {
    List<String> words = new ArrayList<>();
    for (E e : choices) {
      words.add(spelling.apply(e));
    }
    String expected = "one of " + String.join(", ", words);
    if (!(node instanceof CaseNode.Text t)) {
      problems.found(node, path, expected);
      return Optional.empty();
    }
    for (E e : choices) {
      if (spelling.apply(e).equals(t.value())) {
        return Optional.of(e);
      }
    }
    Optional<String> guess = NameSuggestion.likely(t.value(), words);
    problems.found(
        node, path, expected + guess.map(g -> " (did you mean '" + g + "'?)").orElse(""));
    return Optional.empty();
  }

  /** Exactly {@code n} finite numbers: an array such as [x, y, z]. */
  Optional<double[]> numbers(CaseNode node, String path, int n, String expected) {
    return numbers(node, path, n, expected, new String[0]);
  }

  /** Exactly {@code n} values, item i a {@link #quantity} in {@code units[i]} when given. */
  Optional<double[]> numbers(CaseNode node, String path, int n, String expected, String[] units) {
    if (!(node instanceof CaseNode.Arr arr) || arr.items().size() != n) {
      problems.found(node, path, expected);
      return Optional.empty();
    }
    double[] out = new double[n];
    boolean ok = true;
    for (int i = 0; i < n; i++) {
      OptionalDouble v =
          i < units.length
              ? quantity(arr.items().get(i), CasePaths.item(path, i), units[i], "a finite number")
              : number(arr.items().get(i), CasePaths.item(path, i), "a finite number");
      ok &= v.isPresent();
      out[i] = v.orElse(0);
    }
    return ok ? Optional.of(out) : Optional.empty();
  }

  /**
   * A number (constant) or a time table [[t, v], ...] with strictly increasing t.
   *
   * @param minimum smallest value accepted, or -infinity
   */
  Optional<TimeTable> table(CaseNode node, String path, double minimum, String what) {
    return table(node, path, minimum, what, "");
  }

  /**
   * A {@link #table} whose values may carry units of {@code siUnit} (times always may, in s); an
   * empty unit means plain numbers.
   */
  Optional<TimeTable> table(
      CaseNode node, String path, double minimum, String what, String siUnit) {
    String bound = minimum == Double.NEGATIVE_INFINITY ? "" : " ≥ " + minimum;
    String expected = what + bound + " or a time table [[t, value], ...]";
    if (node instanceof CaseNode.Num || (node instanceof CaseNode.Text && !siUnit.isEmpty())) {
      OptionalDouble v =
          siUnit.isEmpty() ? number(node, path, expected) : quantity(node, path, siUnit, expected);
      if (v.isPresent() && v.getAsDouble() < minimum) {
        problems.found(node, path, expected);
        return Optional.empty();
      }
      return v.isPresent() ? Optional.of(TimeTable.constant(v.getAsDouble())) : Optional.empty();
    }
    if (!(node instanceof CaseNode.Arr arr) || arr.items().isEmpty()) {
      problems.found(node, path, expected);
      return Optional.empty();
    }
    int n = arr.items().size();
    double[] t = new double[n];
    double[] v = new double[n];
    boolean ok = true;
    for (int i = 0; i < n; i++) {
      String rowPath = CasePaths.item(path, i);
      Optional<double[]> row =
          numbers(
              arr.items().get(i),
              rowPath,
              2,
              "a row [t, value]",
              siUnit.isEmpty() ? new String[] {"s"} : new String[] {"s", siUnit});
      if (row.isEmpty()) {
        ok = false;
        continue;
      }
      t[i] = row.get()[0];
      v[i] = row.get()[1];
      CaseNode.Arr rowNode = (CaseNode.Arr) arr.items().get(i);
      if (v[i] < minimum) {
        problems.found(rowNode.items().get(1), CasePaths.item(rowPath, 1), what + bound);
        ok = false;
      }
      if (i > 0 && ok && !(t[i] > t[i - 1])) {
        problems.found(
            rowNode.items().get(0),
            CasePaths.item(rowPath, 0),
            "a time greater than the previous row's " + CaseFields.plain(t[i - 1]));
        ok = false;
      }
    }
    return ok ? Optional.of(TimeTable.of(t, v)) : Optional.empty();
  }

  /** A number as users write it: 3600 rather than 3600.0. */
  static String plain(double x) {
    if (x == Math.rint(x) && Math.abs(x) < 1e15) {
      return Long.toString((long) x);
    }
    return Double.toString(x);
  }
}
