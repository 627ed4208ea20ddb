package dev.soakfield.fem.solve;

import dev.soakfield.fem.assembly.CsrMatrix;
import no.uib.cipr.matrix.AbstractMatrix;
import no.uib.cipr.matrix.DenseVector;
import no.uib.cipr.matrix.Vector;

/**
 * Presents a symmetric {@link CsrMatrix} to MTJ's iterative solvers. Only the products CG uses are
 * overridden, all with the matrix's own (parallel) multiply; MTJ's defaults would go entry by
 * entry.
 */
final class CsrOperator extends AbstractMatrix {
  private final CsrMatrix a;
  private final double[] product;

  CsrOperator(CsrMatrix a) {
    super(a.size(), a.size());
    this.a = a;
    this.product = new double[a.size()];
  }

  /** The array behind a dense vector (MTJ's CG only ever hands us copies of our own vectors). */
  static double[] data(Vector v) {
    if (v instanceof DenseVector dense) {
      return dense.getData();
    }
    throw new IllegalArgumentException("expected a DenseVector, got " + v.getClass().getName());
  }

  @Override
  public double get(int row, int column) {
    return a.get(row, column);
  }

  @Override
  public Vector mult(Vector x, Vector y) {
    a.multiply(data(x), data(y));
    return y;
  }

  @Override
  public Vector mult(double alpha, Vector x, Vector y) {
    double[] yd = data(y);
    a.multiply(data(x), yd);
    for (int i = 0; i < yd.length; i++) {
      yd[i] *= alpha;
    }
    return y;
  }

  @Override
  public Vector multAdd(Vector x, Vector y) {
    return multAdd(1.0, x, y);
  }

  @Override
  public Vector multAdd(double alpha, Vector x, Vector y) {
    double[] yd = data(y);
    a.multiply(data(x), product);
    for (int i = 0; i < yd.length; i++) {
      yd[i] += alpha * product[i];
    }
    return y;
  }

  // The matrix is symmetric: the transposed products are the plain ones.

  @Override
  public Vector transMult(Vector x, Vector y) {
    return mult(x, y);
  }

  @Override
  public Vector transMult(double alpha, Vector x, Vector y) {
    return mult(alpha, x, y);
  }

  @Override
  public Vector transMultAdd(Vector x, Vector y) {
    return multAdd(1.0, x, y);
  }

  @Override
  public Vector transMultAdd(double alpha, Vector x, Vector y) {
    return multAdd(alpha, x, y);
  }
}
