package dev.soakfield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Thermal desorption of a uniformly charged thin plate with one kind of kinetic trap (McNabb &amp;
 * Foster, Trans. Metall. Soc. AIME 227 (1963) 618): the peak against an independent 1-D
 * finite-difference solution written here, the detrapping energy from the Kissinger plot
 * (Kissinger, Anal. Chem. 29 (1957) 1702; applied to hydrogen traps by Lee &amp; Lee, Metall.
 * Trans. A 17 (1986) 345) against the trap's release energy, and desorbed + remaining = charged.
 */
class TdsCommandTest {
  @TempDir Path dir;

  private static final double R = 8.314462618; // J/(mol·K), CODATA 2018
  private static final double L = 2e-4; // plate thickness, m
  private static final double D0 = 1e-7; // m²/s
  private static final double Q = 7e3; // J/mol
  private static final double NT = 1.0; // trap sites, mol/m³
  private static final double K0 = 0.1; // capture, m³/(mol·s), with activation energy Q
  private static final double P0 = 1e11; // release, 1/s
  private static final double ED = 100e3; // release (detrapping) energy, J/mol
  private static final double C0 = 1.0; // charged lattice concentration, mol/m³
  private static final double T0 = 293.15; // K

  private Path kase;

  @BeforeEach
  void plate() throws IOException {
    CliRun mesh =
        CliRun.of(
            "mesh",
            "box",
            "--size",
            L + ",1e-4,1e-4",
            "--cells",
            "20,1,1",
            "--out",
            dir.resolve("plate.msh").toString());
    assertEquals(ExitCodes.OK, mesh.exitCode(), mesh.err());
    kase =
        Files.writeString(
            dir.resolve("plate.json"),
            """
            { "mesh": "plate.msh", "units": { "concentration": "mol/m^3" }, "temperature": "20 degC",
              "materials": { "body": { "diffusivity": { "D0": %s, "Q": %s }, "density": 7850,
                "source": { "law": "trap-kinetic", "name": "deep", "trap-density": %s,
                            "capture-rate": %s, "capture-energy": %s,
                            "release-rate": %s, "release-energy": %s } } },
              "faces": { "xmin": { "kind": "concentration", "value": 0 },
                         "xmax": { "kind": "concentration", "value": 0 },
                         "ymin": { "kind": "sealed" }, "ymax": { "kind": "sealed" },
                         "zmin": { "kind": "sealed" }, "zmax": { "kind": "sealed" } },
              "initial": %s, "time": { "end": 1 } }
            """
                .formatted(D0, Q, NT, K0, Q, P0, ED, C0));
  }

  /**
   * The desorption peak of the same plate by finite differences: n cells across, lattice diffusion
   * by backward Euler (a tridiagonal solve), the trap occupancy at each node by the exact-in-c
   * implicit update θ₁ = (θ₀ + dt·k·c)/(1 + dt·(k·c + p)) with the lattice taking what the traps
   * take (Lie splitting), faces held at c = 0; the desorption rate is the fall of the whole amount
   * per step, standing for the step's middle.
   */
  private static double finiteDifferencePeak(double beta, double end) {
    int n = 100;
    double dx = L / n;
    double dt = 0.02;
    double[] c = new double[n + 1];
    double[] theta = new double[n + 1];
    double[] w = new double[n + 1]; // node volumes per unit area
    for (int i = 0; i <= n; i++) {
      w[i] = i == 0 || i == n ? dx / 2 : dx;
      c[i] = i == 0 || i == n ? 0 : C0;
      double k = K0 * Math.exp(-Q / (R * T0));
      double p = P0 * Math.exp(-ED / (R * T0));
      theta[i] = k * C0 / (k * C0 + p); // at rest with the charge, as the law starts
    }
    double amount = amount(c, theta, w);
    double bestRate = -1;
    double[] last3 = new double[3];
    double[] lastT = new double[3];
    double peakT = Double.NaN;
    double[] a = new double[n + 1];
    double[] b = new double[n + 1];
    double[] cc = new double[n + 1];
    for (double t = dt; t <= end + 1e-9; t += dt) {
      double temp = T0 + beta * t;
      double d = D0 * Math.exp(-Q / (R * temp));
      double k = K0 * Math.exp(-Q / (R * temp));
      double p = P0 * Math.exp(-ED / (R * temp));
      for (int i = 0; i <= n; i++) {
        double th = (theta[i] + dt * k * c[i]) / (1 + dt * (k * c[i] + p));
        c[i] -= NT * (th - theta[i]);
        theta[i] = th;
      }
      c[0] = 0;
      c[n] = 0;
      // backward Euler: c_i − r·(c_{i−1} − 2c_i + c_{i+1}) = c_i,old, ends held at 0
      double r = d * dt / (dx * dx);
      for (int i = 1; i < n; i++) {
        a[i] = -r;
        b[i] = 1 + 2 * r;
        cc[i] = -r;
      }
      double[] rhs = c.clone();
      for (int i = 2; i < n; i++) {
        double m = a[i] / b[i - 1];
        b[i] -= m * cc[i - 1];
        rhs[i] -= m * rhs[i - 1];
      }
      c[n - 1] = rhs[n - 1] / b[n - 1];
      for (int i = n - 2; i >= 1; i--) {
        c[i] = (rhs[i] - cc[i] * c[i + 1]) / b[i];
      }
      double now = amount(c, theta, w);
      double rate = (amount - now) / dt;
      amount = now;
      last3[0] = last3[1];
      last3[1] = last3[2];
      last3[2] = rate;
      lastT[0] = lastT[1];
      lastT[1] = lastT[2];
      lastT[2] = temp - beta * dt / 2;
      // the peak on the ramp: the highest rate after the lattice charge has left (t > 60 s)
      if (t > 60 && last3[1] > bestRate && last3[1] >= last3[2] && last3[1] > last3[0]) {
        bestRate = last3[1];
        // vertex of the parabola through the three points (equal spacing)
        double h = lastT[2] - lastT[1];
        double den = last3[0] - 2 * last3[1] + last3[2];
        peakT = lastT[1] + (den < 0 ? h * (last3[0] - last3[2]) / (2 * den) : 0);
      }
    }
    return peakT;
  }

