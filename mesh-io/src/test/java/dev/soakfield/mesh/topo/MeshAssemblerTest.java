package dev.soakfield.mesh.topo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.mesh.FaceGroup;
import dev.soakfield.mesh.FaceGroupKind;
import dev.soakfield.mesh.MeshFinding;
import dev.soakfield.mesh.MeshImport;
import dev.soakfield.mesh.MeshInputException;
import dev.soakfield.mesh.RawMesh;
import dev.soakfield.mesh.TetMesh;
import java.util.List;
import org.junit.jupiter.api.Test;

class MeshAssemblerTest {
  private static final double EPS = 1e-12;

  private static MeshImport assemble(RawMesh raw) {
    return MeshAssembler.assemble(raw, AssemblyOptions.defaults());
  }

  private static MeshFinding only(MeshImport result, String code) {
    List<MeshFinding> found = result.report().withCode(code);
    assertEquals(1, found.size(), "findings with code " + code + ": " + result.report());
    return found.get(0);
  }

  private static double area(TetMesh mesh, String group) {
    int g = mesh.faceGroupIndex(group);
    assertTrue(g >= 0, "no face group " + group + " in " + mesh.faceGroups());
    return MeshGeometry.groupAreas(mesh)[g];
  }

  private static int faceCount(TetMesh mesh, String group) {
    int g = mesh.faceGroupIndex(group);
    int n = 0;
    for (int f = 0; f < mesh.faceCount(); f++) {
      if (mesh.faceGroup(f) == g) {
        n++;
      }
    }
    return n;
  }

  @Test
  void unitCubeOfSixTetsSplitsIntoSixUnitSidesAtThirtyDegrees() {
    TestMeshes.Grid grid = new TestMeshes.Grid(1, 1, 1, 1.0);
    MeshImport result = assemble(grid.raw(c -> 1, false));
    TetMesh mesh = result.mesh();
    // Exact geometry: unit cube, volume 1; six sides of area 1, two triangles each.
    assertEquals(1.0, MeshGeometry.groupVolumes(mesh)[0], EPS);
    assertEquals(12, mesh.faceCount());
    assertEquals(6, mesh.faceGroups().size());
    for (int p = 1; p <= 6; p++) {
      assertEquals(1.0, area(mesh, "patch-" + p), EPS);
      assertEquals(2, faceCount(mesh, "patch-" + p));
    }
    assertTrue(only(result, "feature-patches").message().contains("6 patches"));
    assertTrue(result.report().withCode("inverted-tets").isEmpty());
    assertFalse(result.report().hasErrors());
  }

  @Test
  void featureAngleAboveTheCubeEdgeAngleGivesOnePatch() {
    TestMeshes.Grid grid = new TestMeshes.Grid(1, 1, 1, 1.0);
    MeshImport result = MeshAssembler.assemble(grid.raw(c -> 1, false), new AssemblyOptions(100.0));
    // Exact geometry: neighbouring cube sides meet at 90 degrees < 100, so all join.
    assertEquals(1, result.mesh().faceGroups().size());
    assertEquals(6.0, area(result.mesh(), "patch-1"), EPS);
  }

  @Test
  void invertedTetIsReorderedAndCounted() {
    // Exact geometry: corners (0,0,0), (0,1,0), (1,0,0), (0,0,1) in this order have volume -1/6.
    RawMesh raw = TestMeshes.tets(new double[] {0, 0, 0, 0, 1, 0, 1, 0, 0, 0, 0, 1}, 0, 1, 2, 3);
    raw.tetIds[0] = 42;
    MeshImport result = assemble(raw);
    assertEquals(1.0 / 6.0, MeshGeometry.tetVolume(result.mesh(), 0), EPS);
    MeshFinding f = only(result, "inverted-tets");
    assertEquals(MeshFinding.Severity.WARNING, f.severity());
    assertTrue(f.message().startsWith("1 tetrahedra"), f.message());
    assertTrue(f.message().contains("42"), f.message());
    // The raw mesh stays as the reader left it.
    assertEquals(1, raw.tets[1]);
  }

