package dev.soakfield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.soakfield.fem.assembly.CsrMatrix;
import dev.soakfield.fem.results.Series;
import dev.soakfield.fem.run.ModelFromResults;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Base64;
import java.util.List;
import no.uib.cipr.matrix.io.MatrixInfo;
import no.uib.cipr.matrix.io.MatrixSize;
import no.uib.cipr.matrix.io.MatrixVectorReader;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** run, report and export on one finished run of the sample case. */
class ResultCommandsTest {
  @TempDir static Path dir;
  static Path out;

  @BeforeAll
  static void runTheSample() throws Exception {
    Path c = Samples.copyTo(dir);
    out = dir.resolve("res");
    CliRun r = CliRun.of("run", c.toString(), "--out", out.toString(), "--quiet");
    assertEquals(0, r.exitCode(), r.err());
    assertEquals("", r.out() + r.err());
  }

  @Test
  void runWritesASelfContainedHtmlReportAndMarkdownWithPngs() throws Exception {
    String html = Files.readString(out.resolve("report.html"));
    assertTrue(html.contains("data:image/png;base64,"), "pictures inline");
    assertFalse(html.contains("src=\"report-"), "no picture by file");
    int at = html.indexOf("data:image/png;base64,") + "data:image/png;base64,".length();
    byte[] png = Base64.getDecoder().decode(html.substring(at, html.indexOf('"', at)));
    // PNG signature, from the PNG specification (ISO/IEC 15948, section 5.2)
    assertEquals(
        List.of(0x89, 0x50, 0x4e, 0x47), // \x89 P N G
        List.of(png[0] & 0xff, (int) png[1], (int) png[2], (int) png[3]));
    for (String s :
        List.of(
            "Materials per volume group",
            "Partitions per face group",
            "sealed",
            "Time to threshold",
            "corner",
            "Inflow per face group",
            "balance error",
            "Warnings",
            "licensed engineer")) {
      assertTrue(html.contains(s), s);
    }
    // the start amount before the faces take their values, and the series' first row after
    double firstRow =
        dev.soakfield.fem.results.Series.read(out.resolve("series.csv")).require("amount")[0];
    assertTrue(firstRow > 0, "the demo's held top fills its nodes at t = 0");
    assertTrue(
        html.contains(
            "amount at t = 0 with the faces&#39; values (the first row of series.csv)"
                .replace("&#39;", "'")),
        "first-row label");
    assertTrue(html.contains(String.format(java.util.Locale.ROOT, "%.4g", firstRow)), html);
    String md = Files.readString(out.resolve("report.md"));
    assertTrue(md.contains("![Uptake: amount in the part over time](report-uptake.png)"), md);
    assertTrue(Files.size(out.resolve("report-uptake.png")) > 1000);
    JsonNode m = new ObjectMapper().readTree(out.resolve("manifest.json").toFile());
    assertTrue(m.get("files").toString().contains("report.html"), m.toString());
  }

  @Test
  void reportRewritesAndTakesFieldPictures() throws Exception {
    Files.createDirectories(out.resolve("pictures"));
    Files.copy(out.resolve("report-uptake.png"), out.resolve("pictures/view-1.png"));
    CliRun r = CliRun.of("report", out.toString());
    assertEquals(0, r.exitCode(), r.err());
    assertTrue(Files.readString(out.resolve("report.md")).contains("(pictures/view-1.png)"));
    assertTrue(Files.readString(out.resolve("report.html")).contains("Field pictures"));
    CliRun bad = CliRun.of("report", dir.toString());
    assertEquals(ExitCodes.BAD_INPUT, bad.exitCode());
    assertTrue(bad.err().contains("found no manifest.json"), bad.err());
  }

