package dev.soakfield.mesh.gen;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

/**
 * Cells that grow geometrically away from named faces: a ratio r at a face makes each cell r times
 * as deep as the one before it, counting from that face, so r > 1 puts the finest cells against it.
 * With n cells over a length L the first is h₁ = L·(r − 1)/(rⁿ − 1) (the sum of a geometric
 * series). A ratio at both ends of a direction grades each half toward its end.
 */
public final class Grading {
  /** No grading: every cell of a direction alike. */
  public static final Grading NONE = new Grading(Map.of());

  private final Map<String, Double> ratios;

  private Grading(Map<String, Double> ratios) {
    this.ratios = Collections.unmodifiableMap(new LinkedHashMap<>(ratios));
  }

  /**
   * Ratios by face name.
   *
   * @throws IllegalArgumentException for a ratio that is not a positive finite number
   */
  public static Grading of(Map<String, Double> ratios) {
    for (Map.Entry<String, Double> e : ratios.entrySet()) {
      double r = e.getValue();
      if (!(r > 0) || Double.isInfinite(r)) {
        throw new IllegalArgumentException(
            "grading of '" + e.getKey() + "': found " + r + ", expected a ratio above 0 (1.2)");
      }
    }
    return new Grading(ratios);
  }

  /** The ratio toward a face, 1 where none was given. */
  public double at(String face) {
    return ratios.getOrDefault(face, 1.0);
  }

  /**
   * Refuses faces the shape does not have.
   *
   * @throws IllegalArgumentException naming the faces the shape has, for a face it does not
   */
  void onlyFaces(Set<String> faces, String shape) {
    for (String f : ratios.keySet()) {
      if (!faces.contains(f)) {
        throw new IllegalArgumentException(
            "grading: found face '"
                + f
                + "', expected a face of the "
                + shape
                + ": "
                + String.join(", ", new TreeSet<>(faces)));
      }
    }
  }

  /**
   * {@code n + 1} positions from {@code from} to {@code from + length}, graded toward the start by
   * {@code startRatio} and toward the end by {@code endRatio} (1: none). Graded at both ends, each
   * end grades its half; an odd count shares the middle cell, half of it in each half, so equal
   * ratios give mirror-image halves.
   */
  static double[] planes(double from, double length, int n, double startRatio, double endRatio) {
    if (startRatio == 1 && endRatio == 1) {
      return TensorGrid.planes(from, length, n);
    }
    double[] p = new double[n + 1];
    p[0] = from;
    p[n] = from + length;
    if (startRatio != 1 && endRatio != 1 && n > 1) {
      int half = n / 2;
      boolean shared = n % 2 == 1;
      double[] start = halfSeries(half, shared, length / 2, startRatio);
      double[] end = halfSeries(half, shared, length / 2, endRatio);
      // Both halves are laid from their own end, so equal ratios mirror to the last bit.
      for (int i = 1; i <= half; i++) {
        p[i] = from + start[i];
        p[n - i] = from + length - end[i];
      }
      return p;
    }
    boolean towardStart = startRatio != 1;
    double r = towardStart ? startRatio : endRatio;
    double h1 = length * (r - 1) / (Math.pow(r, n) - 1);
    double sum = 0;
    for (int i = 1; i < n; i++) {
      sum += h1 * Math.pow(r, i - 1);
      if (towardStart) {
        p[i] = from + sum;
      } else {
        p[n - i] = from + length - sum;
      }
    }
    return p;
  }

  /**
   * Distances from an end of the first {@code count} planes (index 0 is the end itself) of a half
   * of length {@code halfLength}: cells growing by {@code r}, plus half of a shared middle cell.
   */
  private static double[] halfSeries(int count, boolean shared, double halfLength, double r) {
    double rn = Math.pow(r, count);
    double cells = (rn - 1) / (r - 1) + (shared ? rn / 2 : 0);
    double h1 = halfLength / cells;
    double[] d = new double[count + 1];
    for (int i = 1; i <= count; i++) {
      d[i] = d[i - 1] + h1 * Math.pow(r, i - 1);
    }
    return d;
  }

  /**
   * The planes with every cell between them cut into {@code k} equal cells: a refinement that keeps
   * every given plane, so a grading keeps its shape while all its cells shrink alike.
   */
  static double[] split(double[] planes, int k) {
    if (k == 1) {
      return planes;
    }
    int n = planes.length - 1;
    double[] p = new double[n * k + 1];
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < k; j++) {
        p[i * k + j] = planes[i] + (planes[i + 1] - planes[i]) * j / k;
      }
    }
    p[n * k] = planes[n];
    return p;
  }
}
