package dev.soakfield.fem.solve;

import dev.soakfield.fem.assembly.CsrMatrix;
import java.util.ArrayList;
import java.util.List;

/**
 * The smoothed-aggregation hierarchy (Vaněk, Mandel & Brezina, Computing 56 (1996) 179): per level
 * strength filtering with ε = 0.08·2^−level, greedy aggregation, a smoothed prolongator, and the
 * Galerkin coarse matrix Pᵀ A P. Coarsening stops at {@link #DIRECT_ROWS} rows (dense Cholesky), or
 * when it no longer reduces the size: then the last level is solved by smoothing sweeps alone,
 * which suits the diagonally dominant rows that stopped it.
 */
final class AmgHierarchy {
  static final int DIRECT_ROWS = 500;
  static final double FIRST_EPSILON = 0.08;
  static final int MAX_LEVELS = 25;

  /** A level that keeps more than this share of its rows ends the coarsening. */
  static final double STALLED_SHARE = 0.9;

  /** Forward+backward sweep pairs on a coarsest level too large for Cholesky. */
  static final int COARSE_SWEEP_PAIRS = 4;

  private final List<AmgLevel> levels;
  private final DenseCholesky direct;

  private AmgHierarchy(List<AmgLevel> levels, DenseCholesky direct) {
    this.levels = levels;
    this.direct = direct;
  }

  static AmgHierarchy build(CsrMatrix a) {
    List<AmgLevel> levels = new ArrayList<>();
    CsrMatrix current = a;
    double epsilon = FIRST_EPSILON;
    while (true) {
      double[] diagonal = current.diagonal();
      if (current.size() <= DIRECT_ROWS || levels.size() == MAX_LEVELS - 1) {
        levels.add(new AmgLevel(current, diagonal, null, null));
        return new AmgHierarchy(
            levels, current.size() <= DIRECT_ROWS ? DenseCholesky.factor(current) : null);
      }
      SparseRows filtered = StrengthFilter.filter(current, diagonal, epsilon);
      GreedyAggregation aggregation = GreedyAggregation.of(filtered);
      int nc = aggregation.count();
      if (nc == 0 || nc > STALLED_SHARE * current.size()) {
        levels.add(new AmgLevel(current, diagonal, null, null));
        return new AmgHierarchy(levels, null);
      }
      SparseRows p = SmoothedProlongator.build(filtered, aggregation);
      SparseRows pt = p.transpose();
      levels.add(new AmgLevel(current, diagonal, p, pt));
      current = GalerkinProduct.coarse(current, p, pt);
      epsilon *= 0.5;
    }
  }

  List<AmgLevel> levels() {
    return levels;
  }

  /** Dense factor of the coarsest level, or null when that level is solved by sweeps. */
  DenseCholesky direct() {
    return direct;
  }

  /** Σ nnz over levels / nnz of the finest: the memory and work overhead of the hierarchy. */
  double operatorComplexity() {
    long total = 0;
    for (AmgLevel level : levels) {
      total += level.matrix.nonZeros();
    }
    return (double) total / levels.get(0).matrix.nonZeros();
  }

  /** Sizes of the levels, finest first, e.g. "274625 > 12470 > 611". */
  String describe() {
    StringBuilder s = new StringBuilder();
    for (AmgLevel level : levels) {
      if (s.length() > 0) {
        s.append(" > ");
      }
      s.append(level.size());
    }
    return s.append(direct != null ? " (direct)" : " (sweeps)").toString();
  }
}
