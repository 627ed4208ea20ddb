package dev.soakfield.fem.solve;

import dev.soakfield.fem.assembly.CsrMatrix;
import java.io.PrintWriter;
import java.util.Locale;
import no.uib.cipr.matrix.DenseVector;
import no.uib.cipr.matrix.sparse.CG;
import no.uib.cipr.matrix.sparse.CompRowMatrix;
import no.uib.cipr.matrix.sparse.DefaultIterationMonitor;
import no.uib.cipr.matrix.sparse.DiagonalPreconditioner;
import no.uib.cipr.matrix.sparse.IterativeSolverNotConvergedException;

/**
 * Measures, in one run, the sparse product against the machine's memory bandwidth and our PCG
 * (Jacobi, AMG) against stock MTJ (CG with its diagonal preconditioner on its CompRowMatrix), on
 * the matrix a run solves: M + dt·K of tetrahedra on a box of (gridN − 1)³ cells (linear), six
 * tetrahedra each (the structured mesher's), D = 1, at step ratios dt·D/h² of 1 and 100. Figures
 * are best-of-several after warm-up runs (the first runs include JIT compilation).
 *
 * <p>One PCG iteration with Jacobi moves one SpMV (12 bytes per nonzero, 20 per row) and 11 vectors
 * of 8 bytes per row in our fused passes; at the triad rate that is its floor, and the bench prints
 * the iteration's time as a multiple of it.
 */
public final class SolverBench {
  private static final int TRIAD_LENGTH = 20_000_000;
  private static final double TOLERANCE = 1e-8;
  private static final int REPEATS = 3;

  /** Vector bytes per row of one fused Jacobi-PCG iteration beyond its SpMV (see FusedCg). */
  static final double FUSED_VECTOR_BYTES_PER_ROW = 11 * 8.0;

  private SolverBench() {}

  /** Prints the figures to {@code out}; gridN = 65 (64³ cells) gives 274,625 rows. */
  public static void run(PrintWriter out, int gridN) {
    run(out, gridN, 1);
  }

  /**
   * As above with linear (order 1) or quadratic (order 2: (gridN − 1)/2 cells a side, gridN odd)
   * tetrahedra; also prints what the automatic choice takes against what the run measured.
   */
  public static void run(PrintWriter out, int gridN, int order) {
    if (gridN < 8 || gridN > 200) {
      throw new IllegalArgumentException("grid size must lie in [8, 200], got " + gridN);
    }
    if (order != 1 && !(order == 2 && gridN % 2 == 1)) {
      throw new IllegalArgumentException(
          "order "
              + order
              + " with "
              + gridN
              + " nodes a side: expected 1, or 2 with an odd count");
    }
    int cells = (gridN - 1) / order;
    int threads = RowSlices.slicesFor(Integer.MAX_VALUE);
    double triad = triadBytesPerSecond(threads);
    out.printf(Locale.ROOT, "STREAM triad, %d threads: %.1f GB/s%n", threads, triad * 1e-9);
    CsrMatrix a = TetSystem.build(cells, 1.0, order);
    double spmv = spmvSeconds(a);
    double bytes = 12.0 * a.nonZeros() + 20.0 * a.size();
    out.printf(
        Locale.ROOT,
        "SpMV %d rows, %d nonzeros: %.2f ms, %.1f GB/s = %.0f %% of triad%n",
        a.size(),
        a.nonZeros(),
        spmv * 1e3,
        bytes / spmv * 1e-9,
        100 * bytes / spmv / triad);
    double iterationFloor = (bytes + FUSED_VECTOR_BYTES_PER_ROW * a.size()) / triad;
    for (double ratio : new double[] {1.0, 100.0}) {
      CsrMatrix m = ratio == 1.0 ? a : TetSystem.build(cells, ratio, order);
      double[] b = new double[m.size()];
      for (int i = 0; i < b.length; i++) {
        b[i] = 1.0 + 0.5 * Math.sin(0.01 * i);
      }
      double[] mtj = mtjDiagonalCg(m, b);
      double[] jacobi = ours(m, b, PreconditionerKind.JACOBI);
      double[] amg = ours(m, b, PreconditionerKind.AMG);
      out.printf(Locale.ROOT, "ratio dt*D/h^2 = %.0f:%n", ratio);
      out.printf(Locale.ROOT, "  MTJ CG + Diagonal: %4.0f it, solve %.3f s%n", mtj[0], mtj[1]);
      out.printf(
          Locale.ROOT,
          "  our Jacobi-PCG:    %4.0f it, solve %.3f s (%.2f x MTJ), %.2f ms per iteration ="
              + " %.2f x its floor (one SpMV and the vectors at the triad rate)%n",
          jacobi[0],
          jacobi[1],
          jacobi[1] / mtj[1],
          1e3 * jacobi[1] / jacobi[0],
          jacobi[1] / jacobi[0] / iterationFloor);
      out.printf(
          Locale.ROOT,
          "  our AMG-PCG:       %4.0f it, solve %.3f s (%.2f x MTJ), setup %.3f s,"
              + " setup+solve %.2f x MTJ%n",
          amg[0],
          amg[1],
          amg[1] / mtj[1],
          amg[2],
          (amg[1] + amg[2]) / mtj[1]);
      for (int solves : new int[] {1, 100}) {
        PreconditionerKind chosen = PreconditionerChoice.choose(m, m.diagonal(), solves, TOLERANCE);
        PreconditionerKind faster =
            solves * jacobi[1] <= amg[2] + solves * amg[1]
                ? PreconditionerKind.JACOBI
                : PreconditionerKind.AMG;
        out.printf(
            Locale.ROOT,
            "  over %3d solves: the choice takes %s, the faster here is %s%n",
            solves,
            chosen,
            faster);
      }
    }
    AmgHierarchy h = AmgHierarchy.build(TetSystem.build(cells, 100.0, order));
    out.printf(
        Locale.ROOT,
        "AMG levels (ratio 100): %s, operator complexity %.2f%n",
        h.describe(),
        h.operatorComplexity());
    out.flush();
  }

