package dev.soakfield.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.soakfield.fem.fit.PlaneSheetUptake;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Locale;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class FitCommandTest {
  @TempDir Path dir;

  private Path sample(String name) throws Exception {
    Path p = dir.resolve(name);
    try (InputStream in = FitCommandTest.class.getResourceAsStream("/samples/" + name)) {
      Files.copy(in, p);
    }
    return p;
  }

  private static JsonNode json(CliRun r) throws Exception {
    assertEquals(0, r.exitCode(), r.err());
    return new ObjectMapper().readTree(r.out());
  }

  private static boolean covers(JsonNode estimate, double x) {
    return estimate.get("low").asDouble() <= x && x <= estimate.get("high").asDouble();
  }

  @Test
  void bundledWeighingDataGiveBackTheirParameters() throws Exception {
    Path csv = sample("coupon-soak-weighing.csv");
    Path png = dir.resolve("fit.png");
    CliRun text =
        CliRun.of(
            "fit",
            csv.toString(),
            "--thickness",
            "1mm",
            "--edges",
            "40mm,40mm",
            "--plot",
            png.toString());
    assertEquals(0, text.exitCode(), text.err());
    assertTrue(text.out().contains("diffusivity"), text.out());
    assertTrue(text.out().contains("half-time estimate"), text.out());
    assertTrue(text.out().contains("caution:"), text.out());
    assertTrue(text.out().contains("licensed engineering judgement"), text.out());
    byte[] head = Arrays.copyOf(Files.readAllBytes(png), 8);
    // PNG signature (W3C PNG specification, §5.2)
    assertArrayEquals(new byte[] {(byte) 0x89, 'P', 'N', 'G', 13, 10, 26, 10}, head);

    JsonNode j =
        json(
            CliRun.of(
                "fit", csv.toString(), "--thickness", "1mm", "--edges", "40mm,40mm", "--json"));
    // the file's comment states D = 3.0e-12 m^2/s and 0.35 wt% (synthetic data of our own)
    assertTrue(covers(j.get("diffusivity"), 3.0e-12), j.get("diffusivity").toString());
    assertTrue(covers(j.get("saturation"), 0.0035), j.get("saturation").toString());
    assertEquals(17, j.get("points").size());
    assertTrue(j.get("cautions").size() >= 2);
    assertEquals(4, j.get("diffusivity").size(), "value, low, high, standardError");
    // the 95 % interval is value ± t(0.975, n − 2)·se, Student's t (common practice): 17 points
    JsonNode d = j.get("diffusivity");
    double t =
        new org.apache.commons.math3.distribution.TDistribution(15)
            .inverseCumulativeProbability(0.975);
    assertEquals(
        (d.get("high").asDouble() - d.get("low").asDouble()) / 2 / t,
        d.get("standardError").asDouble(),
        1e-9 * d.get("value").asDouble());
  }

  @Test
  void helpShowsThePercentSign() {
    CliRun r = CliRun.of("fit", "--help");
    assertEquals(0, r.exitCode(), r.err());
    assertTrue(r.out().contains("95 % confidence intervals"), r.out());
    assertTrue(r.out().contains("--permeation"), r.out());
  }

  @Test
  void bundledPermeationTransientGivesBackItsParameters() throws Exception {
    Path csv = sample("membrane-permeation.csv");
    JsonNode j =
        json(CliRun.of("fit", "--permeation", csv.toString(), "--thickness", "0.5mm", "--json"));
    // stated in the file: D = 4.0e-10 m^2/s, J_ss = 1.0e-6 mol/(m^2 s), so C0 = J_ss·L/D = 1.25
    assertTrue(covers(j.get("diffusivity"), 4.0e-10), j.get("diffusivity").toString());
    assertTrue(covers(j.get("fittedSteadyFlux"), 1.0e-6), j.toString());
    assertTrue(covers(j.get("saturation"), 1.25), j.get("saturation").toString());
    assertEquals(4.0e-10, j.get("integratedDiffusivity").asDouble(), 0.05 * 4.0e-10);
    // the background row, 0.05 uA/cm^2 = 5e-4 A/m^2, divided by F (CODATA 2018)
    assertEquals(5e-4 / 96485.33212, j.get("background").asDouble(), 1e-15);
  }

  @Test
  void desorptionAndGivenDryMass() throws Exception {
    double l = 2e-3;
    double d = 1.5e-12;
    double dry = 5.0e-3; // kg
    double water = 0.012 * dry;
    Random rnd = new Random(3);
    StringBuilder b = new StringBuilder("# synthetic\ntime [h],mass [g]\n0,");
    b.append(String.format(Locale.ROOT, "%.6f%n", (dry + water) * 1e3));
    for (int i = 1; i <= 25; i++) {
      double t = 3600.0 * i * i * 0.8;
      double m = dry + water * (1 - PlaneSheetUptake.fraction(d * t / (l * l)));
      m += 0.03e-6 * rnd.nextGaussian();
      b.append(String.format(Locale.ROOT, "%.4f,%.7f%n", t / 3600, m * 1e3));
    }
    Path csv = Files.writeString(dir.resolve("dry.csv"), b.toString());
    JsonNode j =
        json(
            CliRun.of(
                "fit",
                csv.toString(),
                "--thickness",
                "2 mm",
                "--desorption",
                "--json",
                "--dry-mass",
                "5 g"));
    assertTrue(covers(j.get("diffusivity"), d), j.get("diffusivity").toString());
    assertTrue(covers(j.get("saturation"), 0.012), j.get("saturation").toString());
    assertEquals(dry, j.get("dryMass").asDouble(), 1e-12);
    // the same drying data without --desorption: refused with the hint, not a negative gain
    CliRun wrongWay = CliRun.of("fit", csv.toString(), "--thickness", "2 mm");
    assertEquals(2, wrongWay.exitCode(), wrongWay.out());
    assertTrue(wrongWay.err().contains("give --desorption"), wrongWay.err());
  }

  @Test
  void arrheniusFromTemperaturesInCelsius() throws Exception {
    // exact D = D0·exp(−Q/(R·T)) with D0 = 4.7e-6 m^2/s, Q = 42 kJ/mol, R = 8.314462618 (CODATA)
    StringBuilder b = new StringBuilder("temperature [degC],diffusivity [m^2/s]\n");
    for (double c : new double[] {25, 45, 65, 85}) {
      double dd = 4.7e-6 * Math.exp(-42e3 / (8.314462618 * (c + 273.15)));
      b.append(String.format(Locale.ROOT, "%.1f,%.10e%n", c, dd));
    }
    Path csv = Files.writeString(dir.resolve("arr.csv"), b.toString());
    JsonNode j = json(CliRun.of("fit", "--arrhenius", csv.toString(), "--json"));
    assertEquals(42e3, j.get("activationEnergy").get("value").asDouble(), 1e-3);
    assertEquals(4.7e-6, j.get("D0").get("value").asDouble(), 1e-12);
  }

  @Test
  void badCsvNamesFileLineFoundAndExpected() throws Exception {
    Path bad =
        Files.writeString(dir.resolve("bad.csv"), "# c\ntime [h],mass [mg]\n0,1000\n1,12x\n");
    CliRun r = CliRun.of("fit", bad.toString(), "--thickness", "1mm");
    assertEquals(ExitCodes.BAD_INPUT, r.exitCode());
    assertTrue(r.err().contains("bad.csv: line 4"), r.err());
    assertTrue(r.err().contains("'12x'") && r.err().contains("expected a finite number"), r.err());
    assertFalse(r.err().contains("at dev.soakfield"), r.err());

    Path header = Files.writeString(dir.resolve("h.csv"), "hours,grams\n0,1\n");
    CliRun h = CliRun.of("fit", header.toString(), "--thickness", "1mm");
    assertEquals(ExitCodes.BAD_INPUT, h.exitCode());
    assertTrue(h.err().contains("line 1") && h.err().contains("expected time"), h.err());

    Path unit = Files.writeString(dir.resolve("u.csv"), "time [h],mass [K]\n0,1\n");
    CliRun u = CliRun.of("fit", unit.toString(), "--thickness", "1mm");
    assertEquals(ExitCodes.BAD_INPUT, u.exitCode());
    assertTrue(u.err().contains("[Θ]") && u.err().contains("kg"), u.err());

    Path few = Files.writeString(dir.resolve("f.csv"), "time,mass\n0,1\n1,1.1\n");
    CliRun f = CliRun.of("fit", few.toString(), "--thickness", "1mm");
    assertEquals(ExitCodes.BAD_INPUT, f.exitCode());
    assertTrue(f.err().contains("at least"), f.err());

    CliRun t = CliRun.of("fit", few.toString(), "--thickness", "1 kg");
    assertEquals(ExitCodes.BAD_INPUT, t.exitCode());
    assertTrue(t.err().contains("--thickness"), t.err());
  }

  /**
   * Exit flux J/J_ss of a membrane charged from t = 0 (Devanathan–Stachurski's image-source form of
   * Crank's membrane solution, §4.3.2): (2/√(πτ))·Σ exp(−(2m+1)²/(4τ)), τ = D·t/L².
   */
  private static double exitFluxRatio(double tau) {
    double sum = 0;
    for (int m = 0; m < 10_000; m++) {
      double k = 2 * m + 1;
      double term = Math.exp(-k * k / (4 * tau));
      sum += term;
      if (term <= 1e-17 * sum) {
        break;
      }
    }
    return 2 / Math.sqrt(Math.PI * tau) * sum;
  }

  /**
   * The case of issue 12: a thick steel wall's exit current of 0.067 uA/cm^2 (J_ss = 6.9e-9
   * mol/(m^2 s)) over a background of 0.05 uA/cm^2 failed with "do not determine both diffusivity
   * and final level" while the same curve times 10 fitted.
   */
  @Test
  void thickWallPermeationCurrentFits() throws Exception {
    double l = 8e-3;
    double d = 1e-10;
    double jss = 6.9e-9;
    double faraday = 96485.33212;
    Random rnd = new Random(12);
    StringBuilder b = new StringBuilder("time [h],current density [uA/cm^2]\n0,0.05\n");
    for (int k = 1; k <= 120; k++) {
      double t = 2 * 3600.0 * k;
      double j = jss * (exitFluxRatio(d * t / (l * l)) + 0.002 * rnd.nextGaussian());
      double microAmpsPerCm2 = (j * faraday) * 1e2 + 0.05; // A/m^2 → uA/cm^2 is × 100
      b.append(String.format(Locale.ROOT, "%d,%.8f%n", 2 * k, microAmpsPerCm2));
    }
    Path csv = Files.writeString(dir.resolve("wall.csv"), b.toString());
    CliRun text = CliRun.of("fit", "--permeation", csv.toString(), "--thickness", "8mm");
    assertEquals(0, text.exitCode(), text.err());
    JsonNode j =
        json(CliRun.of("fit", "--permeation", csv.toString(), "--thickness", "8mm", "--json"));
    assertEquals(d, j.get("diffusivity").get("value").asDouble(), 0.01 * d);
    assertTrue(covers(j.get("diffusivity"), d), j.get("diffusivity").toString());
    assertEquals(jss, j.get("fittedSteadyFlux").get("value").asDouble(), 0.01 * jss);
    assertEquals(d, j.get("integratedDiffusivity").asDouble(), 0.02 * d);
  }

  /** The same transient in mol/(m^2 s) at fluxes 12 decades apart reads the same D. */
  @Test
  void permeationFluxAtAnyScale() throws Exception {
    double l = 1e-3;
    double d = 5e-11;
    for (double jss : new double[] {1e-15, 1e-12, 6.9e-9, 1e-6, 1e3}) {
      Random rnd = new Random(7);
      StringBuilder b = new StringBuilder("time [s],flux [mol/(m^2*s)]\n0,0\n");
      for (int k = 1; k <= 60; k++) {
        double t = 1.2 * l * l / d * k / 60;
        double j = jss * (exitFluxRatio(d * t / (l * l)) + 0.002 * rnd.nextGaussian());
        b.append(t).append(',').append(j).append('\n');
      }
      Path csv = Files.writeString(dir.resolve("j" + jss + ".csv"), b.toString());
      JsonNode j =
          json(CliRun.of("fit", "--permeation", csv.toString(), "--thickness", "1mm", "--json"));
      String at = "J_ss = " + jss + ": " + j.get("diffusivity");
      assertEquals(d, j.get("diffusivity").get("value").asDouble(), 0.01 * d, at);
      assertEquals(jss, j.get("fittedSteadyFlux").get("value").asDouble(), 0.01 * jss, at);
      assertEquals(jss * l / d, j.get("saturation").get("value").asDouble(), 0.02 * jss * l / d);
    }
  }

  /** Weighing and drying data at masses from 1e-15 kg to 1e3 kg read the same D and fraction. */
  @Test
  void weighingAndDryingAtAnyMassScale() throws Exception {
    double l = 2e-3;
    double d = 1.5e-12;
    for (double water : new double[] {1e-15, 1e-12, 1e-9, 1e-5, 1e3}) {
      double dry = 100 * water;
      Random rnd = new Random(9);
      StringBuilder up = new StringBuilder("time [h],mass [kg]\n0,").append(dry).append('\n');
      StringBuilder down =
          new StringBuilder("time [h],mass [kg]\n0,").append(dry + water).append('\n');
      for (int k = 1; k <= 30; k++) {
        double t = 3600.0 * 0.6 * k * k;
        double f = PlaneSheetUptake.fraction(d * t / (l * l));
        up.append(t / 3600).append(',');
        up.append(dry + water * (f + 0.002 * rnd.nextGaussian())).append('\n');
        down.append(t / 3600).append(',');
        down.append(dry + water * (1 - f + 0.002 * rnd.nextGaussian())).append('\n');
      }
      Path upCsv = Files.writeString(dir.resolve("up" + water + ".csv"), up.toString());
      Path downCsv = Files.writeString(dir.resolve("down" + water + ".csv"), down.toString());
      for (CliRun r :
          new CliRun[] {
            CliRun.of("fit", upCsv.toString(), "--thickness", "2mm", "--json"),
            CliRun.of("fit", downCsv.toString(), "--thickness", "2mm", "--desorption", "--json")
          }) {
        JsonNode j = json(r);
        String at = "water " + water + " kg: " + j.get("diffusivity");
        assertEquals(d, j.get("diffusivity").get("value").asDouble(), 0.01 * d, at);
        assertEquals(0.01, j.get("saturation").get("value").asDouble(), 0.01 * 0.01, at);
        assertEquals(water, j.get("saturationMass").get("value").asDouble(), 0.01 * water, at);
      }
      // the table of the text output shows the changes, not 0.0000 mg for a film's nanograms
      CliRun text = CliRun.of("fit", upCsv.toString(), "--thickness", "2mm");
      assertEquals(0, text.exitCode(), text.err());
      assertFalse(text.out().contains(" 0.0000 "), text.out());
    }
  }

  /** Negative control: a record with no transient is refused with the reason, not fitted. */
  @Test
  void aFlatRecordIsRefusedWithTheReason() throws Exception {
    Random rnd = new Random(1);
    StringBuilder j = new StringBuilder("time [h],flux [mol/(m^2*s)]\n0,0\n");
    StringBuilder m = new StringBuilder("time [h],mass [g]\n0,5.0\n");
    for (int k = 1; k <= 40; k++) {
      j.append(k).append(',').append(6.9e-9 * (1 + 0.01 * rnd.nextGaussian())).append('\n');
      m.append(k).append(',').append(5.0 + 0.01).append('\n');
    }
    Path flux = Files.writeString(dir.resolve("flat-flux.csv"), j.toString());
    Path mass = Files.writeString(dir.resolve("flat-mass.csv"), m.toString());
    for (CliRun r :
        new CliRun[] {
          CliRun.of("fit", "--permeation", flux.toString(), "--thickness", "8mm", "--json"),
          CliRun.of("fit", mass.toString(), "--thickness", "2mm", "--json")
        }) {
      assertEquals(ExitCodes.BAD_INPUT, r.exitCode(), r.out());
      assertTrue(r.err().contains("do not determine both diffusivity and final level"), r.err());
      assertTrue(r.err().contains("no transient"), r.err());
      assertFalse(r.out().contains("diffusivity"), r.out());
      assertFalse(r.err().contains("at dev.soakfield"), r.err());
    }
  }
}
