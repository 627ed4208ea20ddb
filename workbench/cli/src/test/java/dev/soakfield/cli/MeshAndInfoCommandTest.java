package dev.soakfield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.load.MeshLoader;
import dev.soakfield.mesh.topo.AssemblyOptions;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class MeshAndInfoCommandTest {
  @TempDir Path dir;

  private static Map<String, JsonNode> byName(JsonNode array) {
    Map<String, JsonNode> m = new HashMap<>();
    array.forEach(n -> m.put(n.get("name").asText(), n));
    return m;
  }

  @Test
  void boxMeshThenInfoReportsTetCountAndExactFaceAreas() throws Exception {
    Path msh = dir.resolve("b.msh");
    CliRun made =
        CliRun.of(
            "mesh",
            "box",
            "--size",
            "0.01,0.01,0.002",
            "--cells",
            "10,10,4",
            "--out",
            msh.toString());
    assertEquals(0, made.exitCode(), made.err());
    CliRun info = CliRun.of("info", msh.toString(), "--json");
    assertEquals(0, info.exitCode(), info.err());
    JsonNode root = new ObjectMapper().readTree(info.out());
    // 10*10*4 cells, six Kuhn tetrahedra per cell (exact count of the construction)
    assertEquals(2400, root.get("tets").asInt());
    assertEquals(11 * 11 * 5, root.get("nodes").asInt());
    Map<String, JsonNode> groups = byName(root.get("face_groups"));
    assertEquals(6, groups.size());
    // exact geometry: face areas of a 0.01 x 0.01 x 0.002 m box
    double[] expected = {0.01 * 0.002, 0.01 * 0.002, 0.01 * 0.002, 0.01 * 0.002, 1e-4, 1e-4};
    String[] names = {"xmin", "xmax", "ymin", "ymax", "zmin", "zmax"};
    for (int i = 0; i < 6; i++) {
      JsonNode g = groups.get(names[i]);
      assertEquals(expected[i], g.get("area_m2").asDouble(), 1e-15, names[i]);
      assertEquals("exterior", g.get("kind").asText());
    }
    assertEquals(2e-7, root.get("volume_groups").get(0).get("volume_m3").asDouble(), 1e-19);
  }

  @Test
  void unitsOnLengthsGiveTheSameMeshAsMetres() throws Exception {
    Path a = dir.resolve("a.msh");
    Path b = dir.resolve("b.msh");
    assertEquals(
        0,
        CliRun.of("mesh", "box", "--size", "2mm,3mm,1mm", "--cells", "2,2,1", "--out", "" + a)
            .exitCode());
    assertEquals(
        0,
        CliRun.of("mesh", "box", "--size", "0.002,0.003,0.001", "--cells", "2,2,1", "--out", "" + b)
            .exitCode());
    assertEquals(Files.readString(a), Files.readString(b));
  }

  @Test
  void layersReportOneVolumeGroupPerLayerWithExactVolumes() throws Exception {
    Path msh = dir.resolve("wall.msh");
    CliRun made =
        CliRun.of(
            "mesh",
            "layers",
            "--size",
            "0.02,0.01",
            "--cells",
            "4,2",
            "--layer",
            "skin:1mm:2",
            "--layer",
            "core:4mm:4",
            "--out",
            msh.toString());
    assertEquals(0, made.exitCode(), made.err());
    JsonNode root = new ObjectMapper().readTree(CliRun.of("info", "" + msh, "--json").out());
    Map<String, JsonNode> vols = byName(root.get("volume_groups"));
    // exact geometry: 0.02 x 0.01 m footprint times each thickness
    assertEquals(0.02 * 0.01 * 0.001, vols.get("skin").get("volume_m3").asDouble(), 1e-18);
    assertEquals(0.02 * 0.01 * 0.004, vols.get("core").get("volume_m3").asDouble(), 1e-18);
  }

  @Test
  void quadraticBoxHasTenNodeTets() throws Exception {
    Path msh = dir.resolve("q.msh");
    assertEquals(
        0,
        CliRun.of(
                "mesh",
                "box",
                "--size",
                "1,1,1",
                "--cells",
                "1,1,1",
                "--quadratic",
                "--out",
                "" + msh)
            .exitCode());
    JsonNode root = new ObjectMapper().readTree(CliRun.of("info", "" + msh, "--json").out());
    assertEquals(10, root.get("nodes_per_tet").asInt());
    // one Kuhn-split cube: 8 corners + 12 cube edges + 6 face diagonals + 1 main diagonal = 27
    // nodes
    assertEquals(27, root.get("nodes").asInt());
  }

  @Test
  void infoTextNamesGroupsAndFindings() {
    Path msh = dir.resolve("b.msh");
    CliRun.of("mesh", "box", "--size", "1,1,1", "--cells", "2,2,2", "--out", msh.toString());
    CliRun info = CliRun.of("info", msh.toString());
    assertEquals(0, info.exitCode(), info.err());
    assertTrue(info.out().contains("xmin"), info.out());
    assertTrue(info.out().contains("48 (4-node, linear)"), info.out());
  }

  @Test
  void missingFileIsBadInputWithoutStackTrace() {
    CliRun r = CliRun.of("info", dir.resolve("nope.msh").toString());
    assertEquals(ExitCodes.BAD_INPUT, r.exitCode());
    assertTrue(r.err().contains("nope.msh"), r.err());
    assertTrue(r.err().contains("no such file"), r.err());
    assertFalse(r.err().contains("at dev.soakfield"), r.err());
  }

  @Test
  void malformedMeshFileIsBadInputNamingTheLine() throws Exception {
    Path bad = dir.resolve("bad.msh");
    Files.writeString(bad, "$MeshFormat\n4.1 0 8\n$EndMeshFormat\n$Nodes\n1 two 1 2\n$EndNodes\n");
    CliRun r = CliRun.of("info", bad.toString());
    assertEquals(ExitCodes.BAD_INPUT, r.exitCode());
    assertTrue(r.err().contains("bad.msh"), r.err());
    assertTrue(r.err().contains("line 5"), r.err());
    assertFalse(r.err().contains("at dev.soakfield"), r.err());
  }

  @Test
  void gradingAndTheRoundMeshersShapeGuardSpeakUp() throws Exception {
    Path graded = dir.resolve("graded.msh");
    CliRun g =
        CliRun.of(
            "mesh",
            "box",
            "--size",
            "1mm,1mm,1mm",
            "--cells",
            "6,1,1",
            "--grade",
            "xmin:2",
            "--out",
            graded.toString());
    assertEquals(0, g.exitCode(), g.err());
    // the first cell against xmin is 1 mm · (2 − 1)/(2⁶ − 1) (a geometric series)
    TetMesh m = MeshLoader.load(graded, AssemblyOptions.defaults()).mesh();
    double first = Double.POSITIVE_INFINITY;
    for (int i = 0; i < m.nodeCount(); i++) {
      if (m.coord(i, 0) > 0) {
        first = Math.min(first, m.coord(i, 0));
      }
    }
    assertEquals(1e-3 / 63, first, 1e-12);
    CliRun face =
        CliRun.of(
            "mesh",
            "box",
            "--size",
            "1,1,1",
            "--cells",
            "2,2,2",
            "--grade",
            "inner:1.2",
            "--out",
            dir.resolve("x.msh").toString());
    assertEquals(2, face.exitCode());
    assertTrue(
        face.err().contains("--grade: found face 'inner', expected a face of the box: xmax, xmin"),
        face.err());
    CliRun twice =
        CliRun.of(
            "mesh",
            "pipe",
            "--inner-radius",
            "50mm",
            "--outer-radius",
            "60mm",
            "--height",
            "20mm",
            "--cells",
            "4,24,1",
            "--grade",
            "inner:1.2",
            "--grade",
            "inner:1.3",
            "--out",
            dir.resolve("x.msh").toString());
    assertEquals(ExitCodes.BAD_INPUT, twice.exitCode());
    assertTrue(
        twice.err().contains("--grade: found face 'inner' twice ('inner:1.2' and 'inner:1.3')"),
        twice.err());
    // a grading no counts can follow (cells 146 times apart across the wall) is refused, naming
    // the counts reached and the way out
    CliRun steep =
        CliRun.of(
            "mesh",
            "pipe",
            "--inner-radius",
            "50mm",
            "--outer-radius",
            "60mm",
            "--height",
            "100mm",
            "--cells",
            "20,72,4",
            "--grade",
            "inner:1.3",
            "--out",
            dir.resolve("x.msh").toString());
    assertEquals(ExitCodes.BAD_INPUT, steep.exitCode());
    assertTrue(steep.err().contains("--cells: found 20,72,4"), steep.err());
    assertTrue(steep.err().contains("--cells-as-given"), steep.err());
    assertTrue(steep.err().contains("raising them reached 20,"), steep.err());
    assertFalse(steep.err().contains("at dev.soakfield"), steep.err());
    CliRun ratio =
        CliRun.of(
            "mesh",
            "box",
            "--size",
            "1,1,1",
            "--cells",
            "2,2,2",
            "--grade",
            "xmin:-1",
            "--out",
            dir.resolve("x.msh").toString());
    assertEquals(2, ratio.exitCode());
    assertTrue(ratio.err().contains("--grade: found 'xmin:-1'"), ratio.err());
    CliRun pipe =
        CliRun.of(
            "mesh",
            "pipe",
            "--inner-radius",
            "50mm",
            "--outer-radius",
            "60mm",
            "--height",
            "20mm",
            "--cells",
            "4,24,1",
            "--out",
            dir.resolve("pipe.msh").toString());
    assertEquals(0, pipe.exitCode(), pipe.err());
    // 50 mm around, 2.5 mm across, 20 mm long: 27 around and 2 along bring every angle to 10°
    assertTrue(pipe.out().contains("cells raised from 4,24,1 to 4,27,2"), pipe.out());
    CliRun kept =
        CliRun.of(
            "mesh",
            "pipe",
            "--inner-radius",
            "50mm",
            "--outer-radius",
            "60mm",
            "--height",
            "20mm",
            "--cells",
            "4,24,1",
            "--cells-as-given",
            "--out",
            dir.resolve("kept.msh").toString());
    assertEquals(0, kept.exitCode(), kept.err());
    assertTrue(kept.out().contains("576 4-node tetrahedra"), kept.out()); // 6 · 4 · 24 · 1
  }

  @Test
  void badOptionsAreBadInput() {
    CliRun zero = CliRun.of("mesh", "box", "--size", "1,1,1", "--cells", "0,1,1", "--out", "x.msh");
    assertEquals(ExitCodes.BAD_INPUT, zero.exitCode());
    assertTrue(zero.err().contains("--cells"), zero.err());
    CliRun unit =
        CliRun.of("mesh", "box", "--size", "1ft,1,1", "--cells", "1,1,1", "--out", "x.msh");
    assertEquals(ExitCodes.BAD_INPUT, unit.exitCode());
    assertTrue(unit.err().contains("'ft'"), unit.err());
    CliRun ext =
        CliRun.of("mesh", "box", "--size", "1,1,1", "--cells", "1,1,1", "--out", dir + "/x.txt");
    assertEquals(ExitCodes.BAD_INPUT, ext.exitCode());
    CliRun unknown = CliRun.of("mesh", "sphere");
    assertEquals(ExitCodes.BAD_INPUT, unknown.exitCode());
  }

  @Test
  void everyCommandHasHelp() {
    for (String[] cmd :
        new String[][] {
          {"--help"},
          {"mesh", "--help"},
          {"mesh", "box", "--help"},
          {"mesh", "layers", "--help"},
          {"mesh", "block", "--help"},
          {"mesh", "cylinder", "--help"},
          {"mesh", "pipe", "--help"},
          {"info", "--help"},
          {"bench", "mesh-import", "--help"},
          {"bench", "solver", "--help"},
          {"bench", "output", "--help"},
          {"run", "--help"},
          {"demo", "--help"},
          {"verify", "--help"}
        }) {
      CliRun r = CliRun.of(cmd);
      assertEquals(0, r.exitCode(), String.join(" ", cmd));
      assertTrue(r.out().contains("Usage:"), String.join(" ", cmd));
    }
  }

  @Test
  void aPlaceThatCannotBeWrittenIsNamedWithoutAStackTrace() throws Exception {
    // a file where a folder is expected: the mesh cannot be written there
    Path blocker = java.nio.file.Files.writeString(dir.resolve("blocker"), "x");
    CliRun r =
        CliRun.of(
            "mesh",
            "box",
            "--size",
            "1mm,1mm,1mm",
            "--cells",
            "1,1,1",
            "--out",
            blocker.resolve("box.msh").toString());
    assertEquals(ExitCodes.BAD_INPUT, r.exitCode(), r.err());
    assertTrue(r.err().contains("could not use " + blocker + ": a file of that name"), r.err());
    assertTrue(!r.err().contains("\tat "), r.err());
  }
}
