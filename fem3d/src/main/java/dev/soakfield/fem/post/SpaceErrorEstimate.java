package dev.soakfield.fem.post;

import dev.soakfield.fem.element.ReferenceMap;
import dev.soakfield.fem.element.TetBasis;
import dev.soakfield.fem.element.TetQuadrature;
import dev.soakfield.mesh.TetMesh;

/**
 * An estimate of the discretisation error in space of a concentration field, from its recovered
 * gradient (O. C. Zienkiewicz and J. Z. Zhu, "A simple error estimator and adaptive procedure for
 * practical engineering analysis", Int. J. Numer. Methods Eng. 24 (1987) 337): the element
 * gradients of c = S·φ are averaged at the nodes, part by part (c jumps where parts meet), and the
 * gap between an element's own gradient and the recovered one, G − ∇c_h, measures how far the
 * element is from representing the field. Across an element of width w along the gradient, a gap of
 * that size means an error in c of about κ·w·|G − ∇c_h|; the element's share of the error is its
 * mean over the element:
 *
 * <pre>e_K = κ_p · w_K · (1/|K|) ∫_K |∇c_h − G| dV</pre>
 *
 * (a concentration), and the error of an amount is Σ e_K |K|. κ_p is calibrated against exact
 * solutions (the plane sheet of Crank's eq. 4.17 from its first layer filling at once to
 * saturation, a sphere, manufactured solutions) so that the estimate brackets the true error within
 * a factor of 3 there: κ₁ for linear, κ₂ for quadratic elements (see the constants).
 *
 * <p>What it promises. Per element and summed as sizes ({@link #absoluteError()}) it estimates ∫|c
 * − c_h| dV, for both orders. Linear elements' errors carry the sign of their curvature, so {@link
 * #amountError()} estimates the amount's error itself. For quadratic elements the amount's error is
 * a bound only: a Galerkin field's amount converges faster than the field (h⁴ against h³ for
 * quadratic elements, measured on the sphere and the manufactured cases) and its sign changes from
 * mesh to mesh, which no local estimate follows; on well-resolved smooth fields the bound
 * overstates it by up to about 1/h (verify's AccuracyEstimates). A goal-oriented (dual-weighted)
 * estimate would follow it, at the cost of a backward run (R. Becker and R. Rannacher, Acta
 * Numerica 10 (2001) 1).
 */
public final class SpaceErrorEstimate {
  /**
   * Linear elements. In one dimension the interpolation error of a smooth field averages h²|c''|/12
   * over an element and the gap averages h|c''|/4, so κ = 1/3 there; when the first layer fills at
   * once the error is h/2 against a gap sum of h/2, κ = 1. 0.8 sits between them (calibrated).
   */
  static final double KAPPA_LINEAR = 0.8;

  /**
   * Quadratic elements, calibrated against ∫|c − c_h| dV on the sphere and both manufactured
   * solutions (estimate/true 0.65 to 1.0 there; 0.18 before, which sat at 0.39 to 1.1). The
   * averaged nodal gradients of a quadratic field are as accurate as its own (O(h²)), so the gap is
   * of the error's order and its ratio to the error stays put as the mesh is refined (measured:
   * sphere 0.68, 0.70, 0.75 on n = 4, 6, 8).
   */
  static final double KAPPA_QUADRATIC = 0.25;

  private final double[] elementError;
  private final double[] volume;
  private double[] partLargest;

  private SpaceErrorEstimate(double[] elementError, double[] volume) {
    this.elementError = elementError;
    this.volume = volume;
  }

  /**
   * The estimate for potential φ (one value per node) and solubility S per tetrahedron (c = S·φ).
   */
  public static SpaceErrorEstimate of(TetMesh mesh, double[] phi, double[] tetS) {
    return mesh.order() == 1 ? linear(mesh, phi, tetS) : general(mesh, phi, tetS);
  }

