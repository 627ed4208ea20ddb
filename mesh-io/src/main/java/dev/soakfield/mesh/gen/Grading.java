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
   * {@code startRatio} and toward the end by {@code endRatio} (1: none).
   */
  static double[] planes(double from, double length, int n, double startRatio, double endRatio) {
    if (startRatio == 1 && endRatio == 1) {
      return TensorGrid.planes(from, length, n);
    }
    double[] sizes = new double[n];
    if (startRatio != 1 && endRatio != 1 && n > 1) {
      int first = (n + 1) / 2;
      fill(sizes, 0, first, length / 2, startRatio, false);
      fill(sizes, first, n - first, length / 2, endRatio, true);
    } else if (endRatio != 1) {
      fill(sizes, 0, n, length, endRatio, true);
    } else {
      fill(sizes, 0, n, length, startRatio, false);
    }
    double[] p = new double[n + 1];
    p[0] = from;
    for (int i = 0; i < n; i++) {
      p[i + 1] = p[i] + sizes[i];
    }
    p[n] = from + length;
    return p;
  }

  /** {@code count} sizes summing to {@code length}, growing by {@code r} from the finer end. */
  private static void fill(
      double[] sizes, int at, int count, double length, double r, boolean finestLast) {
    double h1 = r == 1 ? length / count : length * (r - 1) / (Math.pow(r, count) - 1);
    for (int i = 0; i < count; i++) {
      double h = h1 * Math.pow(r, i);
      sizes[finestLast ? at + count - 1 - i : at + i] = h;
    }
  }
}
