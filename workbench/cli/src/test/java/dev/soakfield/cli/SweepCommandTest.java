package dev.soakfield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code soakfield sweep} on a small sheet of our own: files, exit codes and messages. */
class SweepCommandTest {
  @TempDir Path dir;

  @BeforeEach
  void files() throws IOException {
    MshWriter.write(
        dir.resolve("sheet.msh"), StructuredMesher.box(1e-3, 1e-5, 1e-5, 8, 1, 1, 1), false);
    Files.writeString(
        dir.resolve("sheet.json"),
        """
        { "mesh": "sheet.msh", "materials": { "body": { "diffusivity": 1e-10 } },
          "faces": { "xmin": { "kind": "concentration", "value": 1 },
                     "xmax": { "kind": "concentration", "value": 1 } },
          "thresholds": [ { "name": "half", "level": 0.5, "where": "mean:body" } ],
          "time": { "end": 2000, "step": 50 } }
        """);
  }

  private Path sweep(String vary) throws IOException {
    return Files.writeString(
        dir.resolve("sweep.json"),
        """
        { "base": "sheet.json", "samples": 4, "seed": 3, "sampling": "latin-hypercube",
          "vary": { %s }, "collect": { "times": [600] } }
        """
            .formatted(vary));
  }

  private static final String D =
      "\"materials.body.diffusivity\": { \"distribution\": \"log-normal\", \"median\": 1e-10,"
          + " \"gsd\": 1.2 }";

  @Test
  void aSweepWritesItsTableStatisticsAndPlotsAndARerunRunsNothing() throws IOException {
    Path out = dir.resolve("out");
    CliRun r = CliRun.of("sweep", sweep(D).toString(), "--out", out.toString());
    assertEquals(0, r.exitCode(), r.err());
    assertTrue(r.out().contains("4 cases (4 run now, 0 kept from before), 4 finished"), r.out());
    assertTrue(r.out().contains("threshold:half"), r.out());
    assertTrue(r.out().contains("caution:"), r.out());
    assertTrue(r.err().contains("4 of 4 cases done"), r.err());
    List<String> lines = Files.readAllLines(out.resolve("cases.csv"));
    assertEquals(
        "case,materials.body.diffusivity,amount@600,threshold:half,max:body,balance,status",
        lines.get(0));
    assertEquals(5, lines.size());
    try (Stream<Path> s = Files.list(out.resolve("plots"))) {
      List<String> plots = s.map(p -> p.getFileName().toString()).sorted().toList();
      assertTrue(
          plots.contains("threshold_half-vs-materials.body.diffusivity.png"), plots.toString());
      assertTrue(plots.contains("spread-threshold_half.png"), plots.toString());
    }
    CliRun again =
        CliRun.of("sweep", dir.resolve("sweep.json").toString(), "--out", out.toString());
    assertEquals(0, again.exitCode(), again.err());
    assertTrue(again.out().contains("(0 run now, 4 kept from before)"), again.out());
    assertEquals(lines, Files.readAllLines(out.resolve("cases.csv")));
  }

  @Test
  void failedCasesAreReportedAndTheExitCodeSaysSo() throws IOException {
    CliRun r =
        CliRun.of(
            "sweep",
            sweep("\"materials.body.diffusivity\": { \"values\": [1e-10, -1] }").toString(),
            "--out",
            dir.resolve("out").toString(),
            "--no-plots");
    // samples without a distribution are refused first
    assertEquals(2, r.exitCode());
    assertTrue(r.err().contains("sweep.json: samples: found 4 samples but no distribution"));
    Files.writeString(
        dir.resolve("sweep.json"),
        "{ \"base\": \"sheet.json\", \"vary\": { \"materials.body.diffusivity\":"
            + " { \"values\": [1e-10, -1] } } }");
    CliRun f =
        CliRun.of(
            "sweep", dir.resolve("sweep.json").toString(), "--out", dir.resolve("o").toString());
    assertEquals(3, f.exitCode(), f.err());
    assertTrue(f.err().contains("1 of 2 cases failed"), f.err());
    assertTrue(Files.readString(dir.resolve("o/cases.csv")).contains("failed: case 0002"));
  }

  @Test
  void userMistakesExitWithTwoAndNameTheFileAndKey() throws IOException {
    CliRun r =
        CliRun.of(
            "sweep",
            sweep(D.replace("diffusivity", "diffusivty")).toString(),
            "--out",
            dir.resolve("out").toString());
    assertEquals(2, r.exitCode());
    assertTrue(r.err().contains("sweep.json: vary.materials.body.diffusivty"), r.err());
    assertTrue(r.err().contains("did you mean 'diffusivity'"), r.err());
    assertTrue(!r.err().contains("Exception"), r.err());
    CliRun spark =
        CliRun.of(
            "sweep",
            sweep(D).toString(),
            "--out",
            dir.resolve("s").toString(),
            "--engine",
            "spark");
    assertEquals(2, spark.exitCode());
    assertTrue(spark.err().contains("the Spark engine is an optional module"), spark.err());
    CliRun master =
        CliRun.of(
            "sweep",
            sweep(D).toString(),
            "--out",
            dir.resolve("m").toString(),
            "--master",
            "local[2]");
    assertEquals(2, master.exitCode());
    assertTrue(master.err().contains("--master"), master.err());
  }

  /** what fit --json writes feeds a sweep: standardError joins value, low and high. */
  @Test
  void aFitsJsonFeedsFromFit() throws IOException {
    Path csv =
        Files.writeString(
            dir.resolve("w.csv"),
            "time [h],mass [g]\n0,1.0\n1,1.002\n4,1.0038\n9,1.0052\n16,1.006\n36,1.0068\n64,1.0070"
                + "\n100,1.00702\n");
    CliRun fit = CliRun.of("fit", csv.toString(), "--thickness", "1mm", "--json");
    assertEquals(0, fit.exitCode(), fit.err());
    Files.writeString(dir.resolve("fit.json"), fit.out());
    assertTrue(fit.out().contains("standardError"), fit.out());
    CliRun r =
        CliRun.of(
            "sweep",
            sweep("\"materials.body.diffusivity\": { \"from-fit\": \"fit.json\" }").toString(),
            "--out",
            dir.resolve("out").toString(),
            "--no-plots");
    assertEquals(0, r.exitCode(), r.err() + r.out());
  }

  @Test
  void benchSweepPrintsCasesPerMinuteAndTheRatio() {
    CliRun r = CliRun.of("bench", "sweep", "--cases", "2", "--cells", "0");
    assertEquals(0, r.exitCode(), r.err());
    assertTrue(r.out().contains("one after another (local engine, 1 worker)"), r.out());
    assertTrue(
        r.out()
            .matches(
                "(?s).*local engine, \\d+ workers +[0-9.]+ cases/min +[0-9.]+ ms in a case +[0-9.]+x.*"),
        r.out());
    assertEquals(2, CliRun.of("bench", "sweep", "--cases", "1").exitCode());
    CliRun oneCell = CliRun.of("bench", "sweep", "--cells", "1");
    assertEquals(2, oneCell.exitCode());
    assertTrue(oneCell.err().contains("--cells: found 1, expected 0 (the strip) or 2 to 60"));
  }
}
