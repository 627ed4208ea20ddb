package dev.soakfield.fem.time;

import dev.soakfield.fem.solve.SolverStalledException;
import java.util.Arrays;
import java.util.Locale;
import java.util.TreeSet;

/**
 * Advances a {@link ThetaStepper} from t = 0 to the end time. Steps land exactly on output times
 * and on every breakpoint of the boundary tables. Adaptive steps estimate the local error of each
 * step from the difference between the solution and its linear extrapolation from the two previous
 * states, scaled by dt / (dt + dt_prev) (the usual estimate for backward Euler, e.g. Gresho & Sani,
 * Incompressible Flow and the Finite Element Method, 1998, §3.16); a step above tolerance is
 * retried shorter. Step lengths move on a ladder of powers of two of the first step, so the system
 * matrix and its preconditioner are reused for runs of equal steps.
 */
public final class TransientRun {
  private static final double GROWTH_LIMIT = 4.0;
  private static final double SHRINK_LIMIT = 0.25;

  private TransientRun() {}

  public static RunTotals run(
      ThetaStepper stepper, double[] phiStart, TimeSettings s, StepListener listener) {
    return run(stepper, phiStart, s, listener, CheckpointSink.NONE, null);
  }

  /**
   * Runs from t = 0, or on from a checkpoint's cursor (then {@code phiStart} is ignored, nothing is
   * raised and the listener hears no start: it restored its own state).
   *
   * @param checkpoints hears the state after every accepted step
   * @param resume where an interrupted run stood, or null for a fresh run
   */
  public static RunTotals run(
      ThetaStepper stepper,
      double[] phiStart,
      TimeSettings s,
      StepListener listener,
      CheckpointSink checkpoints,
      RunCursor resume) {
    double end = s.end();
    TreeSet<Double> targets = new TreeSet<>();
    for (double t : s.outputs()) {
      if (t > 0 && t <= end) {
        targets.add(t);
      }
    }
    TreeSet<Double> kinks = new TreeSet<>();
    for (double t : stepper.breakpoints()) {
      if (t > 0 && t < end) {
        targets.add(t);
        kinks.add(t);
      }
    }
    targets.add(end);
    double[] outputs = s.outputs();
    Arrays.sort(outputs);

    double[] phi;
    double scale;
    double[] previous = null;
    double previousDt = 0;
    double t = 0;
    double dt = s.adaptive() ? Math.min(s.initialStep(), s.maxStep()) : s.fixedStep();
    // fixed steps reuse one matrix for the whole run: the preconditioner's set-up is worth more
    stepper.expectSolvesPerMatrix(
        s.adaptive() ? 1 : (int) Math.min(Integer.MAX_VALUE, Math.max(1, Math.round(end / dt))));
    double ladderBase = dt;
    int steps = 0;
    int rejected = 0;
    int sinceRestart = 0;
    long iterations = 0;
    if (resume == null) {
      phi = phiStart.clone();
      double[] raised = stepper.raise(phi, 0.0);
      listener.started(new StepOutcome(phi.clone(), raised, 0.0, stepper.amount(phi, 0.0), 0, 0.0));
      // error scale: the field's size, or what the boundary data will drive it to, whichever is
      // larger
      scale = Math.max(maxAbs(phi), stepper.referencePotential());
    } else {
      phi = resume.phi().clone();
      scale = resume.scale();
      previous = resume.previous() == null ? null : resume.previous().clone();
      previousDt = resume.previousDt();
      t = resume.t();
      dt = resume.dt();
      ladderBase = resume.ladderBase();
      steps = resume.steps();
      rejected = resume.rejected();
      sinceRestart = resume.sinceRestart();
      iterations = resume.iterations();
    }
    double minStep = end * 1e-14;
    while (t < end) {
      double target = targets.ceiling(t + minStep);
      double remaining = target - t;
      // never longer than dt (so a rejection always shortens the try), and no sliver before the
      // target: a remainder up to 1.25 dt is taken in two equal steps. A remainder within 1e-9 of
      // dt is one step: the round-off of adding dt up must not turn the last step into two.
      double tryDt =
          remaining <= dt * (1 + 1e-9) ? remaining : remaining <= 1.25 * dt ? remaining / 2 : dt;
      double theta = TimeSettings.thetaOfStep(s.crankNicolson(), sinceRestart);
      StepOutcome out;
      try {
        out = stepper.step(phi, t, tryDt, theta, previous, previousDt);
      } catch (StepNotConvergedException e) {
        // a nonlinear step that does not converge is retried a quarter as long
        rejected++;
        dt = ladder(ladderBase, tryDt * SHRINK_LIMIT);
        if (dt < minStep || (!s.adaptive() && tryDt <= minStep)) {
          throw new RunFailedException(
              t,
              e.getMessage()
                  + "; the step cannot be shortened further. Check the source law's parameters"
                  + " (rates, trap densities) for extreme values",
              e);
        }
        if (!s.adaptive()) {
          ladderBase = dt; // fixed steps: continue on the shorter step from here
        }
        continue;
      } catch (OutOfRangeException e) {
        throw new RunFailedException(
            t,
            e.getMessage()
                + "; give the case's values in a unit that keeps them nearer 1 (declare"
                + " units.concentration) or correct the value",
            e);
      } catch (SolverStalledException e) {
        throw new RunFailedException(
            t,
            String.format(
                Locale.ROOT,
                "the linear solver did not converge in the step from t = %.6g s to %.6g s: %s;"
                    + " try shorter steps (a smaller \"tolerance\" or \"step\") or check the"
                    + " material data for extreme values",
                t,
                t + tryDt,
                e.getMessage()),
            e);
      }
      iterations += out.iterations();
      double[] next = out.phi();
      if (!allFinite(next)) {
        throw new RunFailedException(
            t, "the solution became non-finite after t = " + t + " s; no results were kept", null);
      }
      double error = 0;
      boolean estimated = s.adaptive() && previous != null;
      if (estimated) {
        scale = Math.max(scale, maxAbs(next));
        error = localError(previous, previousDt, phi, next, tryDt) / Math.max(scale, 1e-300);
        if (error > s.tolerance() && tryDt > minStep) {
          rejected++;
          listener.rejected(t + tryDt, tryDt);
          dt =
              ladder(
                  ladderBase,
                  tryDt * Math.max(SHRINK_LIMIT, 0.9 * Math.sqrt(s.tolerance() / error)));
          if (dt < minStep) {
            throw new RunFailedException(
                t,
                "the time step fell below "
                    + minStep
                    + " s at t = "
                    + t
                    + " s; the tolerance "
                    + s.tolerance()
                    + " cannot be met",
                null);
          }
          continue;
        }
      }
      double tNew = (target - (t + tryDt)) <= minStep ? target : t + tryDt;
      steps++;
      sinceRestart++;
      boolean isOutput = Arrays.binarySearch(outputs, tNew) >= 0 || tNew == end;
      stepper.commit(out);
      listener.accepted(tNew, tryDt, out, isOutput);
      previous = phi;
      previousDt = tryDt;
      phi = next;
      t = tNew;
      if (kinks.contains(t)) {
        previous = null; // the extrapolation does not hold across a kink of the boundary data
        if (s.adaptive()) {
          // the first step after a kink has no error estimate: start it short against what follows
          Double following = targets.higher(t + minStep);
          if (following != null) {
            dt = Math.max(ladderBase, Math.min(dt, ladder(ladderBase, (following - t) / 16)));
          }
        }
      }
      if (listener.stopRequested()) {
        return new RunTotals(steps, rejected, iterations, phi, t);
      }
      if (s.adaptive()) {
        // a step with no estimate (the first, or the first after a kink) grows by 2; one the
        // extrapolation predicted exactly (the solves started from it and needed no iteration)
        // grows by the most allowed
        double grow =
            !estimated
                ? 2.0
                : Math.min(
                    GROWTH_LIMIT, Math.max(SHRINK_LIMIT, 0.9 * Math.sqrt(s.tolerance() / error)));
        if (tryDt >= dt * 0.999) {
          dt = ladder(ladderBase, Math.min(s.maxStep(), dt * grow));
        }
      }
      checkpoints.accepted(
          new RunCursor(
              t,
              dt,
              ladderBase,
              phi,
              previous,
              previousDt,
              scale,
              steps,
              rejected,
              sinceRestart,
              iterations));
    }
    return new RunTotals(steps, rejected, iterations, phi, t);
  }

  /** The largest step of the ladder base·2^k not above dt. */
  private static double ladder(double base, double dt) {
    double k = Math.floor(Math.log(dt / base) / Math.log(2) + 1e-9);
    return base * Math.pow(2, k);
  }

  /** Max-norm of φ₁ − extrapolation(φ₋₁, φ₀), times dt / (dt + dt_prev). */
  static double localError(double[] prev, double prevDt, double[] cur, double[] next, double dt) {
    double r = dt / prevDt;
    double max = 0;
    for (int i = 0; i < next.length; i++) {
      double predicted = cur[i] + r * (cur[i] - prev[i]);
      max = Math.max(max, Math.abs(next[i] - predicted));
    }
    return max * dt / (dt + prevDt);
  }

  private static double maxAbs(double[] a) {
    double m = 0;
    for (double v : a) {
      m = Math.max(m, Math.abs(v));
    }
    return m;
  }

  private static boolean allFinite(double[] a) {
    for (double v : a) {
      if (!Double.isFinite(v)) {
        return false;
      }
    }
    return true;
  }
}
