package dev.soakfield.fem.post;

/**
 * An estimate of the time-stepping error of scalar outputs (an amount, a probe's value) from the
 * accepted steps alone, the same kind of estimate the step control makes. A backward-Euler step
 * adds a local error of about (dt²/2)·Q'' to a quantity Q, a Crank–Nicolson step about
 * (dt³/12)·Q''' (Taylor expansion; common practice). Diffusion then damps an error as it damps the
 * part of the solution it resembles: an error made at t_k, shaped like the solution's rate of
 * change then, has shrunk by T by the factor Q''(T)/Q''(t_k) (exact for one decaying mode e^(−λt)).
 * So the error at T is about
 *
 * <pre>|Q''(T)|·Σ_BE dt²/2 + |Q'''(T)|·Σ_CN dt³/12</pre>
 *
 * with the derivatives at T from divided differences of the last accepted values. Validated against
 * exact solutions in the verification cases (within a factor of 3).
 */
public final class TimeErrorTrack {
  private static final int KEPT = 4;
  private final int count;
  private final double[] times = new double[KEPT];
  private final double[][] values;
  private int seen;
  private double backwardEulerSquares;
  private double crankNicolsonCubes;

  /** A track of {@code count} quantities. */
  public TimeErrorTrack(int count) {
    this.count = count;
    this.values = new double[KEPT][count];
  }

  /** The values at the start of the run. */
  public void start(double t, double[] q) {
    seen = 0;
    push(t, q);
  }

  /** The values after an accepted step of length dt with weight theta (1 or ½). */
  public void step(double t, double dt, double theta, double[] q) {
    if (theta == 1.0) {
      backwardEulerSquares += dt * dt;
    } else {
      crankNicolsonCubes += dt * dt * dt;
    }
    push(t, q);
  }

  private void push(double t, double[] q) {
    for (int k = 0; k < KEPT - 1; k++) {
      times[k] = times[k + 1];
      System.arraycopy(values[k + 1], 0, values[k], 0, count);
    }
    times[KEPT - 1] = t;
    System.arraycopy(q, 0, values[KEPT - 1], 0, count);
    seen++;
  }

  /** The estimate for each quantity now; NaN until three values were seen. */
  public double[] estimates() {
    double[] e = new double[count];
    for (int i = 0; i < count; i++) {
      double second = secondDerivative(i);
      double third = seen >= KEPT ? thirdDerivative(i) : 0;
      e[i] =
          Double.isNaN(second)
              ? Double.NaN
              : Math.abs(second) * backwardEulerSquares / 2
                  + Math.abs(third) * crankNicolsonCubes / 12;
    }
    return e;
  }

  /** Q' now, from the last two values (NaN before the first step). */
  public double rate(int i) {
    if (seen < 2) {
      return Double.NaN;
    }
    return (values[KEPT - 1][i] - values[KEPT - 2][i]) / (times[KEPT - 1] - times[KEPT - 2]);
  }

  /** Q'' now, twice the divided difference of the last three values (NaN before). */
  public double secondDerivative(int i) {
    if (seen < 3) {
      return Double.NaN;
    }
    return 2 * divided(i, KEPT - 3, KEPT - 1);
  }

  private double thirdDerivative(int i) {
    return 6 * divided(i, KEPT - 4, KEPT - 1);
  }

  /** The divided difference f[t_a, …, t_b] of quantity i. */
  private double divided(int i, int a, int b) {
    if (a == b) {
      return values[a][i];
    }
    return (divided(i, a + 1, b) - divided(i, a, b - 1)) / (times[b] - times[a]);
  }

  /** The state, for checkpoints: sums, count seen, times, then values row by row. */
  public double[] snapshot() {
    double[] s = new double[3 + KEPT + KEPT * count];
    s[0] = backwardEulerSquares;
    s[1] = crankNicolsonCubes;
    s[2] = seen;
    System.arraycopy(times, 0, s, 3, KEPT);
    for (int k = 0; k < KEPT; k++) {
      System.arraycopy(values[k], 0, s, 3 + KEPT + k * count, count);
    }
    return s;
  }

  public void restore(double[] s) {
    backwardEulerSquares = s[0];
    crankNicolsonCubes = s[1];
    seen = (int) s[2];
    System.arraycopy(s, 3, times, 0, KEPT);
    for (int k = 0; k < KEPT; k++) {
      System.arraycopy(s, 3 + KEPT + k * count, values[k], 0, count);
    }
  }
}
