package dev.soakfield.fem.element;

/** The map from a tetrahedron's reference coordinates to space, at one point. */
public final class ReferenceMap {
  private ReferenceMap() {}

  /**
   * ∇u = J⁻ᵀ·∂u/∂ξ, with J⁻¹ = adj(J)/det J.
   *
   * @param j the Jacobian row-major, J[r][c] = ∂x_r/∂ξ_c
   * @param d0 ∂u/∂ξ₀ (d1, d2 likewise)
   * @param grad receives ∇u
   * @return det J
   */
  public static double gradient(double[] j, double d0, double d1, double d2, double[] grad) {
    double c00 = j[4] * j[8] - j[5] * j[7];
    double c01 = j[5] * j[6] - j[3] * j[8];
    double c02 = j[3] * j[7] - j[4] * j[6];
    double det = j[0] * c00 + j[1] * c01 + j[2] * c02;
    double r = 1 / det;
    double i00 = c00 * r;
    double i01 = (j[2] * j[7] - j[1] * j[8]) * r;
    double i02 = (j[1] * j[5] - j[2] * j[4]) * r;
    double i10 = c01 * r;
    double i11 = (j[0] * j[8] - j[2] * j[6]) * r;
    double i12 = (j[2] * j[3] - j[0] * j[5]) * r;
    double i20 = c02 * r;
    double i21 = (j[1] * j[6] - j[0] * j[7]) * r;
    double i22 = (j[0] * j[4] - j[1] * j[3]) * r;
    grad[0] = i00 * d0 + i10 * d1 + i20 * d2;
    grad[1] = i01 * d0 + i11 * d1 + i21 * d2;
    grad[2] = i02 * d0 + i12 * d1 + i22 * d2;
    return det;
  }
}
