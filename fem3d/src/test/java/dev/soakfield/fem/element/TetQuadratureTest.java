package dev.soakfield.fem.element;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class TetQuadratureTest {
  /**
   * Exact calculus: ∫ x^a y^b z^c over the unit tetrahedron (corners 0, e1, e2, e3) is a! b! c! /
   * (a + b + c + 3)!.
   */
  static double exactMonomial(int a, int b, int c) {
    return factorial(a) * factorial(b) * factorial(c) / factorial(a + b + c + 3);
  }

  static double factorial(int n) {
    double f = 1;
    for (int k = 2; k <= n; k++) {
      f *= k;
    }
    return f;
  }

  /** The rule on the unit tetrahedron (volume 1/6), point (x, y, z) = (L1, L2, L3). */
  static double integrate(TetQuadrature rule, int a, int b, int c) {
    double s = 0;
    for (int q = 0; q < rule.size(); q++) {
      s +=
          rule.weight(q)
              * Math.pow(rule.bary(q, 1), a)
              * Math.pow(rule.bary(q, 2), b)
              * Math.pow(rule.bary(q, 3), c);
    }
    return s / 6;
  }

  private static void assertExactUpTo(TetQuadrature rule, int degree) {
    for (int a = 0; a <= degree; a++) {
      for (int b = 0; a + b <= degree; b++) {
        for (int c = 0; a + b + c <= degree; c++) {
          double exact = exactMonomial(a, b, c);
          assertEquals(
              exact, integrate(rule, a, b, c), 2e-15 * exact, "x^" + a + " y^" + b + " z^" + c);
        }
      }
    }
  }

  @Test
  void fourPointRuleIsExactForEveryMonomialUpToDegreeTwo() {
    assertEquals(4, TetQuadrature.DEGREE_2.size());
    assertEquals(2, TetQuadrature.DEGREE_2.degree());
    assertExactUpTo(TetQuadrature.DEGREE_2, 2);
  }

  @Test
  void fourPointRuleIsNotExactForDegreeThree() {
    // exact calculus: ∫ x^3 = 3!/6! = 1/120; a degree-2 rule must miss some cubic
    double exact = exactMonomial(3, 0, 0);
    assertTrue(Math.abs(integrate(TetQuadrature.DEGREE_2, 3, 0, 0) - exact) > 1e-6 * exact);
  }

  @Test
  void fourteenPointRuleIsExactForEveryMonomialUpToDegreeFive() {
    assertEquals(14, TetQuadrature.DEGREE_5.size());
    assertEquals(5, TetQuadrature.DEGREE_5.degree());
    assertExactUpTo(TetQuadrature.DEGREE_5, 5);
  }

  @Test
  void fourteenPointRuleHasPositiveWeightsAndInteriorPoints() {
    TetQuadrature rule = TetQuadrature.DEGREE_5;
    for (int q = 0; q < rule.size(); q++) {
      assertTrue(rule.weight(q) > 0);
      double sum = 0;
      for (int a = 0; a < 4; a++) {
        assertTrue(rule.bary(q, a) > 0);
        sum += rule.bary(q, a);
      }
      // exact geometry: barycentric coordinates sum to one
      assertEquals(1.0, sum, 1e-15);
    }
  }
}
