package dev.soakfield.mesh.vtk;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.gen.StructuredMesher.Layer;
import dev.soakfield.mesh.vtk.VtuWriter.Field;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.xml.sax.SAXParseException;

class VtuWriterTest {
  @TempDir Path dir;

  private static TetMesh twoLayers(int order) {
    return StructuredMesher.layers(
        0.3, 0.2, 2, 1, List.of(new Layer("lower", 0.1, 1), new Layer("upper", 0.05, 1)), order);
  }

  /** Values with long binary expansions, so any rounding on the way shows. */
  private static double[] pointScalar(TetMesh mesh) {
    double[] v = new double[mesh.nodeCount()];
    for (int n = 0; n < v.length; n++) {
      v[n] = mesh.coord(n, 0) / 3 + Math.PI * mesh.coord(n, 1) - Math.exp(mesh.coord(n, 2)) * 1e-7;
    }
    return v;
  }

  private static double[] pointVector(TetMesh mesh) {
    double[] v = new double[3 * mesh.nodeCount()];
    for (int i = 0; i < v.length; i++) {
      v[i] = Math.sqrt(i + 2.0) * (i % 2 == 0 ? 1 : -1e-12);
    }
    return v;
  }

  private static double[] cellScalar(TetMesh mesh) {
    double[] v = new double[mesh.tetCount()];
    for (int t = 0; t < v.length; t++) {
      v[t] = 1.0 / (t + 3) + 1e300 * (t % 3);
    }
    return v;
  }

  private static VtuTestReader readBack(Path file, VtuFormat format) throws Exception {
    return format == VtuFormat.APPENDED_RAW
        ? VtuTestReader.readRaw(file)
        : VtuTestReader.read(file);
  }

  @ParameterizedTest
  @EnumSource(VtuFormat.class)
  void volumeMeshAndFieldsReadBackExactly(VtuFormat format) throws Exception {
    for (int order = 1; order <= 2; order++) {
      TetMesh mesh = twoLayers(order);
      Path file = dir.resolve("mesh" + order + format + ".vtu");
      double[] c = pointScalar(mesh);
      double[] flux = pointVector(mesh);
      double[] rate = cellScalar(mesh);
      VtuWriter.write(
          file,
          mesh,
          List.of(new Field("c", 1, c), new Field("flux", 3, flux)),
          List.of(new Field("rate", 1, rate)),
          format);
      VtuTestReader r = readBack(file, format);
      // VTK XML format (formats.md): little endian, UInt64 headers, one piece
      assertEquals("LittleEndian", r.byteOrder);
      assertEquals("UInt64", r.headerType);
      assertEquals(mesh.nodeCount(), r.points());
      assertEquals(mesh.tetCount(), r.cells());

      VtuTestReader.Array points = r.get("Points/Points");
      assertEquals("Float64", points.type());
      assertEquals(3, points.components());
      assertArrayEquals(mesh.copyCoordinates(), points.values());

      int per = mesh.nodesPerTet();
      double[] conn = r.get("Cells/connectivity").values();
      assertEquals("Int64", r.get("Cells/connectivity").type());
      assertEquals(per * mesh.tetCount(), conn.length);
      // formats.md: MSH tet10 order -> VTK order swaps nodes 8 and 9
      int[] fromMsh = per == 4 ? new int[] {0, 1, 2, 3} : new int[] {0, 1, 2, 3, 4, 5, 6, 7, 9, 8};
      for (int t = 0; t < mesh.tetCount(); t++) {
        for (int k = 0; k < per; k++) {
          assertEquals(mesh.tetNode(t, fromMsh[k]), conn[per * t + k], 0);
        }
      }
      double[] offsets = r.get("Cells/offsets").values();
      double[] types = r.get("Cells/types").values();
      assertEquals("UInt8", r.get("Cells/types").type());
      for (int t = 0; t < mesh.tetCount(); t++) {
        // formats.md: offsets are the end index of each cell; tetra 10, quadratic tetra 24
        assertEquals(per * (t + 1), offsets[t], 0);
        assertEquals(per == 4 ? 10 : 24, types[t], 0);
      }
      assertArrayEquals(c, r.get("PointData/c").values());
      assertEquals(3, r.get("PointData/flux").components());
      assertArrayEquals(flux, r.get("PointData/flux").values());
      assertArrayEquals(rate, r.get("CellData/rate").values());
      VtuTestReader.Array groups = r.get("CellData/" + VtuWriter.VOLUME_GROUP);
      assertEquals("Int32", groups.type());
      for (int t = 0; t < mesh.tetCount(); t++) {
        assertEquals(mesh.tetGroup(t), groups.values()[t], 0);
      }
    }
  }

