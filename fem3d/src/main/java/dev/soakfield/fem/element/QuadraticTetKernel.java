package dev.soakfield.fem.element;

/**
 * The 10-node tetrahedron, isoparametric: the Jacobian is evaluated at every quadrature point, so
 * tetrahedra with curved edges (mid-edge nodes moved onto a curved wall) are integrated too.
 * Stiffness uses the degree-2 rule (exact on straight-edged tetrahedra, where ∇N_i · T ∇N_j has
 * degree 2); mass and load use the degree-5 rule (exact for N_i N_j, degree 4, on straight edges).
 */
final class QuadraticTetKernel implements TetKernel {
  private static final TetQuadrature STIFFNESS_RULE = TetQuadrature.DEGREE_2;
  private static final TetQuadrature MASS_RULE = TetQuadrature.DEGREE_5;

  /** ∂N_i/∂ξ at the stiffness points, [q][3 i + k] flattened as 30 q + 3 i + k. */
  private static final double[] STIFF_DN = referenceGradients(STIFFNESS_RULE);

  private static final double[] MASS_DN = referenceGradients(MASS_RULE);
  private static final double[] MASS_N = values(MASS_RULE);

  /**
   * On straight-edged tetrahedra ∇N_i = Σ_a (∂N_i/∂L_a) ∇L_a with constant ∇L_a, so K_ij = V Σ_a≤b
   * G_ab S_ab,ij with G_ab = ∇L_a · T ∇L_b and reference numbers S (the degree-2 rule is exact for
   * them); mass and load are V times reference arrays. About five times fewer operations than the
   * isoparametric path, which curved tetrahedra still take.
   */
  private static final StraightTables STRAIGHT = new StraightTables();

  /**
   * Mid-edge nodes within this fraction of their edge's length of the midpoint count as straight.
   */
  private static final double STRAIGHT_TOLERANCE = 1e-12;

  /** False in tests only, to compare the isoparametric path against the shortcut. */
  private final boolean shortcut;

  private final double[] lgrad = new double[12];
  private final double[] gab = new double[10];
  private final double[] jinv = new double[9];
  private final double[] grad = new double[30];
  private final double[] flux = new double[30];
  private final double[] diag = new double[100];

  QuadraticTetKernel() {
    this(true);
  }

  QuadraticTetKernel(boolean shortcut) {
    this.shortcut = shortcut;
  }

  @Override
  public int nodeCount() {
    return 10;
  }

  @Override
  public void stiffness(double[] x, double[] tensor, int off, double[] out) {
    if (shortcut && isStraight(x)) {
      straightStiffness(x, tensor, off, out);
      return;
    }
    double txx = tensor[off];
    double tyy = tensor[off + 1];
    double tzz = tensor[off + 2];
    double txy = tensor[off + 3];
    double tyz = tensor[off + 4];
    double tzx = tensor[off + 5];
    for (int k = 0; k < 100; k++) {
      out[k] = 0;
    }
    for (int q = 0; q < STIFFNESS_RULE.size(); q++) {
      int base = 30 * q;
      double w = STIFFNESS_RULE.weight(q) * inverseJacobian(x, STIFF_DN, base, jinv) / 6;
      for (int i = 0; i < 10; i++) {
        double d0 = STIFF_DN[base + 3 * i];
        double d1 = STIFF_DN[base + 3 * i + 1];
        double d2 = STIFF_DN[base + 3 * i + 2];
        // ∇N = J^-T ∂N/∂ξ: component r is Σ_c Jinv[c][r] ∂N/∂ξ_c.
        double gx = jinv[0] * d0 + jinv[3] * d1 + jinv[6] * d2;
        double gy = jinv[1] * d0 + jinv[4] * d1 + jinv[7] * d2;
        double gz = jinv[2] * d0 + jinv[5] * d1 + jinv[8] * d2;
        grad[3 * i] = gx;
        grad[3 * i + 1] = gy;
        grad[3 * i + 2] = gz;
        flux[3 * i] = w * (txx * gx + txy * gy + tzx * gz);
        flux[3 * i + 1] = w * (txy * gx + tyy * gy + tyz * gz);
        flux[3 * i + 2] = w * (tzx * gx + tyz * gy + tzz * gz);
      }
      for (int i = 0; i < 10; i++) {
        double gx = grad[3 * i];
        double gy = grad[3 * i + 1];
        double gz = grad[3 * i + 2];
        for (int j = i; j < 10; j++) {
          out[10 * i + j] += gx * flux[3 * j] + gy * flux[3 * j + 1] + gz * flux[3 * j + 2];
        }
      }
    }
    mirrorUpper(out);
  }

