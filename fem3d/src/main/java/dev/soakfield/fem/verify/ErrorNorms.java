package dev.soakfield.fem.verify;

import dev.soakfield.fem.element.TetQuadrature;
import dev.soakfield.mesh.TetMesh;

/**
 * ‖u_h − u‖ in L¹ and L² and |u_h − u| in H¹ (the seminorm, ‖∇u_h − ∇u‖) over a mesh, by the
 * degree-5 rule on each element's own map, and the integral of u_h (the amount when u_h is c).
 * Elements of degree p should give L² errors falling as h^(p+1) and H¹ errors as h^p for smooth u
 * (S. C. Brenner and L. R. Scott, The Mathematical Theory of Finite Element Methods, 3rd ed.
 * (2008), Thm 4.4.20 and ch. 5).
 */
final class ErrorNorms {
  private ErrorNorms() {}

  /** The errors: {@code l2}, {@code h1} (seminorm) and {@code l1} (∫|u_h − u| dV). */
  record Errors(double l2, double h1, double l1) {}

  /**
   * The errors of field {@code uh} (one value per node) against {@code exact}, optionally weighted
   * per tetrahedron: {@code weight[t]} multiplies u_h there (c = S·φ from φ), null for 1.
   */
  static Errors of(TetMesh mesh, double[] uh, double[] weight, ExactField exact) {
    TetQuadrature q = TetQuadrature.DEGREE_5;
    ElementField f = new ElementField(mesh);
    double[] l = new double[4];
    double[] g = new double[3];
    double l2 = 0;
    double h1 = 0;
    double l1 = 0;
    for (int e = 0; e < mesh.tetCount(); e++) {
      double w = weight == null ? 1.0 : weight[e];
      for (int k = 0; k < q.size(); k++) {
        for (int a = 0; a < 4; a++) {
          l[a] = q.bary(k, a);
        }
        f.at(e, l, uh);
        double[] x = f.position();
        double dv = q.weight(k) * f.jacobian() / 6;
        double d = w * f.value() - exact.value(x[0], x[1], x[2]);
        exact.gradient(x[0], x[1], x[2], g);
        double[] gh = f.gradient();
        double gx = w * gh[0] - g[0];
        double gy = w * gh[1] - g[1];
        double gz = w * gh[2] - g[2];
        l1 += dv * Math.abs(d);
        l2 += dv * d * d;
        h1 += dv * (gx * gx + gy * gy + gz * gz);
      }
    }
    return new Errors(Math.sqrt(l2), Math.sqrt(h1), l1);
  }

  /** ∫ weight·u_h dV over the mesh (weight per tetrahedron, null for 1). */
  static double integral(TetMesh mesh, double[] uh, double[] weight) {
    TetQuadrature q = TetQuadrature.DEGREE_5;
    ElementField f = new ElementField(mesh);
    double[] l = new double[4];
    double sum = 0;
    for (int e = 0; e < mesh.tetCount(); e++) {
      double w = weight == null ? 1.0 : weight[e];
      for (int k = 0; k < q.size(); k++) {
        for (int a = 0; a < 4; a++) {
          l[a] = q.bary(k, a);
        }
        f.at(e, l, uh);
        sum += q.weight(k) * f.jacobian() / 6 * w * f.value();
      }
    }
    return sum;
  }

  /** ∫ u dV of the exact field over the mesh's elements, by the same rule. */
  static double exactIntegral(TetMesh mesh, ExactField exact) {
    TetQuadrature q = TetQuadrature.DEGREE_5;
    ElementField f = new ElementField(mesh);
    double[] l = new double[4];
    double[] zero = new double[mesh.nodeCount()];
    double sum = 0;
    for (int e = 0; e < mesh.tetCount(); e++) {
      for (int k = 0; k < q.size(); k++) {
        for (int a = 0; a < 4; a++) {
          l[a] = q.bary(k, a);
        }
        f.at(e, l, zero);
        double[] x = f.position();
        sum += q.weight(k) * f.jacobian() / 6 * exact.value(x[0], x[1], x[2]);
      }
    }
    return sum;
  }
}
