package dev.soakfield.fem.solve;

import dev.soakfield.fem.assembly.CsrMatrix;

/** One level of the hierarchy: its matrix, smoother data, transfers to the next level, work. */
final class AmgLevel {
  final CsrMatrix matrix;
  final double[] inverseDiagonal;

  /** Fine-from-coarse prolongator P, or null on the coarsest level. */
  final SparseRows prolongator;

  /** Restriction Pᵀ, or null on the coarsest level. */
  final SparseRows restriction;

  final double[] residual;
  final double[] rhs;
  final double[] solution;

  AmgLevel(CsrMatrix matrix, double[] diagonal, SparseRows prolongator, SparseRows restriction) {
    this.matrix = matrix;
    int n = matrix.size();
    this.inverseDiagonal = new double[n];
    for (int i = 0; i < n; i++) {
      inverseDiagonal[i] = 1.0 / diagonal[i];
    }
    this.prolongator = prolongator;
    this.restriction = restriction;
    this.residual = new double[n];
    this.rhs = new double[n];
    this.solution = new double[n];
  }

  int size() {
    return matrix.size();
  }
}
