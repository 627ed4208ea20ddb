package dev.soakfield.law.api;

import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.ServiceLoader;

/**
 * The solver's side of parameter checking, for tools that check a law outside a run (the law test
 * kit): it turns parameters as a case gives them — numbers in the declared SI unit, or text with a
 * unit such as "40 kJ/mol" — into checked {@link LawParameters}, exactly as a run would. Laws never
 * call it; the solver provides one implementation, found with {@link #find()}.
 */
public interface ParameterBinder {
  /** The key of a case's source object that names the law; never a parameter. */
  String LAW_KEY = "law";

  /**
   * The checked values, or every problem with them.
   *
   * @param parameters present exactly when {@code problems} is empty
   * @param problems one "key: found …, expected …" line each
   */
  record Binding(Optional<LawParameters> parameters, List<String> problems) {
    public Binding {
      Objects.requireNonNull(parameters, "parameters");
      problems = List.copyOf(problems);
      if (parameters.isPresent() != problems.isEmpty()) {
        throw new IllegalArgumentException("either parameters or problems");
      }
    }
  }

  /** Checks {@code given} against {@code provider}'s declarations; the key "law" is ignored. */
  Binding bind(SourceLawProvider provider, Map<String, Object> given);

  /**
   * Checks {@code given} against a face law's declarations, as {@link #bind(SourceLawProvider,
   * Map)} does for source laws; the key "law" is ignored.
   *
   * @throws UnsupportedOperationException from a binder that checks source laws only
   */
  default Binding bind(FaceLawProvider provider, Map<String, Object> given) {
    throw new UnsupportedOperationException(
        getClass().getName() + " checks source laws only, not face law '" + provider.id() + "'");
  }

  /**
   * A value written with a unit ("60 kJ/mol", or a bare number meaning {@code unit} itself) in
   * {@code unit}.
   *
   * @throws IllegalArgumentException when the text does not parse or its unit has another dimension
   */
  double inUnit(String text, String unit);

  /**
   * The binder on the class path (the solver's).
   *
   * @throws IllegalStateException when none is there, naming what to add
   */
  static ParameterBinder find() {
    return ServiceLoader.load(ParameterBinder.class, ParameterBinder.class.getClassLoader())
        .findFirst()
        .orElseThrow(
            () ->
                new IllegalStateException(
                    "no "
                        + ParameterBinder.class.getName()
                        + " on the class path: put Soakfield's solver (fem3d) on the test class"
                        + " path"));
  }
}
