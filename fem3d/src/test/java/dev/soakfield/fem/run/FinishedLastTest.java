package dev.soakfield.fem.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.results.MeshAsRun;
import dev.soakfield.fem.results.RunManifest;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * "finished" is the last word a run writes: the report is made while the folder still says running,
 * so a run killed between its solve and its report is not taken for a complete one.
 */
class FinishedLastTest {
  @TempDir Path dir;

  /** Stands for kill -9 between the solve and the report. */
  private static final class Killed extends Error {
    private static final long serialVersionUID = 1L;
  }

  private Path caseFile() throws IOException {
    return BoxCase.write(dir, "{ \"end\": 100, \"step\": 10 }");
  }

  @Test
  void theReportIsWrittenWhileTheFolderStillSaysRunning() throws IOException {
    Path c = caseFile();
    Path out = dir.resolve("out");
    RunOptions options =
        RunOptions.defaults()
            .withCompletion(
                (folder, finished, mesh) -> {
                  // the run's own mesh comes along, the one its folder holds
                  assertEquals(MeshAsRun.inFolder(folder).tetCount(), mesh.tetCount());
                  // the results are in place, the folder does not yet claim to be finished
                  assertEquals(
                      RunManifest.Status.RUNNING,
                      RunManifest.readFrom(folder).orElseThrow().status());
                  assertTrue(Files.exists(folder.resolve("series.csv")));
                  assertEquals(RunManifest.Status.FINISHED, finished.status());
                  Files.writeString(folder.resolve("report.md"), "# the report");
                  return List.of("report.md");
                });
    RunPipeline.run(c, out, RunProgress.SILENT, options);
    RunManifest m = RunManifest.readFrom(out).orElseThrow();
    assertEquals(RunManifest.Status.FINISHED, m.status());
    assertTrue(m.files().contains("report.md"), m.files().toString());
  }

  @Test
  void aRunKilledBeforeItsReportDoesNotSayFinished() throws IOException {
    Path c = caseFile();
    Path out = dir.resolve("killed");
    RunOptions options =
        RunOptions.defaults()
            .withCompletion(
                (folder, finished, mesh) -> {
                  throw new Killed();
                });
    assertThrows(Killed.class, () -> RunPipeline.run(c, out, RunProgress.SILENT, options));
    assertEquals(RunManifest.Status.RUNNING, RunManifest.readFrom(out).orElseThrow().status());
  }
}