  @Test
  void flatTetIsReportedWithItsId() {
    // Exact geometry: node 4 at (0.5, 0.5, 0) lies in the plane z = 0 of nodes 0, 1, 2.
    RawMesh raw =
        TestMeshes.tets(
            new double[] {0, 0, 0, 1, 0, 0, 0, 1, 0, 0, 0, 1, 0.5, 0.5, 0}, 0, 1, 2, 3, 0, 1, 2, 4);
    raw.tetIds[0] = 7;
    raw.tetIds[1] = 99;
    MeshImport result = assemble(raw);
    MeshFinding f = only(result, "degenerate-tets");
    assertEquals(MeshFinding.Severity.ERROR, f.severity());
    assertTrue(f.message().startsWith("1 tetrahedra"), f.message());
    assertTrue(f.message().endsWith("elements 99"), f.message());
    assertTrue(result.report().hasErrors());
    // A flat tet has zero volume ratio (exact geometry): histogram bin 0.
    assertEquals(1, result.report().quality().volumeRatioHistogram()[0]);
    assertEquals(0.0, result.report().quality().minDihedralDeg(), EPS);
  }

  @Test
  void twoCubesWithTaggedInterfaceBetweenTwoVolumes() {
    TestMeshes.Grid grid = new TestMeshes.Grid(2, 1, 1, 1.0);
    RawMesh raw = grid.raw(c -> c + 1, false);
    raw.volumeNames.put(1, "shell");
    raw.volumeNames.put(2, "core");
    raw.surfaceNames.put(5, "bond");
    TestMeshes.addTriangles(raw, grid.sideTriangles(0, 0, 0, 0, 1), 5, 300);
    MeshImport result = assemble(raw);
    TetMesh mesh = result.mesh();
    assertEquals("shell", mesh.volumeGroups().get(0).name());
    assertEquals("core", mesh.volumeGroups().get(1).name());
    // Exact geometry: two unit cubes.
    assertEquals(1.0, MeshGeometry.groupVolumes(mesh)[0], EPS);
    assertEquals(1.0, MeshGeometry.groupVolumes(mesh)[1], EPS);
    FaceGroup bond = mesh.faceGroups().get(mesh.faceGroupIndex("bond"));
    assertEquals(FaceGroupKind.INTERFACE, bond.kind());
    assertEquals(5, bond.tag());
    assertEquals(1.0, area(mesh, "bond"), EPS);
    assertEquals(2, faceCount(mesh, "bond"));
    // Exact geometry: the 2 x 1 x 1 box has outer area 10, 20 triangles, none tagged.
    assertEquals(10.0, area(mesh, FaceGroup.UNTAGGED), EPS);
    assertEquals(20, faceCount(mesh, FaceGroup.UNTAGGED));
    assertTrue(only(result, "untagged-faces").message().startsWith("20 exterior faces"));
    assertTrue(result.report().withCode("interface-within-volume").isEmpty());
    // Tagged faces first, in file order.
    assertEquals(mesh.faceGroupIndex("bond"), mesh.faceGroup(0));
    assertEquals(mesh.faceGroupIndex("bond"), mesh.faceGroup(1));
  }

  @Test
  void interfaceInsideOneVolumeIsKeptWithWarning() {
    TestMeshes.Grid grid = new TestMeshes.Grid(2, 1, 1, 1.0);
    RawMesh raw = grid.raw(c -> 1, false);
    TestMeshes.addTriangles(raw, grid.sideTriangles(0, 0, 0, 0, 1), 5, 300);
    MeshImport result = assemble(raw);
    FaceGroup g = result.mesh().faceGroups().get(result.mesh().faceGroupIndex("surface-5"));
    assertEquals(FaceGroupKind.INTERFACE, g.kind());
    MeshFinding f = only(result, "interface-within-volume");
    assertEquals(MeshFinding.Severity.WARNING, f.severity());
    assertTrue(f.message().startsWith("2 tagged triangles"), f.message());
  }

