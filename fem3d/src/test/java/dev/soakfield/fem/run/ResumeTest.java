package dev.soakfield.fem.run;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.results.ResultFolderException;
import dev.soakfield.fem.results.StateFile;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Runs interrupted at random points and resumed from their checkpoints end as if never stopped. */
class ResumeTest {
  @TempDir Path dir;

  /** Stands for kill -9: nothing in the pipeline catches it, so the folder stays as it was. */
  private static final class Killed extends Error {
    private static final long serialVersionUID = 1L;
  }

  private Path caseFile(String steps) throws IOException {
    MshWriter.write(
        dir.resolve("plate.msh"),
        StructuredMesher.layers(
            2e-3,
            2e-3,
            3,
            3,
            java.util.List.of(
                new StructuredMesher.Layer("mould", 1e-3, 4),
                new StructuredMesher.Layer("die", 0.5e-3, 2)),
            1),
        false);
    return Files.writeString(
        dir.resolve("case.json"),
        """
        { "mesh": "plate.msh",
          "exposure": [ { "duration": 3000, "temperature": 300 },
                        { "duration": 1000, "temperature": [300, 380] },
                        { "duration": 4000, "temperature": 380 } ],
          "materials": {
            "mould": { "diffusivity": { "D0": 1e-6, "Q": 3e4 },
                       "solubility": { "S0": 0.5, "dH": -1e4 } },
            "die":   { "diffusivity": 1e-12, "solubility": 0.2 } },
          "faces": { "zmax": { "kind": "concentration", "value": 1.0 },
                     "xmin": { "kind": "exchange", "coefficient": 1e-7, "value": 0.5 } },
          "time": { %s, "outputs": [1000, 4000, 8000] },
          "probes": { "p": [0.001, 0.001, 0.0012] },
          "threshold": 0.3 }
        """
            .formatted(steps));
  }

  private static RunProgress killAt(int step) {
    return (t, end, steps, rejected) -> {
      if (steps == step) {
        throw new Killed();
      }
    };
  }

  private void interruptedThenResumed(String steps, int seed) throws IOException {
    Path c = caseFile(steps);
    Path reference = dir.resolve("whole");
    RunPipeline.run(c, reference, RunProgress.SILENT, RunOptions.defaults());
    String series = Files.readString(reference.resolve("series.csv"));
    StateFile.State end = StateFile.read(reference.resolve(StateFile.NAME));
    int total = series.split("\n", -1).length - 2;
    Random random = new Random(seed);
    for (int trial = 0; trial < 3; trial++) {
      Path out = dir.resolve("broken-" + trial);
      int killStep = 5 + random.nextInt(total - 10);
      RunOptions options = RunOptions.defaults().withCheckpoints(3 + random.nextInt(9), 0);
      assertThrows(Killed.class, () -> RunPipeline.run(c, out, killAt(killStep), options));
      assertTrue(Files.exists(out.resolve(Checkpointer.NAME)), "killed at step " + killStep);
      RunPipeline.run(c, out, RunProgress.SILENT, options.withResume(true));
      assertEquals(series, Files.readString(out.resolve("series.csv")), "killed at " + killStep);
      StateFile.State resumed = StateFile.read(out.resolve(StateFile.NAME));
      assertArrayEquals(end.phi(), resumed.phi(), "bit for bit, killed at step " + killStep);
      assertTrue(Files.notExists(out.resolve(Checkpointer.NAME)));
    }
  }

  @Test
  void fixedStepsResumeBitForBit() throws IOException {
    interruptedThenResumed("\"end\": 8000, \"step\": 50", 7);
  }

  @Test
  void adaptiveStepsResumeBitForBit() throws IOException {
    interruptedThenResumed("\"end\": 8000, \"tolerance\": 1e-3", 11);
  }

  /**
   * A checkpoint with one flipped bit, or cut short, is refused with the way out, never resumed
   * into another series (the resume tests above are the control: an intact one goes on).
   */
  @Test
  void aDamagedCheckpointIsRefusedNotResumed() throws IOException {
    Path c = caseFile("\"end\": 8000, \"step\": 50");
    RunOptions options = RunOptions.defaults().withCheckpoints(5, 0);
    for (String damage : new String[] {"flip", "cut"}) {
      Path out = dir.resolve("damaged-" + damage);
      assertThrows(Killed.class, () -> RunPipeline.run(c, out, killAt(40), options));
      Path checkpoint = out.resolve(Checkpointer.NAME);
      byte[] bytes = Files.readAllBytes(checkpoint);
      if (damage.equals("flip")) {
        bytes[bytes.length / 2] ^= 0x10; // one bit in the middle of the numbers
      } else {
        bytes = java.util.Arrays.copyOf(bytes, bytes.length / 3);
      }
      Files.write(checkpoint, bytes);
      ResultFolderException e =
          assertThrows(
              ResultFolderException.class,
              () -> RunPipeline.run(c, out, RunProgress.SILENT, options.withResume(true)));
      assertTrue(e.getMessage().contains("damaged checkpoint"), e.getMessage());
      assertTrue(e.getMessage().contains("without --resume"), e.getMessage());
    }
  }

  @Test
  void aFinishedRunHasNothingToResume() throws IOException {
    Path c = caseFile("\"end\": 8000, \"step\": 400");
    Path out = dir.resolve("done");
    RunPipeline.run(c, out, RunProgress.SILENT, RunOptions.defaults());
    ResultFolderException e =
        assertThrows(
            ResultFolderException.class,
            () ->
                RunPipeline.run(
                    c, out, RunProgress.SILENT, RunOptions.defaults().withResume(true)));
    assertTrue(e.getMessage().contains("nothing to resume"), e.getMessage());
  }
}