  private static double amount(double[] c, double[] theta, double[] w) {
    double s = 0;
    for (int i = 0; i < c.length; i++) {
      s += w[i] * (c[i] + NT * theta[i]);
    }
    return s;
  }

  private JsonNode tds(Path out, String... rates) throws IOException {
    List<String> args =
        new java.util.ArrayList<>(
            List.of("tds", kase.toString(), "--to", "600K", "--out", out.toString(), "--json"));
    if (rates.length == 1) {
      args.addAll(List.of("--rate", rates[0]));
    } else {
      args.addAll(List.of("--rates", String.join(",", rates)));
    }
    CliRun r = CliRun.of(args.toArray(String[]::new));
    assertEquals(ExitCodes.OK, r.exitCode(), r.err());
    return new ObjectMapper().readTree(r.out());
  }

  @Test
  void thePeakMatchesAFiniteDifferenceSolutionAndTheAmountCloses() throws IOException {
    Path out = dir.resolve("one");
    JsonNode j = tds(out, "10K/min");
    JsonNode run = j.get("runs").get(0);
    assertEquals(1, run.get("peaks").size(), run.toString());
    double peak = run.get("peaks").get(0).get("temperature").asDouble();
    double beta = 10.0 / 60;
    double reference = finiteDifferencePeak(beta, (600 - T0) / beta);
    assertEquals(reference, peak, 1.0, "peak temperature against finite differences");
    // negative control: the same plate heated at 12 K/min peaks more than 1 K higher
    double faster = finiteDifferencePeak(12.0 / 60, (600 - T0) / (12.0 / 60));
    assertTrue(Math.abs(faster - peak) > 1.0, "12 K/min peaks at " + faster);
    // desorbed + remaining = charged
    double charged = run.get("charged").asDouble();
    double closed = run.get("desorbed").asDouble() + run.get("remaining").asDouble();
    assertEquals(charged, closed, 1e-8 * charged);
    // charged: the lattice charge and the full traps, c0 + N_T·θ0 over the plate's volume
    assertEquals((C0 + NT) * L * 1e-8, charged, 1e-4 * charged);
    assertTrue(run.get("remaining").asDouble() < 1e-3 * charged, "the plate is empty at 600 K");
    List<String> lines = Files.readAllLines(out.resolve("tds.csv"));
    assertTrue(lines.get(0).startsWith("time [s],temperature [K],desorption_rate_per_area [mol/"));
    assertTrue(lines.get(0).contains("desorption_rate_per_mass [mol/(kg*s)],cumulative [mol]"));
    assertTrue(Files.size(out.resolve("tds.png")) > 1000);
    assertTrue(Files.exists(out.resolve("run").resolve("series.csv")));
  }

  @Test
  void theKissingerPlotGivesTheDetrappingEnergy() throws IOException {
    Path out = dir.resolve("several");
    JsonNode j = tds(out, "2K/min", "5K/min", "10K/min", "20K/min");
    JsonNode k = j.get("kissinger");
    double e = k.get("detrapping_energy").asDouble();
    assertEquals(ED, e, 0.02 * ED, "Kissinger energy against the release energy");
    assertTrue(k.get("low").asDouble() < e && e < k.get("high").asDouble());
    assertTrue(Files.size(out.resolve("kissinger.png")) > 1000);
    assertTrue(Files.exists(out.resolve("rate-10K-min").resolve("tds.csv")));
    // negative control: a release energy 5 % off lies outside the 2 % band
    assertFalse(Math.abs(1.05 * ED - e) <= 0.02 * ED);
  }

  @Test
  void aRampEndingBelowItsStartIsABadInput() {
    CliRun r =
        CliRun.of(
            "tds",
            kase.toString(),
            "--rate",
            "10K/min",
            "--to",
            "250K",
            "--out",
            dir.resolve("bad").toString());
    assertEquals(ExitCodes.BAD_INPUT, r.exitCode(), r.err());
    assertTrue(r.err().contains("--to: found 250.0 K"), r.err());
    assertFalse(r.err().contains("\tat "), r.err());
    CliRun rate = CliRun.of("tds", kase.toString(), "--rate", "10 m", "--to", "600K", "--out", "x");
    assertEquals(ExitCodes.BAD_INPUT, rate.exitCode(), rate.err());
    assertTrue(rate.err().contains("--rate"), rate.err());
  }
}
