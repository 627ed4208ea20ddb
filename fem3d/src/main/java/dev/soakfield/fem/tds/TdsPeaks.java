package dev.soakfield.fem.tds;

import java.util.ArrayList;
import java.util.List;

/**
 * The peaks of a desorption curve against temperature: local maxima of the rate on the ramp that
 * stand out (at least {@link #MIN_HEIGHT} of the highest, and each separated from the next by a dip
 * to below {@link #MIN_DIP} of the lower of the two), each refined by the parabola through the
 * highest row and its two neighbours.
 */
public final class TdsPeaks {
  /** A peak lower than this share of the highest is no peak. */
  static final double MIN_HEIGHT = 0.05;

  /** Two maxima are two peaks when the rate between them falls below this share of the lower. */
  static final double MIN_DIP = 0.9;

  /**
   * One peak.
   *
   * @param temperature K
   * @param rate the desorption rate there, amount/s
   */
  public record Peak(double temperature, double rate) {}

  private TdsPeaks() {}

  /** The peaks of {@code rate} against {@code temperature} from row {@code from} on. */
  public static List<Peak> find(double[] temperature, double[] rate, int from) {
    int n = rate.length;
    double highest = 0;
    for (int i = from; i < n; i++) {
      highest = Math.max(highest, rate[i]);
    }
    List<Integer> kept = new ArrayList<>();
    // row 0 is the start (no step, no rate): a fall from the first step on is the lattice's
    // outflow running down, not a peak, so a maximum needs a real row before it
    for (int i = Math.max(from, 1) + 1; i < n - 1; i++) {
      if (!(rate[i] > rate[i - 1] && rate[i] >= rate[i + 1])) {
        continue;
      }
      if (kept.isEmpty()) {
        kept.add(i);
        continue;
      }
      int last = kept.get(kept.size() - 1);
      double dip = rate[last];
      for (int k = last; k <= i; k++) {
        dip = Math.min(dip, rate[k]);
      }
      if (dip < MIN_DIP * Math.min(rate[last], rate[i])) {
        kept.add(i);
      } else if (rate[i] > rate[last]) {
        kept.set(kept.size() - 1, i); // one peak with a shoulder: its top is the higher maximum
      }
    }
    // the height rule counts against the highest peak, not the start's outflow running down
    highest = 0;
    for (int k : kept) {
      highest = Math.max(highest, rate[k]);
    }
    List<Peak> out = new ArrayList<>();
    for (int k : kept) {
      if (highest > 0 && rate[k] >= MIN_HEIGHT * highest) {
        out.add(refine(temperature, rate, k));
      }
    }
    return out;
  }

  /** The highest of {@code peaks}. */
  public static Peak highest(List<Peak> peaks) {
    Peak best = peaks.get(0);
    for (Peak p : peaks) {
      if (p.rate() > best.rate()) {
        best = p;
      }
    }
    return best;
  }

  /** The vertex of the parabola through rows k−1, k, k+1 (rate against temperature). */
  static Peak refine(double[] temperature, double[] rate, int k) {
    double x0 = temperature[k - 1];
    double x1 = temperature[k];
    double x2 = temperature[k + 1];
    double y0 = rate[k - 1];
    double y1 = rate[k];
    double y2 = rate[k + 1];
    double d1 = (y1 - y0) / (x1 - x0);
    double d2 = (y2 - y1) / (x2 - x1);
    double a = (d2 - d1) / (x2 - x0);
    if (!(a < 0)) {
      return new Peak(x1, y1);
    }
    double b = d1 - a * (x0 + x1);
    double x = -b / (2 * a);
    if (!(x > x0 && x < x2)) {
      return new Peak(x1, y1);
    }
    double y = y1 + d1 * (x - x1) + a * (x - x0) * (x - x1);
    return new Peak(x, y);
  }
}