  @Test
  void tagOnExteriorAndInteriorIsSplitInTwoGroups() {
    TestMeshes.Grid grid = new TestMeshes.Grid(2, 1, 1, 1.0);
    RawMesh raw = grid.raw(c -> c + 1, false);
    TestMeshes.addTriangles(raw, grid.sideTriangles(0, 0, 0, 0, 0), 5, 300);
    TestMeshes.addTriangles(raw, grid.sideTriangles(0, 0, 0, 0, 1), 5, 310);
    MeshImport result = assemble(raw);
    TetMesh mesh = result.mesh();
    assertEquals(
        FaceGroupKind.EXTERIOR, mesh.faceGroups().get(mesh.faceGroupIndex("surface-5")).kind());
    assertEquals(
        FaceGroupKind.INTERFACE,
        mesh.faceGroups().get(mesh.faceGroupIndex("surface-5-interface")).kind());
    // Exact geometry: one unit square each.
    assertEquals(1.0, area(mesh, "surface-5"), EPS);
    assertEquals(1.0, area(mesh, "surface-5-interface"), EPS);
    assertTrue(only(result, "split-face-group").message().contains("surface-5-interface"));
  }

  @Test
  void missingTagLeavesItsSideUntagged() {
    TestMeshes.Grid grid = new TestMeshes.Grid(1, 1, 1, 1.0);
    RawMesh raw = grid.raw(c -> 1, false);
    int tag = 1;
    for (int axis = 0; axis < 3; axis++) {
      for (int side = 0; side < 2; side++) {
        if (axis == 2 && side == 1) {
          continue; // the top is left without a tag
        }
        TestMeshes.addTriangles(raw, grid.sideTriangles(0, 0, 0, axis, side), tag, 100L * tag);
        tag++;
      }
    }
    MeshImport result = assemble(raw);
    TetMesh mesh = result.mesh();
    assertEquals(6, mesh.faceGroups().size());
    assertEquals(FaceGroup.UNTAGGED, mesh.faceGroups().get(5).name());
    assertEquals(6, mesh.faceGroups().get(5).tag());
    // Exact geometry: the untagged top is the unit square z = 1.
    assertEquals(1.0, area(mesh, FaceGroup.UNTAGGED), EPS);
    assertEquals(2, faceCount(mesh, FaceGroup.UNTAGGED));
    for (int f = 0; f < mesh.faceCount(); f++) {
      if (mesh.faceGroup(f) == 5) {
        for (int k = 0; k < 3; k++) {
          assertEquals(1.0, mesh.coord(mesh.faceNode(f, k), 2), 0.0);
        }
      }
    }
    assertTrue(only(result, "untagged-faces").message().startsWith("2 exterior faces"));
    assertTrue(result.report().withCode("feature-patches").isEmpty());
  }

  @Test
  void nonConformingTriangleIsReported() {
    TestMeshes.Grid grid = new TestMeshes.Grid(1, 1, 1, 1.0);
    RawMesh raw = grid.raw(c -> 1, false);
    TestMeshes.addTriangles(raw, grid.wrongSideTriangles(0, 0, 0, 1, 0), 4, 501);
    MeshImport result = assemble(raw);
    MeshFinding f = only(result, "non-conforming-faces");
    assertEquals(MeshFinding.Severity.ERROR, f.severity());
    assertTrue(f.message().startsWith("2 tagged triangles"), f.message());
    assertTrue(f.message().endsWith("elements 501, 502"), f.message());
    // Nothing matched, so the whole exterior is untagged.
    assertEquals(12, faceCount(result.mesh(), FaceGroup.UNTAGGED));
  }

