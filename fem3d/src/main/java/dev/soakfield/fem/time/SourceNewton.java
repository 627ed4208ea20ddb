package dev.soakfield.fem.time;

import java.util.Arrays;

/**
 * Newton's method with a backtracking line search on the free rows of R(φ) = A φ − b − dt·q(φ), q
 * the nodal sources of the materials' source laws and of the face laws with their derivative ∂q/∂φ.
 */
final class SourceNewton {
  private static final int MAX_ITERATIONS = 30;
  private static final double TOLERANCE = 1e-10;

  private final NodalSources laws;
  private final EliminatedSystem system;
  private final boolean[] isPrescribed;
  private final int n;
  private double[] residuals = new double[0];

  /** Newton iterations and the linear iterations they took. */
  record Result(int iterations, int linearIterations) {}

  SourceNewton(NodalSources laws, EliminatedSystem system, boolean[] isPrescribed) {
    this.laws = laws;
    this.system = system;
    this.isPrescribed = isPrescribed;
    this.n = isPrescribed.length;
  }

  /**
   * Solves for phi1 (prescribed values stay as phi1 holds them); q receives the converged nodal
   * sources.
   *
   * @throws StepNotConvergedException when the iteration does not converge (retry shorter)
   */
  Result solve(double[] fullRhs, double[] phi1, double t1, double dt, double kelvin, double[] q) {
    double[] dq = new double[n];
    double[] residual = new double[n];
    double[] trial = new double[n];
    double[] delta = new double[n];
    double scale = norm(fullRhs);
    int linear = 0;
    laws.evaluate(phi1, t1, dt, kelvin, q, dq);
    double norm = residual(phi1, fullRhs, q, dt, residual);
    double[] history = new double[MAX_ITERATIONS + 1];
    for (int it = 0; it < MAX_ITERATIONS; it++) {
      history[it] = norm;
      double qScale = dt * norm(q);
      if (norm <= TOLERANCE * Math.max(scale + qScale, Double.MIN_NORMAL)) {
        residuals = Arrays.copyOf(history, it + 1);
        return new Result(it, linear);
      }
      for (int i = 0; i < n; i++) {
        residual[i] = -residual[i];
      }
      Arrays.fill(delta, 0.0);
      linear += system.solveJacobian(dq, dt, it == 0, residual, delta);
      double lambda = 1.0;
      double trialNorm;
      double[] trialQ = new double[n];
      double[] trialDq = new double[n];
      while (true) {
        for (int i = 0; i < n; i++) {
          trial[i] = phi1[i] + lambda * delta[i];
        }
        laws.evaluate(trial, t1, dt, kelvin, trialQ, trialDq);
        trialNorm = residual(trial, fullRhs, trialQ, dt, residual);
        if (trialNorm <= (1 - 1e-4 * lambda) * norm || lambda < 1.0 / 64) {
          break;
        }
        lambda /= 2;
      }
      System.arraycopy(trial, 0, phi1, 0, n);
      System.arraycopy(trialQ, 0, q, 0, n);
      System.arraycopy(trialDq, 0, dq, 0, n);
      norm = trialNorm;
    }
    residuals = history;
    throw new StepNotConvergedException(
        t1 - dt, dt, MAX_ITERATIONS, norm / Math.max(scale, Double.MIN_NORMAL));
  }

  /** The residual norms of the last solve's iterations (the first is the starting guess's). */
  double[] lastResiduals() {
    return residuals.clone();
  }

  /** R = A φ − b − dt·q on free rows (0 on prescribed rows) into out; returns ‖R‖₂. */
  private double residual(double[] phi, double[] fullRhs, double[] q, double dt, double[] out) {
    system.multiplyUnreduced(phi, out);
    double s = 0;
    for (int i = 0; i < n; i++) {
      if (isPrescribed[i]) {
        out[i] = 0.0;
      } else {
        out[i] -= fullRhs[i] + dt * q[i];
        s += out[i] * out[i];
      }
    }
    return Math.sqrt(s);
  }

  private double norm(double[] v) {
    double s = 0;
    for (int i = 0; i < n; i++) {
      if (!isPrescribed[i]) {
        s += v[i] * v[i];
      }
    }
    return Math.sqrt(s);
  }
}
