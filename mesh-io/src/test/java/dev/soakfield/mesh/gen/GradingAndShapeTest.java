package dev.soakfield.mesh.gen;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.mesh.TetMesh;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Graded cells follow the geometric series (h₁ = L(r − 1)/(rⁿ − 1), the sum of a geometric series;
 * common practice for graded meshes), and the round meshers' tetrahedra keep their smallest
 * dihedral angle above 10° at any cell counts. Angles are measured here from the face normals (the
 * dihedral angle at an edge is π less the angle between the outward normals of the two faces that
 * meet there), independently of the mesh checker.
 */
class GradingAndShapeTest {
  @Test
  void gradedPlanesFollowTheGeometricSeries() {
    double l = 2e-3;
    double r = 1.3;
    int n = 10;
    double[] p = Grading.planes(0, l, n, r, 1);
    double h1 = l * (r - 1) / (Math.pow(r, n) - 1);
    for (int i = 0; i < n; i++) {
      assertEquals(h1 * Math.pow(r, i), p[i + 1] - p[i], 1e-15, "cell " + i);
    }
    assertEquals(l, p[n], 0);
    // toward the end: the same sizes in reverse
    double[] q = Grading.planes(0, l, n, 1, r);
    for (int i = 0; i < n; i++) {
      assertEquals(p[i + 1] - p[i], q[n - i] - q[n - i - 1], 1e-15);
    }
    // both ends: symmetric halves, finest at both faces
    double[] b = Grading.planes(0, l, n, r, r);
    assertEquals(b[1] - b[0], b[n] - b[n - 1], 1e-15);
    assertTrue(b[1] - b[0] < b[n / 2 + 1] - b[n / 2]);
    // no grading is the even split
    assertArrayEquals(TensorGrid.planes(0, l, n), Grading.planes(0, l, n, 1, 1), 0);
  }

  @Test
  void aGradedBoxKeepsItsVolumeAndPutsItsFinestCellsAtTheFace() {
    TetMesh m =
        StructuredMesher.box(
            1e-3, 2e-3, 3e-3, 8, 3, 4, 1, Grading.of(Map.of("xmin", 1.5, "zmax", 1.2)));
    double v = 0;
    for (int t = 0; t < m.tetCount(); t++) {
      v += volume(m, t);
    }
    assertEquals(6e-9, v, 1e-20);
    double firstX = Double.POSITIVE_INFINITY;
    for (int i = 0; i < m.nodeCount(); i++) {
      if (m.coord(i, 0) > 0) {
        firstX = Math.min(firstX, m.coord(i, 0));
      }
    }
    assertEquals(1e-3 * 0.5 / (Math.pow(1.5, 8) - 1), firstX, 1e-15);
  }

  @Test
  void gradingNamesTheFacesAShapeHas() {
    IllegalArgumentException e =
        assertThrows(
            IllegalArgumentException.class,
            () -> StructuredMesher.box(1, 1, 1, 2, 2, 2, 1, Grading.of(Map.of("inner", 1.2))));
    assertTrue(e.getMessage().contains("xmin"), e.getMessage());
    assertThrows(IllegalArgumentException.class, () -> Grading.of(Map.of("xmin", 0.0)));
    assertThrows(IllegalArgumentException.class, () -> Grading.of(Map.of("xmin", Double.NaN)));
  }

  @ParameterizedTest
  @CsvSource({"20,72,4", "2,200,1", "4,8,30", "1,3,1", "6,400,2", "3,12,200"})
  void pipeTetrahedraStayAboveTenDegrees(int nr, int na, int nz) {
    TetMesh m = StructuredMesher.pipe(50e-3, 60e-3, 0.1, nr, na, nz, 1);
    assertTrue(smallestDihedral(m) > 10, nr + "," + na + "," + nz + ": " + smallestDihedral(m));
  }

  /** A gently graded wall (1.1 over 8 cells: 2:1 from outer to inner) keeps the bound too. */
  @Test
  void aGentlyGradedPipeStaysAboveTenDegrees() {
    TetMesh graded =
        StructuredMesher.pipe(
            50e-3, 60e-3, 0.1, 8, 24, 4, 1, Grading.of(Map.of("inner", 1.1)), false);
    assertTrue(smallestDihedral(graded) > 10, "graded: " + smallestDihedral(graded));
  }

