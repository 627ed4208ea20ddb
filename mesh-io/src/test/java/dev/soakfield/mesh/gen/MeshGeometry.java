package dev.soakfield.mesh.gen;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.mesh.FaceGroupKind;
import dev.soakfield.mesh.TetMesh;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/** Geometry and topology measured on a mesh, independently of the code that built it. */
final class MeshGeometry {
  private MeshGeometry() {}

  static double[] point(TetMesh mesh, int node) {
    return new double[] {mesh.coord(node, 0), mesh.coord(node, 1), mesh.coord(node, 2)};
  }

  static double[] sub(double[] a, double[] b) {
    return new double[] {a[0] - b[0], a[1] - b[1], a[2] - b[2]};
  }

  static double[] cross(double[] a, double[] b) {
    return new double[] {
      a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]
    };
  }

  static double dot(double[] a, double[] b) {
    return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
  }

  static double norm(double[] a) {
    return Math.sqrt(dot(a, a));
  }

  /** Signed volume of the corner tetrahedron (exact geometry: det of edge vectors / 6). */
  static double tetVolume(TetMesh mesh, int t) {
    double[] p0 = point(mesh, mesh.tetNode(t, 0));
    double[] a = sub(point(mesh, mesh.tetNode(t, 1)), p0);
    double[] b = sub(point(mesh, mesh.tetNode(t, 2)), p0);
    double[] c = sub(point(mesh, mesh.tetNode(t, 3)), p0);
    return dot(a, cross(b, c)) / 6;
  }

  /** Right-hand normal of the corner triangle, length = twice its area. */
  static double[] faceNormal2(TetMesh mesh, int f) {
    double[] p0 = point(mesh, mesh.faceNode(f, 0));
    return cross(
        sub(point(mesh, mesh.faceNode(f, 1)), p0), sub(point(mesh, mesh.faceNode(f, 2)), p0));
  }

  static double faceArea(TetMesh mesh, int f) {
    return 0.5 * norm(faceNormal2(mesh, f));
  }

  static double[] faceCentroid(TetMesh mesh, int f) {
    double[] c = new double[3];
    for (int k = 0; k < 3; k++) {
      double[] p = point(mesh, mesh.faceNode(f, k));
      for (int a = 0; a < 3; a++) {
        c[a] += p[a] / 3;
      }
    }
    return c;
  }

  static double totalVolume(TetMesh mesh) {
    double v = 0;
    for (int t = 0; t < mesh.tetCount(); t++) {
      v += tetVolume(mesh, t);
    }
    return v;
  }

  static double groupVolume(TetMesh mesh, String group) {
    int g = mesh.volumeGroupIndex(group);
    assertTrue(g >= 0, "volume group " + group);
    double v = 0;
    for (int t = 0; t < mesh.tetCount(); t++) {
      if (mesh.tetGroup(t) == g) {
        v += tetVolume(mesh, t);
      }
    }
    return v;
  }

  static double groupArea(TetMesh mesh, String group) {
    int g = mesh.faceGroupIndex(group);
    assertTrue(g >= 0, "face group " + group);
    double a = 0;
    for (int f = 0; f < mesh.faceCount(); f++) {
      if (mesh.faceGroup(f) == g) {
        a += faceArea(mesh, f);
      }
    }
    return a;
  }

  static void assertAllPositive(TetMesh mesh) {
    for (int t = 0; t < mesh.tetCount(); t++) {
      assertTrue(tetVolume(mesh, t) > 0, "tetrahedron " + t + " is not positively oriented");
    }
  }

  private static List<Integer> key(int a, int b, int c) {
    int[] k = {a, b, c};
    Arrays.sort(k);
    return List.of(k[0], k[1], k[2]);
  }

  /**
   * Counts how many tetrahedra hold each triangle and checks the conformity rules: no triangle in
   * more than two tetrahedra; the exterior groups hold exactly the triangles of one tetrahedron,
   * each once, with the normal pointing away from that tetrahedron; interface faces lie between two
   * tetrahedra.
   */
  static void assertConformingWithOutwardFaces(TetMesh mesh) {
    Map<List<Integer>, Integer> count = new HashMap<>();
    Map<List<Integer>, Integer> owner = new HashMap<>();
    int[][] sides = {{1, 2, 3}, {0, 3, 2}, {0, 1, 3}, {0, 2, 1}};
    for (int t = 0; t < mesh.tetCount(); t++) {
      for (int[] s : sides) {
        List<Integer> k = key(mesh.tetNode(t, s[0]), mesh.tetNode(t, s[1]), mesh.tetNode(t, s[2]));
        count.merge(k, 1, Integer::sum);
        owner.put(k, t);
      }
    }
    int boundary = 0;
    for (int c : count.values()) {
      assertTrue(c == 1 || c == 2, "a triangle is shared by " + c + " tetrahedra");
      if (c == 1) {
        boundary++;
      }
    }
    int exterior = 0;
    Map<List<Integer>, Integer> seen = new HashMap<>();
    for (int f = 0; f < mesh.faceCount(); f++) {
      List<Integer> k = key(mesh.faceNode(f, 0), mesh.faceNode(f, 1), mesh.faceNode(f, 2));
      assertEquals(null, seen.put(k, f), "face " + f + " listed twice");
      Integer c = count.get(k);
      assertTrue(c != null, "face " + f + " is no tetrahedron's face");
      FaceGroupKind kind = mesh.faceGroups().get(mesh.faceGroup(f)).kind();
      if (kind == FaceGroupKind.EXTERIOR) {
        assertEquals(1, c, "exterior face " + f + " shared by two tetrahedra");
        exterior++;
        int t = owner.get(k);
        double[] p0 = point(mesh, mesh.faceNode(f, 0));
        int apex = -1;
        for (int n = 0; n < 4; n++) {
          if (!k.contains(mesh.tetNode(t, n))) {
            apex = mesh.tetNode(t, n);
          }
        }
        double toApex = dot(faceNormal2(mesh, f), sub(point(mesh, apex), p0));
        assertTrue(toApex < 0, "exterior face " + f + " points into its tetrahedron");
      } else {
        assertEquals(2, c, "interface face " + f + " not between two tetrahedra");
      }
    }
    assertEquals(boundary, exterior, "exterior faces against triangles of one tetrahedron");
  }
}
