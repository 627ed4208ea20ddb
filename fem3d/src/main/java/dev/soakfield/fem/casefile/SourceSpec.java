package dev.soakfield.fem.casefile;

/**
 * The volume source term π of a material, as the case names it. Each kind keeps its parameters;
 * laws supplied by plugins will be a further kind here.
 */
public sealed interface SourceSpec {
  /** The kind as spelt in a case file. */
  String kind();

  /** No source. */
  record NoSource() implements SourceSpec {
    @Override
    public String kind() {
      return "none";
    }
  }

  /**
   * A constant volume source.
   *
   * @param rate amount per m³ per s; negative for a sink
   */
  record ConstantRate(double rate) implements SourceSpec {
    @Override
    public String kind() {
      return "constant";
    }
  }

  /**
   * A source proportional to the local concentration, π = k·c.
   *
   * @param rate k in 1/s; negative for a sink (trapping, consumption)
   */
  record FirstOrder(double rate) implements SourceSpec {
    @Override
    public String kind() {
      return "first-order";
    }
  }

  /**
   * A law from the source-law catalog (built in or a plugin), named by its id, with its parameters
   * as the case gives them.
   *
   * @param id the law's id
   * @param name what the case calls this instance ({@code "name": "dislocations"}); the id when the
   *     case names none, with "-2", "-3" … for further unnamed instances of one law in a material
   * @param reversible whether what this instance traps counts as diffusible ({@code "reversible":
   *     false} marks deep traps whose hydrogen stays at room temperature)
   * @param parameters parameter name → a number (SI) or a string with a unit, in file order
   * @param path the key path of this source in the case file, for messages
   * @param line line of the source object, 0 when unknown
   * @param column column of the source object, 0 when unknown
   */
  record LawSource(
      String id,
      String name,
      boolean reversible,
      java.util.Map<String, Object> parameters,
      String path,
      int line,
      int column)
      implements SourceSpec {
    public LawSource {
      java.util.Objects.requireNonNull(id, "id");
      java.util.Objects.requireNonNull(name, "name");
      parameters = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(parameters));
      java.util.Objects.requireNonNull(path, "path");
    }

    /** An instance named by its id, reversible. */
    public LawSource(
        String id, java.util.Map<String, Object> parameters, String path, int line, int column) {
      this(id, id, true, parameters, path, line, column);
    }

    /** The same instance under another name. */
    public LawSource named(String newName) {
      return new LawSource(id, newName, reversible, parameters, path, line, column);
    }

    @Override
    public String kind() {
      return "law";
    }
  }
}
