package dev.soakfield.fem.verify;

import dev.soakfield.fem.element.ReferenceMap;
import dev.soakfield.fem.element.TetBasis;
import dev.soakfield.mesh.TetMesh;

/**
 * A finite-element field evaluated inside one tetrahedron at a time, isoparametrically: position,
 * value and gradient at barycentric coordinates, with the Jacobian of the element's own (possibly
 * curved) map. Written for the verification cases from the shape functions alone, so that error
 * norms and face fluxes do not reuse the assembly they check. One instance per thread.
 */
final class ElementField {
  private final TetMesh mesh;
  private final int order;
  private final int per;
  private final double[] n;
  private final double[] dn;
  private final double[] jac = new double[9];
  private final double[] x = new double[3];
  private final double[] grad = new double[3];
  private double value;
  private double det;

  ElementField(TetMesh mesh) {
    this.mesh = mesh;
    this.order = mesh.order();
    this.per = mesh.nodesPerTet();
    this.n = new double[per];
    this.dn = new double[3 * per];
  }

  /** Evaluates field {@code u} (one value per node) in tetrahedron {@code tet} at {@code l}. */
  void at(int tet, double[] l, double[] u) {
    TetBasis.values(order, l, n);
    TetBasis.referenceGradients(order, l, dn);
    double[] j = jac;
    java.util.Arrays.fill(j, 0.0);
    x[0] = 0;
    x[1] = 0;
    x[2] = 0;
    double d0 = 0;
    double d1 = 0;
    double d2 = 0;
    value = 0;
    for (int i = 0; i < per; i++) {
      int v = mesh.tetNode(tet, i);
      for (int r = 0; r < 3; r++) {
        double c = mesh.coord(v, r);
        x[r] += n[i] * c;
        for (int k = 0; k < 3; k++) {
          j[3 * r + k] += c * dn[3 * i + k];
        }
      }
      value += n[i] * u[v];
      d0 += u[v] * dn[3 * i];
      d1 += u[v] * dn[3 * i + 1];
      d2 += u[v] * dn[3 * i + 2];
    }
    det = ReferenceMap.gradient(j, d0, d1, d2, grad);
  }

  /** The position of the last point evaluated (shared; read only). */
  double[] position() {
    return x;
  }

  double value() {
    return value;
  }

  /** The gradient of the field at the last point (shared; read only). */
  double[] gradient() {
    return grad;
  }

  /** |det J| at the last point: dV = |det J|·dξ (the reference element has volume 1/6). */
  double jacobian() {
    return Math.abs(det);
  }
}
