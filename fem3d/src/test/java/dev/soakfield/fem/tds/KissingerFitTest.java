package dev.soakfield.fem.tds;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The Kissinger fit on peak temperatures of first-order desorption, which obey the peak condition
 * β·E/(R·T_p²) = ν·exp(−E/(R·T_p)) exactly (Kissinger, Anal. Chem. 29 (1957) 1702, eq. 6 for n =
 * 1): solved here by bisection for each rate, the fit must give E back.
 */
class KissingerFitTest {
  private static final double R = KissingerFit.GAS_CONSTANT;

  /** The first-order peak temperature at heating rate beta (K/s). */
  static double peak(double beta, double energy, double nu) {
    double lo = 100;
    double hi = 3000;
    for (int i = 0; i < 200; i++) {
      double t = 0.5 * (lo + hi);
      // f rises with T: ν·exp(−E/RT) − β·E/(R·T²)
      if (nu * Math.exp(-energy / (R * t)) > beta * energy / (R * t * t)) {
        hi = t;
      } else {
        lo = t;
      }
    }
    return 0.5 * (lo + hi);
  }

  @Test
  void exactFirstOrderPeaksGiveTheEnergyBack() {
    double e = 85e3;
    double[] rates = {2.0 / 60, 5.0 / 60, 10.0 / 60, 20.0 / 60};
    double[] peaks = new double[rates.length];
    for (int i = 0; i < rates.length; i++) {
      peaks[i] = peak(rates[i], e, 1e10);
    }
    KissingerFit f = KissingerFit.of(rates, peaks);
    assertEquals(e, f.energy(), 1e-6 * e);
    assertTrue(f.low() <= f.energy() && f.energy() <= f.high());
    assertTrue(f.high() - f.low() < 1e-3 * e, "exact points: a narrow interval");
    // negative control: peaks 2 K higher at the fastest rate move the energy by more than 2 %
    peaks[3] += 2;
    assertTrue(Math.abs(KissingerFit.of(rates, peaks).energy() - e) > 0.02 * e);
  }

  @Test
  void twoRatesGiveNoIntervalAndOneRateNoFit() {
    KissingerFit f =
        KissingerFit.of(
            new double[] {0.1, 0.2}, new double[] {peak(0.1, 5e4, 1e8), peak(0.2, 5e4, 1e8)});
    assertEquals(5e4, f.energy(), 5e-2);
    assertTrue(Double.isNaN(f.low()) && Double.isNaN(f.high()));
    assertThrows(
        IllegalArgumentException.class,
        () -> KissingerFit.of(new double[] {0.1}, new double[] {400}));
    assertThrows(
        IllegalArgumentException.class,
        () -> KissingerFit.of(new double[] {0.1, 0.2}, new double[] {400, 400}));
  }
}
