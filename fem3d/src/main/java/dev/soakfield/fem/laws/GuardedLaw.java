package dev.soakfield.fem.laws;

import dev.soakfield.law.api.LawParameters;
import dev.soakfield.law.api.LawPoint;
import dev.soakfield.law.api.RateSink;
import dev.soakfield.law.api.SourceLaw;
import dev.soakfield.law.api.StateView;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Objects;

/**
 * The solver's handle on one material's law: the same calls as {@link SourceLaw}, each given the
 * simulated time, and each checked, so that a law that throws or answers NaN or infinity stops the
 * run with a {@link SourceLawException} naming the law, its origin, the material and the time. Safe
 * to call from several threads when the law is (the SPI requires it).
 */
public final class GuardedLaw {
  private final SourceLaw law;
  private final String lawId;
  private final String origin;
  private final String material;
  private final List<String> stateNames;

  /**
   * Wraps {@code law}, created by {@code entry}'s provider, for {@code material}.
   *
   * @throws SourceLawException when the law's state names cannot be had or are not distinct
   */
  public GuardedLaw(LawEntry entry, String material, SourceLaw law) {
    this.law = Objects.requireNonNull(law, "law");
    this.lawId = entry.id();
    this.origin = entry.describe();
    this.material = Objects.requireNonNull(material, "material");
    List<String> names;
    try {
      names = List.copyOf(law.stateNames());
    } catch (RuntimeException | LinkageError e) {
      throw fault(Double.NaN, "stateNames() " + threw(e), e);
    }
    if (new HashSet<>(names).size() != names.size()) {
      throw fault(Double.NaN, "stateNames() gave " + names + ", expected distinct names", null);
    }
    this.stateNames = names;
  }

  /**
   * Creates {@code entry}'s law from checked {@code values} and wraps it.
   *
   * @throws IllegalArgumentException when the provider rejects the values as inconsistent (a user's
   *     mistake: the message says why; report it at the material's source)
   * @throws SourceLawException when the provider fails otherwise
   */
  public static GuardedLaw create(LawEntry entry, LawParameters values, String material) {
    SourceLaw law;
    try {
      law = entry.provider().create(values);
    } catch (IllegalArgumentException e) {
      throw e;
    } catch (RuntimeException | LinkageError e) {
      throw new SourceLawException(
          entry.id(), entry.describe(), material, Double.NaN, "create() " + threw(e), e);
    }
    if (law == null) {
      throw new SourceLawException(
          entry.id(), entry.describe(), material, Double.NaN, "create() gave null", null);
    }
    return new GuardedLaw(entry, material, law);
  }

  /** The law itself, for a solver that checks its answers on its own. */
  public SourceLaw law() {
    return law;
  }

  public String lawId() {
    return lawId;
  }

  public String material() {
    return material;
  }

  /** Names of the state variables per node; empty for a stateless law. */
  public List<String> stateNames() {
    return stateNames;
  }

  /** Number of state variables per node. */
  public int stateSize() {
    return stateNames.size();
  }

  /** The state at a node at the start of the run ({@code time}: the run's start, s). */
  public void initialState(double concentration, double temperature, double time, double[] state) {
    try {
      law.initialState(concentration, temperature, state);
    } catch (RuntimeException | LinkageError e) {
      throw fault(time, "initialState " + at(concentration, temperature) + " " + threw(e), e);
    }
    checkState(state, time, "initialState " + at(concentration, temperature));
  }

  /** π and ∂π/∂c at the end of the step; forwards them to {@code out} once checked. */
  public void rate(LawPoint at, StateView start, RateSink out) {
    CheckedSink sink = new CheckedSink();
    try {
      law.rate(at, start, sink);
    } catch (RuntimeException | LinkageError e) {
      throw fault(at.time(), "rate " + at(at) + " " + threw(e), e);
    }
    if (!sink.called) {
      throw fault(
          at.time(), "rate " + at(at) + " gave no answer (never called RateSink.set)", null);
    }
    if (!Double.isFinite(sink.rate) || !Double.isFinite(sink.derivative)) {
      throw fault(
          at.time(),
          "rate "
              + at(at)
              + " gave π = "
              + sink.rate
              + ", ∂π/∂c = "
              + sink.derivative
              + ", expected finite numbers",
          null);
    }
    out.set(sink.rate, sink.derivative);
  }

  /** The state at the end of an accepted step. */
  public void advance(LawPoint at, StateView start, double[] end) {
    try {
      law.advance(at, start, end);
    } catch (RuntimeException | LinkageError e) {
      throw fault(at.time(), "advance " + at(at) + " " + threw(e), e);
    }
    checkState(end, at.time(), "advance " + at(at));
  }

  /** The amount per m³ the state holds ({@code time}: when, for messages). */
  public double trappedAmount(StateView state, double temperature, double time) {
    double trapped;
    try {
      trapped = law.trappedAmount(state, temperature);
    } catch (RuntimeException | LinkageError e) {
      throw fault(time, "trappedAmount at T = " + temperature + " K " + threw(e), e);
    }
    if (!Double.isFinite(trapped)) {
      throw fault(time, "trappedAmount gave " + trapped + ", expected a finite number", null);
    }
    return trapped;
  }

  private void checkState(double[] state, double time, String call) {
    for (int k = 0; k < stateNames.size(); k++) {
      if (!Double.isFinite(state[k])) {
        throw fault(
            time,
            call + " gave " + stateNames.get(k) + " = " + state[k] + ", expected a finite number",
            null);
      }
    }
  }

  private SourceLawException fault(double time, String what, Throwable cause) {
    return new SourceLawException(lawId, origin, material, time, what, cause);
  }

  private static String at(LawPoint p) {
    return at(p.concentration(), p.temperature());
  }

  private static String at(double c, double t) {
    return String.format(Locale.ROOT, "at c = %.6g, T = %.6g K", c, t);
  }

  /** "threw X: message (at Class.method(File.java:12))": the law's own frame, no full trace. */
  static String threw(Throwable e) {
    StackTraceElement[] trace = e.getStackTrace();
    return "threw " + e + (trace.length > 0 ? " (at " + trace[0] + ")" : "");
  }

  /** Holds one answer of the law until it is checked. */
  private static final class CheckedSink implements RateSink {
    boolean called;
    double rate;
    double derivative;

    @Override
    public void set(double rate, double derivative) {
      this.called = true;
      this.rate = rate;
      this.derivative = derivative;
    }
  }
}
