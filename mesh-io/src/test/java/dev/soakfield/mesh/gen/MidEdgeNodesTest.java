package dev.soakfield.mesh.gen;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.mesh.TetMesh;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

class MidEdgeNodesTest {
  // MSH ten-node tetrahedron: nodes 4-9 on edges (0,1), (1,2), (2,0), (3,0), (3,2), (3,1);
  // six-node triangle: nodes 3-5 on (0,1), (1,2), (2,0) (formats.md, MSH element types 11 and 9)
  private static final int[][] TET_EDGES = {{0, 1}, {1, 2}, {2, 0}, {3, 0}, {3, 2}, {3, 1}};
  private static final int[][] FACE_EDGES = {{0, 1}, {1, 2}, {2, 0}};

  /**
   * Exact count of the edges of the Kuhn grid: the grid lines along x, y and z, one diagonal per
   * grid quad (xy, xz, yz planes) and one main diagonal per cell.
   */
  private static long kuhnEdges(long nx, long ny, long nz) {
    long lines = nx * (ny + 1) * (nz + 1) + (nx + 1) * ny * (nz + 1) + (nx + 1) * (ny + 1) * nz;
    long quads = nx * ny * (nz + 1) + nx * (ny + 1) * nz + (nx + 1) * ny * nz;
    return lines + quads + nx * ny * nz;
  }

  private static List<Integer> edge(int a, int b) {
    return List.of(Math.min(a, b), Math.max(a, b));
  }

  /** Checks every mid node sits at its edge's midpoint and is the same node in every element. */
  private static void assertMidNodesShared(TetMesh mesh) {
    Map<List<Integer>, Integer> mid = new HashMap<>();
    for (int t = 0; t < mesh.tetCount(); t++) {
      for (int k = 0; k < 6; k++) {
        int a = mesh.tetNode(t, TET_EDGES[k][0]);
        int b = mesh.tetNode(t, TET_EDGES[k][1]);
        int m = mesh.tetNode(t, 4 + k);
        Integer before = mid.putIfAbsent(edge(a, b), m);
        assertEquals(before == null ? m : before, m, "edge " + a + "-" + b + " has two mid nodes");
      }
    }
    for (int f = 0; f < mesh.faceCount(); f++) {
      for (int k = 0; k < 3; k++) {
        int a = mesh.faceNode(f, FACE_EDGES[k][0]);
        int b = mesh.faceNode(f, FACE_EDGES[k][1]);
        assertEquals(mid.get(edge(a, b)), mesh.faceNode(f, 3 + k), "face " + f + " edge " + k);
      }
    }
  }

  @Test
  void promotedBoxHasOneNodePerEdgeAtItsMidpoint() {
    int nx = 3;
    int ny = 2;
    int nz = 4;
    TetMesh linear = StructuredMesher.box(0.3, 0.2, 0.4, nx, ny, nz, 1);
    TetMesh quadratic = MidEdgeNodes.promote(linear);
    long corners = (nx + 1L) * (ny + 1) * (nz + 1);
    assertEquals(corners + kuhnEdges(nx, ny, nz), quadratic.nodeCount());
    assertEquals(2, quadratic.order());
    assertEquals(linear.tetCount(), quadratic.tetCount());
    assertEquals(linear.faceCount(), quadratic.faceCount());
    assertEquals(linear.volumeGroups(), quadratic.volumeGroups());
    assertEquals(linear.faceGroups(), quadratic.faceGroups());
    for (int t = 0; t < quadratic.tetCount(); t++) {
      for (int k = 0; k < 4; k++) {
        assertEquals(linear.tetNode(t, k), quadratic.tetNode(t, k));
      }
      for (int k = 0; k < 6; k++) {
        int a = quadratic.tetNode(t, TET_EDGES[k][0]);
        int b = quadratic.tetNode(t, TET_EDGES[k][1]);
        int m = quadratic.tetNode(t, 4 + k);
        assertTrue(m >= corners, "mid nodes come after the corner nodes");
        for (int axis = 0; axis < 3; axis++) {
          // exact geometry: midpoint of the straight edge
          double expected = 0.5 * (quadratic.coord(a, axis) + quadratic.coord(b, axis));
          assertEquals(expected, quadratic.coord(m, axis), 1e-15);
        }
      }
    }
    assertMidNodesShared(quadratic);
  }

