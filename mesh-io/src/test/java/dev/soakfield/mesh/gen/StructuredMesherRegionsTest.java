package dev.soakfield.mesh.gen;

import static dev.soakfield.mesh.gen.MeshGeometry.assertAllPositive;
import static dev.soakfield.mesh.gen.MeshGeometry.assertConformingWithOutwardFaces;
import static dev.soakfield.mesh.gen.MeshGeometry.faceCentroid;
import static dev.soakfield.mesh.gen.MeshGeometry.faceNormal2;
import static dev.soakfield.mesh.gen.MeshGeometry.groupArea;
import static dev.soakfield.mesh.gen.MeshGeometry.groupVolume;
import static dev.soakfield.mesh.gen.MeshGeometry.norm;
import static dev.soakfield.mesh.gen.MeshGeometry.totalVolume;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.mesh.FaceGroupKind;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher.Insert;
import dev.soakfield.mesh.gen.StructuredMesher.Layer;
import java.util.List;
import org.junit.jupiter.api.Test;

class StructuredMesherRegionsTest {
  private static final double LX = 0.01;
  private static final double LY = 0.02;
  private static final List<Layer> STACK =
      List.of(
          new Layer("substrate", 0.002, 2),
          new Layer("coating", 0.0005, 1),
          new Layer("topcoat", 0.0001, 2));

  @Test
  void layersHaveTheirVolumesAndInterfacesTheFullPlateArea() {
    TetMesh mesh = StructuredMesher.layers(LX, LY, 2, 3, STACK, 1);
    double plate = LX * LY;
    // exact geometry: a layer's volume is plate area x thickness
    assertEquals(plate * 0.002, groupVolume(mesh, "substrate"), 1e-13 * plate * 0.002);
    assertEquals(plate * 0.0005, groupVolume(mesh, "coating"), 1e-13 * plate * 0.0005);
    assertEquals(plate * 0.0001, groupVolume(mesh, "topcoat"), 1e-13 * plate * 0.0001);
    assertEquals(plate, groupArea(mesh, "substrate-coating"), 1e-13 * plate);
    assertEquals(plate, groupArea(mesh, "coating-topcoat"), 1e-13 * plate);
    // exact geometry: the sides of a 2.6 mm thick plate
    assertEquals(LY * 0.0026, groupArea(mesh, "xmin"), 1e-13 * LY * 0.0026);
    assertEquals(plate, groupArea(mesh, "zmax"), 1e-13 * plate);
    assertEquals(6 * 2 * 3 * 5, mesh.tetCount());
    assertAllPositive(mesh);
    assertConformingWithOutwardFaces(mesh);
  }

  @Test
  void layerInterfaceLiesOnItsPlaneAndPointsUp() {
    TetMesh mesh = StructuredMesher.layers(LX, LY, 2, 3, STACK, 1);
    int g = mesh.faceGroupIndex("substrate-coating");
    assertEquals(FaceGroupKind.INTERFACE, mesh.faceGroups().get(g).kind());
    int n = 0;
    for (int f = 0; f < mesh.faceCount(); f++) {
      if (mesh.faceGroup(f) == g) {
        n++;
        double[] normal = faceNormal2(mesh, f);
        assertEquals(1, normal[2] / norm(normal), 1e-12);
        assertEquals(0.002, faceCentroid(mesh, f)[2], 1e-15);
      }
    }
    // exact geometry: two triangles per cell of the 2 x 3 plane
    assertEquals(2 * 2 * 3, n);
  }

  @Test
  void layerNamesMustBeUniqueAndInterfacesDistinct() {
    var e =
        assertThrows(
            IllegalArgumentException.class,
            () ->
                StructuredMesher.layers(
                    LX, LY, 1, 1, List.of(new Layer("a", 1, 1), new Layer("a", 1, 1)), 1));
    assertEquals("layer name: found 'a' twice, expected unique layer names", e.getMessage());
    List<Layer> clash =
        List.of(
            new Layer("a", 1, 1),
            new Layer("b-c", 1, 1),
            new Layer("a-b", 1, 1),
            new Layer("c", 1, 1));
    // interfaces "a-b-c", "b-c-a-b", "a-b-c": the third repeats the first
    e =
        assertThrows(
            IllegalArgumentException.class, () -> StructuredMesher.layers(LX, LY, 1, 1, clash, 1));
    assertTrue(e.getMessage().contains("'a-b-c' arises twice"), e.getMessage());
    e =
        assertThrows(
            IllegalArgumentException.class,
            () -> StructuredMesher.layers(LX, LY, 1, 1, List.of(new Layer("a", 0, 1)), 1));
    assertEquals(
        "thickness of layer 'a': found 0.0, expected a positive length in metres", e.getMessage());
    e =
        assertThrows(
            IllegalArgumentException.class,
            () -> StructuredMesher.layers(LX, LY, 1, 1, List.of(), 1));
    assertEquals("layers: found none, expected at least one layer", e.getMessage());
  }

