package dev.soakfield.law.face.recombination;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.soakfield.law.api.FaceLaw;
import dev.soakfield.law.api.FaceLawProvider;
import dev.soakfield.law.testkit.FaceLawContract;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

class RecombinationContractTest extends FaceLawContract {
  @Override
  protected FaceLawProvider provider() {
    return new RecombinationProvider();
  }

  /** Hydrogen at a steel surface, c in mol/m³: a scenario of our own. */
  @Override
  protected Map<String, Object> parameters() {
    return Map.of(
        "dissociation-rate",
        1e-8,
        "dissociation-energy",
        "20 kJ/mol",
        "recombination-rate",
        1e-7,
        "recombination-energy",
        "30 kJ/mol");
  }

  @Override
  protected List<Sample> samples() {
    return List.of(new Sample(0.1, 300, 1e5), new Sample(5, 500, 1e7), new Sample(0.01, 700, 0));
  }

  @Test
  void atRestTheConcentrationFollowsSievertsLaw() {
    // J = 0 ⇔ c = √(kd/kr)·√p (Sieverts' law as the balance of the two surface reactions)
    FaceLaw law = law();
    double t = 400;
    double kd = 1e-8 * Math.exp(-20e3 / (RecombinationLaw.GAS_CONSTANT * t));
    double kr = 1e-7 * Math.exp(-30e3 / (RecombinationLaw.GAS_CONSTANT * t));
    double p = 2e6;
    double c = Math.sqrt(kd / kr * p);
    assertEquals(0, answer(law, c, t, p)[0], 1e-12 * kd * p);
    assertEquals(kd * p, answer(law, 0, t, p)[0], 1e-12 * kd * p);
    assertEquals(-kr * 4 * c * c, answer(law, 2 * c, t, 0)[0], 1e-12 * kr * c * c);
  }
}
