package dev.soakfield.fem.fit;

import java.util.Arrays;
import java.util.List;
import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.stat.regression.SimpleRegression;

/**
 * D0 and Q of D = D0·exp(−Q/(R·T)) from diffusivities at several temperatures: least squares of ln
 * D on 1/T (Commons Math {@link SimpleRegression}), 95 % intervals from Student's t with n − 2
 * degrees of freedom. The interval of D0 is exp of the interval of ln D0, so it is not symmetric.
 */
public final class ArrheniusFit {
  /** Molar gas constant, J/(mol·K) (CODATA 2018, exact). */
  public static final double GAS_CONSTANT = 8.314462618;

  /** D0 in m²/s, Q in J/mol, and the residuals of ln D. */
  public record Result(
      Estimate d0, Estimate activationEnergy, List<Double> lnResiduals, double rSquare) {
    /** D at {@code temperature} K from the fitted law. */
    public double diffusivityAt(double temperature) {
      return d0.value() * Math.exp(-activationEnergy.value() / (GAS_CONSTANT * temperature));
    }
  }

  private ArrheniusFit() {}

  /**
   * Fits temperatures in K and diffusivities in m²/s.
   *
   * @throws IllegalArgumentException with fewer than 3 points, a non-positive value, or a single
   *     temperature
   */
  public static Result fit(double[] temperature, double[] diffusivity) {
    int n = temperature.length;
    if (n != diffusivity.length) {
      throw new IllegalArgumentException("temperatures and diffusivities differ in count");
    }
    if (n < 3) {
      throw new IllegalArgumentException(
          "an Arrhenius fit with intervals needs at least 3 points, found " + n);
    }
    SimpleRegression reg = new SimpleRegression(true);
    for (int i = 0; i < n; i++) {
      if (!(temperature[i] > 0) || !(diffusivity[i] > 0)) {
        throw new IllegalArgumentException(
            "point "
                + (i + 1)
                + ": temperature and diffusivity must be > 0, found "
                + temperature[i]
                + " K, "
                + diffusivity[i]);
      }
      reg.addData(1 / temperature[i], Math.log(diffusivity[i]));
    }
    double slope = reg.getSlope();
    if (Double.isNaN(slope)) {
      throw new IllegalArgumentException("an Arrhenius fit needs at least two temperatures");
    }
    double tq = new TDistribution(n - 2).inverseCumulativeProbability(0.975);
    double seSlope = reg.getSlopeStdErr();
    double seIntercept = reg.getInterceptStdErr();
    double q = -slope * GAS_CONSTANT;
    Estimate qEst = Estimate.symmetric(q, seSlope * GAS_CONSTANT, tq * seSlope * GAS_CONSTANT);
    double b = reg.getIntercept();
    double d0 = Math.exp(b);
    Estimate d0Est =
        new Estimate(
            d0, d0 * seIntercept, Math.exp(b - tq * seIntercept), Math.exp(b + tq * seIntercept));
    double[] res = new double[n];
    for (int i = 0; i < n; i++) {
      res[i] = Math.log(diffusivity[i]) - reg.predict(1 / temperature[i]);
    }
    return new Result(d0Est, qEst, Arrays.stream(res).boxed().toList(), reg.getRSquare());
  }
}