  /**
   * Linear elements, the fast way: each element's gradient is constant (found once from its edge
   * matrix), the recovered gradient is linear in it, so the gap is integrated by the degree-2
   * rule's four points with barycentric weights alone.
   */
  private static SpaceErrorEstimate linear(TetMesh mesh, double[] phi, double[] tetS) {
    int tets = mesh.tetCount();
    double[] recovered = new double[3 * mesh.nodeCount()];
    double[] weight = new double[mesh.nodeCount()];
    double[] error = new double[tets];
    double[] vol = new double[tets];
    double[] grad = new double[3];
    double[] mean = new double[3];
    double[] scratch = new double[12];
    TetQuadrature rule = TetQuadrature.DEGREE_2;
    for (int g = 0; g < mesh.volumeGroups().size(); g++) {
      java.util.Arrays.fill(recovered, 0);
      java.util.Arrays.fill(weight, 0);
      for (int t = 0; t < tets; t++) {
        if (mesh.tetGroup(t) == g) {
          vol[t] = linearGradient(mesh, t, phi, tetS[t], grad, scratch);
          for (int i = 0; i < 4; i++) {
            int v = mesh.tetNode(t, i);
            recovered[3 * v] += vol[t] * grad[0];
            recovered[3 * v + 1] += vol[t] * grad[1];
            recovered[3 * v + 2] += vol[t] * grad[2];
            weight[v] += vol[t];
          }
        }
      }
      divide(recovered, weight);
      for (int t = 0; t < tets; t++) {
        if (mesh.tetGroup(t) != g) {
          continue;
        }
        linearGradient(mesh, t, phi, tetS[t], grad, scratch);
        double gap = 0;
        java.util.Arrays.fill(mean, 0);
        for (int k = 0; k < rule.size(); k++) {
          double gx = -grad[0];
          double gy = -grad[1];
          double gz = -grad[2];
          for (int i = 0; i < 4; i++) {
            int node = mesh.tetNode(t, i);
            double l = rule.bary(k, i);
            gx += l * recovered[3 * node];
            gy += l * recovered[3 * node + 1];
            gz += l * recovered[3 * node + 2];
            mean[0] += rule.weight(k) * l * recovered[3 * node];
            mean[1] += rule.weight(k) * l * recovered[3 * node + 1];
            mean[2] += rule.weight(k) * l * recovered[3 * node + 2];
          }
          gap += rule.weight(k) * Math.sqrt(gx * gx + gy * gy + gz * gz);
        }
        double w = width(mesh, t, dot(grad, grad) > 0 ? grad : mean);
        error[t] = KAPPA_LINEAR * w * gap * curvatureSign(mesh, t, recovered);
      }
    }
    return new SpaceErrorEstimate(error, vol);
  }

  /** ∇(S·φ) of a linear tetrahedron into grad (scratch: 12 numbers); returns its volume. */
  private static double linearGradient(
      TetMesh mesh, int t, double[] phi, double s, double[] grad, double[] scratch) {
    int a = mesh.tetNode(t, 0);
    double[] e = scratch; // the edges from corner 0 in 0..8, the differences of c in 9..11
    for (int k = 0; k < 3; k++) {
      int b = mesh.tetNode(t, k + 1);
      for (int r = 0; r < 3; r++) {
        e[3 * k + r] = mesh.coord(b, r) - mesh.coord(a, r);
      }
      e[9 + k] = s * (phi[b] - phi[a]);
    }
    double d0 = e[9];
    double d1 = e[10];
    double d2 = e[11];
    // solve E·grad = d (rows of E the edges from corner 0) by Cramer's rule
    double det =
        e[0] * (e[4] * e[8] - e[5] * e[7])
            - e[1] * (e[3] * e[8] - e[5] * e[6])
            + e[2] * (e[3] * e[7] - e[4] * e[6]);
    grad[0] =
        (d0 * (e[4] * e[8] - e[5] * e[7])
                - e[1] * (d1 * e[8] - e[5] * d2)
                + e[2] * (d1 * e[7] - e[4] * d2))
            / det;
    grad[1] =
        (e[0] * (d1 * e[8] - e[5] * d2)
                - d0 * (e[3] * e[8] - e[5] * e[6])
                + e[2] * (e[3] * d2 - d1 * e[6]))
            / det;
    grad[2] =
        (e[0] * (e[4] * d2 - d1 * e[7])
                - e[1] * (e[3] * d2 - d1 * e[6])
                + d0 * (e[3] * e[7] - e[4] * e[6]))
            / det;
    return Math.abs(det) / 6;
  }

  private static void divide(double[] recovered, double[] weight) {
    for (int v = 0; v < weight.length; v++) {
      if (weight[v] > 0) {
        for (int r = 0; r < 3; r++) {
          recovered[3 * v + r] /= weight[v];
        }
      }
    }
  }

