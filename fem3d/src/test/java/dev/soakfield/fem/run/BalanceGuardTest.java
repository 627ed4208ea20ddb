package dev.soakfield.fem.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.casefile.TimeSpec;
import dev.soakfield.fem.results.RunManifest;
import dev.soakfield.fem.results.Series;
import dev.soakfield.fem.time.RunFailedException;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A run whose amount does not balance is a failure, not a result. An exchange face with a
 * coefficient of 1e6 m/s on a 6 × 6 × 3 mm box (D = 1e-10 m²/s) once gave a balance error near 1
 * and half the uptake with exit code 0; it now balances and agrees with the published solution. A
 * run that still cannot balance (steps 1e17 times the part's diffusion time) fails and says why.
 */
class BalanceGuardTest {
  private static final double AREA = 6e-3 * 6e-3;
  private static final double D = 1e-10;
  private static final double END = 3600;

  @TempDir Path dir;

  @BeforeEach
  void mesh() throws IOException {
    MshWriter.write(
        dir.resolve("box.msh"), StructuredMesher.box(6e-3, 6e-3, 3e-3, 6, 6, 3, 1), false);
  }

  private Path box(String name, double d, String face, String time) throws IOException {
    return Files.writeString(
        dir.resolve(name + ".json"),
        """
        { "mesh": "box.msh", "materials": { "body": { "diffusivity": %s } },
          "faces": { "zmax": %s },
          "time": { "end": %s } }
        """
            .formatted(d, face, time));
  }

  private Path exchange(double h) throws IOException {
    return box(
        "h" + h,
        D,
        "{ \"kind\": \"exchange\", \"coefficient\": %s, \"value\": 1.0 }".formatted(h),
        String.valueOf(END));
  }

  private double amount(Path out) {
    return Series.read(out.resolve("series.csv")).last("amount");
  }

  @Test
  void aStrongExchangeFaceBalancesAndReachesTheHeldFaceLimit() throws IOException {
    RunSummary strong = RunPipeline.run(exchange(1e6), dir.resolve("strong"), RunProgress.SILENT);
    RunSummary stronger =
        RunPipeline.run(exchange(1e10), dir.resolve("stronger"), RunProgress.SILENT);
    assertTrue(strong.balanceRelative() < 1e-10, "" + strong.balanceRelative());
    assertTrue(stronger.balanceRelative() < 1e-10, "" + stronger.balanceRelative());
    // h·(element size)/D = 1e13 and 1e17: both are held faces to every printed digit
    double m = amount(dir.resolve("strong"));
    assertEquals(m, amount(dir.resolve("stronger")), 1e-6 * m);
    // semi-infinite medium with its surface held from t = 0 (the penetration √(Dt) = 0.6 mm is a
    // fifth of the 3 mm depth): M_t = 2 c_s √(D t / π) per area, Crank (1975) eq. 3.15 (numbering
    // from memory). Three cells through the depth: within 10 %.
    double exact = 2 * Math.sqrt(D * END / Math.PI) * AREA;
    assertEquals(exact, m, 0.1 * exact);
    // negative control: a weak face (h·size/D = 1) takes in far less than the held limit
    RunPipeline.run(exchange(1e-7), dir.resolve("weak"), RunProgress.SILENT);
    assertTrue(amount(dir.resolve("weak")) < 0.7 * exact);
  }

  @Test
  void aRunThatDoesNotBalanceFailsAndSaysWhy() throws IOException {
    // D = 1 m²/s in a 3 mm part evens out in about 1e-5 s; steps up to 1e12 s leave the held
    // face's reaction to round-off
    Path endless = box("endless", 1.0, "{ \"kind\": \"concentration\", \"value\": 1.0 }", "1e12");
    Path out = dir.resolve("endless-out");
    RunFailedException e =
        assertThrows(
            RunFailedException.class, () -> RunPipeline.run(endless, out, RunProgress.SILENT));
    assertTrue(e.getMessage().contains("the amount does not balance"), e.getMessage());
    assertTrue(e.getMessage().contains("max_step"), e.getMessage());
    assertTrue(e.getMessage().contains("balance_limit"), e.getMessage());
    RunManifest m = RunManifest.readFrom(out).orElseThrow();
    assertEquals(RunManifest.Status.FAILED, m.status());
    // negative control: the same part over a time it needs balances
    Path sensible = box("sensible", 1.0, "{ \"kind\": \"concentration\", \"value\": 1.0 }", "1e-4");
    RunSummary s = RunPipeline.run(sensible, dir.resolve("sensible-out"), RunProgress.SILENT);
    assertTrue(s.balanceRelative() < TimeSpec.DEFAULT_BALANCE_LIMIT, "" + s.balanceRelative());
  }

  @Test
  void theCaseMayRaiseTheLimitOnPurpose() throws IOException {
    // the same run with the limit raised to 1: it finishes and its summary shows the error it has
    // (the user asked for it)
    Path raised =
        box(
            "raised",
            1.0,
            "{ \"kind\": \"concentration\", \"value\": 1.0 }",
            "1e12, \"balance_limit\": 1");
    RunSummary s = RunPipeline.run(raised, dir.resolve("raised-out"), RunProgress.SILENT);
    assertTrue(s.balanceRelative() > TimeSpec.DEFAULT_BALANCE_LIMIT, "" + s.balanceRelative());
  }
}
