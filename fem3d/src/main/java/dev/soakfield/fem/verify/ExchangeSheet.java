package dev.soakfield.fem.verify;

import dev.soakfield.fem.model.DiffusionModel;
import dev.soakfield.fem.time.ThetaStepper;
import dev.soakfield.fem.time.TimeSettings;
import dev.soakfield.fem.time.TransientRun;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.apache.commons.math3.analysis.solvers.BrentSolver;

/**
 * A plane sheet of thickness 2l whose two faces exchange with an environment at c_e through a
 * transfer coefficient α (−D ∂c/∂n = α (c_e − c)), the other faces sealed. J. Crank, The
 * Mathematics of Diffusion, 2nd ed. (1975), §4.3.5 ("surface evaporation"; section and equation
 * numbers from memory): M_t/M_∞ = 1 − Σ 2L² exp(−β_n² D t/l²) / (β_n² (β_n² + L² + L)), β_n tan β_n
 * = L, L = lα/D.
 *
 * <p>Two things are checked: the uptake at moderate L against the series, and that as α grows the
 * answer becomes the held-face answer of the same mesh and steps (with a balance closing to 1e-10
 * at every α), the limit the series has as L → ∞.
 */
public final class ExchangeSheet {
  private static final double HALF = 0.5; // l, half the thickness
  private static final double D = 1.0;
  private static final String SERIES_SOURCE = "Crank (1975) §4.3.5, M_t/M_inf series";
  private static final double[] TAU = {0.02, 0.1, 0.3}; // D t / l²

  private ExchangeSheet() {}

  /** The checks `verify` lists: L = 1 and 10 against the series, and the limit of large α. */
  public static List<Check> run() {
    List<Check> checks = new ArrayList<>();
    for (double bigL : new double[] {1, 10}) {
      checks.addAll(againstSeries(bigL));
    }
    checks.addAll(strongLimit());
    return checks;
  }

  private static List<Check> againstSeries(double bigL) {
    double alpha = bigL * D / HALF;
    double[] outputs = outputTimes();
    TimeSettings settings = steps(outputs[outputs.length - 1]);
    Recorder rec = sheet(40, Map.of("xmin", exchange(alpha), "xmax", exchange(alpha)), settings);
    List<Check> checks = new ArrayList<>();
    for (int i = 0; i < TAU.length; i++) {
      double computed = rec.uptakeAt(outputs[i]) / volume();
      checks.add(
          new Check(
              "exchange sheet L=" + fmt(bigL) + ", uptake at Dt/l^2=" + TAU[i],
              SERIES_SOURCE,
              fractionalUptake(bigL, TAU[i]),
              computed,
              2e-3,
              true));
    }
    checks.add(
        Check.atMost(
            "exchange sheet L=" + fmt(bigL) + ", global balance",
            "conservation (exact)",
            1e-10,
            rec.balanceRelative()));
    return checks;
  }

  /**
   * Growing α: the uptake must approach the held sheet's published curve (the series at L → ∞,
   * Crank eq. 4.18) as closely as a held face does on the same mesh and steps, successive α must
   * agree ever more closely, and the balance must close at every α. Before the solver's stopping
   * rule weighed rows by their diagonal, L = 1e8 stopped after one iteration with half the uptake.
   */
  private static List<Check> strongLimit() {
    double end = TAU[1] * HALF * HALF / D;
    double reference = fractionalUptake(1e12, TAU[1]);
    List<Check> checks = new ArrayList<>();
    double previous = Double.NaN;
    double previousL = Double.NaN;
    for (double bigL : new double[] {1e4, 1e8, 1e12}) {
      double alpha = bigL * D / HALF;
      Recorder rec =
          sheet(40, Map.of("xmin", exchange(alpha), "xmax", exchange(alpha)), steps(end));
      double uptake = rec.uptakeAt(end) / volume();
      String label = "exchange sheet L=" + fmt(bigL);
      checks.add(
          new Check(
              label + ", uptake at Dt/l^2=" + TAU[1],
              "Crank (1975) eq. 4.18, the limit L -> infinity of the §4.3.5 series",
              reference,
              uptake,
              2e-3,
              true));
      if (!Double.isNaN(previous)) {
        // the surface resistance 1/α against l/D puts the answer about 1/L below the limit, so
        // the change from the previous L is at most a few times 1/L_previous
        checks.add(
            Check.atMost(
                label + ", change from L=" + fmt(previousL) + " (relative)",
                "convergence as L -> infinity (order 1/L)",
                10 / previousL + 1e-9,
                Math.abs(uptake - previous) / uptake));
      }
      previous = uptake;
      previousL = bigL;
      checks.add(
          Check.atMost(
              label + ", global balance", "conservation (exact)", 1e-10, rec.balanceRelative()));
    }
    return checks;
  }

  private static double[] outputTimes() {
    double[] outputs = new double[TAU.length];
    for (int i = 0; i < TAU.length; i++) {
      outputs[i] = TAU[i] * HALF * HALF / D;
    }
    return outputs;
  }

  /** Crank–Nicolson steps of 2.5e-4 (after two backward-Euler ones) to end, output at TAU. */
  private static TimeSettings steps(double end) {
    double[] upTo = java.util.Arrays.stream(outputTimes()).filter(t -> t <= end).toArray();
    return new TimeSettings(end, upTo, true, Double.NaN, 2.5e-4, 2.5e-4, 2.5e-4);
  }

  private static Recorder sheet(
      int cells, Map<String, UniformModels.Condition> faces, TimeSettings settings) {
    TetMesh mesh = StructuredMesher.box(2 * HALF, 0.1, 0.1, cells, 1, 1, 1);
    DiffusionModel model =
        UniformModels.model(
            mesh, new double[] {D}, new double[] {1.0}, new double[] {0.0}, 0.0, faces);
    ThetaStepper stepper = new ThetaStepper(model, false, 1e-12, 5000);
    double[] phi0 = model.initialPhi();
    Recorder rec = new Recorder(stepper.amount(phi0));
    TransientRun.run(stepper, phi0, settings, rec);
    return rec;
  }

  private static UniformModels.Condition exchange(double alpha) {
    return UniformModels.Condition.exchange(alpha, 1.0);
  }

  private static double volume() {
    return 2 * HALF * 0.1 * 0.1;
  }

  /**
   * The series for M_t/M_∞ at τ = D t / l², summed until its terms fall below 1e-15; L up to about
   * 1e13 (β_n then lies within round-off of (n − ½)π).
   */
  static double fractionalUptake(double bigL, double tau) {
    BrentSolver brent = new BrentSolver(1e-15, 1e-15);
    double sum = 0;
    for (int n = 1; n < 10_000; n++) {
      // β_n lies in ((n−1)π, (n−1)π + π/2): β tan β − L rises from −L to +∞ there
      double lo = (n - 1) * Math.PI + 1e-12;
      double hi = (n - 1) * Math.PI + Math.PI / 2 - Math.min(1e-12, 0.1 / bigL);
      double beta = brent.solve(1000, b -> b * Math.tan(b) - bigL, lo, hi);
      double b2 = beta * beta;
      double term = 2 * bigL * bigL * Math.exp(-b2 * tau) / (b2 * (b2 + bigL * bigL + bigL));
      sum += term;
      if (term < 1e-15 && n > 3) {
        break;
      }
    }
    return 1 - sum;
  }

  private static String fmt(double v) {
    return v >= 1e4 ? String.format(java.util.Locale.ROOT, "%.0e", v) : String.valueOf((int) v);
  }
}
