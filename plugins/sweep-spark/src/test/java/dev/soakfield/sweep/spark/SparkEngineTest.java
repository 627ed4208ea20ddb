package dev.soakfield.sweep.spark;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.sweep.EngineSettings;
import dev.soakfield.fem.sweep.LocalSweepEngine;
import dev.soakfield.fem.sweep.SweepEngine;
import dev.soakfield.fem.sweep.SweepEngines;
import dev.soakfield.fem.sweep.SweepFile;
import dev.soakfield.fem.sweep.SweepPlan;
import dev.soakfield.fem.sweep.SweepRun;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.apache.spark.sql.Dataset;
import org.apache.spark.sql.Row;
import org.apache.spark.sql.SparkSession;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The Spark engine against the local engine on a small sweep of our own (a coarse plane sheet, D
 * listed and sampled, a case that fails): the same table for the same seed, in local mode and with
 * executors in other processes (local-cluster mode: cases and rows cross process boundaries).
 */
class SparkEngineTest {
  @TempDir Path dir;

  private Path sweep;
  private final List<String> log = new ArrayList<>();
  private List<Path> plugins = List.of();

  @BeforeEach
  void files() throws IOException {
    MshWriter.write(
        dir.resolve("sheet.msh"), StructuredMesher.box(1e-3, 1e-5, 1e-5, 6, 1, 1, 1), false);
    Files.writeString(
        dir.resolve("sheet.json"),
        """
        { "mesh": "sheet.msh", "materials": { "body": { "diffusivity": 1e-10 } },
          "faces": { "xmin": { "kind": "concentration", "value": 1 },
                     "xmax": { "kind": "concentration", "value": 1 } },
          "thresholds": [ { "name": "half", "level": 0.5, "where": "mean:body" } ],
          "time": { "end": 1500, "step": 50 } }
        """);
    sweep =
        Files.writeString(
            dir.resolve("sweep.json"),
            """
            { "base": "sheet.json",
              "vary": { "materials.body.diffusivity": { "values": [1e-10, -1e-10] },
                        "faces.xmin.value": { "distribution": "uniform", "low": 0.8,
                                              "high": 1.2 },
                        "time.end": { "values": ["25 min"] } },
              "samples": 5, "seed": 11, "sampling": "latin-hypercube",
              "collect": { "times": [300, 900] } }
            """);
  }

  private SweepRun.Outcome run(SweepEngine engine, String out, Optional<String> master)
      throws IOException {
    return SweepRun.run(
        SweepPlan.of(SweepFile.read(sweep)),
        engine,
        new EngineSettings(
            dir.resolve(out), dir.resolve("sheet.msh"), plugins, 2, master, log::add),
        false,
        false);
  }

  private SweepRun.Outcome local;

  private void sameTableAsTheLocalEngine(String master) throws IOException {
    local = run(new LocalSweepEngine(), "local", Optional.empty());
    SweepRun.Outcome spark = run(SweepEngines.named("spark"), "spark", Optional.of(master));
    String expected = Files.readString(dir.resolve("local/cases.csv"));
    assertEquals(expected, Files.readString(dir.resolve("spark/cases.csv")));
    assertEquals(10, local.table().rows().size());
    assertEquals(5, spark.failures().size(), "the cases with D < 0 fail on both engines");
    assertTrue(log.stream().anyMatch(l -> l.startsWith("spark: " + master)), log.toString());
    assertEquals(List.of(dir.resolve("spark/cases.parquet")), spark.engineFiles());
  }

  /** The Parquet copy holds the table's rows and a number where the table has one. */
  private static void parquetMatches(SparkSession s, Path folder, double expectedFirstAmount) {
    Dataset<Row> p = s.read().parquet(folder.resolve("cases.parquet").toUri().toString());
    assertEquals(10, p.count());
    Row first = p.orderBy("case").first();
    assertEquals("01", first.getString(0).substring(2));
    assertEquals(1e-10, first.getDouble(1));
    assertEquals("25 min", first.getString(first.fieldIndex("time.end")));
    assertEquals(expectedFirstAmount, first.getDouble(first.fieldIndex("amount@300")));
    assertTrue(p.orderBy("case").collectAsList().get(9).isNullAt(first.fieldIndex("amount@300")));
  }

