package dev.soakfield.fem.solve;

import no.uib.cipr.matrix.Matrix;
import no.uib.cipr.matrix.Vector;
import no.uib.cipr.matrix.sparse.Preconditioner;

/**
 * z = D⁻¹ r with D the diagonal of the matrix, as an MTJ preconditioner: for the tests that hold
 * our fused PCG (which applies D⁻¹ inside its own passes) against MTJ's CG. Overwrites the whole
 * output, so no zeroing needed.
 */
final class JacobiPreconditioner implements Preconditioner {
  private final double[] inverseDiagonal;

  /**
   * @param diagonal positive diagonal entries (checked by the caller)
   */
  JacobiPreconditioner(double[] diagonal) {
    inverseDiagonal = new double[diagonal.length];
    for (int i = 0; i < diagonal.length; i++) {
      inverseDiagonal[i] = 1.0 / diagonal[i];
    }
  }

  @Override
  public Vector apply(Vector b, Vector x) {
    double[] bd = CsrOperator.data(b);
    double[] xd = CsrOperator.data(x);
    for (int i = 0; i < xd.length; i++) {
      xd[i] = inverseDiagonal[i] * bd[i];
    }
    return x;
  }

  @Override
  public Vector transApply(Vector b, Vector x) {
    return apply(b, x);
  }

  @Override
  public void setMatrix(Matrix matrix) {
    throw new UnsupportedOperationException(
        "built from the diagonal of a CsrMatrix; use PcgSolver.setMatrix");
  }
}