  @Test
  void centralInsertHasItsCellsVolumeAndSurfaceArea() {
    Insert core = new Insert("core", 0.25, 0.25, 0.25, 0.75, 0.75, 0.75);
    TetMesh mesh = StructuredMesher.block(1, 1, 1, 4, 4, 4, List.of(core), 1);
    // exact geometry: 2 x 2 x 2 captured cells of edge 0.25 -> volume 0.125, surface 6 x 0.25
    assertEquals(0.125, groupVolume(mesh, "core"), 1e-14);
    assertEquals(1 - 0.125, groupVolume(mesh, "body"), 1e-14);
    assertEquals(1.5, groupArea(mesh, "core-surface"), 1e-14);
    assertEquals(1, totalVolume(mesh), 1e-14);
    assertAllPositive(mesh);
    assertConformingWithOutwardFaces(mesh);
    int g = mesh.faceGroupIndex("core-surface");
    assertEquals(FaceGroupKind.INTERFACE, mesh.faceGroups().get(g).kind());
    for (int f = 0; f < mesh.faceCount(); f++) {
      if (mesh.faceGroup(f) == g) {
        double[] c = faceCentroid(mesh, f);
        double[] fromCentre = {c[0] - 0.5, c[1] - 0.5, c[2] - 0.5};
        assertTrue(MeshGeometry.dot(faceNormal2(mesh, f), fromCentre) > 0, "points out of core");
      }
    }
  }

  @Test
  void insertReachingOutsideSharesTheOuterGroups() {
    // cells with centres x < 0.5 of a 4-cell row: the half x in [0, 0.5]
    Insert half = new Insert("half", 0, 0, 0, 0.5, 1, 1);
    TetMesh mesh = StructuredMesher.block(1, 1, 1, 4, 2, 2, List.of(half), 1);
    // exact geometry: the only inner surface is the plane x = 0.5 of area 1
    assertEquals(1.0, groupArea(mesh, "half-surface"), 1e-14);
    assertEquals(0.5, groupVolume(mesh, "half"), 1e-14);
    assertEquals(1.0, groupArea(mesh, "xmin"), 1e-14);
    assertEquals(1.0, groupArea(mesh, "zmin"), 1e-14);
    assertConformingWithOutwardFaces(mesh);
  }

  @Test
  void laterInsertWinsAndOwnsTheSharedFaces() {
    Insert first = new Insert("first", 0, 0, 0, 0.5, 1, 1);
    Insert second = new Insert("second", 0.25, 0, 0, 0.75, 1, 1);
    TetMesh mesh = StructuredMesher.block(1, 1, 1, 4, 1, 1, List.of(first, second), 1);
    // columns of width 0.25: first keeps [0, 0.25], second takes [0.25, 0.75], body [0.75, 1]
    assertEquals(0.25, groupVolume(mesh, "first"), 1e-14);
    assertEquals(0.5, groupVolume(mesh, "second"), 1e-14);
    assertEquals(0.25, groupVolume(mesh, "body"), 1e-14);
    // first's only inner face (x = 0.25) belongs to the later insert, as do both of second's
    assertEquals(-1, mesh.faceGroupIndex("first-surface"));
    assertEquals(2.0, groupArea(mesh, "second-surface"), 1e-14);
    assertConformingWithOutwardFaces(mesh);
  }

  @Test
  void insertWithoutCellsIsNamed() {
    Insert thin = new Insert("thin", 0.1, 0.1, 0.1, 0.2, 0.2, 0.2);
    var e =
        assertThrows(
            IllegalArgumentException.class,
            () -> StructuredMesher.block(1, 1, 1, 2, 2, 2, List.of(thin), 1));
    assertTrue(
        e.getMessage().startsWith("insert 'thin': found no cell centre inside it"), e.getMessage());
    Insert body = new Insert("body", 0, 0, 0, 1, 1, 1);
    e =
        assertThrows(
            IllegalArgumentException.class,
            () -> StructuredMesher.block(1, 1, 1, 2, 2, 2, List.of(body), 1));
    assertTrue(e.getMessage().startsWith("insert name: found 'body'"), e.getMessage());
    Insert backwards = new Insert("b", 0.5, 0, 0, 0.2, 1, 1);
    e =
        assertThrows(
            IllegalArgumentException.class,
            () -> StructuredMesher.block(1, 1, 1, 2, 2, 2, List.of(backwards), 1));
    assertEquals("insert 'b': found x from 0.5 to 0.2, expected increasing bounds", e.getMessage());
  }

  @Test
  void insertFillingTheBoxLeavesNoBodyAndNoSurface() {
    Insert all = new Insert("all", 0, 0, 0, 1, 1, 1);
    TetMesh mesh = StructuredMesher.block(1, 1, 1, 2, 2, 2, List.of(all), 1);
    assertEquals(1, mesh.volumeGroups().size());
    assertEquals("all", mesh.volumeGroups().get(0).name());
    assertEquals(6, mesh.faceGroups().size());
    assertEquals(1, groupVolume(mesh, "all"), 1e-14);
  }
}
