package dev.soakfield.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.soakfield.fem.sweep.CaseRow;
import dev.soakfield.fem.sweep.CasesTable;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The sweep's pictures: which are drawn, how points are grouped, and that they are PNG files. */
class SweepPlotsTest {
  @TempDir Path dir;

  private static CaseRow row(String id, String d, String soak, double half) {
    return new CaseRow(
        id,
        List.of(d, soak),
        List.of("threshold:half", "balance"),
        List.of(half, 1e-12),
        CaseRow.FINISHED,
        0.1);
  }

  @Test
  void eachOutputAgainstEachNumericKeyAndTheSpreadOfEachThreshold() throws IOException {
    CasesTable t =
        new CasesTable(
            List.of("materials.body.diffusivity", "exposure.0.temperature"),
            List.of(
                row("0001", "1.0E-12", "\"60 degC\"", 3600),
                row("0002", "2.0E-12", "\"85 degC\"", 1800),
                row("0003", "3.0E-12", "\"85 degC\"", Double.NaN),
                CaseRow.failed(
                    new dev.soakfield.fem.sweep.PlannedCase("0004", List.of("-1", "\"x\"")),
                    "bad",
                    0)));
    List<Path> files = SweepPlots.write(t, dir);
    assertEquals(
        List.of(
            "threshold_half-vs-materials.body.diffusivity.png",
            "balance-vs-materials.body.diffusivity.png",
            "spread-threshold_half.png"),
        files.stream().map(p -> p.getFileName().toString()).toList());
    byte[] png = {(byte) 0x89, 'P', 'N', 'G'}; // the PNG signature (PNG specification, 5.2)
    for (Path f : files) {
      assertArrayEquals(png, Arrays.copyOf(Files.readAllBytes(f), 4));
    }
    List<CaseRow> done = t.rows().stream().filter(CaseRow::finished).toList();
    assertEquals(
        List.of(
            "exposure.0.temperature = 60 degC",
            "exposure.0.temperature = 85 degC",
            "exposure.0.temperature = 85 degC"),
        SweepPlots.groups(t, done));
  }

  @Test
  void axesReadInPowersOfTenOnlyForVerySmallOrLargeValues() {
    assertEquals("0.###E0", SweepPlots.pattern(List.of(1e-12, 3e-12)));
    assertEquals("0.###E0", SweepPlots.pattern(List.of(2e5)));
    assertEquals("0.####", SweepPlots.pattern(List.of(0.5, 30.0)));
    assertEquals("threshold:x [s]", SweepPlots.titled("threshold:x"));
    assertEquals("balance", SweepPlots.titled("balance"));
  }
}
