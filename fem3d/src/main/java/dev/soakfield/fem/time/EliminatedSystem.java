package dev.soakfield.fem.time;

import dev.soakfield.fem.assembly.CsrMatrix;
import dev.soakfield.fem.assembly.SystemAssembler;
import dev.soakfield.fem.model.DiffusionModel;
import dev.soakfield.fem.solve.PcgSolver;
import dev.soakfield.fem.solve.PreconditionerKind;
import dev.soakfield.fem.solve.SolveStats;
import java.util.Arrays;

/**
 * The step's system M + θ·dt·L(t₁) with the prescribed rows and columns eliminated symmetrically,
 * so it stays symmetric positive definite for conjugate gradients, and its solver. The matrix and
 * its preconditioner are rebuilt only when dt, θ, a transfer coefficient or the temperature change.
 * The system before elimination is kept too: its product with the solution gives the reactions on
 * the prescribed rows, the amount they take in.
 */
final class EliminatedSystem {
  private final DiffusionModel model;
  private final BoundarySets boundary;
  private final int n;

  /** Newton corrections expected per step, which share the step's Jacobian (common practice). */
  private static final int NEWTON_SOLVES = 3;

  private final CsrMatrix system;
  private final CsrMatrix unreduced; // the same system before elimination, for the reactions
  private CsrMatrix jacobian; // system plus the laws' derivative on the diagonal; made when needed
  private final int[] eliminated; // CSR positions in free rows whose column is prescribed
  private final int[] diagonalPosition;
  // Prescribed rows keep their own diagonal (x_i = φ_D scaled by it), so they do not dominate ‖b‖
  // and the solver's relative tolerance stays meaningful for the free rows.
  private final double[] prescribedDiagonal;
  // work vectors of the right-hand side with held values, kept between steps
  private double[] heldValues;
  private double[] reducedRhs;
  private final PcgSolver solver;
  private boolean solverHasSystem;
  private int expectedSolves = 1;
  // Σ of the free rows' entries over free columns, 1ᵀA_ff1: how much a uniform shift of the free
  // values moves the sum of their rows
  private double freeSum;
  private double systemDt = Double.NaN;
  private double systemTheta = Double.NaN;
  private double systemTemperature = Double.NaN;
  private double[] systemH = new double[0];

  EliminatedSystem(
      DiffusionModel model,
      SystemAssembler asm,
      BoundarySets boundary,
      double solverTolerance,
      int maxIterations) {
    this.model = model;
    this.boundary = boundary;
    this.n = model.space().dofCount();
    system = asm.newMatrix();
    unreduced = system.zeroCopy();
    eliminated = eliminatedPositions();
    diagonalPosition = new int[n];
    for (int i = 0; i < n; i++) {
      diagonalPosition[i] = system.indexOf(i, i);
    }
    prescribedDiagonal = new double[n];
    solver = new PcgSolver(solverTolerance, maxIterations, PreconditionerKind.AUTO);
  }

  private int[] eliminatedPositions() {
    boolean[] isPrescribed = boundary.isPrescribed;
    int[] rs = system.rowStart();
    int[] cols = system.cols();
    int count = 0;
    for (int i = 0; i < system.size(); i++) {
      if (!isPrescribed[i]) {
        for (int k = rs[i]; k < rs[i + 1]; k++) {
          if (isPrescribed[cols[k]]) {
            count++;
          }
        }
      }
    }
    int[] pos = new int[count];
    int p = 0;
    for (int i = 0; i < system.size(); i++) {
      if (!isPrescribed[i]) {
        for (int k = rs[i]; k < rs[i + 1]; k++) {
          if (isPrescribed[cols[k]]) {
            pos[p++] = k;
          }
        }
      }
    }
    return pos;
  }

  /** Builds M + θ dt L(t1) with prescribed rows and columns eliminated, when anything changed. */
  void prepare(CoefficientCache.Coefficients co, double dt, double theta, double t1) {
    double[] h = boundary.exchangeCoefficients(t1);
    if (dt == systemDt
        && theta == systemTheta
        && co.temperature == systemTemperature
        && Arrays.equals(h, systemH)) {
      return;
    }
    fullSystem(co, unreduced, dt, theta, h);
    double[] a = system.values();
    System.arraycopy(unreduced.values(), 0, a, 0, a.length);
    int[] rs = system.rowStart();
    int[] cols = system.cols();
    for (int i = 0; i < system.size(); i++) {
      if (boundary.isPrescribed[i]) {
        for (int k = rs[i]; k < rs[i + 1]; k++) {
          if (cols[k] == i) {
            prescribedDiagonal[i] = a[k];
          } else {
            a[k] = 0.0;
          }
        }
      }
    }
    for (int k : eliminated) {
      a[k] = 0.0;
    }
    freeSum = 0;
    for (int i = 0; i < system.size(); i++) {
      if (!boundary.isPrescribed[i]) {
        for (int k = rs[i]; k < rs[i + 1]; k++) {
          freeSum += a[k];
        }
      }
    }
    solverHasSystem = false;
    systemDt = dt;
    systemTheta = theta;
    systemTemperature = co.temperature;
    systemH = h;
  }