  /** Quadratic (isoparametric) elements: gradients sampled at the nodes and quadrature points. */
  private static SpaceErrorEstimate general(TetMesh mesh, double[] phi, double[] tetS) {
    int tets = mesh.tetCount();
    int per = mesh.nodesPerTet();
    TetQuadrature rule = mesh.order() == 1 ? TetQuadrature.DEGREE_2 : TetQuadrature.DEGREE_5;
    // the element gradients are sampled at the nodes (for the recovery), then at the rule's points
    Geometry geo = new Geometry(mesh, samplePoints(per, rule));
    double[] recovered = new double[3 * mesh.nodeCount()];
    double[] weight = new double[mesh.nodeCount()];
    double[] error = new double[tets];
    double[] vol = new double[tets];
    double[] own = new double[3];
    double[] mean = new double[3];
    int groups = mesh.volumeGroups().size();
    for (int g = 0; g < groups; g++) {
      java.util.Arrays.fill(recovered, 0);
      java.util.Arrays.fill(weight, 0);
      for (int t = 0; t < tets; t++) {
        if (mesh.tetGroup(t) != g) {
          continue;
        }
        for (int i = 0; i < per; i++) {
          geo.at(t, i, phi);
          int v = mesh.tetNode(t, i);
          double w = geo.jacobian();
          for (int r = 0; r < 3; r++) {
            recovered[3 * v + r] += w * tetS[t] * geo.grad[r];
          }
          weight[v] += w;
        }
      }
      divide(recovered, weight);
      for (int t = 0; t < tets; t++) {
        if (mesh.tetGroup(t) != g) {
          continue;
        }
        double gap = 0;
        double v = 0;
        java.util.Arrays.fill(own, 0);
        java.util.Arrays.fill(mean, 0);
        for (int k = 0; k < rule.size(); k++) {
          geo.at(t, per + k, phi);
          double dv = rule.weight(k) * geo.jacobian() / 6;
          double gx = -tetS[t] * geo.grad[0];
          double gy = -tetS[t] * geo.grad[1];
          double gz = -tetS[t] * geo.grad[2];
          for (int r = 0; r < 3; r++) {
            own[r] += dv * geo.grad[r];
          }
          double[] n = geo.shape();
          for (int i = 0; i < per; i++) {
            int node = mesh.tetNode(t, i);
            gx += n[i] * recovered[3 * node];
            gy += n[i] * recovered[3 * node + 1];
            gz += n[i] * recovered[3 * node + 2];
            mean[0] += dv * n[i] * recovered[3 * node];
            mean[1] += dv * n[i] * recovered[3 * node + 1];
            mean[2] += dv * n[i] * recovered[3 * node + 2];
          }
          gap += dv * Math.sqrt(gx * gx + gy * gy + gz * gz);
          v += dv;
        }
        vol[t] = v;
        // the width along the element's own (mean) gradient; along the recovered one where that is
        // zero
        double w = width(mesh, t, dot(own, own) > 0 ? own : mean);
        // quadratic elements: a size only (the curvature's sign does not tell theirs)
        error[t] = KAPPA_QUADRATIC * w * gap / v;
      }
    }
    return new SpaceErrorEstimate(error, vol);
  }

  /** The element's nodes, then the rule's points, in barycentric coordinates. */
  private static double[][] samplePoints(int per, TetQuadrature rule) {
    double[][] nodes = nodeBarycentrics(per);
    double[][] points = new double[per + rule.size()][];
    System.arraycopy(nodes, 0, points, 0, per);
    for (int k = 0; k < rule.size(); k++) {
      points[per + k] =
          new double[] {rule.bary(k, 0), rule.bary(k, 1), rule.bary(k, 2), rule.bary(k, 3)};
    }
    return points;
  }

  /**
   * The tetrahedron's width along a direction (its corners' spread), the element size that matters
   * for a field changing that way; its smallest height when the direction is zero.
   */
  private static double width(TetMesh mesh, int t, double[] direction) {
    double norm = Math.sqrt(dot(direction, direction));
    double lo = Double.POSITIVE_INFINITY;
    double hi = Double.NEGATIVE_INFINITY;
    if (norm == 0) {
      return 0;
    }
    for (int a = 0; a < 4; a++) {
      int v = mesh.tetNode(t, a);
      double s =
          (mesh.coord(v, 0) * direction[0]
                  + mesh.coord(v, 1) * direction[1]
                  + mesh.coord(v, 2) * direction[2])
              / norm;
      lo = Math.min(lo, s);
      hi = Math.max(hi, s);
    }
    return hi - lo;
  }

  /**
   * The sign of c_h − c an element's interpolation error has: for a field of Hessian H, ∫_K (c − I
   * c) = −(|K|/40)·Σ over the six edges e of eᵀHe (exact for quadratics, common practice), with H
   * the gradient of the recovered gradient across the element's corners. Where the field curves up,
   * the straight element lies above it. Elements of opposite curvature then cancel in a sum as
   * their errors do.
   */
  private static double curvatureSign(TetMesh mesh, int t, double[] recovered) {
    // eᵀHe = e·(G(end) − G(start)) for a G linear across the element
    double sum = 0;
    for (int i = 0; i < 4; i++) {
      for (int j = i + 1; j < 4; j++) {
        int p = mesh.tetNode(t, i);
        int q = mesh.tetNode(t, j);
        for (int r = 0; r < 3; r++) {
          sum +=
              (mesh.coord(q, r) - mesh.coord(p, r)) * (recovered[3 * q + r] - recovered[3 * p + r]);
        }
      }
    }
    return sum >= 0 ? 1 : -1;
  }

