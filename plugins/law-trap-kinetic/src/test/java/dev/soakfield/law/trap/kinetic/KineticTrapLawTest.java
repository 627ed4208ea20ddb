package dev.soakfield.law.trap.kinetic;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.law.testkit.Answer;
import dev.soakfield.law.testkit.At;
import dev.soakfield.law.testkit.State;
import dev.soakfield.law.testkit.WellMixedCell;
import org.junit.jupiter.api.Test;

class KineticTrapLawTest {
  static final double R = KineticTrapLaw.GAS_CONSTANT;

  @Test
  void atAFixedLatticeConcentrationTheOccupancyRelaxesExponentially() {
    // McNabb & Foster (1963), trap equation at constant c: linear in θ, so θ(t) = θ∞ + (θ0 − θ∞)
    // ·exp(−(k·c + p)·t) with θ∞ = k·c/(k·c + p)
    double k = 2.0;
    double p = 0.5;
    double c = 0.75;
    KineticTrapLaw law = new KineticTrapLaw(1.0, k, 0, p, 0);
    double rate = k * c + p;
    double thetaInf = k * c / rate;
    double t = 2.0;
    double exact = thetaInf * (1 - Math.exp(-rate * t));
    double previous = Double.NaN;
    for (double dt : new double[] {0.02, 0.01, 0.005}) {
      WellMixedCell cell = WellMixedCell.heldAt(law, c, 300).withState(0);
      cell.run(t, dt);
      double error = Math.abs(cell.state()[0] - exact);
      assertTrue(error < 0.02 * exact, "dt " + dt + ": error " + error);
      if (!Double.isNaN(previous)) {
        assertEquals(2.0, previous / error, 0.1, "backward Euler converges at first order");
      }
      previous = error;
    }
    double[] rest = new double[1];
    law.initialState(c, 300, rest);
    assertEquals(thetaInf, rest[0], 1e-15);
  }

  @Test
  void fastKineticsApproachesLocalEquilibrium() {
    // Krom & Bakker, Metall. Mater. Trans. B 31 (2000) 1475: with k/p = exp(Eb/(R·T))/N_L and fast
    // exchange, the McNabb–Foster trap obeys Oriani's equilibrium θ/(1 − θ) = (c/N_L)·exp(Eb/(R·T))
    // (Oriani, Acta Metall. 18 (1970) 147), so the amount the traps take over a step, and its
    // derivative, become Oriani's
    double nT = 1e22 * 10;
    double nL = 5.1e29;
    double t = 300;
    double kOverP = Math.exp(60e3 / (R * t)) / nL;
    double c0 = 1e21;
    double c1 = 1.2e21;
    double dt = 1.0;
    double orianiTheta1 = orianiTheta(c1 * kOverP);
    double orianiSlope = nT * kOverP / Math.pow(1 + c1 * kOverP, 2);
    double previousGap = Double.POSITIVE_INFINITY;
    for (double p : new double[] {1e1, 1e3, 1e5}) {
      KineticTrapLaw law = new KineticTrapLaw(nT, p * kOverP, 0, p, 0);
      double[] start = new double[1];
      law.initialState(c0, t, start);
      assertEquals(orianiTheta(c0 * kOverP), start[0], 1e-12);
      Answer a = Answer.of(law, new At(c1, t, dt, dt), new State(start));
      double trapped1 = nT * start[0] - a.rate() * dt;
      double gap = Math.abs(trapped1 / (nT * orianiTheta1) - 1);
      double slopeGap = Math.abs(-a.derivative() * dt / orianiSlope - 1);
      assertTrue(gap < previousGap, "p = " + p + ": gap " + gap);
      previousGap = gap;
      if (p == 1e5) {
        assertTrue(gap < 1e-4, "trapped amount against Oriani's, gap " + gap);
        assertTrue(slopeGap < 1e-4, "∂c_T/∂c against Oriani's, gap " + slopeGap);
      }
    }
  }

  private static double orianiTheta(double x) {
    return x / (1 + x);
  }

  @Test
  void unsaturableSitesGiveCarterKiblerTwoStageAbsorption() {
    // Carter & Kibler, J. Compos. Mater. 12 (1978) 118 (from memory: ∂N/∂t = γ·n − β·N): in a
    // closed, well-mixed volume n + N is kept and, from N = 0, N(t) = n0·γ/(γ + β)·(1 −
    // exp(−(γ + β)·t)). Mapping γ = k·N_T, β = p with N_T far above N.
    double gamma = 2e-6;
    double beta = 1e-6;
    double nT = 1e6;
    KineticTrapLaw law = new KineticTrapLaw(nT, gamma / nT, 0, beta, 0);
    WellMixedCell cell = WellMixedCell.closed(law, 1.0, 300).withState(0);
    for (double t : new double[] {2e5, 5e5, 1e6}) {
      cell.run(t, 100);
      double exact = gamma / (gamma + beta) * (1 - Math.exp(-(gamma + beta) * t));
      assertEquals(exact, cell.held(), 1e-3 * exact, "bound amount at t = " + t);
      assertEquals(1.0, cell.concentration() + cell.held(), 1e-12, "amount kept");
    }
  }

