package dev.soakfield.fem.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.results.ResultFolderException;
import dev.soakfield.fem.results.Series;
import dev.soakfield.fem.run.RunPipeline;
import dev.soakfield.fem.run.RunProgress;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A small sweep on the local engine: its table, a failing case, reruns and foreign folders. */
class SweepRunTest {
  @TempDir Path dir;

  private Path sweep;
  private final List<String> log = new ArrayList<>();

  @BeforeEach
  void files() throws IOException {
    SheetSweep.writeCase(dir, 8, "{ \"end\": 400, \"step\": 20 }");
    sweep =
        SheetSweep.writeSweep(
            dir,
            """
            { "base": "sheet.json",
              "vary": { "materials.body.diffusivity": { "values": [1e-10, 2e-10, -1e-10] },
                        "faces.xmin.value": { "range": [0.5, 1.0], "count": 2 } },
              "collect": { "times": [100, 400, 900] } }
            """);
  }

  private SweepRun.Outcome run(Path out, int workers, boolean force) throws IOException {
    return SweepRun.run(
        SweepPlan.of(SweepFile.read(sweep)),
        new LocalSweepEngine(),
        new EngineSettings(
            out, dir.resolve("sheet.msh"), List.of(), workers, Optional.empty(), log::add),
        force,
        false);
  }

  @Test
  void everyCaseIsARowWithTheContractColumnsAndAFailingCaseDoesNotStopTheSweep()
      throws IOException {
    SweepRun.Outcome o = run(dir.resolve("out"), 2, false);
    List<String> lines = Files.readAllLines(dir.resolve("out/cases.csv"), StandardCharsets.UTF_8);
    assertEquals(
        "case,materials.body.diffusivity,faces.xmin.value,amount@100,amount@400,amount@900,"
            + "threshold:half,max:body,balance,status",
        lines.get(0));
    assertEquals(7, lines.size());
    assertEquals(2, o.failures().size());
    for (CaseRow r : o.failures()) {
      assertTrue(r.status().startsWith("failed: case 000"), r.status());
      assertTrue(r.status().contains("materials.body.diffusivity"), r.status());
      assertEquals("-1.0E-10", r.values().get(0));
    }
    String failed = lines.get(6);
    assertTrue(
        failed.startsWith("0006,-1.0E-10,1.0,,,,,,,\"failed: case 0006 of sweep.json"), failed);
    assertTrue(
        failed.contains(
            "(sheet.json with materials.body.diffusivity = -1.0E-10, faces.xmin.value = 1.0):"
                + " materials.body.diffusivity: found -1.0E-10, expected a positive number"),
        failed);
    assertFalse(failed.contains("line "), "no place in text the user never saw: " + failed);
    CaseRow first = o.table().rows().get(0);
    assertEquals(CaseRow.FINISHED, first.status());
    assertTrue(Double.isNaN(first.value("amount@900")), "a time after the end has no value");
    assertTrue(Files.isRegularFile(dir.resolve("out/statistics.csv")));
    assertFalse(Files.exists(dir.resolve("out").resolve(LocalSweepEngine.SCRATCH)));
    assertTrue(log.stream().anyMatch(l -> l.contains("case 0005 failed")), log.toString());
  }

  /**
   * The collected figures are those of the same case run on its own through {@code soakfield run}'s
   * pipeline (an independent path: its own case file, its own series.csv).
   */
  @Test
  void rowsHoldWhatTheSameCaseRunOnItsOwnGives() throws IOException {
    SweepRun.Outcome o = run(dir.resolve("out"), 2, false);
    Path single =
        Files.writeString(
            dir.resolve("single.json"),
            Files.readString(dir.resolve("sheet.json"))
                .replace("\"diffusivity\": 1e-10", "\"diffusivity\": 2e-10")
                .replace(
                    "\"kind\": \"concentration\", \"value\": 1 },\n",
                    "\"kind\":" + " \"concentration\", \"value\": 0.5 },\n"));
    assertTrue(Files.readString(single).contains("\"value\": 0.5"));
    RunPipeline.run(single, dir.resolve("single"), RunProgress.SILENT);
    Series s = Series.read(dir.resolve("single/series.csv"));
    CaseRow row = o.table().rows().get(2); // D = 2e-10, xmin at 0.5
    assertEquals(List.of("2.0E-10", "0.5"), row.values());
    double[] t = s.require("time");
    assertEquals(s.require("amount")[indexOf(t, 100)], row.value("amount@100"), 0);
    assertEquals(s.last("amount"), row.value("amount@400"), 0);
    assertEquals(s.max("max:body"), row.value("max:body"), 0);
  }

  private static int indexOf(double[] t, double v) {
    for (int i = 0; i < t.length; i++) {
      if (t[i] == v) {
        return i;
      }
    }
    throw new AssertionError("no row at t = " + v);
  }

