package dev.soakfield.fem.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class PreconditionerChoiceTest {
  private static PreconditionerKind autoChoiceFor(int n, double shift, boolean dirichlet) {
    PcgSolver solver = new PcgSolver(1e-8, 100, PreconditionerKind.AUTO);
    solver.setMatrix(GridLaplacian.build(n, shift, dirichlet));
    return solver.activePreconditioner();
  }

  @Test
  void shortStepsPickJacobi() {
    // Shift 1 (step ratio 1): every interior row sum is 1 against a diagonal of 7, share 1/7.
    assertEquals(PreconditionerKind.JACOBI, autoChoiceFor(20, 1.0, true));
    // Sealed grid, shift 0.5: row sum = shift, share ≥ 0.5/6.5 ≈ 0.077 on every row.
    assertEquals(PreconditionerKind.JACOBI, autoChoiceFor(12, 0.5, false));
  }

  @Test
  void laplacianAndLongStepsPickAmg() {
    // Pure Dirichlet Laplacian: interior rows sum to 0, only boundary rows carry a share.
    assertEquals(PreconditionerKind.AMG, autoChoiceFor(20, 0.0, true));
    // Shift 0.01 (step ratio 100): share 0.01/6.01 on interior rows.
    assertEquals(PreconditionerKind.AMG, autoChoiceFor(20, 0.01, true));
  }

  @Test
  void explicitKindsAreKept() {
    PcgSolver jacobi = new PcgSolver(1e-8, 100, PreconditionerKind.JACOBI);
    jacobi.setMatrix(GridLaplacian.build(10, 0.0, true));
    assertEquals(PreconditionerKind.JACOBI, jacobi.activePreconditioner());
    PcgSolver amg = new PcgSolver(1e-8, 100, PreconditionerKind.AMG);
    amg.setMatrix(GridLaplacian.build(10, 5.0, true));
    assertEquals(PreconditionerKind.AMG, amg.activePreconditioner());
  }
}
