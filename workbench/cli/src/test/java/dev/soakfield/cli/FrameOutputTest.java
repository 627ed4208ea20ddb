package dev.soakfield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.results.StoredRun;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code run --compress / --float64} and {@code bench output}: the frames say how they are stored
 * and read back; the bench prints its table and refuses bad counts with exit 2.
 */
class FrameOutputTest {
  @TempDir Path dir;

  private Path sheet() throws Exception {
    MshWriter.write(
        dir.resolve("sheet.msh"), StructuredMesher.box(1e-3, 1e-4, 1e-4, 10, 1, 1, 1), false);
    return Files.writeString(
        dir.resolve("sheet.json"),
        """
        { "mesh": "sheet.msh", "materials": { "body": { "diffusivity": 1e-10 } },
          "faces": { "xmin": { "kind": "concentration", "value": 1.0 } },
          "initial": 0.0, "time": { "end": 100, "step": 10 } }
        """);
  }

  @Test
  void compressedDoubleFramesAreWrittenAndReadBack() throws Exception {
    Path kase = sheet();
    Path out = dir.resolve("out");
    CliRun run =
        CliRun.of("run", kase.toString(), "--out", out.toString(), "--compress", "--float64");
    assertEquals(0, run.exitCode(), run.err());
    String frame = Files.readString(out.resolve("fields/c_0001.vtu"), StandardCharsets.UTF_8);
    assertTrue(frame.contains("compressor=\"vtkZLibDataCompressor\""), frame.substring(0, 300));
    assertTrue(frame.contains("<DataArray type=\"Float64\" Name=\"phi\""));
    assertEquals(-1L, Files.mismatch(dir.resolve("sheet.msh"), out.resolve("mesh.msh")));
    StoredRun r = StoredRun.open(out);
    double[] c = r.field(r.frameCount() - 1, "c");
    // the held face x = 0 is at its value exactly; Float64 keeps it exact through zlib
    assertEquals(1.0, c[0], 0);

    Path plain = dir.resolve("plain");
    CliRun second = CliRun.of("run", kase.toString(), "--out", plain.toString(), "--quiet");
    assertEquals(0, second.exitCode(), second.err());
    String f32 = Files.readString(plain.resolve("fields/c_0001.vtu"), StandardCharsets.UTF_8);
    assertFalse(f32.contains("compressor="), "no compression unless asked for");
    assertTrue(f32.contains("<DataArray type=\"Float32\" Name=\"c\""));
  }

  @Test
  void benchOutputPrintsEveryVariantAgainstThePlainWrite() {
    CliRun r =
        CliRun.of(
            "bench",
            "output",
            "--cells",
            "3",
            "--frames",
            "2",
            "--repeat",
            "1",
            "--dir",
            dir.resolve("b").toString());
    assertEquals(0, r.exitCode(), r.err());
    List<String> lines = r.out().lines().toList();
    assertTrue(lines.get(0).contains("162 tetrahedra, 64 nodes"), r.out()); // 6 per cell, 4^3
    for (String v : List.of("before (Float64)", "Float32", "Float64", "Float32 --compress")) {
      assertTrue(lines.stream().anyMatch(l -> l.startsWith(v + " ")), v + "\n" + r.out());
    }
  }

  @Test
  void benchOutputRefusesACountOfNothing() {
    CliRun r = CliRun.of("bench", "output", "--frames", "0");
    assertEquals(ExitCodes.BAD_INPUT, r.exitCode(), r.err());
    assertTrue(r.err().contains("--frames"), r.err());
    assertTrue(r.err().contains("found 64, 0, 3"), r.err());
    assertFalse(r.err().contains("\tat "), r.err());
  }
}