  @Test
  void anotherCaseIntoTheFolderNeedsForce() throws Exception {
    Path other = dir.resolve("other.case.json");
    Files.writeString(
        other,
        Files.readString(dir.resolve(Samples.CASE))
            .replace("\"end\": 604800", "\"end\": 86400")
            .replace("[86400, 259200, 604800]", "[86400]"));
    Path copy = dir.resolve("res-copy");
    assertEquals(
        0,
        CliRun.of("run", dir.resolve(Samples.CASE).toString(), "--out", copy.toString(), "--quiet")
            .exitCode());
    CliRun r = CliRun.of("run", other.toString(), "--out", copy.toString(), "--quiet");
    assertEquals(ExitCodes.BAD_INPUT, r.exitCode(), r.err());
    assertTrue(r.err().contains("another case") && r.err().contains("--force"), r.err());
    assertFalse(r.err().contains("\tat "), r.err());
    r = CliRun.of("run", other.toString(), "--out", copy.toString(), "--quiet", "--force");
    assertEquals(0, r.exitCode(), r.err());
  }

  @Test
  void exportCsvPutsUnitsInTheHeaderAndKeepsTheNumbers() throws Exception {
    Path csv = dir.resolve("series-export.csv");
    CliRun r = CliRun.of("export", out.toString(), "--csv", csv.toString());
    assertEquals(0, r.exitCode(), r.err());
    List<String> lines = Files.readAllLines(csv);
    List<String> header = Series.split(lines.get(0));
    assertEquals("time [s]", header.get(0));
    // the sample declares kg/m^3: amounts in kg
    assertTrue(header.contains("amount [kg]"), header.toString());
    assertTrue(header.contains("probe:corner [kg/m^3]"), header.toString());
    assertTrue(header.contains("inflow_rate:zmax [kg/s]"), header.toString());
    assertTrue(header.contains("temperature [K]"), header.toString());
    assertEquals(
        Files.readAllLines(out.resolve("series.csv")).subList(1, lines.size()),
        lines.subList(1, lines.size()));
  }

  @Test
  void exportMtxReadsBackWithAGeneralPurposeReaderToTheSameMatrix() throws Exception {
    Path mtx = dir.resolve("step.mtx");
    CliRun r = CliRun.of("export", out.toString(), "--mtx", mtx.toString(), "--time", "3600");
    assertEquals(0, r.exitCode(), r.err());
    Series series = Series.read(out.resolve("series.csv"));
    double[] t = series.column("time").orElseThrow();
    int k = 1;
    while (t[k] < 3600) {
      k++;
    }
    CsrMatrix a = ModelFromResults.from(out).stepper().systemMatrix(t[k] - t[k - 1], 1.0, t[k]);
    // MTJ's Matrix Market reader (a general-purpose library) parses the header and entries
    try (Reader in = Files.newBufferedReader(mtx, StandardCharsets.UTF_8)) {
      MatrixVectorReader reader = new MatrixVectorReader(in);
      MatrixInfo info = reader.readMatrixInfo();
      assertTrue(info.isCoordinate() && info.isReal() && info.isSymmetric());
      MatrixSize size = reader.readMatrixSize(info);
      assertEquals(a.size(), size.numRows());
      assertEquals(a.size(), size.numColumns());
      int n = size.numEntries();
      int[] row = new int[n];
      int[] col = new int[n];
      double[] val = new double[n];
      reader.readCoordinate(row, col, val);
      long lower = 0;
      for (int i = 0; i < a.size(); i++) {
        for (int p = a.rowStart()[i]; p < a.rowStart()[i + 1]; p++) {
          lower += a.cols()[p] <= i ? 1 : 0;
        }
      }
      assertEquals(lower, n);
      for (int e = 0; e < n; e++) {
        int i = row[e] - 1; // MTJ keeps the file's 1-based indices
        int j = col[e] - 1;
        assertTrue(j <= i, "symmetric storage holds the lower triangle");
        assertEquals(a.get(i, j), val[e], 0.0); // shortest round-trip text: exact
        assertEquals(a.get(j, i), val[e], 1e-12 * Math.abs(val[e]));
      }
    }
    assertTrue(r.out().contains("stored entries"), r.out());
  }

  @Test
  void exportNeedsOneTargetAndAKnownTime() {
    assertEquals(ExitCodes.BAD_INPUT, CliRun.of("export", out.toString()).exitCode());
    CliRun r =
        CliRun.of(
            "export", out.toString(), "--mtx", dir.resolve("x.mtx").toString(), "--time", "1e9");
    assertEquals(ExitCodes.BAD_INPUT, r.exitCode());
    assertTrue(r.err().contains("--time: found 1.0E9 s"), r.err());
  }
}
