package dev.soakfield.fem.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.casefile.CaseInputException;
import dev.soakfield.fem.laws.SourceLawCatalog;
import dev.soakfield.fem.results.Series;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.gen.StructuredMesher.Layer;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Probes on the joint of a two-layer plate whose solubilities differ tenfold: c jumps there, so a
 * probe must say which side it reads, and reads that side's value (c = S·φ with φ continuous).
 */
class ProbeSidesTest {
  @TempDir Path dir;

  private Path plate(String probes) throws IOException {
    MshWriter.write(
        dir.resolve("plate.msh"),
        StructuredMesher.layers(
            1e-3, 1e-3, 2, 2, List.of(new Layer("die", 5e-4, 2), new Layer("mould", 5e-4, 2)), 1),
        false);
    return Files.writeString(
        dir.resolve("plate.json"),
        """
        { "mesh": "plate.msh",
          "materials": { "die": { "diffusivity": 1e-9, "solubility": 0.1 },
                         "mould": { "diffusivity": 1e-9, "solubility": 1.0 } },
          "faces": { "zmax": { "kind": "concentration", "value": 2.0 } },
          "initial": 0,
          "time": { "end": 5000, "step": 500 },
          "probes": %s }
        """
            .formatted(probes));
  }

  @Test
  void aProbeOnTheJointMustNameItsSideAndThenReadsIt() throws IOException {
    CaseInputException e =
        assertThrows(
            CaseInputException.class,
            () ->
                RunPipeline.run(
                    plate("{ \"joint\": [0.0005, 0.0005, 0.0005] }"),
                    dir.resolve("refused"),
                    RunProgress.SILENT));
    assertTrue(e.getMessage().contains("probes.joint"), e.getMessage());
    assertTrue(e.getMessage().contains("parts die and mould meet"), e.getMessage());
    RunPipeline.run(
        plate(
            """
            { "die-side": { "at": [0.0005, 0.0005, 0.0005], "part": "die" },
              "mould-side": { "at": [0.0005, 0.0005, 0.0005], "part": "mould" },
              "inside": [0.0005, 0.0005, 0.0009] }
            """),
        dir.resolve("out"),
        RunProgress.SILENT);
    Series s = Series.read(dir.resolve("out/series.csv"));
    // after D t / L² = 5 the plate is saturated: φ = 2 everywhere, so c = S·φ on each side
    assertEquals(2.0, s.last("probe:mould-side"), 1e-6);
    assertEquals(0.2, s.last("probe:die-side"), 1e-7);
    assertEquals(2.0, s.last("probe:inside"), 1e-6);
  }

  @Test
  void aProbeNamingAPartItDoesNotTouchIsRefused() throws IOException {
    // check binds what run binds: the refusal comes before any solving
    Path c = plate("{ \"p\": { \"at\": [0.0005, 0.0005, 0.0009], \"part\": \"die\" } }");
    CaseInputException e =
        assertThrows(
            CaseInputException.class,
            () ->
                RunPipeline.bindAll(
                    RunPipeline.prepare(c), SourceLawCatalog.classPathOnly().resolver()));
    assertTrue(e.getMessage().contains("probes.p.part"), e.getMessage());
    assertTrue(e.getMessage().contains("expected a part at the point: mould"), e.getMessage());
  }
}
