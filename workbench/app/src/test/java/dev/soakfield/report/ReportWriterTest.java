package dev.soakfield.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.results.ResultFolder;
import dev.soakfield.fem.results.RunManifest;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ReportWriterTest {
  @TempDir Path dir;

  @Test
  void aFailedRunGetsAReportOfWhatThereIsThatSaysSo() throws Exception {
    Path c = Files.writeString(dir.resolve("c.json"), "{ \"mesh\": \"m.msh\" }");
    Path m = Files.writeString(dir.resolve("m.msh"), "mesh bytes");
    Path out = dir.resolve("out");
    ResultFolder f = ResultFolder.open(out, RunManifest.starting(c, m, "test"), false);
    Files.writeString(
        f.work().resolve("series.csv"),
        """
        time,amount,amount:body,max:body,probe:p,balance_error
        0,0,0,0,0,0
        3600,2,2,0.5,0.25,1e-15
        7200,3,3,0.75,,2e-15
        """);
    f.fail("the linear solver did not converge at t = 7200 s", true);
    List<String> files = ReportWriter.write(out);
    assertTrue(files.containsAll(List.of("report.html", "report.md", "report-uptake.png")));
    String md = Files.readString(out.resolve("report.md"));
    assertTrue(
        md.contains("| status | failed: the linear solver did not converge at t = 7200 s |"));
    assertTrue(md.contains("This run did not finish"), md);
    assertTrue(md.contains("No summary.json: the run did not finish."), md);
    // the last row of the series: amount 3 at t = 2 h, max 0.75 over the run
    assertTrue(md.contains("| body | 3.000 | 0.7500 | 0.7500 |"), md);
    assertTrue(md.contains("At the last recorded time, t = 2.00 h"), md);
    assertTrue(md.contains("licensed engineer"), md);
    assertEquals(
        "failed",
        new com.fasterxml.jackson.databind.ObjectMapper()
            .readTree(out.resolve("manifest.json").toFile())
            .get("status")
            .asText());
  }
}
