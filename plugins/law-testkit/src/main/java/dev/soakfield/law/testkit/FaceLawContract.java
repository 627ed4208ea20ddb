package dev.soakfield.law.testkit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import dev.soakfield.law.api.FaceLaw;
import dev.soakfield.law.api.FaceLawProvider;
import dev.soakfield.law.api.FacePoint;
import dev.soakfield.law.api.ParameterBinder;
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
 * The checks every face law must pass, for plugin authors to extend beside {@link
 * SourceLawContract}: give the provider, the parameters a case would give, and a few sample points.
 *
 * <pre>{@code
 * class MyFaceLawTest extends FaceLawContract {
 *   protected FaceLawProvider provider() { return new MyFaceLawProvider(); }
 *   protected Map<String, Object> parameters() { return Map.of("rate", 1e-3); }
 *   protected List<Sample> samples() { return List.of(new Sample(0.5, 300, 1e5)); }
 * }
 * }</pre>
 */
public abstract class FaceLawContract {
  /**
   * A point to check the law at.
   *
   * @param concentration the concentration just inside the face, greater than 0
   * @param temperature K
   * @param pressure the gas fugacity outside, Pa
   */
  public record Sample(double concentration, double temperature, double pressure) {}

  /** The provider under test. */
  protected abstract FaceLawProvider provider();

  /** Parameters as a case gives them (numbers in the declared SI units, or text with units). */
  protected abstract Map<String, Object> parameters();

  /** A few points spanning the law's working range; concentrations greater than 0. */
  protected abstract List<Sample> samples();

  /** Relative tolerance of ∂J/∂c against central differences (step 1e-5·c). */
  protected double derivativeTolerance() {
    return 1e-5;
  }

  /** The law made from {@link #parameters()}, failing the test with the binding's problems. */
  protected final FaceLaw law() {
    ParameterBinder.Binding r = ParameterBinder.find().bind(provider(), parameters());
    if (!r.problems().isEmpty()) {
      fail("parameters() do not bind: " + r.problems());
    }
    return provider().create(r.parameters().orElseThrow());
  }

  /** The law's flux and derivative at c, T, p: {flux, derivative}. */
  protected static double[] answer(FaceLaw law, double c, double temperature, double pressure) {
    double[] out = {Double.NaN, Double.NaN};
    int[] calls = {0};
    law.flux(
        new FacePoint() {
          @Override
          public double concentration() {
            return c;
          }

          @Override
          public double temperature() {
            return temperature;
          }

          @Override
          public double time() {
            return 1000;
          }

          @Override
          public double pressure() {
            return pressure;
          }
        },
        (flux, derivative) -> {
          out[0] = flux;
          out[1] = derivative;
          calls[0]++;
        });
    assertEquals(1, calls[0], "the law must answer exactly once per call");
    return out;
  }

  private List<Sample> checkedSamples() {
    List<Sample> samples = samples();
    assertFalse(samples.isEmpty(), "samples() is empty");
    for (Sample s : samples) {
      assertTrue(s.concentration() > 0 && s.temperature() > 0 && s.pressure() >= 0, "" + s);
    }
    return samples;
  }

  @Test
  public void declarationsAreSane() {
    FaceLawProvider p = provider();
    ParameterBinder binder = ParameterBinder.find();
    Declarations.check(p.id(), p.description(), p.parameters(), binder, d -> {});
    assertTrue(binder.bind(p, parameters()).problems().isEmpty(), "parameters() bind");
  }

  @Test
  public void theServiceFileListsTheProvider() {
    String name = provider().getClass().getName();
    boolean listed =
        ServiceLoader.load(FaceLawProvider.class, provider().getClass().getClassLoader()).stream()
            .anyMatch(p -> p.type().getName().equals(name));
    assertTrue(listed, name + " is not in META-INF/services/" + FaceLawProvider.class.getName());
  }

  @Test
  public void derivativeMatchesCentralDifferences() {
    FaceLaw law = law();
    for (Sample s : checkedSamples()) {
      double c = s.concentration();
      double h = 1e-5 * c;
      double up = answer(law, c + h, s.temperature(), s.pressure())[0];
      double down = answer(law, c - h, s.temperature(), s.pressure())[0];
      double numeric = (up - down) / (2 * h);
      double given = answer(law, c, s.temperature(), s.pressure())[1];
      double scale = Math.max(Math.abs(numeric), Math.abs(given));
      // a flux dominated by a term without c (entry from the gas) leaves the difference only the
      // digits round-off spares: allow that loss, 1e-14 of the flux over the step
      double roundOff = 1e-14 * Math.max(Math.abs(up), Math.abs(down)) / h;
      assertEquals(
          numeric, given, derivativeTolerance() * scale + roundOff + 1e-300, "dJ/dc at " + s);
    }
  }

  @Test
  public void zeroConcentrationGivesFiniteAnswers() {
    FaceLaw law = law();
    for (Sample s : checkedSamples()) {
      double[] a = answer(law, 0.0, s.temperature(), s.pressure());
      assertTrue(Double.isFinite(a[0]) && Double.isFinite(a[1]), "at c = 0 for " + s);
      double[] b = answer(law, s.concentration(), s.temperature(), 0.0);
      assertTrue(Double.isFinite(b[0]) && Double.isFinite(b[1]), "at p = 0 for " + s);
    }
  }

  @Test
  public void answersAreTheSameFromSeveralThreads() throws Exception {
    FaceLaw law = law();
    List<Sample> samples = checkedSamples();
    List<double[]> expected = new ArrayList<>();
    for (Sample s : samples) {
      expected.add(answer(law, s.concentration(), s.temperature(), s.pressure()));
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
                    double[] a = answer(law, s.concentration(), s.temperature(), s.pressure());
                    if (!java.util.Arrays.equals(a, expected.get(k))) {
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
}
