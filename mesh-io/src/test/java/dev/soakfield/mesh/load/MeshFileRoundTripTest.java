package dev.soakfield.mesh.load;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.mesh.MeshImport;
import dev.soakfield.mesh.MeshInputException;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import dev.soakfield.mesh.topo.AssemblyOptions;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/** A mesh written to MSH 4.1 and imported again is the same mesh: numbers, order and groups. */
class MeshFileRoundTripTest {
  @TempDir Path dir;

  static Stream<Arguments> meshes() {
    return Stream.of(1, 2)
        .flatMap(
            order ->
                Stream.of(
                    Arguments.of("box", StructuredMesher.box(0.01, 0.02, 0.003, 3, 4, 2, order)),
                    Arguments.of(
                        "layers",
                        StructuredMesher.layers(
                            1e-2,
                            1e-2,
                            2,
                            3,
                            List.of(
                                new StructuredMesher.Layer("skin", 1e-4, 1),
                                new StructuredMesher.Layer("core", 2e-3, 3)),
                            order)),
                    Arguments.of(
                        "block",
                        StructuredMesher.block(
                            1,
                            1,
                            1,
                            4,
                            4,
                            4,
                            List.of(
                                new StructuredMesher.Insert("die", .25, .25, .25, .75, .75, .5)),
                            order)),
                    Arguments.of(
                        "cylinder", StructuredMesher.cylinder(0.005, 0.01, 2, 8, 2, order)),
                    Arguments.of(
                        "pipe", StructuredMesher.pipe(0.004, 0.005, 0.01, 2, 12, 2, order))));
  }

  @ParameterizedTest(name = "{0} order {1}")
  @MethodSource("meshes")
  void writtenMeshReadsBackIdentically(String name, TetMesh mesh) throws IOException {
    for (boolean binary : new boolean[] {false, true}) {
      Path file = dir.resolve(name + mesh.order() + (binary ? "-bin" : "") + ".msh");
      MshWriter.write(file, mesh, binary);
      MeshImport back = MeshLoader.load(file, AssemblyOptions.defaults());
      assertEquals("", difference(mesh, back.mesh()), name + " binary=" + binary);
      assertTrue(back.mesh().sameAs(mesh));
      assertFalse(back.report().hasErrors(), back.report().findings().toString());
      assertTrue(back.report().withCode("untagged-faces").isEmpty());
      assertTrue(back.report().withCode("inverted-tets").isEmpty());
    }
  }

  /** The first place where two meshes differ, or "" when they hold the same data. */
  private static String difference(TetMesh a, TetMesh b) {
    if (!a.volumeGroups().equals(b.volumeGroups())) {
      return "volume groups " + a.volumeGroups() + " vs " + b.volumeGroups();
    }
    if (!a.faceGroups().equals(b.faceGroups())) {
      return "face groups " + a.faceGroups() + " vs " + b.faceGroups();
    }
    String[] names = {"coordinates", "tets", "tet groups", "faces", "face groups"};
    Object[][] pairs = {
      {a.copyCoordinates(), b.copyCoordinates()},
      {a.copyTets(), b.copyTets()},
      {a.copyTetGroups(), b.copyTetGroups()},
      {a.copyFaces(), b.copyFaces()},
      {a.copyFaceGroups(), b.copyFaceGroups()}
    };
    for (int i = 0; i < names.length; i++) {
      String d = firstDifference(pairs[i][0], pairs[i][1]);
      if (!d.isEmpty()) {
        return names[i] + ": " + d;
      }
    }
    return "";
  }

  private static String firstDifference(Object x, Object y) {
    int n = java.lang.reflect.Array.getLength(x);
    int m = java.lang.reflect.Array.getLength(y);
    for (int i = 0; i < Math.min(n, m); i++) {
      Object u = java.lang.reflect.Array.get(x, i);
      Object v = java.lang.reflect.Array.get(y, i);
      if (!u.equals(v)) {
        return "at " + i + ": " + u + " vs " + v;
      }
    }
    return n == m ? "" : "lengths " + n + " vs " + m;
  }

  @Test
  void loaderNamesMissingFilesAndWrongExtensions() throws IOException {
    MeshInputException missing =
        org.junit.jupiter.api.Assertions.assertThrows(
            MeshInputException.class,
            () -> MeshLoader.load(dir.resolve("gone.msh"), AssemblyOptions.defaults()));
    assertEquals("no such file", missing.found());
    Path txt = Files.writeString(dir.resolve("mesh.txt"), "x");
    MeshInputException ext =
        org.junit.jupiter.api.Assertions.assertThrows(
            MeshInputException.class, () -> MeshLoader.load(txt, AssemblyOptions.defaults()));
    assertTrue(ext.getMessage().contains("mesh.txt"), ext.getMessage());
  }
}