  @Test
  void quadraticTetraFollowsVtkEdgeOrder() throws Exception {
    // formats.md, VTK quadratic tetra: nodes 4-9 on edges (0,1), (1,2), (2,0), (0,3), (1,3), (2,3).
    // Checked by exact geometry: each written mid node is the midpoint of its two written corners.
    TetMesh mesh = StructuredMesher.box(1, 2, 3, 1, 1, 1, 2);
    Path file = dir.resolve("tet10.vtu");
    VtuWriter.write(file, mesh, List.of(), List.of(), VtuFormat.ASCII);
    VtuTestReader r = VtuTestReader.read(file);
    double[] xyz = r.get("Points/Points").values();
    double[] conn = r.get("Cells/connectivity").values();
    int[][] vtkEdges = {{0, 1}, {1, 2}, {2, 0}, {0, 3}, {1, 3}, {2, 3}};
    for (int t = 0; t < r.cells(); t++) {
      for (int k = 0; k < 6; k++) {
        int a = (int) conn[10 * t + vtkEdges[k][0]];
        int b = (int) conn[10 * t + vtkEdges[k][1]];
        int m = (int) conn[10 * t + 4 + k];
        for (int axis = 0; axis < 3; axis++) {
          assertEquals(0.5 * (xyz[3 * a + axis] + xyz[3 * b + axis]), xyz[3 * m + axis], 1e-15);
        }
      }
    }
  }

  @ParameterizedTest
  @EnumSource(VtuFormat.class)
  void surfaceHoldsTheFacesWithTheirGroups(VtuFormat format) throws Exception {
    for (int order = 1; order <= 2; order++) {
      TetMesh mesh = StructuredMesher.cylinder(0.01, 0.02, 1, 8, 2, order);
      double[] c = pointScalar(mesh);
      Path file = dir.resolve("surface" + order + format + ".vtu");
      VtuWriter.writeSurface(file, mesh, List.of(new Field("c", 1, c)), format);
      VtuTestReader r = readBack(file, format);
      int per = mesh.nodesPerFace();
      assertEquals(mesh.faceCount(), r.cells());
      double[] xyz = r.get("Points/Points").values();
      double[] conn = r.get("Cells/connectivity").values();
      double[] cw = r.get("PointData/c").values();
      double[] groups = r.get("CellData/" + VtuWriter.FACE_GROUP).values();
      double[] types = r.get("Cells/types").values();
      java.util.Set<Integer> used = new java.util.HashSet<>();
      for (int f = 0; f < mesh.faceCount(); f++) {
        // formats.md: triangle 5, quadratic triangle 22 (same node order as MSH)
        assertEquals(per == 3 ? 5 : 22, types[f], 0);
        assertEquals(mesh.faceGroup(f), groups[f], 0);
        for (int k = 0; k < per; k++) {
          int written = (int) conn[per * f + k];
          int node = mesh.faceNode(f, k);
          used.add(node);
          for (int axis = 0; axis < 3; axis++) {
            assertEquals(mesh.coord(node, axis), xyz[3 * written + axis], 0);
          }
          assertEquals(c[node], cw[written], 0);
        }
      }
      assertEquals(used.size(), r.points(), "only the face nodes are written");
    }
  }

  @Test
  void appendedRawIsNotValidXmlButBase64Is() throws Exception {
    TetMesh mesh = twoLayers(1);
    Path raw = dir.resolve("raw.vtu");
    Path b64 = dir.resolve("b64.vtu");
    VtuWriter.write(raw, mesh, List.of(), List.of(), VtuFormat.APPENDED_RAW);
    VtuWriter.write(b64, mesh, List.of(), List.of(), VtuFormat.APPENDED_BASE64);
    // 0x00 bytes of the little-endian integers are not allowed in XML 1.0 text
    byte[] bytes = Files.readAllBytes(raw);
    assertThrows(SAXParseException.class, () -> VtuTestReader.parseXml(bytes));
    VtuTestReader.parseXml(Files.readAllBytes(b64));
  }

  @Test
  void wrongFieldsAreRefusedWithTheirNames() {
    TetMesh mesh = twoLayers(1);
    Path file = dir.resolve("bad.vtu");
    var e =
        assertThrows(
            IllegalArgumentException.class,
            () ->
                VtuWriter.write(
                    file,
                    mesh,
                    List.of(new Field("c", 1, new double[5])),
                    List.of(),
                    VtuFormat.ASCII));
    assertEquals(
        "point field 'c': found 5 values, expected "
            + mesh.nodeCount()
            + " (1 per node, "
            + mesh.nodeCount()
            + " nodes)",
        e.getMessage());
    e =
        assertThrows(
            IllegalArgumentException.class,
            () ->
                VtuWriter.write(
                    file,
                    mesh,
                    List.of(),
                    List.of(new Field("volume_group", 1, new double[mesh.tetCount()])),
                    VtuFormat.ASCII));
    assertTrue(
        e.getMessage().startsWith("cell field 'volume_group': found the name twice"),
        e.getMessage());
    e = assertThrows(IllegalArgumentException.class, () -> new Field("v", 2, new double[4]));
    assertEquals("field 'v': found 2 components, expected 1 or 3", e.getMessage());
    assertTrue(!Files.exists(file), "nothing written for refused input");
  }

  @Test
  void volumeGroupCanBeLeftOut() throws Exception {
    TetMesh mesh = twoLayers(1);
    Path file = dir.resolve("plain.vtu");
    VtuWriter.write(file, mesh, List.of(), List.of(), VtuFormat.BINARY, false);
    VtuTestReader r = VtuTestReader.read(file);
    assertTrue(!r.arrays.containsKey("CellData/" + VtuWriter.VOLUME_GROUP));
    assertEquals(4, r.arrays.size(), "points, connectivity, offsets, types");
  }
}
