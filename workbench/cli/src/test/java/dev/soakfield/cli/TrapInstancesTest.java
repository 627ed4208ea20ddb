package dev.soakfield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.results.Series;
import dev.soakfield.mesh.vtk.VtuGrid;
import dev.soakfield.mesh.vtk.VtuReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Two trap types in one part, each named by the case: series.csv, the frames and the report carry
 * each one's trapped amount. In the dilute limit of Oriani's local equilibrium (Oriani, Acta
 * Metall. 18 (1970) 147) a trap holds c_T = (N_T/N_L)·exp(E_b/(R·T))·c, so each trap's amount is
 * its own multiple of the lattice amount.
 */
class TrapInstancesTest {
  @TempDir Path dir;

  private static final double R = 8.314462618; // J/(mol·K), CODATA 2018
  private static final double N_L = 5.1e29; // lattice sites per m³ of iron (from memory)

  private static double slope(double trapDensity, double bindingEnergy) {
    return trapDensity / N_L * Math.exp(bindingEnergy / (R * 300));
  }

  @Test
  void eachNamedTrapHasItsOwnColumnFieldAndReportRow() throws Exception {
    CliRun mesh =
        CliRun.of(
            "mesh",
            "box",
            "--size",
            "1e-3,1e-4,1e-4",
            "--cells",
            "20,1,1",
            "--out",
            dir.resolve("slab.msh").toString());
    assertEquals(ExitCodes.OK, mesh.exitCode(), mesh.err());
    Path kase =
        Files.writeString(
            dir.resolve("two-traps.json"),
            """
            { "mesh": "slab.msh", "temperature": 300,
              "materials": { "body": { "diffusivity": 1e-9, "source": [
                { "law": "trap-equilibrium", "name": "dislocations", "trap-density": 1e23,
                  "lattice-density": 5.1e29, "binding-energy": "27 kJ/mol" },
                { "law": "trap-equilibrium", "name": "carbides", "trap-density": 1e22,
                  "lattice-density": 5.1e29, "binding-energy": "48 kJ/mol" },
                { "law": "trap-equilibrium", "trap-density": 1e21,
                  "lattice-density": 5.1e29, "binding-energy": "20 kJ/mol" } ] } },
              "faces": { "xmin": { "kind": "concentration", "value": 1e15 } },
              "initial": 0,
              "time": { "end": 2000, "step": 100, "capacity": "lumped" } }
            """);
    Path out = dir.resolve("out");
    CliRun run = CliRun.of("run", kase.toString(), "--out", out.toString(), "--quiet");
    assertEquals(ExitCodes.OK, run.exitCode(), run.err());

    Series s = Series.read(out.resolve("series.csv"));
    double lattice = s.last("lattice_amount");
    assertTrue(lattice > 0, "the slab takes up hydrogen");
    double dislocations = s.last("trapped:body:dislocations");
    double carbides = s.last("trapped:body:carbides");
    // an unnamed instance is called by its law's id
    double third = s.last("trapped:body:trap-equilibrium");
    double sDis = slope(Double.parseDouble("1e23"), 27e3);
    double sCarb = slope(Double.parseDouble("1e22"), 48e3);
    double sThird = slope(Double.parseDouble("1e21"), 20e3);
    assertEquals(sDis * lattice, dislocations, 1e-6 * sDis * lattice);
    assertEquals(sCarb * lattice, carbides, 1e-6 * sCarb * lattice);
    assertEquals(sThird * lattice, third, 1e-6 * sThird * lattice);
    // negative control: the two named traps differ far beyond the tolerance, so a swap would fail
    assertTrue(Math.abs(sCarb * lattice - dislocations) > 1e3 * 1e-6 * sDis * lattice);
    assertEquals(
        dislocations + carbides + third,
        s.last("trapped:body"),
        1e-12 * s.last("trapped:body"),
        "the part's trapped amount is the sum over its traps");

    Path lastFrame;
    try (Stream<Path> frames = Files.list(out.resolve("fields"))) {
      lastFrame = frames.sorted().reduce((a, b) -> b).orElseThrow();
    }
    VtuGrid grid = VtuReader.read(lastFrame);
    double[] c = grid.pointField("c");
    double[] field = grid.pointField("trapped:body:carbides");
    int deepest = 0;
    for (int i = 0; i < c.length; i++) {
      if (c[i] > c[deepest]) {
        deepest = i;
      }
    }
    // Float32 frames: about seven digits
    assertEquals(sCarb * c[deepest], field[deepest], 1e-5 * sCarb * c[deepest]);
    assertTrue(grid.pointFieldNames().contains("trapped:body:dislocations"));

    // the window and render offer each trap's field, and colour by it
    dev.soakfield.fem.results.StoredRun stored = dev.soakfield.fem.results.StoredRun.open(out);
    List<String> offered =
        dev.soakfield.app.FieldKind.of(stored).stream().map(k -> k.fileName).toList();
    assertTrue(offered.contains("trapped:body:carbides"), offered.toString());
    dev.soakfield.app.ViewSettings settings = new dev.soakfield.app.ViewSettings();
    settings.frame(stored.frameCount() - 1);
    settings.field(
        java.util.Optional.of(dev.soakfield.app.FieldKind.parse("trapped:body:carbides")));
    dev.soakfield.app.Scene scene =
        new dev.soakfield.app.Scene(dev.soakfield.app.Study.open(out), settings);
    double largest = java.util.Arrays.stream(field).max().orElseThrow();
    assertEquals(largest, scene.high(), 1e-6 * largest); // the colour range is this field's
    String report = Files.readString(out.resolve("report.md"));
    assertTrue(report.contains("Trapped amount per trap"), report);
    for (String name : List.of("| dislocations | body |", "| carbides | body |")) {
      assertTrue(report.contains(name), name + " in the report");
    }
  }
}
