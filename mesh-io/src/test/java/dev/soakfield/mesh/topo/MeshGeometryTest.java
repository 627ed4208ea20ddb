package dev.soakfield.mesh.topo;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.mesh.FaceGroup;
import dev.soakfield.mesh.FaceGroupKind;
import dev.soakfield.mesh.MeshInputException;
import dev.soakfield.mesh.RawMesh;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.VolumeGroup;
import java.util.List;
import org.junit.jupiter.api.Test;

class MeshGeometryTest {
  private static final double EPS = 1e-12;

  /** One volume group, tets and faces as given, no checks beyond the builder's. */
  private static TetMesh mesh(double[] xyz, int[] tets, int[] faces) {
    return new TetMesh.Builder()
        .nodes(xyz)
        .tets(tets, new int[tets.length / 4])
        .faces(faces, new int[faces.length / 3])
        .volumeGroups(List.of(new VolumeGroup("part", 1)))
        .faceGroups(List.of(new FaceGroup("wall", 1, FaceGroupKind.EXTERIOR)))
        .build();
  }

  @Test
  void fiveTetCubeSplitHasExactVolumes() {
    // Four corner tets at the even corners and the inner tet on the odd ones.
    double[] xyz = {
      0, 0, 0, 1, 0, 0, 0, 1, 0, 0, 0, 1, 1, 1, 0, 1, 0, 1, 0, 1, 1, 1, 1, 1,
    };
    int[] tets = {0, 1, 2, 3, 4, 1, 2, 7, 5, 1, 3, 7, 6, 2, 3, 7, 1, 2, 3, 7};
    RawMesh raw = TestMeshes.tets(xyz, tets);
    TetMesh m = MeshAssembler.assemble(raw, AssemblyOptions.defaults()).mesh();
    // Exact geometry: corner tets are 1/6 of the unit cube, the inner one 1 - 4/6 = 1/3.
    for (int t = 0; t < 4; t++) {
      assertEquals(1.0 / 6.0, MeshGeometry.tetVolume(m, t), EPS);
    }
    assertEquals(1.0 / 3.0, MeshGeometry.tetVolume(m, 4), EPS);
    assertEquals(1.0, MeshGeometry.groupVolumes(m)[0], EPS);
    assertEquals(12, m.faceCount());
    assertEquals(6, m.faceGroups().size());
    double[] areas = MeshGeometry.groupAreas(m);
    for (double a : areas) {
      assertEquals(1.0, a, EPS); // exact geometry: each cube side has area 1
    }
  }

  @Test
  void regularTetrahedronAnglesRatioAndSignedVolume() {
    // Alternate corners of the cube [-1,1]^3: edges 2 sqrt 2; in this order inside out.
    double[] xyz = {1, 1, 1, 1, -1, -1, -1, 1, -1, -1, -1, 1};
    TetMesh m = mesh(xyz, new int[] {0, 1, 2, 3}, new int[] {1, 2, 3});
    // Exact geometry: cube volume 8 minus four corner tets of 4/3 each is 8/3; sign from order.
    assertEquals(-8.0 / 3.0, MeshGeometry.tetVolume(m, 0), EPS);
    assertEquals(-1.0, MeshGeometry.volumeRatio(m, 0), EPS);
    // Exact geometry: the regular tetrahedron's dihedral angle is arccos(1/3) = 70.5288 degrees.
    double expected = Math.toDegrees(Math.acos(1.0 / 3.0));
    assertEquals(70.5288, expected, 1e-4);
    for (double a : MeshGeometry.dihedralAnglesDeg(m, 0)) {
      assertEquals(expected, a, 1e-9);
    }
    // Exact geometry: equilateral triangle of side 2 sqrt 2 has area sqrt(3)/4 * 8.
    assertEquals(2.0 * Math.sqrt(3.0), MeshGeometry.faceArea(m, 0), EPS);
  }