  private static double dot(double[] a, double[] b) {
    return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
  }

  private static double[][] nodeBarycentrics(int per) {
    double[][] b = new double[per][4];
    for (int a = 0; a < 4; a++) {
      b[a][a] = 1;
    }
    for (int e = 0; per == 10 && e < 6; e++) {
      b[4 + e][TetBasis.edgeStart(e)] = 0.5;
      b[4 + e][TetBasis.edgeEnd(e)] = 0.5;
    }
    return b;
  }

  /**
   * The estimated error of c at a point in tetrahedron {@code tet}: the larger of its own estimate
   * and the largest in its part. An error is carried by diffusion from where it is made (an exposed
   * face, the first layer filling at once) to where it is read, so a point in a smooth region holds
   * more error than its element makes (measured at a sphere's centre: three times the local
   * estimate with linear elements, up to seven with quadratic ones); diffusion spreads it without
   * raising it above the largest made in the part (the error obeys the same maximum principle as
   * the field, common practice).
   */
  public double pointError(TetMesh mesh, int tet) {
    if (partLargest == null) {
      partLargest = new double[mesh.volumeGroups().size()];
      for (int t = 0; t < elementError.length; t++) {
        int g = mesh.tetGroup(t);
        partLargest[g] = Math.max(partLargest[g], Math.abs(elementError[t]));
      }
    }
    return Math.max(Math.abs(elementError[tet]), partLargest[mesh.tetGroup(tet)]);
  }

  /** Estimated mean |c − c_h| per tetrahedron, in the field's unit (shared; read only). */
  public double[] elementErrors() {
    return elementError;
  }

  /** Estimated error of the amount ∫c dV over the parts flagged (all when null). */
  public double amountError(boolean[] inPart, TetMesh mesh) {
    double sum = 0;
    for (int t = 0; t < elementError.length; t++) {
      if (inPart == null || inPart[mesh.tetGroup(t)]) {
        sum += elementError[t] * volume[t];
      }
    }
    return sum;
  }

  /**
   * Estimated ∫|c − c_h| dV over the whole mesh: the amount's error if no element's error cancelled
   * another's, and a bound of the amount's error (within the estimate's factor).
   */
  public double absoluteError() {
    double sum = 0;
    for (int t = 0; t < elementError.length; t++) {
      sum += Math.abs(elementError[t]) * volume[t];
    }
    return sum;
  }

  /** Estimated error of the amount over the whole mesh (its size). */
  public double amountError() {
    double sum = 0;
    for (int t = 0; t < elementError.length; t++) {
      sum += elementError[t] * volume[t];
    }
    return Math.abs(sum);
  }

  /**
   * The isoparametric map of one tetrahedron at fixed sample points: shape values, ∇φ_h and |det J|
   * there. The shape functions and their reference gradients are the same for every element, so
   * they are tabulated once per sample point.
   */
  private static final class Geometry {
    private final TetMesh mesh;
    private final int per;
    private final double[][] n;
    private final double[][] dn;
    private final double[] j = new double[9];
    final double[] grad = new double[3];
    private double det;
    private int sample;

    Geometry(TetMesh mesh, double[][] points) {
      this.mesh = mesh;
      this.per = mesh.nodesPerTet();
      this.n = new double[points.length][per];
      this.dn = new double[points.length][3 * per];
      for (int k = 0; k < points.length; k++) {
        TetBasis.values(mesh.order(), points[k], n[k]);
        TetBasis.referenceGradients(mesh.order(), points[k], dn[k]);
      }
    }

    /** The shape values at the last sample point (shared; read only). */
    double[] shape() {
      return n[sample];
    }

    void at(int t, int k, double[] u) {
      sample = k;
      double[] dk = dn[k];
      java.util.Arrays.fill(j, 0);
      double d0 = 0;
      double d1 = 0;
      double d2 = 0;
      for (int i = 0; i < per; i++) {
        int v = mesh.tetNode(t, i);
        for (int r = 0; r < 3; r++) {
          double c = mesh.coord(v, r);
          j[3 * r] += c * dk[3 * i];
          j[3 * r + 1] += c * dk[3 * i + 1];
          j[3 * r + 2] += c * dk[3 * i + 2];
        }
        d0 += u[v] * dk[3 * i];
        d1 += u[v] * dk[3 * i + 1];
        d2 += u[v] * dk[3 * i + 2];
      }
      det = ReferenceMap.gradient(j, d0, d1, d2, grad);
    }

    double jacobian() {
      return Math.abs(det);
    }
  }
}
