package dev.soakfield.mesh.gen;

import static dev.soakfield.mesh.gen.MeshGeometry.assertAllPositive;
import static dev.soakfield.mesh.gen.MeshGeometry.assertConformingWithOutwardFaces;
import static dev.soakfield.mesh.gen.MeshGeometry.faceNormal2;
import static dev.soakfield.mesh.gen.MeshGeometry.groupArea;
import static dev.soakfield.mesh.gen.MeshGeometry.norm;
import static dev.soakfield.mesh.gen.MeshGeometry.point;
import static dev.soakfield.mesh.gen.MeshGeometry.totalVolume;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.mesh.FaceGroupKind;
import dev.soakfield.mesh.TetMesh;
import org.junit.jupiter.api.Test;

class StructuredMesherBoxTest {
  private static final double LX = 0.03;
  private static final double LY = 0.02;
  private static final double LZ = 0.005;

  @Test
  void boxHasSixTetsPerCellAndOneNodePerGridPoint() {
    TetMesh mesh = StructuredMesher.box(LX, LY, LZ, 3, 4, 2, 1);
    // exact geometry: 6 Kuhn tetrahedra per cell, (nx+1)(ny+1)(nz+1) grid points,
    // 2 triangles per boundary quad: 2 * 2 * (nx ny + ny nz + nx nz)
    assertEquals(6 * 3 * 4 * 2, mesh.tetCount());
    assertEquals(4 * 5 * 3, mesh.nodeCount());
    assertEquals(4 * (3 * 4 + 4 * 2 + 3 * 2), mesh.faceCount());
    assertEquals(1, mesh.order());
    assertEquals("body", mesh.volumeGroups().get(0).name());
  }

  @Test
  void boxVolumeAndFaceGroupAreasAreExact() {
    TetMesh mesh = StructuredMesher.box(LX, LY, LZ, 3, 4, 2, 1);
    // exact geometry: volume lx ly lz; each side's area the product of its two edge lengths
    assertEquals(LX * LY * LZ, totalVolume(mesh), 1e-13 * LX * LY * LZ);
    assertEquals(LY * LZ, groupArea(mesh, "xmin"), 1e-14 * LY * LZ);
    assertEquals(LY * LZ, groupArea(mesh, "xmax"), 1e-14 * LY * LZ);
    assertEquals(LX * LZ, groupArea(mesh, "ymin"), 1e-14 * LX * LZ);
    assertEquals(LX * LZ, groupArea(mesh, "ymax"), 1e-14 * LX * LZ);
    assertEquals(LX * LY, groupArea(mesh, "zmin"), 1e-14 * LX * LY);
    assertEquals(LX * LY, groupArea(mesh, "zmax"), 1e-14 * LX * LY);
    for (var group : mesh.faceGroups()) {
      assertEquals(FaceGroupKind.EXTERIOR, group.kind());
    }
  }

  @Test
  void boxIsConformingPositiveAndOutward() {
    TetMesh mesh = StructuredMesher.box(LX, LY, LZ, 3, 4, 2, 1);
    assertAllPositive(mesh);
    assertConformingWithOutwardFaces(mesh);
  }

  @Test
  void eachSideGroupFacesAlongItsAxisAndLiesOnItsPlane() {
    TetMesh mesh = StructuredMesher.box(LX, LY, LZ, 2, 3, 2, 1);
    String[] names = {"xmin", "xmax", "ymin", "ymax", "zmin", "zmax"};
    double[] size = {LX, LY, LZ};
    for (int f = 0; f < mesh.faceCount(); f++) {
      int side = mesh.faceGroup(f);
      assertEquals(names[side], mesh.faceGroups().get(side).name());
      int axis = side / 2;
      double sign = side % 2 == 0 ? -1 : 1;
      double[] n = faceNormal2(mesh, f);
      // exact geometry: the outward unit normal of side xmin is (-1, 0, 0), and so on
      assertEquals(sign, n[axis] / norm(n), 1e-12);
      for (int k = 0; k < 3; k++) {
        assertEquals(side % 2 == 0 ? 0 : size[axis], point(mesh, mesh.faceNode(f, k))[axis], 0);
      }
    }
  }