  /**
   * A plugins folder holding a jar without laws (a library a plugin would use): shipped to the
   * executors and loaded there as on this machine, where it changes nothing.
   */
  private void pluginFolderWithALibrary() throws IOException {
    Path folder = Files.createDirectories(dir.resolve("plugins"));
    try (var jar =
        new java.util.jar.JarOutputStream(Files.newOutputStream(folder.resolve("helper.jar")))) {
      jar.putNextEntry(new java.util.jar.JarEntry("helper.txt"));
      jar.write("a library of a plugin".getBytes(java.nio.charset.StandardCharsets.UTF_8));
      jar.closeEntry();
    }
    plugins = List.of(folder, Files.createDirectories(dir.resolve("more-plugins")));
  }

  @Test
  void localModeGivesTheLocalEnginesTable() throws IOException {
    pluginFolderWithALibrary();
    SparkSession s = SparkSessions.local();
    try {
      sameTableAsTheLocalEngine("local[2]");
      double amount = local.table().rows().get(0).value("amount@300");
      parquetMatches(s, dir.resolve("spark"), amount);
      // a rerun with Spark runs nothing and keeps the table
      SweepRun.Outcome again = run(SweepEngines.named("spark"), "spark", Optional.of("local[2]"));
      assertEquals(0, again.ran());
    } finally {
      s.stop();
    }
  }

  /**
   * A second sweep in the same process under a new Spark context (a bench, the tests): the files of
   * the first context are gone, and the cached case runner must not point at them.
   */
  @Test
  void aLaterSparkContextInTheSameProcessRunsItsOwnFiles() throws IOException {
    SparkSession first = SparkSessions.local();
    try {
      run(SweepEngines.named("spark"), "spark-first", Optional.of("local[2]"));
    } finally {
      first.stop();
    }
    SparkSession second = SparkSessions.local();
    try {
      SweepRun.Outcome again =
          run(SweepEngines.named("spark"), "spark-second", Optional.of("local[2]"));
      assertEquals(5, again.failures().size(), again.failures().toString());
      assertEquals(
          Files.readString(dir.resolve("spark-first/cases.csv")),
          Files.readString(dir.resolve("spark-second/cases.csv")));
    } finally {
      second.stop();
    }
  }

  @Test
  void casesCrossingProcessBoundariesGiveTheSameTable() throws IOException {
    SparkSession s = SparkSessions.localCluster();
    try {
      sameTableAsTheLocalEngine(SparkSessions.LOCAL_CLUSTER);
    } finally {
      s.stop();
    }
  }

  @Test
  void tasksHoldAFewCasesAndAtLeastOneTaskPerCore() {
    assertEquals(2, SparkSweepEngine.slices(10, 2));
    assertEquals(25, SparkSweepEngine.slices(200, 2));
    assertEquals(3, SparkSweepEngine.slices(3, 8));
    assertEquals(8, SparkSweepEngine.slices(20, 8));
  }

  @Test
  void aMasterSparkCannotUseOrNoneAtAllIsTheUsersMistake() {
    String bad =
        org.junit.jupiter.api.Assertions.assertThrows(
                dev.soakfield.fem.sweep.SweepInputException.class,
                () -> run(SweepEngines.named("spark"), "bad", Optional.of("nonsense://here")))
            .getMessage();
    assertTrue(bad.startsWith("--master: found 'nonsense://here'"), bad);
    String none =
        org.junit.jupiter.api.Assertions.assertThrows(
                dev.soakfield.fem.sweep.SweepInputException.class,
                () -> run(SweepEngines.named("spark"), "none", Optional.empty()))
            .getMessage();
    assertTrue(none.startsWith("--master: found none"), none);
  }
}
