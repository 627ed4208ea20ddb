package dev.soakfield.mesh.topo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.mesh.FaceGroup;
import dev.soakfield.mesh.FaceGroupKind;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.load.MeshLoader;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Splitting a face group at sharp edges and renaming groups, checked against exact geometry. */
class FaceGroupEditTest {
  @TempDir Path dir;

  /** A 10 × 10 × 4 mm box whose six sides are one face group, "skin". */
  private static TetMesh skinnedBox() {
    TetMesh box = StructuredMesher.box(0.01, 0.01, 0.004, 4, 4, 2, 1);
    int[] groups = new int[box.faceCount()];
    return new TetMesh.Builder()
        .nodes(box.copyCoordinates())
        .order(1)
        .tets(box.copyTets(), box.copyTetGroups())
        .faces(box.copyFaces(), groups)
        .volumeGroups(box.volumeGroups())
        .faceGroups(List.of(new FaceGroup("skin", 1, FaceGroupKind.EXTERIOR)))
        .build();
  }

  private static double area(TetMesh m, int group) {
    double a = 0;
    for (int f = 0; f < m.faceCount(); f++) {
      if (m.faceGroup(f) != group) {
        continue;
      }
      double[][] p = new double[3][3];
      for (int k = 0; k < 3; k++) {
        for (int c = 0; c < 3; c++) {
          p[k][c] = m.coord(m.faceNode(f, k), c);
        }
      }
      double[] u = {p[1][0] - p[0][0], p[1][1] - p[0][1], p[1][2] - p[0][2]};
      double[] v = {p[2][0] - p[0][0], p[2][1] - p[0][1], p[2][2] - p[0][2]};
      double x = u[1] * v[2] - u[2] * v[1];
      double y = u[2] * v[0] - u[0] * v[2];
      double z = u[0] * v[1] - u[1] * v[0];
      a += 0.5 * Math.sqrt(x * x + y * y + z * z);
    }
    return a;
  }

  @Test
  void aBoxSkinSplitsIntoItsSixSidesWithTheirAreas() throws IOException {
    TetMesh split = FaceGroupEdit.splitByFeatureAngle(skinnedBox(), "skin", 30);
    assertEquals(6, split.faceGroups().size());
    List<Double> areas = new ArrayList<>();
    for (int g = 0; g < 6; g++) {
      assertTrue(split.faceGroups().get(g).name().startsWith("skin-"));
      areas.add(Math.round(area(split, g) * 1e12) / 1e12);
    }
    areas.sort(null);
    // exact geometry: four sides of 10 × 4 mm, top and bottom of 10 × 10 mm
    assertEquals(List.of(4e-5, 4e-5, 4e-5, 4e-5, 1e-4, 1e-4), areas);
    // the patches survive a write and a read of the mesh file
    Path file = dir.resolve("split.msh");
    MshWriter.write(file, split, true);
    TetMesh back = MeshLoader.load(file, AssemblyOptions.defaults()).mesh();
    List<String> names = new ArrayList<>();
    back.faceGroups().forEach(g -> names.add(g.name()));
    names.sort(null);
    assertEquals(Arrays.asList("skin-1", "skin-2", "skin-3", "skin-4", "skin-5", "skin-6"), names);
  }

  @Test
  void aFeatureAngleWiderThanTheBoxEdgesKeepsOneGroup() {
    TetMesh box = skinnedBox();
    // negative control: the box's edges are 90°, so at 95° no edge is sharp enough to split
    assertSame(box, FaceGroupEdit.splitByFeatureAngle(box, "skin", 95));
    assertThrows(
        IllegalArgumentException.class, () -> FaceGroupEdit.splitByFeatureAngle(box, "skin", 0));
    assertThrows(
        IllegalArgumentException.class, () -> FaceGroupEdit.splitByFeatureAngle(box, "hull", 30));
  }

  @Test
  void renamingKeepsTheFacesAndRefusesTakenOrUnwritableNames() {
    TetMesh box = StructuredMesher.box(0.01, 0.01, 0.004, 2, 2, 1, 1);
    TetMesh renamed = FaceGroupEdit.rename(box, "zmax", "lid");
    int g = renamed.faceGroupIndex("lid");
    assertEquals(box.faceGroupIndex("zmax"), g);
    assertEquals(area(box, g), area(renamed, g), 0);
    assertEquals(-1, renamed.faceGroupIndex("zmax"));
    assertThrows(IllegalArgumentException.class, () -> FaceGroupEdit.rename(box, "zmax", "xmin"));
    assertThrows(IllegalArgumentException.class, () -> FaceGroupEdit.rename(box, "zmax", "a\"b"));
    assertThrows(IllegalArgumentException.class, () -> FaceGroupEdit.rename(box, "zmax", " "));
  }
}