  @Test
  void oneWorkerAndSeveralGiveTheSameTable() throws IOException {
    run(dir.resolve("a"), 1, false);
    run(dir.resolve("b"), 2, false);
    assertEquals(
        Files.readString(dir.resolve("a/cases.csv")), Files.readString(dir.resolve("b/cases.csv")));
  }

  @Test
  void aRerunRunsOnlyTheCasesThatAreMissing() throws IOException {
    Path out = dir.resolve("out");
    run(out, 2, false);
    String table = Files.readString(out.resolve("cases.csv"));
    SweepRun.Outcome again = run(out, 2, false);
    assertEquals(0, again.ran());
    assertEquals(6, again.kept());
    Files.delete(out.resolve("rows/0003.json"));
    SweepRun.Outcome third = run(out, 2, false);
    assertEquals(1, third.ran());
    assertEquals(table, Files.readString(out.resolve("cases.csv")));
    // failed cases are kept too, unless asked to try them again
    SweepRun.Outcome retried =
        SweepRun.run(
            SweepPlan.of(SweepFile.read(sweep)),
            new LocalSweepEngine(),
            new EngineSettings(
                out, dir.resolve("sheet.msh"), List.of(), 2, Optional.empty(), s -> {}),
            false,
            true);
    assertEquals(2, retried.ran());
  }

  @Test
  void aFolderOfAnotherSweepOrOtherFilesIsNotTouchedWithoutForce() throws IOException {
    Path out = dir.resolve("out");
    run(out, 2, false);
    Files.writeString(sweep, Files.readString(sweep).replace("\"count\": 2", "\"count\": 3"));
    String m = assertThrows(ResultFolderException.class, () -> run(out, 2, false)).getMessage();
    assertTrue(m.contains("another sweep"), m);
    assertEquals(9, run(out, 2, true).table().rows().size());
    Path other = Files.createDirectories(dir.resolve("other"));
    Files.writeString(other.resolve("notes.txt"), "mine");
    String foreign =
        assertThrows(ResultFolderException.class, () -> run(other, 2, false)).getMessage();
    assertTrue(foreign.contains("notes.txt"), foreign);
    assertEquals("mine", Files.readString(other.resolve("notes.txt")));
  }

  @Test
  void statisticsCountTheCasesWithAndWithoutAValue() throws IOException {
    SweepRun.Outcome o = run(dir.resolve("out"), 2, false);
    SweepStatistics.Column c =
        o.statistics().columns().stream()
            .filter(x -> x.name().equals("amount@900"))
            .findFirst()
            .orElseThrow();
    assertEquals(0, c.cases());
    assertEquals(4, c.missing());
    SweepStatistics.Column d =
        o.statistics().columns().stream()
            .filter(x -> x.name().equals("materials.body.diffusivity"))
            .findFirst()
            .orElseThrow();
    assertEquals(4, d.cases());
    assertEquals(1e-10, d.min());
    assertEquals(2e-10, d.max());
    assertEquals(1.5e-10, d.p50(), 1e-25);
  }

  /** Percentiles after Hyndman and Fan (1996) definition 7, as R's quantile() computes them. */
  @Test
  void percentilesInterpolateBetweenOrderStatistics() {
    double[] v = {1, 2, 3, 4, 10};
    assertEquals(3, SweepStatistics.percentile(v, 0.5));
    assertEquals(2, SweepStatistics.percentile(v, 0.25));
    assertEquals(8.8, SweepStatistics.percentile(v, 0.95), 1e-12); // 4 + 0.8·(10 − 4)
    assertTrue(Double.isNaN(SweepStatistics.percentile(new double[0], 0.5)));
  }

  /**
   * A threshold never crossed counts as crossed after the end: the median of {100, 200, never,
   * never} is not 150 (what the crossed cases alone give) but "not crossed".
   */
  @Test
  void thresholdsNeverCrossedKeepPercentilesFromReadingTooEarly() {
    double[] times = {100, 200, Double.NaN, Double.NaN};
    SweepStatistics.Column t = SweepStatistics.column("threshold:x", times);
    assertEquals(2, t.cases());
    assertEquals(2, t.missing());
    assertEquals(100, t.min());
    assertEquals(175, t.p25(), 1e-12); // 100 + 0.75·(200 − 100)
    assertEquals(Double.POSITIVE_INFINITY, t.p50());
    assertEquals(Double.POSITIVE_INFINITY, t.max());
    assertTrue(Double.isNaN(t.mean()));
    // control: the same numbers as amounts after a case's end are left out, not censored
    SweepStatistics.Column a = SweepStatistics.column("amount@900", times);
    assertEquals(150, a.p50(), 1e-12);
    assertEquals(150, a.mean(), 1e-12);
  }
}
