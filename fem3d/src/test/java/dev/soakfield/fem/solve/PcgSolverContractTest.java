package dev.soakfield.fem.solve;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.assembly.CsrMatrix;
import java.util.Arrays;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.CholeskyDecomposition;
import org.junit.jupiter.api.Test;

/** Behaviour every preconditioner choice must show; one subclass per kind. */
abstract class PcgSolverContractTest {
  abstract PreconditionerKind kind();

  private static double[] scaled(double[] v, double[] diagonal) {
    double[] out = new double[v.length];
    for (int i = 0; i < v.length; i++) {
      out[i] = v[i] / diagonal[i];
    }
    return out;
  }

  /**
   * A chain (1D Laplacian plus a small capacity) whose first row carries a transfer term 1e12 times
   * larger, like an exchange face with a huge coefficient: x₀ ≈ 1 and the rest decays from it.
   * Reference: Commons Math's dense Cholesky solve. Negative control: MTJ's stock CG stopping at
   * ‖r‖₂ ≤ rtol·‖b‖₂ satisfies the big row and leaves the chain unsolved.
   */
  @Test
  void aRowTwelveOrdersLargerDoesNotStopTheSolveEarly() throws Exception {
    int n = 40;
    CsrMatrix a = chain(n, 1e12);
    double[] b = new double[n];
    b[0] = 1e12;
    double[] expected =
        new CholeskyDecomposition(new Array2DRowRealMatrix(TestSystems.toDense(a)))
            .getSolver()
            .solve(new ArrayRealVector(b))
            .toArray();
    double[] x = new double[n];
    PcgSolver solver = new PcgSolver(1e-10, 1000, kind());
    solver.setMatrix(a);
    assertTrue(solver.solve(b, x).converged());
    for (int i = 0; i < n; i++) {
      assertEquals(expected[i], x[i], 1e-8 * expected[0], "node " + i);
    }
    assertTrue(expected[n / 2] > 1e-3, "the chain carries a real field: " + expected[n / 2]);
    // negative control: the plain Euclidean rule on the same system
    no.uib.cipr.matrix.sparse.CG stock =
        new no.uib.cipr.matrix.sparse.CG(new no.uib.cipr.matrix.DenseVector(n));
    stock.setIterationMonitor(
        new no.uib.cipr.matrix.sparse.DefaultIterationMonitor(1000, 1e-10, 0, 1e300));
    stock.setPreconditioner(new JacobiPreconditioner(a.diagonal()));
    no.uib.cipr.matrix.DenseVector y = new no.uib.cipr.matrix.DenseVector(n);
    stock.solve(new CsrOperator(a), new no.uib.cipr.matrix.DenseVector(b), y);
    assertTrue(
        Math.abs(y.get(n / 2) - expected[n / 2]) > 1e-2 * expected[n / 2],
        "Euclidean stop left the middle at " + y.get(n / 2) + " for " + expected[n / 2]);
  }

  private static CsrMatrix chain(int n, double big) {
    CsrMatrix a = TestSystems.fullPattern(n);
    double[] v = a.values();
    for (int i = 0; i < n; i++) {
      v[i * n + i] = 2 + 0.01 + (i == 0 ? big : 0);
      if (i > 0) {
        v[i * n + i - 1] = -1;
        v[(i - 1) * n + i] = -1;
      }
    }
    v[(n - 1) * n + n - 1] = 1 + 0.01; // sealed far end
    return a;
  }

  @Test
  void denseSpdSystemMatchesCholeskySolve() {
    CsrMatrix a = TestSystems.denseSpd(60, 7);
    double[] b = new double[60];
    for (int i = 0; i < b.length; i++) {
      b[i] = Math.cos(i);
    }
    // Reference: Commons Math's dense Cholesky solve of the same system (a direct method).
    double[] expected =
        new CholeskyDecomposition(new Array2DRowRealMatrix(TestSystems.toDense(a)))
            .getSolver()
            .solve(new ArrayRealVector(b))
            .toArray();
    double[] x = new double[60];
    PcgSolver solver = new PcgSolver(1e-12, 500, kind());
    solver.setMatrix(a);
    SolveStats stats = solver.solve(b, x);
    assertTrue(stats.converged());
    assertTrue(TestSystems.distance(x, expected) <= 1e-9 * TestSystems.norm(expected));
  }

