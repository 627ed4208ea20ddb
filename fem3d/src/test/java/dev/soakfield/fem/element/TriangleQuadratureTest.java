package dev.soakfield.fem.element;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class TriangleQuadratureTest {
  @Test
  void sixPointRuleIsExactForEveryMonomialUpToDegreeFour() {
    TriangleQuadrature rule = TriangleQuadrature.DEGREE_4;
    assertEquals(6, rule.size());
    for (int a = 0; a <= 4; a++) {
      for (int b = 0; a + b <= 4; b++) {
        double s = 0;
        for (int q = 0; q < rule.size(); q++) {
          s += rule.weight(q) * Math.pow(rule.bary(q, 1), a) * Math.pow(rule.bary(q, 2), b);
        }
        s /= 2;
        // exact calculus: ∫ x^a y^b over the unit triangle is a! b! / (a + b + 2)!
        double exact =
            TetQuadratureTest.factorial(a)
                * TetQuadratureTest.factorial(b)
                / TetQuadratureTest.factorial(a + b + 2);
        assertEquals(exact, s, 2e-15 * exact, "x^" + a + " y^" + b);
      }
    }
  }

  @Test
  void weightsArePositive() {
    for (int q = 0; q < TriangleQuadrature.DEGREE_4.size(); q++) {
      assertTrue(TriangleQuadrature.DEGREE_4.weight(q) > 0);
    }
  }
}