  @Test
  void faceSharedByThreeTetsIsNonManifold() {
    double[] xyz = {0, 0, 0, 1, 0, 0, 0, 1, 0, 0, 0, 1, 0, 0, -1, 0.2, 0.2, 2};
    RawMesh raw = TestMeshes.tets(xyz, 0, 1, 2, 3, 0, 2, 1, 4, 0, 1, 2, 5);
    raw.tetIds = new long[] {11, 12, 13};
    MeshImport result = assemble(raw);
    MeshFinding f = only(result, "non-manifold-faces");
    assertEquals(MeshFinding.Severity.ERROR, f.severity());
    assertTrue(f.message().startsWith("1 faces"), f.message());
    assertTrue(f.message().endsWith("elements 11, 12, 13"), f.message());
  }

  @Test
  void coincidentNodesOfTwoSeparateCubesAreFound() {
    TestMeshes.Grid grid = new TestMeshes.Grid(1, 1, 1, 1.0);
    RawMesh a = grid.raw(c -> 1, false);
    RawMesh raw = new RawMesh();
    raw.xyz = new double[48];
    raw.nodeIds = new long[16];
    raw.tets = new int[48];
    raw.tetTags = new int[12];
    raw.tetIds = new long[12];
    for (int n = 0; n < 8; n++) {
      for (int axis = 0; axis < 3; axis++) {
        raw.xyz[3 * n + axis] = a.xyz[3 * n + axis];
        raw.xyz[24 + 3 * n + axis] = a.xyz[3 * n + axis] + (axis == 0 ? 1.0 : 0.0);
      }
      raw.nodeIds[n] = n + 1L;
      raw.nodeIds[n + 8] = n + 101L;
    }
    for (int i = 0; i < 24; i++) {
      raw.tets[i] = a.tets[i];
      raw.tets[24 + i] = a.tets[i] + 8;
    }
    for (int t = 0; t < 12; t++) {
      raw.tetTags[t] = 1;
      raw.tetIds[t] = t + 1L;
    }
    MeshImport result = assemble(raw);
    // Exact geometry: the right side of the first cube (nodes 2, 4, 6, 8 at x = 1) meets the left
    // side of the second (nodes 101, 103, 105, 107): four pairs, eight nodes.
    MeshFinding f = only(result, "duplicate-nodes");
    assertTrue(f.message().startsWith("8 nodes"), f.message());
    assertTrue(f.message().contains("4 pairs"), f.message());
    assertTrue(f.message().contains("2 and 101"), f.message());
    // The crack shows as two extra exterior sides.
    assertEquals(24, result.mesh().faceCount());
  }

  @Test
  void quadraticInvertedTetKeepsMidNodesOnTheirEdges() {
    // Corners in inside-out order (exact geometry: volume -1 for these points).
    double[] corners = {0, 0, 0, 0, 3, 0, 2, 0, 0, 0, 0, 1};
    // MSH ten-node order: mid-edge nodes on (0,1), (1,2), (2,0), (3,0), (3,2), (3,1).
    int[][] edges = {{0, 1}, {1, 2}, {2, 0}, {3, 0}, {3, 2}, {3, 1}};
    double[] xyz = new double[30];
    System.arraycopy(corners, 0, xyz, 0, 12);
    for (int e = 0; e < 6; e++) {
      for (int axis = 0; axis < 3; axis++) {
        xyz[3 * (4 + e) + axis] =
            0.5 * (corners[3 * edges[e][0] + axis] + corners[3 * edges[e][1] + axis]);
      }
    }
    RawMesh raw = TestMeshes.tets(xyz, 0, 1, 2, 3);
    raw.order = 2;
    raw.tets = new int[] {0, 1, 2, 3, 4, 5, 6, 7, 8, 9};
    MeshImport result = assemble(raw);
    TetMesh mesh = result.mesh();
    only(result, "inverted-tets");
    // Exact geometry: |det| / 6 of edge vectors (0,3,0), (2,0,0), (0,0,1) is 1.
    assertEquals(1.0, MeshGeometry.tetVolume(mesh, 0), EPS);
    for (int e = 0; e < 6; e++) {
      int mid = mesh.tetNode(0, 4 + e);
      int p = mesh.tetNode(0, edges[e][0]);
      int q = mesh.tetNode(0, edges[e][1]);
      for (int axis = 0; axis < 3; axis++) {
        assertEquals(0.5 * (mesh.coord(p, axis) + mesh.coord(q, axis)), mesh.coord(mid, axis), 0.0);
      }
    }
    // Six-node faces: nodes 3, 4, 5 on face edges (0,1), (1,2), (2,0).
    assertEquals(4, mesh.faceCount());
    int[][] faceEdges = {{0, 1}, {1, 2}, {2, 0}};
    for (int f = 0; f < 4; f++) {
      for (int e = 0; e < 3; e++) {
        int mid = mesh.faceNode(f, 3 + e);
        int p = mesh.faceNode(f, faceEdges[e][0]);
        int q = mesh.faceNode(f, faceEdges[e][1]);
        for (int axis = 0; axis < 3; axis++) {
          assertEquals(
              0.5 * (mesh.coord(p, axis) + mesh.coord(q, axis)), mesh.coord(mid, axis), 0.0);
        }
      }
    }
  }

