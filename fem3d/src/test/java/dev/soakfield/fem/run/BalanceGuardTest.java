package dev.soakfield.fem.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.casefile.TimeSpec;
import dev.soakfield.fem.results.RunManifest;
import dev.soakfield.fem.time.RunFailedException;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A run whose amount does not balance is a failure, not a result: an exchange face with a
 * coefficient of 1e6 m/s on a 6 × 6 × 3 mm box (D = 1e-10 m²/s) gave a balance error near 1 and
 * half the held-face amount, with exit code 0. Now it fails and says why; a moderate coefficient
 * (the negative control) still runs and balances.
 */
class BalanceGuardTest {
  @TempDir Path dir;

  private Path box(double h) throws IOException {
    return box(h, "");
  }

  private Path box(double h, String time) throws IOException {
    MshWriter.write(
        dir.resolve("box.msh"), StructuredMesher.box(6e-3, 6e-3, 3e-3, 6, 6, 3, 1), false);
    return Files.writeString(
        dir.resolve("box-" + h + time.length() + ".json"),
        """
        { "mesh": "box.msh", "materials": { "body": { "diffusivity": 1e-10 } },
          "faces": { "zmax": { "kind": "exchange", "coefficient": %s, "value": 1.0 } },
          "time": { "end": 3600 %s } }
        """
            .formatted(h, time));
  }

  @Test
  void aRunThatDoesNotBalanceFailsAndSaysWhy() throws IOException {
    Path out = dir.resolve("strong");
    RunFailedException e =
        assertThrows(
            RunFailedException.class, () -> RunPipeline.run(box(1e6), out, RunProgress.SILENT));
    assertTrue(e.getMessage().contains("the amount does not balance"), e.getMessage());
    assertTrue(e.getMessage().contains("exchange face 'zmax'"), e.getMessage());
    assertTrue(e.getMessage().contains("balance_limit"), e.getMessage());
    RunManifest m = RunManifest.readFrom(out).orElseThrow();
    assertEquals(RunManifest.Status.FAILED, m.status());
    // negative control: 1e-7 m/s, about D over the element size (1e-10 m²/s / 1 mm), balances
    RunSummary moderate = RunPipeline.run(box(1e-7), dir.resolve("moderate"), RunProgress.SILENT);
    assertTrue(
        moderate.balanceRelative() < TimeSpec.DEFAULT_BALANCE_LIMIT,
        "" + moderate.balanceRelative());
  }

  @Test
  void theCaseMayRaiseTheLimitOnPurpose() throws IOException {
    // the same strong face with the limit raised to 1: the run finishes and its summary shows the
    // error it has (the user asked for it)
    RunSummary s =
        RunPipeline.run(
            box(1e6, ", \"balance_limit\": 1"), dir.resolve("raised"), RunProgress.SILENT);
    assertTrue(s.balanceRelative() > TimeSpec.DEFAULT_BALANCE_LIMIT, "" + s.balanceRelative());
  }
}