  @ParameterizedTest
  @CsvSource({"4,16,2", "1,8,40", "6,8,1", "2,64,3"})
  void cylinderTetrahedraStayAboveTenDegrees(int nr, int na, int nz) {
    TetMesh m = StructuredMesher.cylinder(5e-3, 20e-3, nr, na, nz, 1);
    assertTrue(smallestDihedral(m) > 10, nr + "," + na + "," + nz + ": " + smallestDihedral(m));
  }

  /** Negative control: the counts as given (the check's opt-out) make the slivers it prevents. */
  @Test
  void theCountsAsGivenMakeSlivers() {
    TetMesh m = StructuredMesher.pipe(50e-3, 60e-3, 0.1, 20, 72, 4, 1, Grading.NONE, true);
    assertEquals(20 * 72 * 4 * 6, m.tetCount());
    assertTrue(smallestDihedral(m) < 5, "" + smallestDihedral(m));
    int[] raised = StructuredMesher.pipeCells(50e-3, 60e-3, 0.1, 20, 72, 4, Grading.NONE, false);
    assertEquals(20, raised[0]); // the wall's resolution stays
    assertTrue(raised[1] > 72 && raised[2] > 4, java.util.Arrays.toString(raised));
  }

  @Test
  void aPipesVolumeConvergesToTheAnnulus() {
    double exact = Math.PI * (60e-3 * 60e-3 - 50e-3 * 50e-3) * 0.1;
    double coarse = Math.abs(total(StructuredMesher.pipe(50e-3, 60e-3, 0.1, 2, 24, 2, 1)) - exact);
    double fine = Math.abs(total(StructuredMesher.pipe(50e-3, 60e-3, 0.1, 2, 96, 2, 1)) - exact);
    // an inscribed polygon of n sides misses (1 − sin(2π/n)/(2π/n)) of the area: O(1/n²)
    assertTrue(fine < coarse / 10, coarse + " -> " + fine);
    assertEquals(exact, total(StructuredMesher.pipe(50e-3, 60e-3, 0.1, 2, 96, 2, 1)), 1e-3 * exact);
  }

  private static double total(TetMesh m) {
    double v = 0;
    for (int t = 0; t < m.tetCount(); t++) {
      v += volume(m, t);
    }
    return v;
  }

  private static double[] point(TetMesh m, int tet, int k) {
    int n = m.tetNode(tet, k);
    return new double[] {m.coord(n, 0), m.coord(n, 1), m.coord(n, 2)};
  }

  private static double[] sub(double[] a, double[] b) {
    return new double[] {a[0] - b[0], a[1] - b[1], a[2] - b[2]};
  }

  private static double[] cross(double[] a, double[] b) {
    return new double[] {
      a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]
    };
  }

  private static double dot(double[] a, double[] b) {
    return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
  }

  private static double volume(TetMesh m, int t) {
    double[] a = point(m, t, 0);
    return Math.abs(
            dot(sub(point(m, t, 1), a), cross(sub(point(m, t, 2), a), sub(point(m, t, 3), a))))
        / 6;
  }

  /** Smallest dihedral angle over the mesh, degrees. */
  static double smallestDihedral(TetMesh m) {
    double smallest = 180;
    for (int t = 0; t < m.tetCount(); t++) {
      double[][] p = {point(m, t, 0), point(m, t, 1), point(m, t, 2), point(m, t, 3)};
      double[][] normal = new double[4][];
      for (int f = 0; f < 4; f++) {
        double[] a = p[(f + 1) % 4];
        double[] b = p[(f + 2) % 4];
        double[] c = p[(f + 3) % 4];
        double[] n = cross(sub(b, a), sub(c, a));
        if (dot(n, sub(p[f], a)) > 0) { // outward: away from the opposite vertex
          n = new double[] {-n[0], -n[1], -n[2]};
        }
        double len = Math.sqrt(dot(n, n));
        normal[f] = new double[] {n[0] / len, n[1] / len, n[2] / len};
      }
      for (int i = 0; i < 4; i++) {
        for (int j = i + 1; j < 4; j++) {
          double angle =
              180 - Math.toDegrees(Math.acos(Math.max(-1, Math.min(1, dot(normal[i], normal[j])))));
          smallest = Math.min(smallest, angle);
        }
      }
    }
    return smallest;
  }
}