  @Test
  void ratesFollowArrheniusAndSaturationCapsTheTrappedAmount() {
    KineticTrapLaw law = new KineticTrapLaw(3.0, 10, 1e4, 1e8, 6e4);
    // Arrhenius: ln(p(T1)/p(T2)) = −(Ed/R)(1/T1 − 1/T2) (common practice)
    assertEquals(
        -6e4 / R * (1 / 300.0 - 1 / 400.0), Math.log(law.release(300) / law.release(400)), 1e-12);
    assertEquals(
        -1e4 / R * (1 / 300.0 - 1 / 400.0), Math.log(law.capture(300) / law.capture(400)), 1e-12);
    double[] full = new double[1];
    law.initialState(1e12, 300, full);
    assertTrue(full[0] <= 1 && full[0] > 0.999, "θ " + full[0]);
    assertEquals(3.0 * full[0], law.trappedAmount(new State(full), 300), 1e-15);
  }

  @Test
  void thermalDesorptionPeaksFollowKissinger() {
    // Kissinger, Anal. Chem. 29 (1957) 1702; for hydrogen traps Choo & Lee, Metall. Trans. A 13
    // (1982) 135: when release limits desorption (lattice concentration near 0, no recapture), the
    // peak temperature T_p of a constant heating rate β obeys β·Ed/(R·T_p²) = p0·exp(−Ed/(R·T_p)),
    // so ln(β/T_p²) against 1/T_p is a line of slope −Ed/R
    double ed = 60e3;
    double p0 = 1e6;
    KineticTrapLaw law = new KineticTrapLaw(1.0, 1.0, 0, p0, ed);
    double[] betas = {0.01, 0.02, 0.05, 0.1};
    double[] x = new double[betas.length];
    double[] y = new double[betas.length];
    for (int i = 0; i < betas.length; i++) {
      double beta = betas[i];
      double t0 = 250;
      double dt = 0.05 / beta; // 0.05 K a step
      WellMixedCell cell =
          WellMixedCell.heldAt(law, 0, t0).withState(1.0).withTemperature(t -> t0 + beta * t);
      double[] rate = new double[8000];
      double held = cell.held();
      for (int n = 0; n < rate.length; n++) {
        cell.step(dt);
        rate[n] = (held - cell.held()) / dt;
        held = cell.held();
      }
      int m = 1;
      for (int n = 1; n < rate.length - 1; n++) {
        if (rate[n] > rate[m]) {
          m = n;
        }
      }
      assertTrue(m > 1 && m < rate.length - 2, "peak inside the ramp");
      // vertex of the parabola through the three largest rates; rate[n] belongs to mid-step
      double shift = 0.5 * (rate[m - 1] - rate[m + 1]) / (rate[m - 1] - 2 * rate[m] + rate[m + 1]);
      double tp = t0 + 0.05 * (m + 0.5 + shift);
      double kissinger = kissingerPeak(beta, ed, p0);
      assertEquals(kissinger, tp, 0.1, "peak temperature at β = " + beta + " K/s");
      x[i] = 1 / tp;
      y[i] = Math.log(beta / (tp * tp));
    }
    double slope = leastSquaresSlope(x, y);
    assertEquals(-ed / R, slope, 0.002 * ed / R, "Kissinger slope");
  }

  /** Solves β·E/(R·T²) = p0·exp(−E/(R·T)) for T by Newton on its logarithm. */
  private static double kissingerPeak(double beta, double e, double p0) {
    double t = 400;
    for (int i = 0; i < 50; i++) {
      double f = Math.log(beta * e / (R * t * t)) - Math.log(p0) + e / (R * t);
      double df = -2 / t - e / (R * t * t);
      t -= f / df;
    }
    return t;
  }

  private static double leastSquaresSlope(double[] x, double[] y) {
    double mx = 0;
    double my = 0;
    for (int i = 0; i < x.length; i++) {
      mx += x[i] / x.length;
      my += y[i] / x.length;
    }
    double sxy = 0;
    double sxx = 0;
    for (int i = 0; i < x.length; i++) {
      sxy += (x[i] - mx) * (y[i] - my);
      sxx += (x[i] - mx) * (x[i] - mx);
    }
    return sxy / sxx;
  }
}
