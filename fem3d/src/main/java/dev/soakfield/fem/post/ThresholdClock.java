package dev.soakfield.fem.post;

import java.util.Arrays;

/**
 * The time each node first reaches a threshold concentration, interpolated linearly within the step
 * in which it is crossed; -1 where it has not been reached.
 */
public final class ThresholdClock {
  private final double threshold;
  private final double[] nodalSolubility;
  private final double[] firstTime;
  private double[] previousC;

  public ThresholdClock(double threshold, double[] nodalSolubility, double[] phi0) {
    this.threshold = threshold;
    this.nodalSolubility = nodalSolubility.clone();
    this.firstTime = new double[phi0.length];
    Arrays.fill(firstTime, -1);
    previousC = concentration(phi0);
    for (int i = 0; i < phi0.length; i++) {
      if (previousC[i] >= threshold) {
        firstTime[i] = 0;
      }
    }
  }

  private double[] concentration(double[] phi) {
    double[] c = new double[phi.length];
    for (int i = 0; i < c.length; i++) {
      c[i] = nodalSolubility[i] * phi[i];
    }
    return c;
  }

  /** Takes the nodal solubility at a new temperature for the following steps. */
  public void updateSolubility(double[] nodal) {
    System.arraycopy(nodal, 0, nodalSolubility, 0, nodalSolubility.length);
  }

  /** First times and last concentrations, for checkpoints. */
  public double[][] snapshot() {
    return new double[][] {firstTime.clone(), previousC.clone()};
  }

  /** Continues from a {@link #snapshot()}. */
  public void restore(double[][] state) {
    System.arraycopy(state[0], 0, firstTime, 0, firstTime.length);
    previousC = state[1].clone();
  }

  /** Records the step from t − dt to t that ended at potential phi. */
  public void step(double t, double dt, double[] phi) {
    // in place, node by node: a new vector a step is a humongous allocation to G1 at scale
    for (int i = 0; i < phi.length; i++) {
      double c = nodalSolubility[i] * phi[i];
      if (firstTime[i] < 0 && c >= threshold) {
        firstTime[i] = crossing(t - dt, previousC[i], t, c, threshold);
      }
      previousC[i] = c;
    }
  }

  /** Where the straight line from (t0, v0) to (t1, v1) reaches level, clamped to the step. */
  public static double crossing(double t0, double v0, double t1, double v1, double level) {
    if (v1 == v0) {
      return t1;
    }
    double f = (level - v0) / (v1 - v0);
    return t0 + Math.max(0, Math.min(1, f)) * (t1 - t0);
  }

  /** First-exceed time per node, -1 where never (a copy). */
  public double[] firstTimes() {
    return firstTime.clone();
  }
}
