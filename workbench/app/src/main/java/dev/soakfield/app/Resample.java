package dev.soakfield.app;

/** Even resampling of a curve given at uneven times, for plots whose x axis is time. */
public final class Resample {
  private Resample() {}

  /**
   * {@code count} values of y at times evenly spaced from t[0] to t[last], by linear interpolation
   * between the given points (t increasing).
   */
  public static double[] even(double[] t, double[] y, int count) {
    if (t.length != y.length || t.length == 0 || count < 2) {
      throw new IllegalArgumentException(
          "resample: found "
              + t.length
              + " times, "
              + y.length
              + " values, "
              + count
              + " points; expected equal non-empty lengths and at least 2 points");
    }
    double[] out = new double[count];
    double t0 = t[0];
    double t1 = t[t.length - 1];
    int j = 0;
    for (int i = 0; i < count; i++) {
      double ti = t0 + (t1 - t0) * i / (count - 1);
      while (j < t.length - 2 && t[j + 1] < ti) {
        j++;
      }
      if (t.length == 1 || t[j + 1] == t[j]) {
        out[i] = y[Math.min(j + 1, t.length - 1)];
      } else {
        double w = Math.max(0, Math.min(1, (ti - t[j]) / (t[j + 1] - t[j])));
        out[i] = y[j] + w * (y[j + 1] - y[j]);
      }
    }
    return out;
  }
}
