package dev.soakfield.fem.casefile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.casefile.CaseInputException.Problem;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CaseChecksTest {
  // StructuredMesher.box documents its groups: volume "body", exterior faces xmin .. zmax;
  // layers adds one volume group per layer and the interface group "lower-upper".
  private static final TetMesh BOX = StructuredMesher.box(0.01, 0.01, 0.002, 2, 2, 1, 1);

  // two 1 mm layers with the interface group "lower-upper" between them
  private static final TetMesh PLATE =
      StructuredMesher.layers(
          0.01,
          0.01,
          1,
          1,
          List.of(
              new StructuredMesher.Layer("lower", 0.001, 1),
              new StructuredMesher.Layer("upper", 0.001, 1)),
          1);

  @TempDir Path dir;

  @Test
  void misspeltFaceGroupIsReportedWithTheClosestName() {
    CaseSpec spec = CaseReader.read(CaseFiles.resource("misspelt-face.json"));
    CaseInputException e =
        assertThrows(CaseInputException.class, () -> CaseChecks.againstMesh(spec, BOX));
    assertEquals(1, e.problems().size(), e.getMessage());
    Problem p = e.problems().get(0);
    assertEquals(5, p.line());
    assertEquals("faces.xmni", p.path());
    assertEquals("found no face group 'xmni' in box.msh; did you mean 'xmin'?", p.message());
    assertTrue(e.getMessage().startsWith("misspelt-face.json, line 5, column 13, faces.xmni"));
  }

  @Test
  void exteriorGroupsWithoutEntryAreSealedByDefault() {
    CaseSpec spec = CaseReader.read(CaseFiles.resource("example.json"));
    List<String> warnings = CaseChecks.againstMesh(spec, BOX);
    // the example names xmin, xmax, ymin, ymax; the box also has zmin and zmax
    assertEquals(
        List.of(
            "face group 'zmin' has no entry in faces: sealed by default",
            "face group 'zmax' has no entry in faces: sealed by default"),
        warnings);
  }

  @Test
  void volumeGroupsMustMatchMaterialsBothWays() throws IOException {
    Path file =
        write(
            """
            { "mesh": "box.msh",
              "materials": { "bodi": { "diffusivity": 1e-12 } },
              "time": { "end": 10 } }
            """);
    CaseSpec spec = CaseReader.read(file);
    CaseInputException e =
        assertThrows(CaseInputException.class, () -> CaseChecks.againstMesh(spec, BOX));
    List<Problem> p = e.problems();
    assertEquals(2, p.size(), e.getMessage());
    assertEquals("materials", p.get(0).path());
    assertEquals(2, p.get(0).line());
    assertEquals(
        "found no material for volume group 'body' of box.msh, expected a material for every"
            + " volume group",
        p.get(0).message());
    assertEquals("materials.bodi", p.get(1).path());
    assertEquals(
        "found no volume group 'bodi' in box.msh, expected one of body; did you mean 'body'?",
        p.get(1).message());
  }

  @Test
  void sealedOnAnInterfaceIsRefusedRatherThanIgnored() throws IOException {
    Path file =
        write(
            """
            { "mesh": "plate.msh",
              "materials": { "lower": { "diffusivity": 1e-12 },
                             "upper": { "diffusivity": 1e-12 } },
              "faces": { "zmax": { "kind": "concentration", "value": 1 },
                         "lower-upper": { "kind": "sealed" } },
              "time": { "end": 10 } }
            """);
    CaseSpec spec = CaseReader.read(file);
    Problem p =
        assertThrows(CaseInputException.class, () -> CaseChecks.againstMesh(spec, PLATE))
            .problems()
            .get(0);
    assertEquals("faces.lower-upper.kind", p.path());
    assertEquals(5, p.line());
    assertTrue(p.message().startsWith("found 'sealed' on interface group 'lower-upper'"));
  }

  @Test
  void concentrationOnAnInterfaceIsAnError() throws IOException {
    Path file =
        write(
            """
            { "mesh": "plate.msh",
              "materials": { "lower": { "diffusivity": 1e-12 },
                             "upper": { "diffusivity": 1e-12 } },
              "faces": { "lower-upper": {
                           "kind": "concentration", "value": 1 },
                         "zmax": { "kind": "flux", "value": 1e-9 } },
              "probes": { "inside": [0.005, 0.005, 0.001], "far": [0.5, 0, 0] },
              "time": { "end": 10 } }
            """);
    CaseSpec spec = CaseReader.read(file);
    Problem p =
        assertThrows(CaseInputException.class, () -> CaseChecks.againstMesh(spec, PLATE))
            .problems()
            .get(0);
    assertEquals("faces.lower-upper.kind", p.path());
    assertEquals(5, p.line());

    // the same case with the interface condition removed passes; the stray probe is a warning
    Path fixed =
        write(
            Files.readString(file)
                .replaceAll(
                    "\"lower-upper\": \\{\\s*\"kind\": \"concentration\", \"value\": 1 \\},\\s*",
                    ""));
    List<String> warnings = CaseChecks.againstMesh(CaseReader.read(fixed), PLATE);
    assertTrue(warnings.contains("face group 'zmin' has no entry in faces: sealed by default"));
    assertTrue(
        warnings.stream()
            .anyMatch(w -> w.startsWith("probe 'far' at (0.5, 0.0, 0.0) lies outside")),
        warnings.toString());
    // exact geometry: the plate spans [0, 0.01] x [0, 0.01] x [0, 0.002], so "inside" is inside
    assertTrue(warnings.stream().noneMatch(w -> w.startsWith("probe 'inside'")));
    // five exterior groups left without entry (xmin, xmax, ymin, ymax, zmin) plus one probe
    assertEquals(6, warnings.size(), warnings.toString());
  }

  private Path write(String text) throws IOException {
    Path file = Files.createTempFile(dir, "case", ".json");
    Files.writeString(file, text);
    return file;
  }
}