  @Test
  void exteriorNormalsPointAwayFromTheirTet() {
    TestMeshes.Grid grid = new TestMeshes.Grid(3, 2, 2, 0.5);
    RawMesh raw = grid.raw(c -> 1 + c % 2, true);
    MeshImport result = assemble(raw);
    TetMesh mesh = result.mesh();
    // Half the tets came inside out and were reordered.
    assertTrue(only(result, "inverted-tets").message().startsWith((3 * 3 * 2 * 2) + " "));
    assertEquals(2 * (3 * 2 + 3 * 2 + 2 * 2) * 2, mesh.faceCount());
    for (int f = 0; f < mesh.faceCount(); f++) {
      int owner = ownerOf(mesh, f);
      double[] n = MeshGeometry.outwardNormal(mesh, f);
      assertEquals(1.0, Math.sqrt(n[0] * n[0] + n[1] * n[1] + n[2] * n[2]), EPS);
      double away = 0;
      for (int axis = 0; axis < 3; axis++) {
        double faceMid = 0;
        double tetMid = 0;
        for (int k = 0; k < 3; k++) {
          faceMid += mesh.coord(mesh.faceNode(f, k), axis) / 3;
        }
        for (int k = 0; k < 4; k++) {
          tetMid += mesh.coord(mesh.tetNode(owner, k), axis) / 4;
        }
        away += n[axis] * (faceMid - tetMid);
      }
      assertTrue(away > 0, "face " + f + " points into tet " + owner);
    }
    for (int t = 0; t < mesh.tetCount(); t++) {
      assertTrue(MeshGeometry.tetVolume(mesh, t) > 0);
    }
  }

  /** The one tet that holds all three corners of face f (brute force, small meshes only). */
  private static int ownerOf(TetMesh mesh, int f) {
    int found = -1;
    for (int t = 0; t < mesh.tetCount(); t++) {
      int hits = 0;
      for (int k = 0; k < 3; k++) {
        for (int c = 0; c < 4; c++) {
          if (mesh.tetNode(t, c) == mesh.faceNode(f, k)) {
            hits++;
          }
        }
      }
      if (hits == 3) {
        assertEquals(-1, found, "exterior face " + f + " in two tets");
        found = t;
      }
    }
    assertTrue(found >= 0);
    return found;
  }

  @Test
  void largeGridHasTheExpectedExteriorAndArea() {
    int n = 20;
    TestMeshes.Grid grid = new TestMeshes.Grid(n, n, n, 1.0 / n);
    RawMesh raw = grid.raw(c -> 1, false);
    MeshImport result = assemble(raw);
    TetMesh mesh = result.mesh();
    // Exact geometry: each of the 6 sides holds n * n squares of two triangles; unit cube.
    assertEquals(2 * 6 * n * n, mesh.faceCount());
    assertEquals(6 * n * n * n, mesh.tetCount());
    double total = 0;
    for (double a : MeshGeometry.groupAreas(mesh)) {
      total += a;
    }
    assertEquals(6.0, total, 1e-10);
    assertEquals(1.0, MeshGeometry.groupVolumes(mesh)[0], 1e-10);
    assertEquals(6, mesh.faceGroups().size());
    assertEquals(1, result.report().findings().size(), result.report().findings().toString());
  }

