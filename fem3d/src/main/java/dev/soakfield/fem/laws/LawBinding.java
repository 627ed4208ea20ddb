package dev.soakfield.fem.laws;

import dev.soakfield.fem.casefile.NameSuggestion;
import dev.soakfield.fem.units.SiValue;
import dev.soakfield.fem.units.UnitException;
import dev.soakfield.law.api.LawParameter;
import dev.soakfield.law.api.LawParameters;
import dev.soakfield.law.api.ParameterBinder;
import dev.soakfield.law.api.SourceLawProvider;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * Checks the parameters a case gives a law against the provider's declaration: every required key
 * present, no unknown key (with the closest declared name when it is a likely typo), every value a
 * number in the declared unit (or text with a unit, converted) inside the declared range. Defaults
 * fill the keys the case omits.
 */
public final class LawBinding {
  /** The key of a case's source object that names the law; never a parameter. */
  public static final String LAW_KEY = ParameterBinder.LAW_KEY;

  private LawBinding() {}

  /**
   * One thing wrong with the parameters.
   *
   * @param key the parameter key as the case spells it
   * @param found what the case gave ("nothing" when a required key is missing)
   * @param expected what the declaration wants
   */
  public record Problem(String key, String found, String expected) {
    public Problem {
      Objects.requireNonNull(key, "key");
      Objects.requireNonNull(found, "found");
      Objects.requireNonNull(expected, "expected");
    }

    /** "found X, expected Y", for a message placed at the key. */
    public String message() {
      return "found " + found + ", expected " + expected;
    }
  }

  /**
   * The checked values, or what is wrong with them.
   *
   * @param parameters the values when there are no problems
   * @param problems every problem, in the order of the declaration, then unknown keys
   */
  public record Result(Optional<LawParameters> parameters, List<Problem> problems) {
    public Result {
      problems = List.copyOf(problems);
      if (parameters.isPresent() != problems.isEmpty()) {
        throw new IllegalArgumentException("either parameters or problems");
      }
    }
  }

  /**
   * Checks {@code given} (key to Double in the declared SI unit, or to String such as "40 kJ/mol")
   * against {@code provider}'s parameters. The key {@value #LAW_KEY} is ignored.
   */
  public static Result bind(SourceLawProvider provider, Map<String, Object> given) {
    return bind(provider.id(), provider.parameters(), given);
  }

  /** As {@link #bind(SourceLawProvider, Map)}, for a face law. */
  public static Result bind(
      dev.soakfield.law.api.FaceLawProvider provider, Map<String, Object> given) {
    return bind(provider.id(), provider.parameters(), given);
  }

  private static Result bind(String id, List<LawParameter> parameters, Map<String, Object> given) {
    List<Problem> problems = new ArrayList<>();
    Map<String, Double> values = new LinkedHashMap<>();
    Map<String, LawParameter> declared = new LinkedHashMap<>();
    for (LawParameter p : parameters) {
      declared.put(p.name(), p);
    }
    for (LawParameter p : declared.values()) {
      Object value = given.get(p.name());
      if (value == null) {
        if (p.isRequired()) {
          problems.add(new Problem(p.name(), "nothing", "a value in " + p.unit() + " (required)"));
        } else {
          values.put(p.name(), p.defaultValue());
        }
        continue;
      }
      number(p, value, problems).ifPresent(v -> values.put(p.name(), v));
    }
    for (String key : given.keySet()) {
      if (!key.equals(LAW_KEY) && !declared.containsKey(key)) {
        Optional<String> near = NameSuggestion.likely(key, declared.keySet());
        problems.add(
            new Problem(
                key,
                "an unknown parameter of law '" + id + "'",
                near.map(n -> "'" + n + "' (did you mean it?)")
                    .orElse(
                        declared.isEmpty()
                            ? "no parameters"
                            : "one of " + String.join(", ", declared.keySet()))));
      }
    }
    if (!problems.isEmpty()) {
      return new Result(Optional.empty(), problems);
    }
    return new Result(Optional.of(new CheckedParameters(id, values)), List.of());
  }

  private static Optional<Double> number(LawParameter p, Object value, List<Problem> problems) {
    double v;
    if (value instanceof Number n) {
      v = n.doubleValue();
    } else if (value instanceof String text) {
      try {
        v = SiValue.parse(text, p.unit());
      } catch (UnitException e) {
        problems.add(new Problem(p.name(), e.found(), e.expected()));
        return Optional.empty();
      }
    } else {
      problems.add(
          new Problem(
              p.name(),
              value.getClass().getSimpleName().toLowerCase(Locale.ROOT),
              "a number in " + p.unit() + " or text such as \"1.5 " + p.unit() + "\""));
      return Optional.empty();
    }
    if (!Double.isFinite(v) || v < p.minimum() || v > p.maximum()) {
      problems.add(new Problem(p.name(), format(v) + " " + p.unit(), range(p)));
      return Optional.empty();
    }
    return Optional.of(v);
  }

  /** The declared range as a listing shows it: "≥ 0 J/mol", "0 to 1 1". */
  public static String range(LawParameter p) {
    boolean low = p.minimum() > Double.NEGATIVE_INFINITY && p.minimum() > -Double.MAX_VALUE;
    boolean high = p.maximum() < Double.POSITIVE_INFINITY && p.maximum() < Double.MAX_VALUE;
    String unit = " " + p.unit();
    if (low && high) {
      return "a finite value from " + format(p.minimum()) + " to " + format(p.maximum()) + unit;
    }
    if (low) {
      return (p.minimum() > 0 && p.minimum() < 1e-200
              ? "a finite value > 0"
              : "a finite value ≥ " + format(p.minimum()))
          + unit;
    }
    if (high) {
      return "a finite value ≤ " + format(p.maximum()) + unit;
    }
    return "a finite value in" + unit;
  }

  /** A number as short as it reads well: 0, 1.5, 6e+04, 1e-12. */
  public static String format(double v) {
    if (v == Math.rint(v) && Math.abs(v) < 1e6) {
      return Long.toString((long) v);
    }
    return String.format(Locale.ROOT, "%.6g", v)
        .replaceAll("(\\.\\d*?)0+(e|$)", "$1$2")
        .replaceAll("\\.(e|$)", "$1");
  }

  /** Values by name; asking for an undeclared name is the law's bug, said as such. */
  private static final class CheckedParameters implements LawParameters {
    private final String lawId;
    private final Map<String, Double> values;

    CheckedParameters(String lawId, Map<String, Double> values) {
      this.lawId = lawId;
      this.values = new HashMap<>(values);
    }

    @Override
    public double get(String name) {
      Double v = values.get(name);
      if (v == null) {
        throw new IllegalArgumentException(
            "law '" + lawId + "' asked for parameter '" + name + "', which it does not declare");
      }
      return v;
    }

    @Override
    public String toString() {
      return values.toString();
    }
  }
}