  @Override
  public void mass(double[] x, double[] out) {
    if (shortcut && isStraight(x)) {
      double v = LinearTetKernel.signedVolume(x);
      for (int k = 0; k < 100; k++) {
        out[k] = v * STRAIGHT.mass[k];
      }
      return;
    }
    for (int k = 0; k < 100; k++) {
      out[k] = 0;
    }
    for (int q = 0; q < MASS_RULE.size(); q++) {
      double w = MASS_RULE.weight(q) * jacobianDeterminant(x, MASS_DN, 30 * q) / 6;
      int nb = 10 * q;
      for (int i = 0; i < 10; i++) {
        double wi = w * MASS_N[nb + i];
        for (int j = i; j < 10; j++) {
          out[10 * i + j] += wi * MASS_N[nb + j];
        }
      }
    }
    mirrorUpper(out);
  }

  @Override
  public void lumpedMass(double[] x, double[] out) {
    // HRZ: the consistent diagonal scaled so that it sums to the element's total mass (the sum of
    // all consistent entries, which is the volume). E. Hinton, T. Rock, O. C. Zienkiewicz, "A note
    // on mass lumping and related processes in the finite element method", Earthquake Eng. Struct.
    // Dyn. 4 (1976) 245. Row sums would give negative corner masses (−V/20).
    if (shortcut && isStraight(x)) {
      double v = LinearTetKernel.signedVolume(x);
      for (int i = 0; i < 10; i++) {
        out[i] = v * STRAIGHT.lumped[i];
      }
      return;
    }
    mass(x, diag);
    double total = 0;
    double trace = 0;
    for (int i = 0; i < 10; i++) {
      trace += diag[11 * i];
      for (int j = 0; j < 10; j++) {
        total += diag[10 * i + j];
      }
    }
    double s = total / trace;
    for (int i = 0; i < 10; i++) {
      out[i] = s * diag[11 * i];
    }
  }

  @Override
  public void load(double[] x, double[] out) {
    if (shortcut && isStraight(x)) {
      double v = LinearTetKernel.signedVolume(x);
      for (int i = 0; i < 10; i++) {
        out[i] = v * STRAIGHT.load[i];
      }
      return;
    }
    for (int i = 0; i < 10; i++) {
      out[i] = 0;
    }
    for (int q = 0; q < MASS_RULE.size(); q++) {
      double w = MASS_RULE.weight(q) * jacobianDeterminant(x, MASS_DN, 30 * q) / 6;
      int nb = 10 * q;
      for (int i = 0; i < 10; i++) {
        out[i] += w * MASS_N[nb + i];
      }
    }
  }

  @Override
  public double volume(double[] x) {
    double v = 0;
    for (int q = 0; q < MASS_RULE.size(); q++) {
      v += MASS_RULE.weight(q) * jacobianDeterminant(x, MASS_DN, 30 * q);
    }
    return v / 6;
  }

  private void straightStiffness(double[] x, double[] tensor, int off, double[] out) {
    double v = LinearTetKernel.gradients(x, lgrad);
    double txx = tensor[off];
    double tyy = tensor[off + 1];
    double tzz = tensor[off + 2];
    double txy = tensor[off + 3];
    double tyz = tensor[off + 4];
    double tzx = tensor[off + 5];
    int p = 0;
    for (int a = 0; a < 4; a++) {
      double gx = lgrad[3 * a];
      double gy = lgrad[3 * a + 1];
      double gz = lgrad[3 * a + 2];
      double fx = v * (txx * gx + txy * gy + tzx * gz);
      double fy = v * (txy * gx + tyy * gy + tyz * gz);
      double fz = v * (tzx * gx + tyz * gy + tzz * gz);
      for (int b = a; b < 4; b++) {
        gab[p++] = lgrad[3 * b] * fx + lgrad[3 * b + 1] * fy + lgrad[3 * b + 2] * fz;
      }
    }
    double[] sab = STRAIGHT.stiffness;
    int e = 0;
    for (int i = 0; i < 10; i++) {
      for (int j = i; j < 10; j++) {
        double k = 0;
        int base = 10 * e;
        for (int q = 0; q < 10; q++) {
          k += gab[q] * sab[base + q];
        }
        out[10 * i + j] = k;
        e++;
      }
    }
    mirrorUpper(out);
  }

