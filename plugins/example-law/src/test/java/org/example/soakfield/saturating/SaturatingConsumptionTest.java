package org.example.soakfield.saturating;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.soakfield.law.api.SourceLaw;
import dev.soakfield.law.api.SourceLawProvider;
import dev.soakfield.law.testkit.SourceLawContract;
import dev.soakfield.law.testkit.WellMixedCell;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** The contract's checks (inherited) plus one check against a published solution. */
class SaturatingConsumptionTest extends SourceLawContract {
  @Override
  protected SourceLawProvider provider() {
    return new SaturatingConsumptionProvider();
  }

  @Override
  protected Map<String, Object> parameters() {
    return Map.of("max-rate", 2e-3, "half-saturation", 0.5);
  }

  @Override
  protected List<Sample> samples() {
    // below, near and above the half-saturation concentration
    return List.of(
        new Sample(0.1, 0.05, 300, 10), new Sample(1, 0.5, 300, 60), new Sample(5, 8, 300, 1));
  }

  @Test
  void aClosedCellFollowsTheIntegratedMichaelisMentenEquation() {
    // integrated Michaelis–Menten equation: K·ln(c0/c) + (c0 − c) = v·t
    double v = 2e-3;
    double k = 0.5;
    double c0 = 2.0;
    SourceLaw law = provider().create(name -> name.equals("max-rate") ? v : k);
    WellMixedCell cell = WellMixedCell.closed(law, c0, 300);
    cell.run(1000, 0.5);
    double c = cell.concentration();
    assertEquals(v * 1000, k * Math.log(c0 / c) + (c0 - c), 2e-3 * v * 1000);
  }
}
