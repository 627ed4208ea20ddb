package dev.soakfield.law.testkit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import dev.soakfield.law.api.ParameterBinder;
import dev.soakfield.law.api.SourceLaw;
import dev.soakfield.law.api.SourceLawProvider;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.ServiceLoader;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;

/**
 * The checks every source law must pass, for plugin authors to extend: give the provider, the
 * parameters a case would give, and a few sample points; JUnit runs the checks below on them.
 *
 * <pre>{@code
 * class MyLawTest extends SourceLawContract {
 *   protected SourceLawProvider provider() { return new MyLawProvider(); }
 *   protected Map<String, Object> parameters() { return Map.of("max-rate", 1e-3); }
 *   protected List<Sample> samples() { return List.of(new Sample(0.5, 1.0, 300, 60)); }
 * }
 * }</pre>
 */
public abstract class SourceLawContract {
  /**
   * A point to check the law at.
   *
   * @param startConcentration the concentration the start-of-step state is in equilibrium with (the
   *     law's {@link SourceLaw#initialState}); differ it from {@code concentration} to check a step
   *     out of equilibrium
   * @param concentration the end-of-step concentration, greater than 0
   * @param temperature K
   * @param dt step length, s
   */
  public record Sample(
      double startConcentration, double concentration, double temperature, double dt) {}

  /** The provider under test. */
  protected abstract SourceLawProvider provider();

  /** Parameters as a case gives them (numbers in the declared SI units, or text with units). */
  protected abstract Map<String, Object> parameters();

  /** A few points spanning the law's working range; concentrations greater than 0. */
  protected abstract List<Sample> samples();

  /**
   * Relative tolerance of ∂π/∂c against central differences (step 1e-5·c); override for laws with
   * sharp features.
   */
  protected double derivativeTolerance() {
    return 1e-5;
  }

  /** The law made from {@link #parameters()}, failing the test with the binding's problems. */
  protected final SourceLaw law() {
    ParameterBinder.Binding r = ParameterBinder.find().bind(provider(), parameters());
    if (!r.problems().isEmpty()) {
      fail("parameters() do not bind: " + r.problems());
    }
    return provider().create(r.parameters().orElseThrow());
  }

  /** The state at the start of a sample's step. */
  protected final State startState(SourceLaw law, Sample s) {
    double[] state = new double[law.stateNames().size()];
    law.initialState(s.startConcentration(), s.temperature(), state);
    return new State(state);
  }

  private List<Sample> checkedSamples() {
    List<Sample> samples = samples();
    assertFalse(samples.isEmpty(), "samples() is empty");
    for (Sample s : samples) {
      assertTrue(s.concentration() > 0 && s.dt() > 0 && s.temperature() > 0, "sample " + s);
    }
    return samples;
  }

  private static At at(Sample s, double c) {
    return new At(c, s.temperature(), 1000 + s.dt(), s.dt());
  }

  @Test
  public void declarationsAreSane() {
    SourceLawProvider p = provider();
    ParameterBinder binder = ParameterBinder.find();
    Declarations.check(
        p.id(),
        p.description(),
        p.parameters(),
        binder,
        d -> assertFalse(d.unit().isBlank(), d.name() + ": unit (\"1\" for a pure number)"));
    assertTrue(binder.bind(p, parameters()).problems().isEmpty(), "parameters() bind");
  }

  @Test
  public void theServiceFileListsTheProvider() {
    String name = provider().getClass().getName();
    boolean listed =
        ServiceLoader.load(SourceLawProvider.class, provider().getClass().getClassLoader()).stream()
            .anyMatch(p -> p.type().getName().equals(name));
    assertTrue(listed, name + " is not in META-INF/services/" + SourceLawProvider.class.getName());
  }

  @Test
  public void derivativeMatchesCentralDifferences() {
    SourceLaw law = law();
    for (Sample s : checkedSamples()) {
      State start = startState(law, s);
      double c = s.concentration();
      double h = 1e-5 * c;
      Answer mid = Answer.of(law, at(s, c), start);
      double fd =
          (Answer.of(law, at(s, c + h), start).rate() - Answer.of(law, at(s, c - h), start).rate())
              / (2 * h);
      double scale = Math.abs(mid.derivative()) + Math.abs(fd) + Math.abs(mid.rate()) / c;
      assertEquals(
          fd,
          mid.derivative(),
          derivativeTolerance() * scale + Double.MIN_NORMAL,
          "∂π/∂c at " + s + " against (π(c+h) − π(c−h))/2h");
    }
  }

  @Test
  public void theStateUpdateKeepsTheBalance() {
    SourceLaw law = law();
    for (Sample s : checkedSamples()) {
      State start = startState(law, s);
      Answer a = Answer.of(law, at(s, s.concentration()), start);
      double[] end = new double[law.stateNames().size()];
      law.advance(at(s, s.concentration()), start, end);
      double held0 = law.trappedAmount(start, s.temperature());
      double held1 = law.trappedAmount(new State(end), s.temperature());
      if (law.stateNames().isEmpty()) {
        assertEquals(0.0, held1, "a stateless law holds nothing");
        continue;
      }
      double scale = Math.abs(held0) + Math.abs(held1) + Math.abs(a.rate() * s.dt());
      // what the state takes up is what the rate removed from the mobile amount over the step
      assertEquals(-a.rate() * s.dt(), held1 - held0, 1e-10 * scale + Double.MIN_NORMAL, "at " + s);
    }
  }

  @Test
  public void zeroConcentrationGivesFiniteAnswers() {
    SourceLaw law = law();
    for (Sample s : checkedSamples()) {
      double[] state = new double[law.stateNames().size()];
      law.initialState(0, s.temperature(), state);
      assertAllFinite(state, "initialState(0) at " + s);
      for (State start : List.of(new State(state), startState(law, s))) {
        Answer a = Answer.of(law, at(s, 0), start);
        assertTrue(
            Double.isFinite(a.rate()) && Double.isFinite(a.derivative()), "rate at c = 0: " + a);
        double[] end = new double[state.length];
        law.advance(at(s, 0), start, end);
        assertAllFinite(end, "advance to c = 0 at " + s);
        assertTrue(Double.isFinite(law.trappedAmount(new State(end), s.temperature())), "held");
      }
    }
  }

  @Test
  public void answersAreTheSameFromSeveralThreads() throws Exception {
    SourceLaw law = law();
    List<Sample> samples = checkedSamples();
    List<Answer> expected = new ArrayList<>();
    for (Sample s : samples) {
      expected.add(Answer.of(law, at(s, s.concentration()), startState(law, s)));
    }
    ExecutorService pool = Executors.newFixedThreadPool(4);
    try {
      List<Future<Integer>> work = new ArrayList<>();
      for (int t = 0; t < 4; t++) {
        int offset = t;
        work.add(
            pool.submit(
                () -> {
                  int mismatches = 0;
                  for (int i = 0; i < 2000; i++) {
                    int k = (i + offset) % samples.size();
                    Sample s = samples.get(k);
                    Answer a = Answer.of(law, at(s, s.concentration()), startState(law, s));
                    if (!a.equals(expected.get(k))) {
                      mismatches++;
                    }
                  }
                  return mismatches;
                }));
      }
      for (Future<Integer> f : work) {
        assertEquals(0, f.get(60, TimeUnit.SECONDS), "answers that differ between threads");
      }
    } finally {
      pool.shutdownNow();
    }
  }

  private static void assertAllFinite(double[] values, String what) {
    for (double v : values) {
      assertTrue(Double.isFinite(v), what + ": " + java.util.Arrays.toString(values));
    }
  }
}