  @Test
  void kuhnSplitOfUnitCubeHasDihedralAnglesOf45To90Degrees() {
    // exact geometry of the Kuhn simplex v0=(0,0,0), v1=(1,0,0), v2=(1,1,0), v3=(1,1,1):
    // outward unit normals n0=(1,0,0) (face x=1), n3=(0,0,-1) (face z=0),
    // n1=(-1,1,0)/sqrt2 (face x=y), n2=(0,-1,1)/sqrt2 (face y=z); cos(dihedral_ij) = -ni.nj gives
    // 90 (n0,n3), 45 (n0,n1), 90 (n0,n2), 90 (n3,n1), 45 (n3,n2), 60 (n1,n2) degrees.
    // All six cube tetrahedra are congruent to it, so every angle is 45, 60 or 90 degrees.
    TetMesh mesh = StructuredMesher.box(1, 1, 1, 1, 1, 1, 1);
    assertEquals(6, mesh.tetCount());
    double min = 180;
    double max = 0;
    int[][] faces = {{1, 2, 3}, {0, 3, 2}, {0, 1, 3}, {0, 2, 1}};
    for (int t = 0; t < 6; t++) {
      double[][] normals = new double[4][];
      for (int i = 0; i < 4; i++) {
        double[] p0 = point(mesh, mesh.tetNode(t, faces[i][0]));
        double[] n =
            MeshGeometry.cross(
                MeshGeometry.sub(point(mesh, mesh.tetNode(t, faces[i][1])), p0),
                MeshGeometry.sub(point(mesh, mesh.tetNode(t, faces[i][2])), p0));
        double len = norm(n);
        normals[i] = new double[] {n[0] / len, n[1] / len, n[2] / len};
      }
      for (int i = 0; i < 4; i++) {
        for (int j = i + 1; j < 4; j++) {
          double angle = Math.toDegrees(Math.acos(-MeshGeometry.dot(normals[i], normals[j])));
          assertTrue(
              Math.abs(angle - 45) < 1e-9
                  || Math.abs(angle - 60) < 1e-9
                  || Math.abs(angle - 90) < 1e-9,
              "dihedral angle " + angle);
          min = Math.min(min, angle);
          max = Math.max(max, angle);
        }
      }
    }
    assertEquals(45, min, 1e-9);
    assertEquals(90, max, 1e-9);
  }

  @Test
  void wrongArgumentsGiveUserMessages() {
    var e =
        assertThrows(
            IllegalArgumentException.class, () -> StructuredMesher.box(0, 1, 1, 1, 1, 1, 1));
    assertEquals("length in x: found 0.0, expected a positive length in metres", e.getMessage());
    e =
        assertThrows(
            IllegalArgumentException.class,
            () -> StructuredMesher.box(1, 1, Double.NaN, 1, 1, 1, 1));
    assertEquals("length in z: found NaN, expected a positive length in metres", e.getMessage());
    e =
        assertThrows(
            IllegalArgumentException.class, () -> StructuredMesher.box(1, 1, 1, 0, 1, 1, 1));
    assertEquals("cells in x: found 0, expected a positive count", e.getMessage());
    e =
        assertThrows(
            IllegalArgumentException.class, () -> StructuredMesher.box(1, 1, 1, 1, 1, -2, 1));
    assertEquals("cells in z: found -2, expected a positive count", e.getMessage());
    e =
        assertThrows(
            IllegalArgumentException.class, () -> StructuredMesher.box(1, 1, 1, 1, 1, 1, 3));
    assertEquals("element order: found 3, expected 1 (linear) or 2 (quadratic)", e.getMessage());
    e =
        assertThrows(
            IllegalArgumentException.class,
            () -> StructuredMesher.box(1, 1, 1, 100_000, 100_000, 100_000, 1));
    assertTrue(
        e.getMessage().startsWith("mesh size: found 6000000000000000 tetrahedra"), e.getMessage());
  }
}
