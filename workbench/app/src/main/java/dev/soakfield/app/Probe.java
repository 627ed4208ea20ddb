package dev.soakfield.app;

import dev.soakfield.fem.results.StoredRun;
import java.util.Optional;

/**
 * A point placed on the surface by a click, with the field there through time: a nodal field is
 * interpolated linearly between the corners of the picked triangle (barycentric weights), a
 * per-element field is the value of the tetrahedron the triangle bounds.
 */
public final class Probe {
  private final double[] point;
  private final int[] nodes;
  private final double[] weights;
  private final int tet;
  private final String where;

  private Probe(double[] point, int[] nodes, double[] weights, int tet, String where) {
    this.point = point;
    this.nodes = nodes;
    this.weights = weights;
    this.tet = tet;
    this.where = where;
  }

  /** The probe at the hit of the ray (6 numbers: origin, direction) on the scene's surface. */
  public static Probe at(Scene scene, double[] ray, PickIndex.Hit hit) {
    double s = hit.distance();
    double[] p = {ray[0] + s * ray[3], ray[1] + s * ray[4], ray[2] + s * ray[5]};
    BoundarySurface surf = scene.surface();
    double[] xyz = scene.study().geometry().coordinates();
    int[] n = new int[3];
    double[][] c = new double[3][3];
    for (int k = 0; k < 3; k++) {
      n[k] = surf.node(hit.triangle(), k);
      for (int a = 0; a < 3; a++) {
        c[k][a] = xyz[3 * n[k] + a];
      }
    }
    double[] w = barycentric(p, c[0], c[1], c[2]);
    return new Probe(p, n, w, surf.tet(hit.triangle()), scene.describe(hit));
  }

  /** Barycentric weights of p in triangle (a, b, c), by sub-triangle areas along its normal. */
  static double[] barycentric(double[] p, double[] a, double[] b, double[] c) {
    double[] n = cross(sub(b, a), sub(c, a));
    double area = dot(n, n);
    if (area == 0) {
      return new double[] {1, 0, 0};
    }
    double wa = dot(cross(sub(b, p), sub(c, p)), n) / area;
    double wb = dot(cross(sub(c, p), sub(a, p)), n) / area;
    return new double[] {wa, wb, 1 - wa - wb};
  }

  private static double[] sub(double[] x, double[] y) {
    return new double[] {x[0] - y[0], x[1] - y[1], x[2] - y[2]};
  }

  private static double[] cross(double[] x, double[] y) {
    return new double[] {
      x[1] * y[2] - x[2] * y[1], x[2] * y[0] - x[0] * y[2], x[0] * y[1] - x[1] * y[0]
    };
  }

  private static double dot(double[] x, double[] y) {
    return x[0] * y[0] + x[1] * y[1] + x[2] * y[2];
  }

  /** Copy of x, y, z. */
  public double[] point() {
    return point.clone();
  }

  /** What was clicked: face group and part. */
  public String where() {
    return where;
  }

  /** The field interpolated at the probe from nodal values. */
  public double valueOf(double[] nodal) {
    return weights[0] * nodal[nodes[0]]
        + weights[1] * nodal[nodes[1]]
        + weights[2] * nodal[nodes[2]];
  }

  /** The field at the probe in every frame of the results, or empty without results. */
  public Optional<double[]> curve(Study study, FieldKind field) {
    if (study.results().isEmpty()) {
      return Optional.empty();
    }
    StoredRun r = study.results().get();
    double[] v = new double[r.frameCount()];
    for (int f = 0; f < v.length; f++) {
      // a per-element field is the value of the tetrahedron under the probe
      v[f] =
          field.perElement
              ? FrameValues.perElement(r, f, field)[tet]
              : valueOf(r.field(f, field.fileName));
    }
    return Optional.of(v);
  }
}
