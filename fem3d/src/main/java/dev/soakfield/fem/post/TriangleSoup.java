package dev.soakfield.fem.post;

import java.util.Arrays;

/**
 * Unconnected triangles from a cut or an isosurface: three corners of x, y, z each, a field value
 * at each corner, and the tetrahedron each triangle came from. Arrays are handed out without
 * copying; the soup is made to be drawn or measured.
 */
public final class TriangleSoup {
  private final double[] corners;
  private final double[] values;
  private final int[] sourceTets;

  TriangleSoup(double[] corners, double[] values, int[] sourceTets) {
    this.corners = corners;
    this.values = values;
    this.sourceTets = sourceTets;
  }

  public int triangleCount() {
    return sourceTets.length;
  }

  /** x, y, z of corner 0, 1, 2 of triangle 0, then triangle 1, ...: 9 numbers a triangle. */
  public double[] corners() {
    return corners;
  }

  /** The carried field at each corner: 3 numbers a triangle. */
  public double[] values() {
    return values;
  }

  /** Index of the (original, not subdivided) tetrahedron each triangle lies in. */
  public int[] sourceTets() {
    return sourceTets;
  }

  /** Total area, by the cross product of each triangle's edges. */
  public double area() {
    double sum = 0;
    for (int t = 0; t < triangleCount(); t++) {
      int o = 9 * t;
      double ax = corners[o + 3] - corners[o];
      double ay = corners[o + 4] - corners[o + 1];
      double az = corners[o + 5] - corners[o + 2];
      double bx = corners[o + 6] - corners[o];
      double by = corners[o + 7] - corners[o + 1];
      double bz = corners[o + 8] - corners[o + 2];
      double cx = ay * bz - az * by;
      double cy = az * bx - ax * bz;
      double cz = ax * by - ay * bx;
      sum += 0.5 * Math.sqrt(cx * cx + cy * cy + cz * cz);
    }
    return sum;
  }

  /** Growing arrays for the kernels. */
  static final class Builder {
    private double[] corners = new double[9 * 1024];
    private double[] values = new double[3 * 1024];
    private int[] tets = new int[1024];
    private int count;

    void add(double[] p, double[] v, int a, int b, int c, int tet) {
      if (count == tets.length) {
        int n = tets.length * 2;
        corners = Arrays.copyOf(corners, 9 * n);
        values = Arrays.copyOf(values, 3 * n);
        tets = Arrays.copyOf(tets, n);
      }
      int o = 9 * count;
      System.arraycopy(p, 3 * a, corners, o, 3);
      System.arraycopy(p, 3 * b, corners, o + 3, 3);
      System.arraycopy(p, 3 * c, corners, o + 6, 3);
      values[3 * count] = v[a];
      values[3 * count + 1] = v[b];
      values[3 * count + 2] = v[c];
      tets[count++] = tet;
    }

    TriangleSoup build() {
      return new TriangleSoup(
          Arrays.copyOf(corners, 9 * count),
          Arrays.copyOf(values, 3 * count),
          Arrays.copyOf(tets, count));
    }
  }
}