  /** True when every mid-edge node sits at its edge's midpoint (within rounding). */
  private static boolean isStraight(double[] x) {
    for (int e = 0; e < 6; e++) {
      int a = 3 * TetBasis.edgeStart(e);
      int b = 3 * TetBasis.edgeEnd(e);
      int m = 3 * (4 + e);
      double len2 = 0;
      double dev2 = 0;
      for (int k = 0; k < 3; k++) {
        double d = x[b + k] - x[a + k];
        double off = x[m + k] - 0.5 * (x[a + k] + x[b + k]);
        len2 += d * d;
        dev2 += off * off;
      }
      if (dev2 > STRAIGHT_TOLERANCE * STRAIGHT_TOLERANCE * len2) {
        return false;
      }
    }
    return true;
  }

  /** Reference numbers of the straight-edged 10-node tetrahedron, per unit volume. */
  private static final class StraightTables {
    /** [pair (a ≤ b) fastest, then upper-triangle entry (i ≤ j)]: S_ab,ij, 55 × 10 numbers. */
    final double[] stiffness = new double[550];

    final double[] mass = new double[100];
    final double[] lumped = new double[10];
    final double[] load = new double[10];

    StraightTables() {
      double[] l = new double[4];
      double[] n = new double[10];
      // dN_i/dL_a with the four L independent (a degree-1 polynomial in L)
      double[] d = new double[40];
      double[][] r = new double[16][100];
      TetQuadrature rule = TetQuadrature.DEGREE_2;
      for (int q = 0; q < rule.size(); q++) {
        for (int a = 0; a < 4; a++) {
          l[a] = rule.bary(q, a);
        }
        baryDerivatives(l, d);
        for (int a = 0; a < 4; a++) {
          for (int b = 0; b < 4; b++) {
            for (int i = 0; i < 10; i++) {
              for (int j = 0; j < 10; j++) {
                r[4 * a + b][10 * i + j] += rule.weight(q) * d[4 * i + a] * d[4 * j + b];
              }
            }
          }
        }
      }
      int e = 0;
      for (int i = 0; i < 10; i++) {
        for (int j = i; j < 10; j++) {
          int p = 0;
          for (int a = 0; a < 4; a++) {
            for (int b = a; b < 4; b++) {
              double s = r[4 * a + b][10 * i + j];
              if (b != a) {
                s += r[4 * b + a][10 * i + j];
              }
              stiffness[10 * e + p++] = s;
            }
          }
          e++;
        }
      }
      TetQuadrature mrule = TetQuadrature.DEGREE_5;
      for (int q = 0; q < mrule.size(); q++) {
        for (int a = 0; a < 4; a++) {
          l[a] = mrule.bary(q, a);
        }
        TetBasis.values(2, l, n);
        for (int i = 0; i < 10; i++) {
          load[i] += mrule.weight(q) * n[i];
          for (int j = 0; j < 10; j++) {
            mass[10 * i + j] += mrule.weight(q) * n[i] * n[j];
          }
        }
      }
      double trace = 0;
      for (int i = 0; i < 10; i++) {
        trace += mass[11 * i];
      }
      for (int i = 0; i < 10; i++) {
        lumped[i] = mass[11 * i] / trace; // HRZ: the diagonal scaled to a total of one volume
      }
    }

    private static void baryDerivatives(double[] l, double[] d) {
      for (int k = 0; k < 40; k++) {
        d[k] = 0;
      }
      for (int a = 0; a < 4; a++) {
        d[4 * a + a] = 4 * l[a] - 1;
      }
      for (int e = 0; e < 6; e++) {
        int a = TetBasis.edgeStart(e);
        int b = TetBasis.edgeEnd(e);
        d[4 * (4 + e) + a] = 4 * l[b];
        d[4 * (4 + e) + b] = 4 * l[a];
      }
    }
  }

