package dev.soakfield.mesh.msh;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.mesh.FaceGroup;
import dev.soakfield.mesh.FaceGroupKind;
import dev.soakfield.mesh.RawMesh;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.VolumeGroup;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Writing a mesh and reading it back gives the same numbers, connectivity, tags and names. */
class MshWriterRoundTripTest {
  private static final List<VolumeGroup> VOLUMES =
      List.of(new VolumeGroup("matrix", 7), new VolumeGroup("fibre bundle", 3));
  private static final List<FaceGroup> FACES =
      List.of(
          new FaceGroup("wet side", 40, FaceGroupKind.EXTERIOR),
          new FaceGroup("sealed", 41, FaceGroupKind.EXTERIOR),
          new FaceGroup("bond line", 12, FaceGroupKind.INTERFACE));

  /**
   * The cube's tetrahedra (or their 10-node forms on the 27-node grid) with coordinates that
   * exercise the number format: random bits, tiny, huge and negative values. Groups alternate so
   * that several element blocks name the same entity.
   */
  static TetMesh mesh(int order, long seed) {
    int nodes = order == 1 ? 8 : 27;
    SplittableRandom rnd = new SplittableRandom(seed);
    double[] xyz = new double[3 * nodes];
    for (int i = 0; i < xyz.length; i++) {
      xyz[i] =
          switch (i % 5) {
            case 0 -> rnd.nextDouble();
            case 1 -> (rnd.nextDouble() - 0.5) * 1e-300;
            case 2 -> Double.longBitsToDouble(rnd.nextLong() & 0x7fefffffffffffffL);
            case 3 -> -rnd.nextInt(1000) / 8.0;
            default -> rnd.nextDouble() * 1e22;
          };
    }
    int perTet = order == 1 ? 4 : 10;
    int perFace = order == 1 ? 3 : 6;
    int[] tets = new int[6 * perTet];
    for (int t = 0; t < 6; t++) {
      int[] tags = order == 1 ? CubeFixture.TETS[t] : CubeFixture.tet10(CubeFixture.TETS[t]);
      for (int k = 0; k < perTet; k++) {
        tets[perTet * t + k] = tags[k] - 1;
      }
    }
    int[] faces = new int[12 * perFace];
    for (int s = 0; s < 6; s++) {
      for (int j = 0; j < 2; j++) {
        int[] f = CubeFixture.SIDES[s][j];
        int[] tags = order == 1 ? f : CubeFixture.tri6(f);
        for (int k = 0; k < perFace; k++) {
          faces[perFace * (2 * s + j) + k] = tags[k] - 1;
        }
      }
    }
    return new TetMesh.Builder()
        .nodes(xyz)
        .order(order)
        .tets(tets, new int[] {0, 0, 1, 0, 1, 1})
        .faces(faces, new int[] {0, 0, 1, 2, 2, 1, 0, 1, 1, 1, 2, 0})
        .volumeGroups(VOLUMES)
        .faceGroups(FACES)
        .build();
  }

  private static void assertSame(TetMesh m, RawMesh r) {
    assertEquals(m.order(), r.order);
    assertArrayEquals(m.copyCoordinates(), r.xyz); // bit for bit
    assertArrayEquals(m.copyTets(), r.tets);
    assertArrayEquals(m.copyFaces(), r.tris);
    for (int t = 0; t < m.tetCount(); t++) {
      assertEquals(m.volumeGroups().get(m.tetGroup(t)).tag(), r.tetTags[t]);
    }
    for (int f = 0; f < m.faceCount(); f++) {
      assertEquals(m.faceGroups().get(m.faceGroup(f)).tag(), r.triTags[f]);
    }
    assertEquals(Map.of(7, "matrix", 3, "fibre bundle"), r.volumeNames);
    assertEquals(Map.of(40, "wet side", 41, "sealed", 12, "bond line"), r.surfaceNames);
    assertTrue(r.physicalTags);
    assertEquals(List.of(), r.findings);
  }

  @ParameterizedTest
  @CsvSource({"1, false", "1, true", "2, false", "2, true"})
  void roundTripKeepsEverything(int order, boolean binary) throws IOException {
    for (long seed = 1; seed <= 20; seed++) {
      TetMesh m = mesh(order, seed);
      ByteArrayOutputStream out = new ByteArrayOutputStream();
      MshWriter.write(out, m, binary);
      assertSame(m, MshReader.read(out.toByteArray(), "round-trip.msh"));
    }
  }

  @Test
  void writesToAPathAndBlocksFollowRunsOfOneGroup(@TempDir Path dir) throws IOException {
    TetMesh m = mesh(1, 99);
    Path file = dir.resolve("out.msh");
    MshWriter.write(file, m, false);
    assertSame(m, MshReader.read(file));
    String text = Files.readString(file, StandardCharsets.UTF_8);
    assertTrue(text.startsWith("$MeshFormat\n4.1 0 8\n$EndMeshFormat\n"));
    // tet runs 0 0 | 1 | 0 | 1 1 and face runs 0 0 | 1 | 2 2 | 1 | 0 | 1 1 1 | 2 | 0: 4 + 8 blocks
    assertTrue(text.contains("$Elements\n12 18 1 18\n"), text);
    assertTrue(text.contains("\n3 7 4 2\n1 1 2 4 8\n2 1 6 2 8\n3 3 4 1\n"), text);
  }

  @Test
  void binaryFileStartsWithTheByteOrderMarker() throws IOException {
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    MshWriter.write(out, mesh(1, 5), true);
    byte[] b = out.toByteArray();
    String head = "$MeshFormat\n4.1 1 8\n";
    assertEquals(head, new String(b, 0, head.length(), StandardCharsets.US_ASCII));
    // published format: the int 1 in the writer's byte order (little-endian here)
    assertArrayEquals(
        new byte[] {1, 0, 0, 0}, java.util.Arrays.copyOfRange(b, head.length(), head.length() + 4));
  }

  @Test
  void groupsThatShareATagCannotBeWritten() {
    TetMesh m =
        new TetMesh.Builder()
            .nodes(new double[] {0, 0, 0, 1, 0, 0, 0, 1, 0, 0, 0, 1})
            .tets(new int[] {0, 1, 2, 3}, new int[] {0})
            .volumeGroups(List.of(new VolumeGroup("a", 2), new VolumeGroup("b", 2)))
            .build();
    IllegalArgumentException e =
        assertThrows(
            IllegalArgumentException.class,
            () -> MshWriter.write(new ByteArrayOutputStream(), m, false));
    assertTrue(e.getMessage().contains("share tag 2"));
  }
}
