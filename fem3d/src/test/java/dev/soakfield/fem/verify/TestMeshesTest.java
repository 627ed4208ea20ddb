package dev.soakfield.fem.verify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.topo.MeshGeometry;
import org.junit.jupiter.api.Test;

/**
 * The convergence studies' meshes: valid, the curved walls where they belong, jitter repeatable.
 */
class TestMeshesTest {
  @Test
  void jitterMovesInnerNodesOnlyAndKeepsEveryTetrahedronTheRightWayOut() {
    TetMesh box = StructuredMesher.box(1, 1, 1, 6, 6, 6, 1);
    TetMesh j = TestMeshes.jittered(box, 5);
    boolean[] onFace = new boolean[box.nodeCount()];
    for (int f = 0; f < box.faceCount(); f++) {
      for (int k = 0; k < 3; k++) {
        onFace[box.faceNode(f, k)] = true;
      }
    }
    int moved = 0;
    for (int v = 0; v < box.nodeCount(); v++) {
      double d = 0;
      for (int r = 0; r < 3; r++) {
        d = Math.max(d, Math.abs(j.coord(v, r) - box.coord(v, r)));
      }
      if (onFace[v]) {
        assertEquals(0, d, 0, "face node " + v);
      } else {
        assertTrue(d <= TestMeshes.JITTER / 6 + 1e-15, "inner node " + v);
        moved += d > 0 ? 1 : 0;
      }
    }
    assertEquals(125, moved); // every one of the 5³ inner nodes
    for (int t = 0; t < j.tetCount(); t++) {
      assertTrue(MeshGeometry.tetVolume(j, t) > 0, "tetrahedron " + t);
    }
    // a fixed seed gives the same mesh
    assertTrue(j.sameAs(TestMeshes.jittered(box, 5)));
  }

  @Test
  void theBallIsASphereOfShapelyTetrahedraWhoseQuadraticFormLiesOnIt() {
    double[] deficit = new double[2];
    for (int level = 0; level < 2; level++) {
      int n = 4 << level;
      TetMesh ball = TestMeshes.ball(1, n, 2);
      double volume = 0;
      double smallest = 180;
      for (int t = 0; t < ball.tetCount(); t++) {
        volume += MeshGeometry.tetVolume(ball, t);
        for (double a : MeshGeometry.dihedralAnglesDeg(ball, t)) {
          smallest = Math.min(smallest, a);
        }
      }
      // an inscribed polyhedron: under 4π/3 by a share that falls as h² (exact geometry)
      deficit[level] = 1 - volume / (4 * Math.PI / 3);
      assertTrue(deficit[level] > 0 && deficit[level] < 0.05, "volume deficit " + deficit[level]);
      assertTrue(smallest > 8, "smallest dihedral angle " + smallest);
      TetMesh q = TestMeshes.quadratic(ball, 1, false);
      for (int f = 0; f < q.faceCount(); f++) {
        for (int k = 0; k < 6; k++) {
          int v = q.faceNode(f, k);
          double r =
              Math.sqrt(
                  q.coord(v, 0) * q.coord(v, 0)
                      + q.coord(v, 1) * q.coord(v, 1)
                      + q.coord(v, 2) * q.coord(v, 2));
          assertEquals(1.0, r, 1e-12, "face node " + v);
        }
      }
    }
    assertEquals(4, deficit[0] / deficit[1], 0.4); // measured 3.9
  }

  @Test
  void theQuadraticCylinderHasItsSideNodesOnTheCircle() {
    TetMesh q = TestMeshes.quadratic(TestMeshes.cylinder(1, 2, 2, 8, 4, 1), 1, true);
    int side = q.faceGroupIndex("side");
    int checked = 0;
    for (int f = 0; f < q.faceCount(); f++) {
      if (q.faceGroup(f) == side) {
        for (int k = 0; k < 6; k++) {
          int v = q.faceNode(f, k);
          assertEquals(1.0, Math.hypot(q.coord(v, 0), q.coord(v, 1)), 1e-12);
          checked++;
        }
      }
    }
    assertTrue(checked > 0);
  }
}
