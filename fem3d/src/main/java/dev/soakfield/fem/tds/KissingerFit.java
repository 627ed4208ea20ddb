package dev.soakfield.fem.tds;

import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.stat.regression.SimpleRegression;

/**
 * The detrapping energy from the peak temperatures of TDS runs at several heating rates (Kissinger,
 * Anal. Chem. 29 (1957) 1702; for hydrogen traps Lee &amp; Lee, Metall. Trans. A 17 (1986) 345):
 * ln(β/T_p²) = −E_d/(R·T_p) + const, so E_d = −R × the slope of ln(β/T_p²) against 1/T_p, with its
 * 95 % interval from the slope's standard error and Student's t (n − 2 degrees of freedom; none for
 * two rates).
 *
 * @param energy E_d, J/mol
 * @param low lower end of the 95 % interval, J/mol (NaN with two rates)
 * @param high upper end, J/mol (NaN with two rates)
 * @param x 1/T_p of each rate, 1/K
 * @param y ln(β/T_p²) of each rate (β in K/s, T_p in K)
 * @param intercept the fitted line's intercept
 */
@SuppressWarnings("ArrayRecordComponent") // a handful of points, built once
public record KissingerFit(
    double energy, double low, double high, double[] x, double[] y, double intercept) {
  /** Molar gas constant, J/(mol·K) (CODATA 2018, exact in the 2019 SI). */
  public static final double GAS_CONSTANT = 8.314462618;

  /**
   * The fit.
   *
   * @param rates heating rates, K/s
   * @param peaks the peak temperature at each rate, K
   * @throws IllegalArgumentException with fewer than two rates or two equal ones
   */
  public static KissingerFit of(double[] rates, double[] peaks) {
    if (rates.length < 2 || rates.length != peaks.length) {
      throw new IllegalArgumentException(
          "a Kissinger plot needs the peak temperatures of at least two heating rates");
    }
    SimpleRegression r = new SimpleRegression();
    double[] x = new double[rates.length];
    double[] y = new double[rates.length];
    for (int i = 0; i < rates.length; i++) {
      x[i] = 1 / peaks[i];
      y[i] = Math.log(rates[i] / (peaks[i] * peaks[i]));
      r.addData(x[i], y[i]);
    }
    double slope = r.getSlope();
    if (!Double.isFinite(slope)) {
      throw new IllegalArgumentException("the heating rates give one peak temperature");
    }
    double energy = -GAS_CONSTANT * slope;
    double low = Double.NaN;
    double high = Double.NaN;
    if (rates.length > 2) {
      double t = new TDistribution(rates.length - 2).inverseCumulativeProbability(0.975);
      double half = t * r.getSlopeStdErr() * GAS_CONSTANT;
      low = energy - half;
      high = energy + half;
    }
    return new KissingerFit(energy, low, high, x, y, r.getIntercept());
  }
}