  private static void mirrorUpper(double[] out) {
    for (int i = 1; i < 10; i++) {
      for (int j = 0; j < i; j++) {
        out[10 * i + j] = out[10 * j + i];
      }
    }
  }

  /** det J at one point, J[r][c] = Σ_i x[3 i + r] ∂N_i/∂ξ_c. */
  private static double jacobianDeterminant(double[] x, double[] dn, int base) {
    double j00 = 0, j01 = 0, j02 = 0, j10 = 0, j11 = 0, j12 = 0, j20 = 0, j21 = 0, j22 = 0;
    for (int i = 0; i < 10; i++) {
      double d0 = dn[base + 3 * i];
      double d1 = dn[base + 3 * i + 1];
      double d2 = dn[base + 3 * i + 2];
      double px = x[3 * i];
      double py = x[3 * i + 1];
      double pz = x[3 * i + 2];
      j00 += px * d0;
      j01 += px * d1;
      j02 += px * d2;
      j10 += py * d0;
      j11 += py * d1;
      j12 += py * d2;
      j20 += pz * d0;
      j21 += pz * d1;
      j22 += pz * d2;
    }
    return j00 * (j11 * j22 - j12 * j21)
        - j01 * (j10 * j22 - j12 * j20)
        + j02 * (j10 * j21 - j11 * j20);
  }

  /** Fills inv (row-major J^-1) at one point and returns det J. */
  private static double inverseJacobian(double[] x, double[] dn, int base, double[] inv) {
    double j00 = 0, j01 = 0, j02 = 0, j10 = 0, j11 = 0, j12 = 0, j20 = 0, j21 = 0, j22 = 0;
    for (int i = 0; i < 10; i++) {
      double d0 = dn[base + 3 * i];
      double d1 = dn[base + 3 * i + 1];
      double d2 = dn[base + 3 * i + 2];
      double px = x[3 * i];
      double py = x[3 * i + 1];
      double pz = x[3 * i + 2];
      j00 += px * d0;
      j01 += px * d1;
      j02 += px * d2;
      j10 += py * d0;
      j11 += py * d1;
      j12 += py * d2;
      j20 += pz * d0;
      j21 += pz * d1;
      j22 += pz * d2;
    }
    double c00 = j11 * j22 - j12 * j21;
    double c01 = j12 * j20 - j10 * j22;
    double c02 = j10 * j21 - j11 * j20;
    double det = j00 * c00 + j01 * c01 + j02 * c02;
    double r = 1 / det;
    inv[0] = c00 * r;
    inv[1] = (j02 * j21 - j01 * j22) * r;
    inv[2] = (j01 * j12 - j02 * j11) * r;
    inv[3] = c01 * r;
    inv[4] = (j00 * j22 - j02 * j20) * r;
    inv[5] = (j02 * j10 - j00 * j12) * r;
    inv[6] = c02 * r;
    inv[7] = (j01 * j20 - j00 * j21) * r;
    inv[8] = (j00 * j11 - j01 * j10) * r;
    return det;
  }

  private static double[] referenceGradients(TetQuadrature rule) {
    double[] out = new double[30 * rule.size()];
    double[] l = new double[4];
    double[] one = new double[30];
    for (int q = 0; q < rule.size(); q++) {
      for (int a = 0; a < 4; a++) {
        l[a] = rule.bary(q, a);
      }
      TetBasis.referenceGradients(2, l, one);
      System.arraycopy(one, 0, out, 30 * q, 30);
    }
    return out;
  }

  private static double[] values(TetQuadrature rule) {
    double[] out = new double[10 * rule.size()];
    double[] l = new double[4];
    double[] one = new double[10];
    for (int q = 0; q < rule.size(); q++) {
      for (int a = 0; a < 4; a++) {
        l[a] = rule.bary(q, a);
      }
      TetBasis.values(2, l, one);
      System.arraycopy(one, 0, out, 10 * q, 10);
    }
    return out;
  }
}
