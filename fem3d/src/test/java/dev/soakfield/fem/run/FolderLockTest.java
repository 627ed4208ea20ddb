package dev.soakfield.fem.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.results.FolderLock;
import dev.soakfield.fem.results.ResultFolderException;
import dev.soakfield.fem.results.RunManifest;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A folder a run is writing into is refused to a second run, which leaves it untouched. */
class FolderLockTest {
  @TempDir Path dir;

  private Path caseFile() throws IOException {
    return BoxCase.write(dir, "{ \"end\": 100, \"step\": 10 }");
  }

  @Test
  void aSecondRunIntoABusyFolderIsRefusedAndTheFinishedResultStays() throws IOException {
    Path c = caseFile();
    Path out = dir.resolve("out");
    RunPipeline.run(c, out, RunProgress.SILENT);
    String series = Files.readString(out.resolve("series.csv"));
    FolderLock busy = FolderLock.take(out);
    try {
      ResultFolderException e =
          assertThrows(
              ResultFolderException.class, () -> RunPipeline.run(c, out, RunProgress.SILENT));
      assertTrue(e.getMessage().contains("another run writing into this folder"), e.getMessage());
      assertTrue(
          e.getMessage().contains("process " + ProcessHandle.current().pid()), e.getMessage());
    } finally {
      busy.close();
    }
    assertEquals(RunManifest.Status.FINISHED, RunManifest.readFrom(out).orElseThrow().status());
    assertEquals(series, Files.readString(out.resolve("series.csv")));
    // negative control: once the first run has let go, the folder takes a new run
    RunPipeline.run(c, out, RunProgress.SILENT);
    assertEquals(RunManifest.Status.FINISHED, RunManifest.readFrom(out).orElseThrow().status());
  }
}