  @Test
  void manufacturedSolutionOnGridLaplacianIsRecovered() {
    int n = 14;
    CsrMatrix a = GridLaplacian.build(n, 0.01, true);
    double[] exact = TestSystems.smoothField(n);
    double[] b = TestSystems.multiply(a, exact);
    double[] x = new double[a.size()];
    PcgSolver solver = new PcgSolver(1e-10, 1000, kind());
    solver.setMatrix(a);
    SolveStats stats = solver.solve(b, x);
    assertTrue(stats.converged());
    assertTrue(stats.iterations() > 0);
    // norms are of D⁻¹ times the vector: the stopping rule weighs each row by its diagonal
    double[] d = a.diagonal();
    assertEquals(TestSystems.norm(scaled(b, d)), stats.rhsNorm(), 1e-12 * stats.rhsNorm());
    assertTrue(stats.residualNorm() <= 1e-10 * stats.rhsNorm());
    // The true residual agrees with CG's recursive one to well within the tolerance.
    double[] r = TestSystems.multiply(a, x);
    for (int i = 0; i < r.length; i++) {
      r[i] = b[i] - r[i];
    }
    assertTrue(TestSystems.norm(scaled(r, d)) <= 2e-10 * stats.rhsNorm());
    // Error ≤ κ(A)·rtol·‖x‖; κ of the shifted 7-point Laplacian ≈ 12/0.01 (common practice bound).
    assertTrue(TestSystems.distance(x, exact) <= 1e-6 * TestSystems.norm(exact));
  }

  @Test
  void warmStartWithExactSolutionTakesNoIterations() {
    CsrMatrix a = GridLaplacian.build(10, 0.5, true);
    double[] exact = TestSystems.smoothField(10);
    double[] b = TestSystems.multiply(a, exact);
    double[] x = exact.clone();
    PcgSolver solver = new PcgSolver(1e-8, 100, kind());
    solver.setMatrix(a);
    SolveStats stats = solver.solve(b, x);
    assertEquals(0, stats.iterations());
    assertArrayEquals(exact, x);
  }

  @Test
  void warmStartNearTheSolutionTakesFewerIterationsThanColdStart() {
    CsrMatrix a = GridLaplacian.build(12, 0.05, true);
    double[] exact = TestSystems.smoothField(12);
    double[] b = TestSystems.multiply(a, exact);
    PcgSolver solver = new PcgSolver(1e-8, 1000, kind());
    solver.setMatrix(a);
    int cold = solver.solve(b, new double[a.size()]).iterations();
    double[] near = exact.clone();
    for (int i = 0; i < near.length; i++) {
      near[i] *= 1 + 1e-5 * Math.sin(i);
    }
    int warm = solver.solve(b, near).iterations();
    // Stopping is absolute (rtol·‖b‖): a start 1e-5 off needs fewer iterations than one from zero.
    assertTrue(warm < cold, "warm " + warm + " cold " + cold);
  }

  @Test
  void zeroRightHandSideGivesZeroSolution() {
    CsrMatrix a = GridLaplacian.build(6, 1.0, true);
    double[] x = new double[a.size()];
    Arrays.fill(x, 3.0);
    PcgSolver solver = new PcgSolver(1e-8, 100, kind());
    solver.setMatrix(a);
    SolveStats stats = solver.solve(new double[a.size()], x);
    assertEquals(0, stats.iterations());
    assertTrue(stats.converged());
    assertArrayEquals(new double[a.size()], x);
  }

  @Test
  void tooFewIterationsThrowWithTheNumbers() {
    CsrMatrix a = GridLaplacian.build(16, 0.001, true);
    double[] b = TestSystems.multiply(a, TestSystems.smoothField(16));
    PcgSolver solver = new PcgSolver(1e-12, 2, kind());
    solver.setMatrix(a);
    SolverStalledException e =
        assertThrows(SolverStalledException.class, () -> solver.solve(b, new double[a.size()]));
    assertEquals(2, e.stats().iterations());
    assertTrue(!e.stats().converged());
    assertTrue(e.stats().relativeResidual() > 1e-12);
    assertTrue(e.getMessage().contains("after 2 iterations"), e.getMessage());
    assertTrue(e.getMessage().contains("target 1.0e-12"), e.getMessage());
    assertTrue(e.getMessage().contains("smaller time steps"), e.getMessage());
  }

  @Test
  void publicSurfaceChecksItsArguments() {
    assertThrows(IllegalArgumentException.class, () -> new PcgSolver(0.0, 10, kind()));
    assertThrows(IllegalArgumentException.class, () -> new PcgSolver(1e-8, 0, kind()));
    PcgSolver solver = new PcgSolver(1e-8, 10, kind());
    assertThrows(IllegalStateException.class, () -> solver.solve(new double[1], new double[1]));
    CsrMatrix a = GridLaplacian.build(3, 1.0, true);
    solver.setMatrix(a);
    assertThrows(
        IllegalArgumentException.class, () -> solver.solve(new double[27], new double[26]));
    CsrMatrix negative = GridLaplacian.build(3, -7.0, true);
    IllegalArgumentException e =
        assertThrows(IllegalArgumentException.class, () -> solver.setMatrix(negative));
    assertTrue(e.getMessage().contains("row 0 has diagonal entry -1.0"), e.getMessage());
  }
}
