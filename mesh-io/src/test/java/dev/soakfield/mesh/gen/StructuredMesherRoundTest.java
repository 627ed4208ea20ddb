package dev.soakfield.mesh.gen;

import static dev.soakfield.mesh.gen.MeshGeometry.assertAllPositive;
import static dev.soakfield.mesh.gen.MeshGeometry.assertConformingWithOutwardFaces;
import static dev.soakfield.mesh.gen.MeshGeometry.groupArea;
import static dev.soakfield.mesh.gen.MeshGeometry.totalVolume;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.mesh.TetMesh;
import org.junit.jupiter.api.Test;

class StructuredMesherRoundTest {
  private static final double R = 0.01;
  private static final double H = 0.02;

  /** Exact geometry: area of the regular n-gon inscribed in radius r, (n/2) r^2 sin(2 pi / n). */
  private static double polygonArea(int n, double r) {
    return 0.5 * n * r * r * Math.sin(2 * Math.PI / n);
  }

  /** Exact geometry: perimeter of the regular n-gon inscribed in radius r, 2 n r sin(pi / n). */
  private static double polygonPerimeter(int n, double r) {
    return 2 * n * r * Math.sin(Math.PI / n);
  }

  // The counts are taken as given here (the meshers' shape guard otherwise raises them): these
  // tests check the grids' geometry cell by cell.

  @Test
  void cylinderIsThePrismOfTheInscribedPolygon() {
    int n = 16;
    TetMesh mesh = StructuredMesher.cylinder(R, H, 2, n, 3, 1, Grading.NONE, true);
    double area = polygonArea(n, R);
    assertEquals(area * H, totalVolume(mesh), 1e-13 * area * H);
    assertEquals(area, groupArea(mesh, "bottom"), 1e-13 * area);
    assertEquals(area, groupArea(mesh, "top"), 1e-13 * area);
    assertEquals(polygonPerimeter(n, R) * H, groupArea(mesh, "side"), 1e-13 * R * H);
    // O-grid: (n/4)^2 square cells and n x nRadial ring cells per level, 6 tetrahedra each
    assertEquals(6 * 3 * (4 * 4 + n * 2), mesh.tetCount());
    assertAllPositive(mesh);
    assertConformingWithOutwardFaces(mesh);
  }

  @Test
  void cylinderSideNodesLieOnTheCircle() {
    TetMesh mesh = StructuredMesher.cylinder(R, H, 3, 24, 2, 1, Grading.NONE, true);
    int side = mesh.faceGroupIndex("side");
    int checked = 0;
    for (int f = 0; f < mesh.faceCount(); f++) {
      if (mesh.faceGroup(f) == side) {
        for (int k = 0; k < 3; k++) {
          int node = mesh.faceNode(f, k);
          assertEquals(R, Math.hypot(mesh.coord(node, 0), mesh.coord(node, 1)), 1e-12 * R);
          checked++;
        }
      }
    }
    assertEquals(3 * 2 * 24 * 2, checked);
  }

  @Test
  void cylinderVolumeConvergesAtSecondOrderInCellsAround() {
    // exact geometry: pi r^2 - (n/2) r^2 sin(2 pi / n) ~ (2 pi^3 / 3) r^2 / n^2, so doubling n
    // divides the volume error by about 4
    double exact = Math.PI * R * R * H;
    double previous = Double.NaN;
    for (int n = 8; n <= 64; n *= 2) {
      double error =
          exact - totalVolume(StructuredMesher.cylinder(R, H, 2, n, 1, 1, Grading.NONE, true));
      assertTrue(error > 0, "inscribed prism is smaller than the cylinder");
      if (!Double.isNaN(previous)) {
        assertEquals(4.0, previous / error, 0.1);
      }
      previous = error;
    }
  }

  @Test
  void pipeIsThePrismOfTwoInscribedPolygons() {
    int n = 12;
    double ri = 0.004;
    TetMesh mesh = StructuredMesher.pipe(ri, R, H, 2, n, 2, 1, Grading.NONE, true);
    double ring = polygonArea(n, R) - polygonArea(n, ri);
    assertEquals(ring * H, totalVolume(mesh), 1e-13 * ring * H);
    assertEquals(ring, groupArea(mesh, "bottom"), 1e-13 * ring);
    assertEquals(ring, groupArea(mesh, "top"), 1e-13 * ring);
    assertEquals(polygonPerimeter(n, ri) * H, groupArea(mesh, "inner"), 1e-13 * R * H);
    assertEquals(polygonPerimeter(n, R) * H, groupArea(mesh, "outer"), 1e-13 * R * H);
    // periodic grid: n x nRadial x nz cells and n x (nRadial+1) x (nz+1) nodes
    assertEquals(6 * n * 2 * 2, mesh.tetCount());
    assertEquals(n * 3 * 3, mesh.nodeCount());
    assertAllPositive(mesh);
    assertConformingWithOutwardFaces(mesh);
  }

  @Test
  void pipeWallNodesLieOnTheirCircles() {
    double ri = 0.004;
    TetMesh mesh = StructuredMesher.pipe(ri, R, H, 1, 7, 1, 1, Grading.NONE, true);
    for (String group : new String[] {"inner", "outer"}) {
      int g = mesh.faceGroupIndex(group);
      double rho = group.equals("inner") ? ri : R;
      for (int f = 0; f < mesh.faceCount(); f++) {
        if (mesh.faceGroup(f) == g) {
          for (int k = 0; k < 3; k++) {
            int node = mesh.faceNode(f, k);
            assertEquals(rho, Math.hypot(mesh.coord(node, 0), mesh.coord(node, 1)), 1e-12 * rho);
          }
        }
      }
    }
    assertConformingWithOutwardFaces(mesh);
  }

  @Test
  void roundArgumentsAreChecked() {
    var e =
        assertThrows(
            IllegalArgumentException.class,
            () -> StructuredMesher.pipe(0.01, 0.01, 1, 1, 8, 1, 1, Grading.NONE, true));
    assertTrue(
        e.getMessage().endsWith("expected the inner radius below the outer"), e.getMessage());
    e =
        assertThrows(
            IllegalArgumentException.class,
            () -> StructuredMesher.cylinder(1, 1, 1, 10, 1, 1, Grading.NONE, true));
    assertEquals("cells around: found 10, expected a multiple of 4, at least 8", e.getMessage());
    e =
        assertThrows(
            IllegalArgumentException.class,
            () -> StructuredMesher.pipe(1, 2, 1, 1, 2, 1, 1, Grading.NONE, true));
    assertEquals("cells around: found 2, expected at least 3", e.getMessage());
    e =
        assertThrows(
            IllegalArgumentException.class,
            () -> StructuredMesher.cylinder(-1, 1, 1, 8, 1, 1, Grading.NONE, true));
    assertEquals("radius: found -1.0, expected a positive length in metres", e.getMessage());
  }
}