  @Test
  void promotionIsDeterministicAndKeepsQuadraticMeshes() {
    TetMesh linear = StructuredMesher.box(1, 1, 1, 2, 2, 2, 1);
    TetMesh once = MidEdgeNodes.promote(linear);
    assertTrue(once.sameAs(MidEdgeNodes.promote(linear)));
    assertSame(once, MidEdgeNodes.promote(once));
    assertTrue(once.sameAs(StructuredMesher.box(1, 1, 1, 2, 2, 2, 2)));
  }

  @Test
  void quadraticCylinderSatisfiesEulerAndKeepsItsSideOnTheCircle() {
    double r = 0.01;
    TetMesh linear = StructuredMesher.cylinder(r, 0.02, 2, 16, 2, 1);
    TetMesh quadratic = StructuredMesher.cylinder(r, 0.02, 2, 16, 2, 2);
    long edges = (long) quadratic.nodeCount() - linear.nodeCount();
    // Count the triangles of the linear mesh: each tet has 4, shared ones counted once.
    Map<List<Integer>, Integer> triangles = new HashMap<>();
    int[][] sides = {{1, 2, 3}, {0, 3, 2}, {0, 1, 3}, {0, 2, 1}};
    for (int t = 0; t < linear.tetCount(); t++) {
      for (int[] s : sides) {
        int[] k = {linear.tetNode(t, s[0]), linear.tetNode(t, s[1]), linear.tetNode(t, s[2])};
        java.util.Arrays.sort(k);
        triangles.merge(List.of(k[0], k[1], k[2]), 1, Integer::sum);
      }
    }
    // Euler characteristic of a triangulated solid ball: V - E + F - T = 1 (common practice)
    assertEquals(
        1, linear.nodeCount() - edges + triangles.size() - linear.tetCount(), "V - E + F - T");
    assertMidNodesShared(quadratic);
    int side = quadratic.faceGroupIndex("side");
    for (int f = 0; f < quadratic.faceCount(); f++) {
      if (quadratic.faceGroup(f) == side) {
        for (int k = 0; k < 6; k++) {
          int n = quadratic.faceNode(f, k);
          assertEquals(r, Math.hypot(quadratic.coord(n, 0), quadratic.coord(n, 1)), 1e-12 * r);
        }
      }
    }
  }

  @Test
  void quadraticPipeKeepsBothWallsOnTheirCircles() {
    double ri = 0.003;
    double ro = 0.005;
    TetMesh mesh = StructuredMesher.pipe(ri, ro, 0.01, 1, 9, 1, 2);
    assertMidNodesShared(mesh);
    for (String group : new String[] {"inner", "outer"}) {
      int g = mesh.faceGroupIndex(group);
      double rho = group.equals("inner") ? ri : ro;
      for (int f = 0; f < mesh.faceCount(); f++) {
        if (mesh.faceGroup(f) == g) {
          for (int k = 0; k < 6; k++) {
            int n = mesh.faceNode(f, k);
            assertEquals(rho, Math.hypot(mesh.coord(n, 0), mesh.coord(n, 1)), 1e-12 * rho);
          }
        }
      }
    }
    // a mid node of a vertical edge in the bottom plane cannot exist; bottom mid nodes stay at z=0
    int bottom = mesh.faceGroupIndex("bottom");
    for (int f = 0; f < mesh.faceCount(); f++) {
      if (mesh.faceGroup(f) == bottom) {
        for (int k = 3; k < 6; k++) {
          assertEquals(0, mesh.coord(mesh.faceNode(f, k), 2), 0);
        }
      }
    }
  }

  @Test
  void millionTetBoxPromotesToCornersPlusEdges() {
    // 6 x 56^3 = 1 053 696 tetrahedra
    int n = 56;
    TetMesh quadratic = StructuredMesher.box(1, 1, 1, n, n, n, 2);
    assertEquals(6L * n * n * n, quadratic.tetCount());
    assertEquals((n + 1L) * (n + 1) * (n + 1) + kuhnEdges(n, n, n), quadratic.nodeCount());
  }
}