  @Test
  void nodeNumbersBeyondTwentyOneBitsAreMatched() {
    // a cube split into six tets whose nodes sit past 2^21 unused nodes: the face matching must
    // not depend on node numbers fitting a packed key
    int pad = (1 << 21) + 5;
    double[] cube = {0, 0, 0, 1, 0, 0, 0, 1, 0, 1, 1, 0, 0, 0, 1, 1, 0, 1, 0, 1, 1, 1, 1, 1};
    double[] xyz = new double[3 * pad + cube.length];
    for (int i = 0; i < pad; i++) {
      xyz[3 * i] = -10 - i; // far away and distinct
    }
    System.arraycopy(cube, 0, xyz, 3 * pad, cube.length);
    int[] kuhn = {0, 1, 3, 7, 0, 3, 2, 7, 0, 2, 6, 7, 0, 6, 4, 7, 0, 4, 5, 7, 0, 5, 1, 7};
    int[] tets = new int[kuhn.length];
    for (int i = 0; i < kuhn.length; i++) {
      tets[i] = kuhn[i] + pad;
    }
    MeshImport result =
        MeshAssembler.assemble(TestMeshes.tets(xyz, tets), AssemblyOptions.defaults());
    // exact geometry: a unit cube has 12 exterior triangles (2 per side) and area 6
    assertEquals(12, result.mesh().faceCount());
    double total = 0;
    for (double a : MeshGeometry.groupAreas(result.mesh())) {
      total += a;
    }
    assertEquals(6.0, total, 1e-12);
    assertEquals(6, result.mesh().faceGroups().size()); // six flat sides at 30 degrees
  }

  @Test
  void unusedNodeIsKeptAndCounted() {
    RawMesh raw =
        TestMeshes.tets(new double[] {0, 0, 0, 1, 0, 0, 0, 1, 0, 0, 0, 1, 5, 5, 5}, 0, 1, 2, 3);
    MeshImport result = assemble(raw);
    assertEquals(5, result.mesh().nodeCount());
    MeshFinding f = only(result, "unused-nodes");
    assertTrue(f.message().startsWith("1 nodes"), f.message());
    assertTrue(f.message().endsWith("nodes 5"), f.message());
  }

  @Test
  void duplicateTriangleKeepsTheFirstTag() {
    TestMeshes.Grid grid = new TestMeshes.Grid(1, 1, 1, 1.0);
    RawMesh raw = grid.raw(c -> 1, false);
    int[] side = grid.sideTriangles(0, 0, 0, 0, 0);
    TestMeshes.addTriangles(raw, side, 3, 10);
    TestMeshes.addTriangles(raw, new int[] {side[2], side[0], side[1]}, 4, 20);
    MeshImport result = assemble(raw);
    MeshFinding f = only(result, "duplicate-faces");
    assertTrue(f.message().endsWith("elements 20"), f.message());
    assertEquals(-1, result.mesh().faceGroupIndex("surface-4"));
    assertEquals(2, faceCount(result.mesh(), "surface-3"));
  }

  @Test
  void entityTagsGiveEntityNames() {
    TestMeshes.Grid grid = new TestMeshes.Grid(1, 1, 1, 1.0);
    RawMesh raw = grid.raw(c -> 3, false);
    raw.physicalTags = false;
    TestMeshes.addTriangles(raw, grid.sideTriangles(0, 0, 0, 2, 0), 7, 1);
    TetMesh mesh = assemble(raw).mesh();
    assertEquals("entity-3", mesh.volumeGroups().get(0).name());
    assertEquals("entity-7", mesh.faceGroups().get(0).name());
    raw.physicalTags = true;
    mesh = assemble(raw).mesh();
    assertEquals("volume-3", mesh.volumeGroups().get(0).name());
    assertEquals("surface-7", mesh.faceGroups().get(0).name());
  }