  @Test
  void cubeCornerTetHasRightAnglesAtTheCorner() {
    double[] xyz = {0, 0, 0, 1, 0, 0, 0, 1, 0, 0, 0, 1};
    TetMesh m = mesh(xyz, new int[] {0, 1, 2, 3}, new int[] {0, 2, 1});
    double[] a = MeshGeometry.dihedralAnglesDeg(m, 0);
    // Exact geometry: coordinate planes meet at 90 degrees along edges (0,1), (2,0), (3,0); the
    // slanted face x + y + z = 1 meets each of them at arccos(1/sqrt 3) = 54.7356 degrees.
    double slant = Math.toDegrees(Math.acos(1.0 / Math.sqrt(3.0)));
    assertArrayEquals(new double[] {90, slant, 90, 90, slant, slant}, a, 1e-9);
    assertEquals(1.0 / 6.0, MeshGeometry.tetVolume(m, 0), EPS);
    assertEquals(0.5, MeshGeometry.faceArea(m, 0), EPS);
    // Face 0-2-1 in the plane z = 0, turning clockwise seen from above: normal -z.
    assertArrayEquals(new double[] {0, 0, -1}, MeshGeometry.outwardNormal(m, 0), EPS);
    // Exact geometry: edges 1,1,1,sqrt2,sqrt2,sqrt2 give l_rms = sqrt(1.5), ratio
    // 6 sqrt2 (1/6) / 1.5^1.5.
    assertEquals(Math.sqrt(2.0) / Math.pow(1.5, 1.5), MeshGeometry.volumeRatio(m, 0), EPS);
  }

  @Test
  void boundingBoxCoversTheTetsOnly() {
    TestMeshes.Grid grid = new TestMeshes.Grid(2, 1, 1, 0.5);
    RawMesh raw = grid.raw(c -> 1, false);
    // A node of no tetrahedron far away does not widen the box.
    raw.xyz = java.util.Arrays.copyOf(raw.xyz, raw.xyz.length + 3);
    raw.xyz[raw.xyz.length - 1] = 40.0;
    raw.nodeIds = java.util.Arrays.copyOf(raw.nodeIds, raw.nodeIds.length + 1);
    raw.nodeIds[raw.nodeIds.length - 1] = 999;
    TetMesh m = MeshAssembler.assemble(raw, AssemblyOptions.defaults()).mesh();
    // Exact geometry: two cubes of side 0.5 along x.
    assertArrayEquals(new double[] {0, 0, 0, 1.0, 0.5, 0.5}, MeshGeometry.boundingBox(m), 0.0);
  }

  @Test
  void groupVolumesFollowTheGroups() {
    TestMeshes.Grid grid = new TestMeshes.Grid(3, 1, 1, 1.0);
    RawMesh raw = grid.raw(c -> c == 0 ? 1 : 2, false);
    TetMesh m = MeshAssembler.assemble(raw, AssemblyOptions.defaults()).mesh();
    // Exact geometry: one unit cube in group 1, two in group 2.
    assertArrayEquals(new double[] {1.0, 2.0}, MeshGeometry.groupVolumes(m), EPS);
  }

  @Test
  void normalOfZeroAreaFaceNamesFaceAndCorners() {
    double[] xyz = {0, 0, 0, 1, 0, 0, 0, 1, 0, 0, 0, 1, 2, 0, 0};
    // Face 1: nodes 0, 1, 4 on the x axis (exact geometry: zero area).
    TetMesh m = mesh(xyz, new int[] {0, 1, 2, 3}, new int[] {0, 2, 1, 0, 1, 4});
    MeshInputException e =
        assertThrows(MeshInputException.class, () -> MeshGeometry.outwardNormal(m, 1));
    assertEquals("face 1", e.location());
    assertTrue(e.found().contains("node 4 (2.00000000, 0.00000000, 0.00000000)"), e.found());
  }

  @Test
  void dihedralAnglesOfTetWithCollinearCornersAreRefused() {
    double[] xyz = {0, 0, 0, 1, 0, 0, 2, 0, 0, 0, 0, 1};
    TetMesh m = mesh(xyz, new int[] {0, 1, 2, 3}, new int[0]);
    MeshInputException e =
        assertThrows(MeshInputException.class, () -> MeshGeometry.dihedralAnglesDeg(m, 0));
    assertEquals("tetrahedron 0", e.location());
  }

  @Test
  void indicesOutsideTheMeshAreRefused() {
    double[] xyz = {0, 0, 0, 1, 0, 0, 0, 1, 0, 0, 0, 1};
    TetMesh m = mesh(xyz, new int[] {0, 1, 2, 3}, new int[] {0, 2, 1});
    assertThrows(IndexOutOfBoundsException.class, () -> MeshGeometry.tetVolume(m, 1));
    assertThrows(IndexOutOfBoundsException.class, () -> MeshGeometry.faceArea(m, -1));
  }
}
