package dev.soakfield.law.face.cathodic;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.soakfield.law.api.FaceLaw;
import dev.soakfield.law.api.FaceLawProvider;
import dev.soakfield.law.testkit.FaceLawContract;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

class CathodicChargingContractTest extends FaceLawContract {
  @Override
  protected FaceLawProvider provider() {
    return new CathodicChargingProvider();
  }

  /** A steel coupon charged at 1 mA/cm², c in mol/m³: a scenario of our own. */
  @Override
  protected Map<String, Object> parameters() {
    return Map.of(
        "current-density",
        "1 mA/cm^2",
        "efficiency",
        0.02,
        "recombination-rate",
        1e-7,
        "recombination-energy",
        "30 kJ/mol");
  }

  @Override
  protected List<Sample> samples() {
    return List.of(new Sample(0.1, 300, 0), new Sample(5, 350, 0));
  }

  @Test
  void theEntryFluxIsFaradaysLawTimesTheEfficiency() {
    FaceLaw law = law();
    // 1 mA/cm² = 10 A/m²; J = η·i/F, F = 96485.33212 C/mol (CODATA 2018)
    double entry = 0.02 * 10 / 96485.33212;
    assertEquals(entry, answer(law, 0, 300, 0)[0], 1e-12 * entry);
    double kr = 1e-7 * Math.exp(-30e3 / (CathodicChargingLaw.GAS_CONSTANT * 300));
    double c = Math.sqrt(entry / kr); // where recombination takes back all that enters
    assertEquals(0, answer(law, c, 300, 0)[0], 1e-9 * entry);
  }
}
