package dev.soakfield.fem.solve;

import java.util.Arrays;
import java.util.List;
import no.uib.cipr.matrix.Matrix;
import no.uib.cipr.matrix.Vector;
import no.uib.cipr.matrix.sparse.Preconditioner;

/**
 * One symmetric V-cycle of the smoothed-aggregation hierarchy per application: forward
 * Gauss–Seidel, coarse correction, backward Gauss–Seidel. The output starts from zero whatever MTJ
 * passes in (MTJ's CG hands over its previous vector; using it as a guess would make the
 * preconditioner change between iterations and break CG).
 */
final class AmgPreconditioner implements Preconditioner {
  private final AmgHierarchy hierarchy;
  private final List<AmgLevel> levels;

  AmgPreconditioner(AmgHierarchy hierarchy) {
    this.hierarchy = hierarchy;
    this.levels = hierarchy.levels();
  }

  AmgHierarchy hierarchy() {
    return hierarchy;
  }

  @Override
  public Vector apply(Vector b, Vector x) {
    double[] xd = CsrOperator.data(x);
    apply(CsrOperator.data(b), xd);
    return x;
  }

  /** x = B b with B the V-cycle operator (x's content is ignored). */
  void apply(double[] b, double[] x) {
    Arrays.fill(x, 0.0);
    cycle(0, b, x);
  }

  @Override
  public Vector transApply(Vector b, Vector x) {
    return apply(b, x);
  }

  @Override
  public void setMatrix(Matrix matrix) {
    throw new UnsupportedOperationException(
        "built from a CsrMatrix hierarchy; use PcgSolver.setMatrix");
  }

  /** x (zero on entry) ← V-cycle on level l for right-hand side b. */
  private void cycle(int l, double[] b, double[] x) {
    AmgLevel level = levels.get(l);
    if (l == levels.size() - 1) {
      solveCoarsest(level, b, x);
      return;
    }
    GaussSeidel.forward(level.matrix, level.inverseDiagonal, b, x);
    double[] r = level.residual;
    level.matrix.multiply(x, r);
    for (int i = 0; i < r.length; i++) {
      r[i] = b[i] - r[i];
    }
    AmgLevel coarse = levels.get(l + 1);
    level.restriction.multiply(r, coarse.rhs);
    Arrays.fill(coarse.solution, 0.0);
    cycle(l + 1, coarse.rhs, coarse.solution);
    level.prolongator.multiplyAdd(coarse.solution, x);
    GaussSeidel.backward(level.matrix, level.inverseDiagonal, b, x);
  }

  private void solveCoarsest(AmgLevel level, double[] b, double[] x) {
    if (hierarchy.direct() != null) {
      hierarchy.direct().solve(b, x);
      return;
    }
    for (int s = 0; s < AmgHierarchy.COARSE_SWEEP_PAIRS; s++) {
      GaussSeidel.forward(level.matrix, level.inverseDiagonal, b, x);
      GaussSeidel.backward(level.matrix, level.inverseDiagonal, b, x);
    }
  }
}