  private void fullSystem(
      CoefficientCache.Coefficients co, CsrMatrix target, double dt, double theta, double[] h) {
    target.setZero();
    target.addScaled(1.0, co.capacity);
    target.addScaled(theta * dt, co.stiffness);
    if (model.hasFirstOrderSource()) {
      target.addScaled(-theta * dt, co.sink);
    }
    for (int g = 0; g < boundary.exchanges.size(); g++) {
      if (h[g] != 0) {
        target.addScaled(theta * dt * h[g], co.exchangeMass.get(g));
      }
    }
  }

  /** A copy of the eliminated matrix last prepared. */
  CsrMatrix copy() {
    CsrMatrix copy = system.zeroCopy();
    copy.addScaled(1.0, system);
    return copy;
  }

  /** The system before elimination times phi, into out. */
  void multiplyUnreduced(double[] phi, double[] out) {
    unreduced.multiply(phi, out);
  }

  /** One linear solve of the eliminated system for the right-hand side before elimination. */
  int solve(double[] fullRhs, double[] phi1) {
    double[] b = eliminatedRhs(fullRhs, phi1);
    double squares = 0;
    for (double v : b) {
      squares += v * v; // the solver measures residuals by this norm: it must be finite
    }
    if (!Double.isFinite(squares)) {
      throw new OutOfRangeException(
          "the step's equations hold numbers beyond double precision (their norm overflows),"
              + " from a held, flux or exchange value or a coefficient of extreme size");
    }
    if (!solverHasSystem) {
      solver.setMatrix(system, expectedSolves);
      solverHasSystem = true;
    }
    SolveStats stats = solver.solve(b, phi1);
    conserve(stats.residualSum(), phi1);
    return stats.iterations();
  }

  /**
   * Shifts the free values by one constant so that their rows' residuals add up to zero. The
   * residuals' sum is exactly what the step adds to the amount beyond what enters and is made: a
   * solve to 1e-11 leaves about that much of the amount each step, and 10⁵ steps (a day in steps of
   * a second) added it up past the balance limit. The shift is of the solver's tolerance, far below
   * the discretisation error; the discrete equations' own conservation then holds each step to
   * round-off (common practice: a conservative correction after an inexact solve).
   */
  private void conserve(double residualSum, double[] phi1) {
    if (!(freeSum > 0) || residualSum == 0 || !Double.isFinite(residualSum)) {
      return;
    }
    double shift = residualSum / freeSum;
    for (int i = 0; i < n; i++) {
      if (!boundary.isPrescribed[i]) {
        phi1[i] += shift;
      }
    }
  }

  /**
   * The right-hand side of the eliminated system: prescribed rows scaled, prescribed columns moved
   * over.
   */
  private double[] eliminatedRhs(double[] fullRhs, double[] phi1) {
    if (boundary.prescribed.isEmpty()) {
      return fullRhs; // nothing to eliminate (the solver only reads it)
    }
    if (heldValues == null) {
      // kept between steps: at scale a new vector a step is a humongous allocation to G1
      heldValues = new double[n];
      reducedRhs = new double[n];
    }
    double[] phiD = heldValues;
    for (int i = 0; i < n; i++) {
      phiD[i] = boundary.isPrescribed[i] ? phi1[i] : 0.0;
    }
    double[] b = reducedRhs;
    unreduced.multiply(phiD, b);
    for (int i = 0; i < n; i++) {
      b[i] = boundary.isPrescribed[i] ? prescribedDiagonal[i] * phi1[i] : fullRhs[i] - b[i];
    }
    return b;
  }

  /** See {@link ThetaStepper#expectSolvesPerMatrix}. */
  void expectSolvesPerMatrix(int solves) {
    expectedSolves = solves;
  }

  /**
   * Solves (system − dt·diag(dq) on the free rows) delta = rhs: one Newton correction. The
   * preconditioner is rebuilt on the first iteration of a step, where the laws' derivative may
   * dominate the capacity term, and reused after.
   */
  int solveJacobian(double[] dq, double dt, boolean firstIteration, double[] rhs, double[] delta) {
    if (jacobian == null) {
      jacobian = system.zeroCopy(); // only runs with source laws take Newton steps
    }
    double[] a = jacobian.values();
    System.arraycopy(system.values(), 0, a, 0, a.length);
    for (int i = 0; i < n; i++) {
      if (!boundary.isPrescribed[i]) {
        a[diagonalPosition[i]] -= dt * dq[i];
      }
    }
    solverHasSystem = false;
    if (firstIteration) {
      solver.setMatrix(jacobian, NEWTON_SOLVES);
    } else {
      solver.replaceMatrix(jacobian);
    }
    return solver.solve(rhs, delta).iterations();
  }
}
