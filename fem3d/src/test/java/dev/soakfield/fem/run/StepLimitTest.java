package dev.soakfield.fem.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.casefile.CaseInputException;
import dev.soakfield.fem.results.RunManifest;
import dev.soakfield.fem.time.RunFailedException;
import java.io.IOException;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Time controls that would run for ever are stopped with a message, not left to fill the disk. */
class StepLimitTest {
  @TempDir Path dir;

  private Path caseWith(String time) throws IOException {
    return BoxCase.write(dir, time);
  }

  @Test
  void aRunThatOutgrowsItsStepLimitFailsSayingWhatToChange() throws IOException {
    // steps of at most 1 s over 1000 s need 1000 steps; the limit is 50
    Path c = caseWith("{ \"end\": 1000, \"max_step\": 1, \"max_steps\": 50 }");
    Path out = dir.resolve("out");
    RunFailedException e =
        assertThrows(RunFailedException.class, () -> RunPipeline.run(c, out, RunProgress.SILENT));
    assertTrue(e.getMessage().contains("took 50 steps"), e.getMessage());
    assertTrue(e.getMessage().contains("time.max_steps"), e.getMessage());
    assertEquals(RunManifest.Status.FAILED, RunManifest.readFrom(out).orElseThrow().status());
    // negative control: the same run with room for its steps finishes
    RunPipeline.run(
        caseWith("{ \"end\": 1000, \"max_step\": 1, \"max_steps\": 5000 }"),
        dir.resolve("ok"),
        RunProgress.SILENT);
    assertEquals(
        RunManifest.Status.FINISHED,
        RunManifest.readFrom(dir.resolve("ok")).orElseThrow().status());
  }

  /** A held value whose products overflow is a run that cannot go on, said as such (exit 3). */
  @Test
  void valuesBeyondDoublePrecisionStopTheRunWithTheReason() throws IOException {
    Path c = BoxCase.write(dir, "{ \"end\": 100, \"step\": 10 }").resolveSibling("box.json");
    java.nio.file.Files.writeString(
        c, java.nio.file.Files.readString(c).replace("\"value\": 1", "\"value\": 1e300"));
    RunFailedException e =
        assertThrows(
            RunFailedException.class,
            () -> RunPipeline.run(c, dir.resolve("big"), RunProgress.SILENT));
    assertTrue(e.getMessage().contains("beyond double precision"), e.getMessage());
    assertTrue(e.getMessage().contains("units.concentration"), e.getMessage());
    // the control: 1e30 is large but fine
    java.nio.file.Files.writeString(c, java.nio.file.Files.readString(c).replace("1e300", "1e30"));
    RunPipeline.run(c, dir.resolve("large"), RunProgress.SILENT);
  }

  @Test
  void fixedStepsBeyondTheLimitAreRefusedBeforeTheRun() throws IOException {
    CaseInputException e =
        assertThrows(
            CaseInputException.class,
            () -> RunPipeline.prepare(caseWith("{ \"end\": 1e308, \"step\": 1 }")));
    assertTrue(e.getMessage().contains("time.step"), e.getMessage());
    assertTrue(e.getMessage().contains("at most 10000000 steps"), e.getMessage());
    CaseInputException zero =
        assertThrows(
            CaseInputException.class,
            () -> RunPipeline.prepare(caseWith("{ \"end\": 10, \"max_steps\": 0 }")));
    assertTrue(zero.getMessage().contains("time.max_steps"), zero.getMessage());
  }
}
