package dev.soakfield.fem.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.assembly.CsrMatrix;
import org.junit.jupiter.api.Test;

class JacobiPcgTest extends PcgSolverContractTest {
  @Override
  PreconditionerKind kind() {
    return PreconditionerKind.JACOBI;
  }

  /**
   * Our fused iteration is textbook PCG (Saad 2003, Algorithm 9.1) in fewer passes: on a grid
   * Laplacian (uniform diagonal, so the diagonal-scaled stopping norm is the Euclidean one times a
   * constant) it takes the same number of iterations as MTJ's CG with the same Jacobi
   * preconditioner and target, and reaches the same solution to round-off.
   */
  @Test
  void theFusedIterationIsTextbookPcgStepForStep() throws Exception {
    int n = 16;
    CsrMatrix a = GridLaplacian.build(n, 0.05, true);
    double[] b = TestSystems.multiply(a, TestSystems.smoothField(n));
    double tol = 1e-10;
    double[] x = new double[a.size()];
    PcgSolver ours = new PcgSolver(tol, 1000, kind());
    ours.setMatrix(a);
    SolveStats stats = ours.solve(b, x);

    no.uib.cipr.matrix.sparse.CG stock =
        new no.uib.cipr.matrix.sparse.CG(new no.uib.cipr.matrix.DenseVector(a.size()));
    no.uib.cipr.matrix.sparse.DefaultIterationMonitor monitor =
        new no.uib.cipr.matrix.sparse.DefaultIterationMonitor(
            1000, 0, tol * TestSystems.norm(b), 1e300);
    stock.setIterationMonitor(monitor);
    stock.setPreconditioner(new JacobiPreconditioner(a.diagonal()));
    no.uib.cipr.matrix.DenseVector y = new no.uib.cipr.matrix.DenseVector(a.size());
    stock.solve(new CsrOperator(a), new no.uib.cipr.matrix.DenseVector(b), y);

    assertEquals(monitor.iterations(), stats.iterations());
    assertTrue(stats.iterations() > 10, "a real iteration: " + stats.iterations());
    assertTrue(TestSystems.distance(x, y.getData()) <= 1e-12 * TestSystems.norm(x));
  }

  @Test
  void inconsistentSingularSystemStallsAboveItsNullSpaceBound() {
    // Sealed grid, no capacity: rows sum to zero, constants span the null space. For b = e_0 every
    // residual b − A x keeps the component ⟨b, 1⟩/√n = 1/√n along the unit constant vector
    // (exact linear algebra: range(A) ⊥ null(A) for symmetric A), so ⟨r, 1⟩ = ⟨b, 1⟩ = 1 forever.
    // The solver measures ‖D⁻¹r‖; by Cauchy–Schwarz 1 = ⟨D⁻¹r, D·1⟩ ≤ ‖D⁻¹r‖·‖d‖, and ‖D⁻¹b‖ =
    // 1/d₀, so the relative residual stays ≥ d₀/‖d‖ (d the diagonal).
    int n = 6;
    CsrMatrix a = GridLaplacian.build(n, 0.0, false);
    double[] b = new double[a.size()];
    b[0] = 1;
    PcgSolver solver = new PcgSolver(1e-8, 200, kind());
    solver.setMatrix(a);
    SolverStalledException e =
        assertThrows(SolverStalledException.class, () -> solver.solve(b, new double[a.size()]));
    assertEquals(200, e.stats().iterations());
    double[] d = a.diagonal();
    assertTrue(e.stats().relativeResidual() >= (1 - 1e-9) * d[0] / TestSystems.norm(d));
    assertTrue(e.getMessage().contains("did not converge after 200 iterations"), e.getMessage());
  }

  @Test
  void breakdownOnAZeroCurvatureDirectionIsReported() {
    // Same singular matrix with b = D·1: the first Jacobi direction is exactly the constant vector,
    // A·1 = 0 in exact integer arithmetic, so p·Ap = 0 and the step is infinite: the residual turns
    // NaN, a breakdown, reported as such.
    CsrMatrix a = GridLaplacian.build(5, 0.0, false);
    double[] b = a.diagonal();
    PcgSolver solver = new PcgSolver(1e-8, 50, kind());
    solver.setMatrix(a);
    SolverStalledException e =
        assertThrows(SolverStalledException.class, () -> solver.solve(b, new double[a.size()]));
    assertTrue(e.getMessage().contains("broke down"), e.getMessage());
    assertTrue(Double.isNaN(e.stats().residualNorm()));
  }
}
