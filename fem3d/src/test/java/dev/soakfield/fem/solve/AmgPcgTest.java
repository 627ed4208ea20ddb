package dev.soakfield.fem.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.assembly.CsrMatrix;
import java.util.Random;
import org.junit.jupiter.api.Test;

class AmgPcgTest extends PcgSolverContractTest {
  @Override
  PreconditionerKind kind() {
    return PreconditionerKind.AMG;
  }

  @Test
  void amgNeedsFarFewerIterationsThanJacobiOnA3dLaplacian() {
    // Jacobi-PCG iterations grow like sqrt(κ) ~ 1/h while a multigrid V-cycle keeps them nearly
    // bounded (Vaněk, Mandel & Brezina 1996); on 40³ with shift 0.01 (step ratio 100) the gap is
    // large. Compared within one run, no clock involved.
    CsrMatrix a = GridLaplacian.build(40, 0.01, true);
    double[] b = TestSystems.multiply(a, TestSystems.smoothField(40));
    PcgSolver jacobi = new PcgSolver(1e-8, 2000, PreconditionerKind.JACOBI);
    jacobi.setMatrix(a);
    int jacobiIterations = jacobi.solve(b, new double[a.size()]).iterations();
    PcgSolver amg = new PcgSolver(1e-8, 2000, PreconditionerKind.AMG);
    amg.setMatrix(a);
    int amgIterations = amg.solve(b, new double[a.size()]).iterations();
    assertTrue(
        amgIterations * 3 < jacobiIterations,
        "AMG " + amgIterations + " against Jacobi " + jacobiIterations);
    // The paper reports iteration counts in the low tens for 3D model problems.
    assertTrue(amgIterations <= 20, "AMG " + amgIterations);
  }

  /**
   * Quadratic tetrahedra with a consistent capacity that outweighs diffusion (short steps): the
   * capacity's vertex rows have negative row sums and positive off-diagonal entries, so lumping the
   * weak entries took some filtered diagonals to zero or below and the hierarchy to NaN (a run of a
   * 32³-cell quadratic box stopped with "Cholesky pivot 0 is NaN"). The hierarchy must stay finite
   * and AMG must converge to the solution, in fewer iterations than Jacobi.
   */
  @Test
  void quadraticElementsWithShortStepsGiveAFiniteHierarchyThatConverges() {
    for (double ratio : new double[] {0.01, 1.0}) {
      CsrMatrix a = TetSystem.build(8, ratio, 2);
      double[] exact = TestSystems.smoothField(2 * 8 + 1); // 17³ nodes of the quadratic box
      double[] b = TestSystems.multiply(a, exact);
      PcgSolver amg = new PcgSolver(1e-10, 500, PreconditionerKind.AMG);
      amg.setMatrix(a);
      double[] x = new double[a.size()];
      int amgIterations = amg.solve(b, x).iterations();
      assertTrue(
          TestSystems.distance(x, exact) < 1e-7 * TestSystems.norm(exact),
          "ratio " + ratio + ": error " + TestSystems.distance(x, exact));
      PcgSolver jacobi = new PcgSolver(1e-10, 5000, PreconditionerKind.JACOBI);
      jacobi.setMatrix(a);
      int jacobiIterations = jacobi.solve(b, new double[a.size()]).iterations();
      assertTrue(
          amgIterations < jacobiIterations,
          "ratio " + ratio + ": AMG " + amgIterations + " against Jacobi " + jacobiIterations);
    }
  }

  @Test
  void vCycleIsSymmetricAndPositive() {
    CsrMatrix a = GridLaplacian.build(20, 0.01, true);
    AmgPreconditioner b = new AmgPreconditioner(AmgHierarchy.build(a));
    assertTrue(b.hierarchy().levels().size() >= 3, b.hierarchy().describe());
    Random random = new Random(11);
    int n = a.size();
    for (int trial = 0; trial < 5; trial++) {
      double[] x = randomVector(random, n);
      double[] y = randomVector(random, n);
      double[] bx = new double[n];
      double[] by = new double[n];
      b.apply(x, bx);
      b.apply(y, by);
      double left = dot(bx, y);
      double right = dot(x, by);
      // Symmetric to round-off: forward GS before, backward after, Galerkin coarse, exact solve.
      assertEquals(left, right, 1e-12 * TestSystems.norm(bx) * TestSystems.norm(y));
      assertTrue(dot(bx, x) > 0);
    }
  }

  @Test
  void hierarchyCoarsensToADirectSolveWithModestComplexity() {
    AmgHierarchy h = AmgHierarchy.build(GridLaplacian.build(30, 0.01, true));
    int levels = h.levels().size();
    assertTrue(levels >= 3, h.describe());
    assertTrue(h.levels().get(levels - 1).size() <= AmgHierarchy.DIRECT_ROWS, h.describe());
    assertNotNull(h.direct());
    for (int l = 1; l < levels; l++) {
      // Aggregates of a 7-point graph hold about 7 nodes or more: each level shrinks by > 3.
      assertTrue(h.levels().get(l).size() * 3 < h.levels().get(l - 1).size(), h.describe());
    }
    // Common practice for smoothed aggregation in 3D: operator complexity below 2.
    assertTrue(h.operatorComplexity() < 2.0, "complexity " + h.operatorComplexity());
  }

  @Test
  void stronglyDominantMatrixNeedsNoCoarseLevelAndStillConverges() {
    // Shift 100: |a_ij| = 1 < 0.08·106, so every connection is weak and nothing aggregates; the
    // hierarchy is the fine level solved by sweeps.
    CsrMatrix a = GridLaplacian.build(30, 100.0, true);
    AmgHierarchy h = AmgHierarchy.build(a);
    assertEquals(1, h.levels().size());
    assertNull(h.direct());
    double[] exact = TestSystems.smoothField(30);
    double[] b = TestSystems.multiply(a, exact);
    double[] x = new double[a.size()];
    PcgSolver solver = new PcgSolver(1e-10, 50, PreconditionerKind.AMG);
    solver.setMatrix(a);
    assertTrue(solver.solve(b, x).iterations() <= 5);
    assertTrue(TestSystems.distance(x, exact) <= 1e-8 * TestSystems.norm(exact));
  }

  @Test
  void indefiniteMatrixIsRejectedWhenTheHierarchyIsBuilt() {
    // 7³ grid: the smallest eigenvalue of the 7-point Laplacian is 3·(2 − 2cos(π/8)) ≈ 0.457
    // (exact: eigenvalues of the 1D second difference are 2 − 2cos(kπ/(n+1))), so a shift of −1
    // makes it indefinite while every diagonal entry stays positive (5).
    CsrMatrix a = GridLaplacian.build(7, -1.0, true);
    PcgSolver solver = new PcgSolver(1e-8, 100, PreconditionerKind.AMG);
    IllegalArgumentException e =
        assertThrows(IllegalArgumentException.class, () -> solver.setMatrix(a));
    assertTrue(e.getMessage().contains("not positive definite"), e.getMessage());
  }

  private static double[] randomVector(Random random, int n) {
    double[] v = new double[n];
    for (int i = 0; i < n; i++) {
      v[i] = random.nextGaussian();
    }
    return v;
  }

  private static double dot(double[] a, double[] b) {
    double s = 0;
    for (int i = 0; i < a.length; i++) {
      s += a[i] * b[i];
    }
    return s;
  }
}
