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
}