  @Test
  void readerFindingsComeFirst() {
    TestMeshes.Grid grid = new TestMeshes.Grid(1, 1, 1, 1.0);
    RawMesh raw = grid.raw(c -> 1, true);
    raw.findings.add(MeshFinding.warning("reader-note", "from the reader"));
    List<MeshFinding> findings = assemble(raw).report().findings();
    assertEquals("reader-note", findings.get(0).code());
    assertEquals("inverted-tets", findings.get(1).code());
  }

  @Test
  void meshWithoutTetsIsAnInputError() {
    RawMesh raw = new RawMesh();
    raw.source = "shell.msh";
    MeshInputException e = assertThrows(MeshInputException.class, () -> assemble(raw));
    assertEquals("shell.msh", e.source());
    assertTrue(e.getMessage().contains("no tetrahedra"), e.getMessage());
  }

  @Test
  void nonPositiveTagIsAnInputError() {
    RawMesh raw = TestMeshes.tets(new double[] {0, 0, 0, 1, 0, 0, 0, 1, 0, 0, 0, 1}, 0, 1, 2, 3);
    raw.tetTags[0] = 0;
    raw.tetIds[0] = 17;
    MeshInputException e = assertThrows(MeshInputException.class, () -> assemble(raw));
    assertEquals("element 17", e.location());
    assertEquals("group tag 0", e.found());
  }

  @Test
  void nonFiniteCoordinateIsAnInputError() {
    RawMesh raw =
        TestMeshes.tets(new double[] {0, 0, 0, 1, 0, 0, 0, Double.NaN, 0, 0, 0, 1}, 0, 1, 2, 3);
    MeshInputException e = assertThrows(MeshInputException.class, () -> assemble(raw));
    assertEquals("node 3", e.location());
  }

  @Test
  void featureAngleMustLieBetweenZeroAndHalfTurn() {
    assertEquals(30.0, AssemblyOptions.defaults().featureAngleDeg());
    assertThrows(IllegalArgumentException.class, () -> new AssemblyOptions(0.0));
    assertThrows(IllegalArgumentException.class, () -> new AssemblyOptions(180.0));
    assertThrows(IllegalArgumentException.class, () -> new AssemblyOptions(Double.NaN));
  }

  @Test
  void regularTetHasPerfectQuality() {
    // The inner tetrahedron of the five-tet cube split, (1,0,0), (0,1,0), (0,0,1), (1,1,1): all
    // edges sqrt 2, so it is regular (exact geometry).
    RawMesh raw = TestMeshes.tets(new double[] {1, 0, 0, 0, 1, 0, 0, 0, 1, 1, 1, 1}, 0, 1, 2, 3);
    MeshImport result = assemble(raw);
    // Exact geometry: the regular tetrahedron's dihedral angle is arccos(1/3) = 70.5288 degrees.
    double expected = Math.toDegrees(Math.acos(1.0 / 3.0));
    assertEquals(expected, result.report().quality().minDihedralDeg(), 1e-9);
    assertEquals(expected, result.report().quality().maxDihedralDeg(), 1e-9);
    assertEquals(1.0, result.report().quality().minVolumeRatio(), 1e-12);
    assertEquals(1, result.report().quality().volumeRatioHistogram()[9]);
    assertTrue(result.report().withCode("low-dihedral").isEmpty());
  }

  @Test
  void sliverTetIsWarned() {
    // Exact geometry: the apex (0.3, 0.3, 0.01) sits 0.3 from the edges on the x and y axes, so
    // the two faces there rise atan(0.01 / 0.3) = 1.909 degrees from the base: the smallest angle.
    RawMesh raw =
        TestMeshes.tets(new double[] {0, 0, 0, 1, 0, 0, 0, 1, 0, 0.3, 0.3, 0.01}, 0, 1, 2, 3);
    MeshImport result = assemble(raw);
    assertEquals(
        Math.toDegrees(Math.atan(0.01 / 0.3)), result.report().quality().minDihedralDeg(), 1e-9);
    assertEquals(MeshFinding.Severity.WARNING, only(result, "low-dihedral").severity());
    assertFalse(result.report().hasErrors());
  }

