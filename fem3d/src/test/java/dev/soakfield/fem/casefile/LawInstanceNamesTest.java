package dev.soakfield.fem.casefile;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.soakfield.fem.run.RunPipeline;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Source-law instances get the case's names, or their law's id numbered, and a reversibility. */
class LawInstanceNamesTest {
  @TempDir Path dir;

  @Test
  void unnamedInstancesAreCalledByTheirIdNumberedAndNamedOnesKeepTheirNames() throws Exception {
    MshWriter.write(dir.resolve("box.msh"), StructuredMesher.box(1, 1, 1, 1, 1, 1, 1), false);
    Path kase =
        Files.writeString(
            dir.resolve("c.json"),
            """
            { "mesh": "box.msh",
              "materials": { "body": { "diffusivity": 1e-10, "source": [
                { "law": "trap-kinetic", "trap-density": 1 },
                { "law": "trap-kinetic", "name": "carbides", "reversible": false },
                { "law": "trap-kinetic" } ] } },
              "time": { "end": 1, "step": 1 } }
            """);
    List<SourceSpec.LawSource> laws =
        RunPipeline.prepare(kase).spec().materials().get("body").laws();
    assertEquals(
        List.of("trap-kinetic", "carbides", "trap-kinetic-2"),
        laws.stream().map(SourceSpec.LawSource::name).toList());
    assertEquals(
        List.of(true, false, true), laws.stream().map(SourceSpec.LawSource::reversible).toList());
    // the instance keys are no parameters of the law
    assertEquals(List.of(), List.copyOf(laws.get(1).parameters().keySet()));
    assertEquals(List.of("trap-density"), List.copyOf(laws.get(0).parameters().keySet()));
  }
}
