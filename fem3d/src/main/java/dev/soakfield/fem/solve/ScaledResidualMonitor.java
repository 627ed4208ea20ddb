package dev.soakfield.fem.solve;

import no.uib.cipr.matrix.DenseVector;
import no.uib.cipr.matrix.Vector;
import no.uib.cipr.matrix.sparse.DefaultIterationMonitor;
import no.uib.cipr.matrix.sparse.IterativeSolverNotConvergedException;

/**
 * MTJ's iteration monitor measuring residuals in the diagonally scaled norm ‖D⁻¹r‖₂, so that the
 * stopping test does not depend on how the rows of the system are scaled. The target is absolute
 * (set per solve as rtol·‖D⁻¹b‖), never relative to the starting residual, so a warm start does not
 * over-solve; no divergence limit, since CG's residual may rise before it falls (NaN is still
 * caught).
 */
final class ScaledResidualMonitor extends DefaultIterationMonitor {
  private double[] inverseDiagonal = new double[0];

  ScaledResidualMonitor(int maxIterations) {
    super(maxIterations, 0.0, 0.0, Double.POSITIVE_INFINITY);
  }

  /** Takes the diagonal of the matrix the following solves use (positive, finite). */
  void scaleBy(double[] diagonal) {
    double[] inv = new double[diagonal.length];
    for (int i = 0; i < inv.length; i++) {
      inv[i] = 1.0 / diagonal[i];
    }
    inverseDiagonal = inv;
  }

  /** ‖D⁻¹v‖₂. */
  double scaledNorm(double[] v) {
    double s = 0;
    for (int i = 0; i < v.length; i++) {
      double e = v[i] * inverseDiagonal[i];
      s += e * e;
    }
    return Math.sqrt(s);
  }

  @Override
  public boolean converged(Vector r, Vector x) throws IterativeSolverNotConvergedException {
    double[] v = r instanceof DenseVector d ? d.getData() : new DenseVector(r).getData();
    return converged(scaledNorm(v), x);
  }

  @Override
  public boolean converged(Vector r) throws IterativeSolverNotConvergedException {
    return converged(r, null);
  }
}
