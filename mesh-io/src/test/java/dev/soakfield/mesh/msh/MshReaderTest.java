package dev.soakfield.mesh.msh;

import static dev.soakfield.mesh.msh.CubeFixture.CORNERS;
import static dev.soakfield.mesh.msh.CubeFixture.SIDES;
import static dev.soakfield.mesh.msh.CubeFixture.SIDE_NAMES;
import static dev.soakfield.mesh.msh.CubeFixture.TETS;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.mesh.MeshFinding;
import dev.soakfield.mesh.RawMesh;
import java.io.IOException;
import java.io.InputStream;
import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class MshReaderTest {
  static Path resource(String name) {
    try {
      return Path.of(MshReaderTest.class.getResource("/msh/" + name).toURI());
    } catch (URISyntaxException e) {
      throw new IllegalStateException(e);
    }
  }

  private static boolean hasFinding(RawMesh m, String code) {
    return m.findings.stream().anyMatch(f -> f.code().equals(code));
  }

  /** Node index of the file's node tag, via the reader's nodeIds. */
  private static int indexOfTag(RawMesh m, long tag) {
    for (int i = 0; i < m.nodeIds.length; i++) {
      if (m.nodeIds[i] == tag) {
        return i;
      }
    }
    throw new AssertionError("no node tag " + tag);
  }

  @ParameterizedTest
  @ValueSource(
      strings = {
        "cube_v41_ascii.msh",
        "cube_v22_ascii.msh",
        BinaryFixtures.CUBE_V22,
        BinaryFixtures.CUBE_V41
      })
  void linearCubeHasItsNodesTetsFacesTagsAndNames(String file) {
    RawMesh m = MshReader.read(resource(file));
    assertTrue(m.source.endsWith(file));
    assertEquals(1, m.order);
    assertEquals(8, m.nodeCount());
    assertEquals(6, m.tetCount());
    assertEquals(12, m.triCount());
    assertTrue(m.physicalTags);
    // exact geometry: node tag n at the corner whose bits are n - 1
    for (int n = 1; n <= 8; n++) {
      int i = indexOfTag(m, n);
      for (int a = 0; a < 3; a++) {
        assertEquals(CORNERS[n - 1][a], m.xyz[3 * i + a], 0.0); // 0.0 == -0.0 here
      }
    }
    double volume = 0;
    for (int t = 0; t < 6; t++) {
      for (int k = 0; k < 4; k++) {
        assertEquals(TETS[t][k], m.nodeIds[m.tets[4 * t + k]]);
      }
      assertEquals(1, m.tetTags[t]);
      // exact geometry: the six tetrahedra of the cube each have volume 1/6, positive orientation
      assertEquals(1.0 / 6, MeshGeometry.tetVolume(m, t), 1e-15);
      volume += MeshGeometry.tetVolume(m, t);
    }
    assertEquals(1.0, volume, 1e-15);
    for (int s = 0; s < 6; s++) {
      double area = 0;
      for (int j = 0; j < 2; j++) {
        int f = 2 * s + j;
        for (int k = 0; k < 3; k++) {
          assertEquals(SIDES[s][j][k], m.nodeIds[m.tris[3 * f + k]]);
        }
        assertEquals(11 + s, m.triTags[f]);
        area += MeshGeometry.triArea(m, f);
      }
      // exact geometry: each side of the unit cube has area 1
      assertEquals(1.0, area, 1e-15);
    }
    assertEquals(Map.of(1, "body"), m.volumeNames);
    assertEquals(6, m.surfaceNames.size());
    for (int s = 0; s < 6; s++) {
      assertEquals(SIDE_NAMES[s], m.surfaceNames.get(11 + s));
    }
    // the 4.1 files hold two point elements, the 2.2 files one; both hold two lines
    assertEquals(file.contains("v41") ? 2 : 1, m.skippedPoints);
    assertEquals(2, m.skippedLines);
    assertEquals(0, m.findings.size(), () -> m.findings.toString());
  }

  @ParameterizedTest
  @ValueSource(strings = {"cube_p2_v41_ascii.msh", BinaryFixtures.CUBE_P2_V22})
  void quadraticCubeHasMidEdgeNodesHalfwayBetweenCorners(String file) {
    RawMesh m = MshReader.read(resource(file));
    assertEquals(2, m.order);
    assertEquals(27, m.nodeCount());
    assertEquals(6, m.tetCount());
    assertEquals(12, m.triCount());
    assertEquals(60, m.tets.length);
    assertEquals(72, m.tris.length);
    for (int t = 0; t < 6; t++) {
      int[] expected = CubeFixture.tet10(TETS[t]);
      for (int k = 0; k < 10; k++) {
        assertEquals(expected[k], m.nodeIds[m.tets[10 * t + k]]);
      }
      // exact geometry: MSH edge order (0,1) (1,2) (2,0) (3,0) (3,2) (3,1); midpoints are exact
      int[][] edges = {{0, 1}, {1, 2}, {2, 0}, {3, 0}, {3, 2}, {3, 1}};
      for (int e = 0; e < 6; e++) {
        for (int a = 0; a < 3; a++) {
          double mid =
              (m.xyz[3 * m.tets[10 * t + edges[e][0]] + a]
                      + m.xyz[3 * m.tets[10 * t + edges[e][1]] + a])
                  / 2;
          assertEquals(mid, m.xyz[3 * m.tets[10 * t + 4 + e] + a]);
        }
      }
      assertEquals(1.0 / 6, MeshGeometry.tetVolume(m, t), 1e-15);
    }
    for (int s = 0; s < 6; s++) {
      for (int j = 0; j < 2; j++) {
        int[] expected = CubeFixture.tri6(SIDES[s][j]);
        for (int k = 0; k < 6; k++) {
          assertEquals(expected[k], m.nodeIds[m.tris[6 * (2 * s + j) + k]]);
        }
      }
    }
  }

  @Test
  void quadraticCubeOnOneSurfaceEntityTakesItsPhysicalTag() {
    RawMesh m = MshReader.read(resource("cube_p2_v41_ascii.msh"));
    for (int t = 0; t < 6; t++) {
      assertEquals(7, m.tetTags[t]);
    }
    for (int f = 0; f < 12; f++) {
      assertEquals(8, m.triTags[f]);
    }
    assertEquals(Map.of(7, "core"), m.volumeNames);
    assertEquals(Map.of(8, "skin"), m.surfaceNames);
  }

  @Test
  void twoVolumesWithInterfaceAndSkippedSectionsInAnyOrder() {
    RawMesh m = MshReader.read(resource("two_volumes_v41_ascii.msh"));
    assertEquals(12, m.nodeCount());
    assertEquals(12, m.tetCount());
    assertEquals(2, m.triCount());
    double left = 0;
    double right = 0;
    for (int t = 0; t < 12; t++) {
      assertEquals(t < 6 ? 1 : 2, m.tetTags[t]);
      double v = MeshGeometry.tetVolume(m, t);
      if (t < 6) {
        left += v;
      } else {
        right += v;
      }
    }
    // exact geometry: two unit cubes
    assertEquals(1.0, left, 1e-15);
    assertEquals(1.0, right, 1e-15);
    for (int f = 0; f < 2; f++) {
      assertEquals(5, m.triTags[f]);
      for (int k = 0; k < 3; k++) {
        assertEquals(1.0, m.xyz[3 * m.tris[3 * f + k]]); // exact geometry: the interface is x = 1
      }
    }
    assertEquals(Map.of(1, "left", 2, "right"), m.volumeNames);
    assertEquals(Map.of(5, "joint"), m.surfaceNames);
    assertTrue(m.physicalTags);
    assertEquals(0, m.findings.size());
  }

  @ParameterizedTest
  @ValueSource(strings = {"no_physical_v41_ascii.msh", "no_physical_v22_ascii.msh"})
  void withoutPhysicalGroupsTheEntityTagsNameTheGroups(String file) {
    RawMesh m = MshReader.read(resource(file));
    assertFalse(m.physicalTags);
    assertArrayEquals(new int[] {9}, m.tetTags);
    assertArrayEquals(new int[] {4}, m.triTags);
    assertTrue(hasFinding(m, "msh-no-physical-groups"));
    assertEquals(MeshFinding.Severity.WARNING, m.findings.get(0).severity());
    // exact geometry: the corner tetrahedron with legs 2 has volume 8/6; its base triangle area 2
    assertEquals(8.0 / 6, MeshGeometry.tetVolume(m, 0), 1e-15);
    assertEquals(2.0, MeshGeometry.triArea(m, 0), 1e-15);
  }

  @Test
  void sparseUnorderedNodeTagsMapToDenseIndicesInFileOrder() {
    RawMesh m = MshReader.read(resource("sparse_tags_v41_ascii.msh"));
    assertArrayEquals(new long[] {1000000007L, 5, 3000000000L, 42}, m.nodeIds);
    assertArrayEquals(new double[] {0.5, -1.25, 3, 3, 0, 0, 0, 3, 0, 0, 0, 3}, m.xyz);
    assertArrayEquals(new int[] {1, 2, 3, 0}, m.tets);
    assertArrayEquals(new long[] {900}, m.tetIds);
    assertArrayEquals(new int[] {1, 0, 2}, m.tris);
    assertArrayEquals(new long[] {77}, m.triIds);
    assertArrayEquals(new int[] {4}, m.tetTags);
    assertArrayEquals(new int[] {6}, m.triTags);
    assertEquals(Map.of(4, "tip"), m.volumeNames);
    assertEquals(Map.of(6, "base"), m.surfaceNames);
  }

  @Test
  void severalPhysicalTagsTakeTheFirstAndUnlistedSurfacesTheirEntityTag() {
    RawMesh m = MshReader.read(resource("entity_quirks_v41_ascii.msh"));
    assertArrayEquals(new int[] {3}, m.tetTags);
    assertArrayEquals(new int[] {20, 7}, m.triTags);
    assertTrue(m.physicalTags);
    assertTrue(hasFinding(m, "msh-several-physical-tags"));
    assertTrue(hasFinding(m, "msh-entity-not-listed"));
    assertEquals(2, m.findings.size());
    assertEquals("resin", m.volumeNames.get(3));
  }

  @Test
  void streamAndByteArrayReadTheSameAsThePath() throws IOException {
    Path p = resource("cube_v41_ascii.msh");
    RawMesh a = MshReader.read(p);
    RawMesh b = MshReader.read(Files.readAllBytes(p), "bytes.msh");
    RawMesh c;
    try (InputStream in = Files.newInputStream(p)) {
      c = MshReader.read(in, "stream.msh");
    }
    assertArrayEquals(a.xyz, b.xyz);
    assertArrayEquals(a.tets, c.tets);
    assertArrayEquals(a.triTags, c.triTags);
    assertEquals("stream.msh", c.source);
  }

  @Test
  void committedBinaryFilesAreWhatTheFormatHelperMakes() throws IOException {
    assertArrayEquals(
        BinaryFixtures.cubeV22(), Files.readAllBytes(resource(BinaryFixtures.CUBE_V22)));
    assertArrayEquals(
        BinaryFixtures.cubeV41(), Files.readAllBytes(resource(BinaryFixtures.CUBE_V41)));
    assertArrayEquals(
        BinaryFixtures.cubeP2V22(), Files.readAllBytes(resource(BinaryFixtures.CUBE_P2_V22)));
  }

  @Test
  void decimalFormsOfTheAsciiFileReadAsTheirExactValues() {
    RawMesh m = MshReader.read(resource("cube_v41_ascii.msh"));
    // node 4 is written "0.1e1 10E-1 -0": exactly 1, 1 and negative zero
    int i = indexOfTag(m, 4);
    assertEquals(1.0, m.xyz[3 * i]);
    assertEquals(1.0, m.xyz[3 * i + 1]);
    assertEquals(Double.doubleToRawLongBits(-0.0), Double.doubleToRawLongBits(m.xyz[3 * i + 2]));
  }

  @Test
  void binary41WithFourByteSizesAndNoEntities() {
    // format description: the data size of a 4.1 binary file is sizeof(size_t), 4 or 8
    MshBytes b = new MshBytes(java.nio.ByteOrder.LITTLE_ENDIAN, 4);
    b.line("$MeshFormat").line("4.1 1 4").i32(1).line("").line("$EndMeshFormat");
    b.line("$Nodes").size(1, 4, 10, 13).i32(3, 2, 0).size(4).size(10, 11, 12, 13);
    b.f64(0, 0, 0).f64(3, 0, 0).f64(0, 3, 0).f64(0, 0, 3).line("").line("$EndNodes");
    b.line("$Elements").size(1, 1, 5, 5).i32(3, 2, 4).size(1).size(5, 10, 11, 12, 13);
    RawMesh m = MshReader.read(b.line("").line("$EndElements").bytes(), "small.msh");
    assertArrayEquals(new int[] {0, 1, 2, 3}, m.tets);
    assertArrayEquals(new int[] {2}, m.tetTags); // no $Entities: the entity tag, with a warning
    assertFalse(m.physicalTags);
    assertTrue(hasFinding(m, "msh-no-physical-groups"));
    // exact geometry: legs of 3 give volume 27/6
    assertEquals(27.0 / 6, MeshGeometry.tetVolume(m, 0), 1e-15);
  }

  @Test
  void crlfLineEndingsAreRead() throws IOException {
    String text = Files.readString(resource("cube_v22_ascii.msh")).replace("\n", "\r\n");
    RawMesh m =
        MshReader.read(text.getBytes(java.nio.charset.StandardCharsets.US_ASCII), "crlf.msh");
    assertEquals(6, m.tetCount());
    assertEquals("x0", m.surfaceNames.get(11));
  }
}
