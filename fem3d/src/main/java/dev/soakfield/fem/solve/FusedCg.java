package dev.soakfield.fem.solve;

import dev.soakfield.fem.assembly.CsrMatrix;

/**
 * Preconditioned conjugate gradients on plain arrays, each iteration in as few passes over memory
 * as the algorithm allows, every pass split over the cores ({@link RowSlices}):
 *
 * <ol>
 *   <li>q = A p together with p·q (one pass over the matrix);
 *   <li>x += α p, r −= α q, and — with Jacobi — z = D⁻¹r, r·z and ‖D⁻¹r‖² in the same pass;
 *   <li>p = z + β p (with Jacobi z is not stored: p = D⁻¹r + β p).
 * </ol>
 *
 * <p>With AMG the preconditioner is one more pass of its own and r·z another. Iterations are
 * vector-for-vector those of textbook PCG (Saad, Iterative Methods for Sparse Linear Systems, 2nd
 * ed., Algorithm 9.1); the partial sums of each pass are added in slice order, so a solve gives the
 * same bits on every run with the same core count. MTJ's CG, which this replaces in the solve path,
 * runs every vector operation single-threaded and separately (eight passes).
 */
final class FusedCg {
  /**
   * What a solve ended with.
   *
   * @param residualSum Σ r_i of the final residual b − A x (unscaled): what the solve leaves of the
   *     rows' balance
   */
  record Outcome(
      int iterations, double residual, boolean converged, boolean brokeDown, double residualSum) {}

  private double[] r = new double[0];
  private double[] z = new double[0];
  private double[] p = new double[0];
  private double[] q = new double[0];

  private void ensure(int n) {
    if (r.length != n) {
      r = new double[n];
      z = new double[n];
      p = new double[n];
      q = new double[n];
    }
  }

  /**
   * Solves A x = b from the guess in x until ‖D⁻¹(b − A x)‖ ≤ target.
   *
   * @param inverseDiagonal D⁻¹, for the stopping norm (and the Jacobi preconditioner)
   * @param amg the AMG preconditioner, or null for Jacobi
   */
  Outcome solve(
      CsrMatrix a,
      double[] inverseDiagonal,
      AmgPreconditioner amg,
      double[] b,
      double[] x,
      double target,
      int maxIterations) {
    int n = a.size();
    ensure(n);
    int[] rs = a.rowStart();
    int[] cols = a.cols();
    double[] values = a.values();
    int parts = RowSlices.slicesFor(n);
    double[] partial = new double[4 * parts];
    // r = b − A x and its norm
    RowSlices.run(
        parts,
        s -> {
          double norm = 0;
          double rsum = 0;
          for (int i = from(n, parts, s), to = from(n, parts, s + 1); i < to; i++) {
            double ri = b[i] - row(rs, cols, values, i, x);
            r[i] = ri;
            rsum += ri;
            double e = ri * inverseDiagonal[i];
            norm += e * e;
          }
          partial[s] = norm;
          partial[3 * parts + s] = rsum;
        });
    double residual = Math.sqrt(sum(partial, parts, 0));
    if (!(residual > target)) {
      return new Outcome(
          0, residual, residual <= target, Double.isNaN(residual), sum(partial, parts, 3 * parts));
    }
    double rho = precondition(amg, inverseDiagonal, n, parts, partial);
    // p = z
    if (amg == null) {
      RowSlices.run(
          parts,
          s -> {
            for (int i = from(n, parts, s), to = from(n, parts, s + 1); i < to; i++) {
              p[i] = inverseDiagonal[i] * r[i];
            }
          });
    } else {
      System.arraycopy(z, 0, p, 0, n);
    }
    for (int k = 1; k <= maxIterations; k++) {
      // 1. q = A p, p·q
      RowSlices.run(
          parts,
          s -> {
            double pq = 0;
            for (int i = from(n, parts, s), to = from(n, parts, s + 1); i < to; i++) {
              double qi = row(rs, cols, values, i, p);
              q[i] = qi;
              pq += p[i] * qi;
            }
            partial[s] = pq;
          });
      // no test on p·q: zero curvature makes α infinite and the residual NaN, caught below
      double alpha = rho / sum(partial, parts, 0);
      // 2. x += α p, r −= α q, the norm (and with Jacobi z and r·z on the fly)
      boolean jacobi = amg == null;
      RowSlices.run(
          parts,
          s -> {
            double norm = 0;
            double rz = 0;
            double rsum = 0;
            for (int i = from(n, parts, s), to = from(n, parts, s + 1); i < to; i++) {
              x[i] += alpha * p[i];
              double ri = r[i] - alpha * q[i];
              r[i] = ri;
              rsum += ri;
              double e = ri * inverseDiagonal[i];
              norm += e * e;
              rz += ri * e;
            }
            partial[s] = norm;
            partial[parts + s] = rz;
            partial[3 * parts + s] = rsum;
          });
      residual = Math.sqrt(sum(partial, parts, 0));
      if (!Double.isFinite(residual)) {
        return new Outcome(k, Double.NaN, false, true, Double.NaN);
      }
      if (residual <= target) {
        return new Outcome(k, residual, true, false, sum(partial, parts, 3 * parts));
      }
      double rhoNew =
          jacobi
              ? sum(partial, parts, parts)
              : precondition(amg, inverseDiagonal, n, parts, partial);
      double beta = rhoNew / rho;
      rho = rhoNew;
      // 3. p = z + β p
      RowSlices.run(
          parts,
          s -> {
            for (int i = from(n, parts, s), to = from(n, parts, s + 1); i < to; i++) {
              double zi = jacobi ? inverseDiagonal[i] * r[i] : z[i];
              p[i] = zi + beta * p[i];
            }
          });
    }
    return new Outcome(maxIterations, residual, false, false, sum(partial, parts, 3 * parts));
  }

  /** z = M⁻¹ r and r·z (with Jacobi only r·z: z is formed where it is used). */
  private double precondition(
      AmgPreconditioner amg, double[] inverseDiagonal, int n, int parts, double[] partial) {
    if (amg != null) {
      amg.apply(r, z);
    }
    RowSlices.run(
        parts,
        s -> {
          double rz = 0;
          for (int i = from(n, parts, s), to = from(n, parts, s + 1); i < to; i++) {
            rz += r[i] * (amg == null ? inverseDiagonal[i] * r[i] : z[i]);
          }
          partial[s] = rz;
        });
    return sum(partial, parts, 0);
  }

  private static double row(int[] rs, int[] cols, double[] values, int i, double[] v) {
    double s = 0;
    for (int k = rs[i]; k < rs[i + 1]; k++) {
      s += values[k] * v[cols[k]];
    }
    return s;
  }

  /** First row of slice s (its bounds are computed once per pass, not per row: a long division). */
  private static int from(int n, int parts, int s) {
    return RowSlices.start(n, parts, s);
  }

  private static double sum(double[] partial, int parts, int offset) {
    double s = 0;
    for (int i = 0; i < parts; i++) {
      s += partial[offset + i];
    }
    return s;
  }
}