  private static double triadBytesPerSecond(int threads) {
    double[] x = new double[TRIAD_LENGTH];
    double[] y = new double[TRIAD_LENGTH];
    double[] z = new double[TRIAD_LENGTH];
    for (int i = 0; i < TRIAD_LENGTH; i++) {
      y[i] = i;
      z[i] = 1.0 / (i + 1);
    }
    double best = Double.MAX_VALUE;
    for (int rep = 0; rep < 8; rep++) {
      double s = 1.0 + rep;
      long t0 = System.nanoTime();
      RowSlices.run(
          threads,
          p -> {
            int from = RowSlices.start(TRIAD_LENGTH, threads, p);
            int to = RowSlices.start(TRIAD_LENGTH, threads, p + 1);
            for (int i = from; i < to; i++) {
              x[i] = y[i] + s * z[i];
            }
          });
      best = Math.min(best, (System.nanoTime() - t0) * 1e-9);
    }
    if (x[TRIAD_LENGTH - 1] == 0) {
      throw new IllegalStateException("triad result lost");
    }
    return 24.0 * TRIAD_LENGTH / best;
  }

  private static double spmvSeconds(CsrMatrix a) {
    double[] x = new double[a.size()];
    double[] y = new double[a.size()];
    java.util.Arrays.fill(x, 1.0);
    double best = Double.MAX_VALUE;
    for (int rep = 0; rep < 60; rep++) {
      long t0 = System.nanoTime();
      a.multiply(x, y);
      best = Math.min(best, (System.nanoTime() - t0) * 1e-9);
    }
    return best;
  }

  /** {iterations, best solve seconds, best setup seconds}. */
  private static double[] ours(CsrMatrix a, double[] b, PreconditionerKind kind) {
    PcgSolver solver = new PcgSolver(TOLERANCE, 10_000, kind);
    double bestSolve = Double.MAX_VALUE;
    double bestSetup = Double.MAX_VALUE;
    int iterations = 0;
    for (int rep = 0; rep <= REPEATS; rep++) {
      solver.setMatrix(a);
      SolveStats stats = solver.solve(b, new double[a.size()]);
      if (rep > 0) {
        bestSolve = Math.min(bestSolve, stats.solveSeconds());
        bestSetup = Math.min(bestSetup, stats.setupSeconds());
      }
      iterations = stats.iterations();
    }
    return new double[] {iterations, bestSolve, bestSetup};
  }

  /** {iterations, best solve seconds} of MTJ's CG with its DiagonalPreconditioner. */
  private static double[] mtjDiagonalCg(CsrMatrix a, double[] b) {
    int n = a.size();
    int[][] pattern = new int[n][];
    for (int i = 0; i < n; i++) {
      pattern[i] = java.util.Arrays.copyOfRange(a.cols(), a.rowStart()[i], a.rowStart()[i + 1]);
    }
    CompRowMatrix m = new CompRowMatrix(n, n, pattern);
    System.arraycopy(a.values(), 0, m.getData(), 0, a.nonZeros());
    double rhsNorm = 0;
    for (double v : b) {
      rhsNorm += v * v;
    }
    rhsNorm = Math.sqrt(rhsNorm);
    DenseVector bv = new DenseVector(b, false);
    double best = Double.MAX_VALUE;
    int iterations = 0;
    for (int rep = 0; rep <= REPEATS; rep++) {
      long t0 = System.nanoTime();
      DenseVector x = new DenseVector(n);
      CG cg = new CG(x);
      DiagonalPreconditioner diagonal = new DiagonalPreconditioner(n);
      diagonal.setMatrix(m);
      cg.setPreconditioner(diagonal);
      DefaultIterationMonitor monitor =
          new DefaultIterationMonitor(10_000, 0.0, TOLERANCE * rhsNorm, Double.POSITIVE_INFINITY);
      cg.setIterationMonitor(monitor);
      try {
        cg.solve(m, bv, x);
      } catch (IterativeSolverNotConvergedException e) {
        throw new IllegalStateException("MTJ reference solve did not converge", e);
      }
      if (rep > 0) {
        best = Math.min(best, (System.nanoTime() - t0) * 1e-9);
      }
      iterations = monitor.iterations();
    }
    return new double[] {iterations, best};
  }
}
