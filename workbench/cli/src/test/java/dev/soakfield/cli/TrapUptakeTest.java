package dev.soakfield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The built-in {@code trap-equilibrium} law in a whole run: in the dilute limit, uptake into a slab
 * with traps is plain diffusion with Oriani's effective diffusivity (Oriani, Acta Metall. 18 (1970)
 * 147): D_eff = D_L/(1 + (N_T/N_L)·exp(E_b/(R·T))).
 */
class TrapUptakeTest {
  @TempDir Path dir;

  private static final double R = 8.314462618; // J/(mol·K), CODATA 2018

  private Path caseFile(String name, double diffusivity, String source) throws Exception {
    return Files.writeString(
        dir.resolve(name),
        """
        { "mesh": "slab.msh", "temperature": 300,
          "materials": { "body": { "diffusivity": %s, "solubility": 1.0 %s } },
          "faces": { "xmin": { "kind": "concentration", "value": 1e15 } },
          "initial": 0,
          "time": { "end": 2e5, "step": 2000, "capacity": "lumped" } }
        """
            .formatted(diffusivity, source));
  }

  private List<double[]> series(Path out, String... columns) throws Exception {
    List<String> lines = Files.readAllLines(out.resolve("series.csv"));
    List<String> header = Arrays.asList(lines.get(0).split(",", -1));
    List<double[]> rows = new ArrayList<>();
    for (String line : lines.subList(1, lines.size())) {
      String[] cells = line.split(",", -1);
      double[] row = new double[columns.length];
      for (int i = 0; i < columns.length; i++) {
        int k = header.indexOf(columns[i]);
        assertTrue(k >= 0, columns[i] + " in " + header);
        row[i] = Double.parseDouble(cells[k]);
      }
      rows.add(row);
    }
    return rows;
  }

  @Test
  void diluteEquilibriumTrappingIsDiffusionWithOrianisEffectiveDiffusivity() throws Exception {
    CliRun mesh =
        CliRun.of(
            "mesh",
            "box",
            "--size",
            "1e-3,1e-4,1e-4",
            "--cells",
            "40,1,1",
            "--out",
            dir.resolve("slab.msh").toString());
    assertEquals(ExitCodes.OK, mesh.exitCode(), mesh.err());
    double dLattice = 1e-8; // m²/s, hydrogen in a ferritic steel, order of magnitude (from memory)
    // the check numbers: N_T = 1e23, N_L = 5.1e29 (per m³), E_b = 60 kJ/mol, T = 300 K
    double slope = Double.parseDouble("1e23") / 5.1e29 * Math.exp(60e3 / (R * 300));
    double dEff = dLattice / (1 + slope);
    assertEquals(1.82e-4, dEff / dLattice, 0.005e-4);
    Path trapped =
        caseFile(
            "trapped.json",
            dLattice,
            """
            , "source": { "law": "trap-equilibrium", "trap-density": "1e23",
                          "lattice-density": 5.1e29, "binding-energy": 6e4 }""");
    Path plain = caseFile("plain.json", dEff, "");
    CliRun a =
        CliRun.of("run", trapped.toString(), "--out", dir.resolve("a").toString(), "--quiet");
    assertEquals(ExitCodes.OK, a.exitCode(), a.err());
    CliRun b = CliRun.of("run", plain.toString(), "--out", dir.resolve("b").toString(), "--quiet");
    assertEquals(ExitCodes.OK, b.exitCode(), b.err());
    List<double[]> withTraps = series(dir.resolve("a"), "time", "lattice_amount", "trapped_amount");
    List<double[]> withDeff = series(dir.resolve("b"), "time", "amount");
    assertEquals(withDeff.size(), withTraps.size());
    double end = withDeff.get(withDeff.size() - 1)[1];
    assertTrue(end > 0, "the slab takes up hydrogen");
    for (int i = 1; i < withDeff.size(); i++) {
      double[] t = withTraps.get(i);
      double[] p = withDeff.get(i);
      assertEquals(p[0], t[0], 1e-9 * p[0], "same output times");
      // the lattice uptake curve is the plain one with D_eff
      assertEquals(p[1], t[1], 2e-4 * end, "lattice amount at t = " + t[0]);
      // and the traps hold slope times the lattice amount (dilute: c_T = (N_T·K/N_L)·c)
      assertEquals(slope * t[1], t[2], 2e-4 * slope * t[1], "trapped amount at t = " + t[0]);
    }
  }
}
