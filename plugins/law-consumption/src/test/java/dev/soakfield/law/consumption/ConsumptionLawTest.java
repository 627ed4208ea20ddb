package dev.soakfield.law.consumption;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.soakfield.law.testkit.WellMixedCell;
import org.junit.jupiter.api.Test;

class ConsumptionLawTest {
  @Test
  void aClosedCellDecaysAsFirstOrderKineticsConvergingAtFirstOrder() {
    // integrated first-order rate law c = c0·exp(−k·t) (any physical chemistry text, e.g. Atkins,
    // Physical Chemistry, the integrated rate laws)
    ConsumptionLaw law = new ConsumptionLaw(1e-4, 0);
    double exact = Math.exp(-1.0);
    double[] errors = new double[3];
    int n = 0;
    for (double dt : new double[] {200, 100, 50}) {
      WellMixedCell cell = WellMixedCell.closed(law, 1.0, 300);
      cell.run(1e4, dt);
      assertEquals(1, cell.iterations(), "a linear law converges in one Newton iteration");
      errors[n++] = Math.abs(cell.concentration() - exact);
    }
    // leading error term of backward Euler for c' = −k·c: c(t)·(k·dt)·(k·t)/2 (common practice)
    assertEquals(exact * (1e-4 * 50) * 1.0 / 2, errors[2], 0.05 * errors[2]);
    // backward Euler is first order: halving the step halves the error
    assertEquals(2.0, errors[0] / errors[1], 0.1);
    assertEquals(2.0, errors[1] / errors[2], 0.1);
  }

  @Test
  void theRateConstantFollowsArrhenius() {
    // common practice: near room temperature a rate with Ea ≈ 53 kJ/mol doubles per 10 K
    ConsumptionLaw law = new ConsumptionLaw(1e6, 52.9e3);
    assertEquals(2.0, law.rateConstant(308.15) / law.rateConstant(298.15), 0.02);
    // Ea = 0: the pre-factor itself, at any temperature
    assertEquals(3e-5, new ConsumptionLaw(3e-5, 0).rateConstant(250));
  }
}