  @Test
  void edgeSharedByFourExteriorFacesBreaksPatches() {
    // Two unit cubes of a 2 x 2 x 1 box, diagonal to each other, touch along the edge x = y = 1.
    TestMeshes.Grid grid = new TestMeshes.Grid(2, 2, 1, 1.0);
    RawMesh full = grid.raw(c -> 1, false);
    RawMesh raw = new RawMesh();
    raw.xyz = full.xyz;
    raw.nodeIds = full.nodeIds;
    raw.tets = new int[48];
    raw.tetTags = new int[12];
    raw.tetIds = new long[12];
    int t = 0;
    for (int cell : new int[] {grid.cell(0, 0, 0), grid.cell(1, 1, 0)}) {
      for (int k = 0; k < 6; k++) {
        System.arraycopy(full.tets, 4 * (6 * cell + k), raw.tets, 4 * t, 4);
        raw.tetTags[t] = 1;
        raw.tetIds[t] = full.tetIds[6 * cell + k];
        t++;
      }
    }
    MeshImport result = MeshAssembler.assemble(raw, new AssemblyOptions(100.0));
    // Each cube's sides join (90 < 100 degrees), but not across the shared edge: exact geometry,
    // two patches of area 6.
    assertEquals(2, result.mesh().faceGroups().size());
    assertEquals(6.0, area(result.mesh(), "patch-1"), EPS);
    assertEquals(6.0, area(result.mesh(), "patch-2"), EPS);
    // The corner nodes (2,0,z) and (0,2,z) of the box belong to neither cube.
    assertTrue(only(result, "unused-nodes").message().startsWith("4 nodes"));
  }

  @Test
  void longIdListsAreCutAfterTwenty() {
    double[] xyz = new double[3 * 29];
    double[] tet = {0, 0, 0, 1, 0, 0, 0, 1, 0, 0, 0, 1};
    System.arraycopy(tet, 0, xyz, 0, 12);
    RawMesh raw = TestMeshes.tets(xyz, 0, 1, 2, 3);
    MeshFinding f = only(assemble(raw), "unused-nodes");
    assertTrue(f.message().startsWith("25 nodes"), f.message());
    assertTrue(f.message().endsWith("24 (and 5 more)"), f.message());
  }

  @Test
  void clashingGroupNamesAreMadeUnique() {
    TestMeshes.Grid grid = new TestMeshes.Grid(2, 1, 1, 1.0);
    RawMesh raw = grid.raw(c -> c + 1, false);
    raw.volumeNames.put(1, "body");
    raw.volumeNames.put(2, "body");
    // A user group called "untagged" keeps its name; the faces nobody tagged get another.
    raw.surfaceNames.put(9, FaceGroup.UNTAGGED);
    TestMeshes.addTriangles(raw, grid.sideTriangles(0, 0, 0, 0, 0), 9, 1);
    MeshImport result = assemble(raw);
    TetMesh mesh = result.mesh();
    assertEquals("body", mesh.volumeGroups().get(0).name());
    assertEquals("body-2", mesh.volumeGroups().get(1).name());
    assertEquals(9, mesh.faceGroups().get(mesh.faceGroupIndex(FaceGroup.UNTAGGED)).tag());
    // Exact geometry: the user's group is the unit side x = 0, the rest of the box has area 9.
    assertEquals(1.0, area(mesh, FaceGroup.UNTAGGED), EPS);
    assertEquals(9.0, area(mesh, FaceGroup.UNTAGGED + "-2"), EPS);
    assertEquals(2, result.report().withCode("group-name-clash").size());
  }
}
