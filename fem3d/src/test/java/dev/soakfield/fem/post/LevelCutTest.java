package dev.soakfield.fem.post;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Marching tetrahedra and section cuts against exact planar cuts: a linear field's level set in a
 * box is a plane, whose area inside the box is known from elementary geometry, and the carried
 * linear field must equal its exact value at every corner.
 */
class LevelCutTest {
  private static final boolean[] ALL = new boolean[0];

  private static double[] field(TetMesh m, double a, double b, double c, double d) {
    double[] f = new double[m.nodeCount()];
    for (int n = 0; n < f.length; n++) {
      f[n] = a * m.coord(n, 0) + b * m.coord(n, 1) + c * m.coord(n, 2) + d;
    }
    return f;
  }

  @ParameterizedTest
  @ValueSource(ints = {1, 2})
  void isosurfaceOfLinearFieldIsTheExactPlane(int order) {
    TetMesh m = StructuredMesher.box(1.0, 2.0, 0.5, 3, 4, 2, order);
    double[] f = field(m, 1, 0, 0, 0);
    TriangleSoup s =
        Isosurface.extract(m.copyCoordinates(), m.copyTets(), m.nodesPerTet(), f, 0.37, ALL);
    assertTrue(s.triangleCount() > 0);
    // exact geometry: the plane x = 0.37 meets the box in a 2.0 x 0.5 rectangle
    assertEquals(1.0, s.area(), 1e-12);
    for (int i = 0; i < 3 * s.triangleCount(); i++) {
      assertEquals(0.37, s.corners()[3 * i], 1e-14);
      assertEquals(0.37, s.values()[i], 1e-14);
    }
  }

  @ParameterizedTest
  @ValueSource(ints = {1, 2})
  void levelThroughNodesIsCountedOnce(int order) {
    // nodes lie on x = 0.5: faces on the level must not be drawn from both sides
    TetMesh m = StructuredMesher.box(1.0, 1.0, 1.0, 2, 2, 2, order);
    double[] f = field(m, 1, 0, 0, 0);
    TriangleSoup s =
        Isosurface.extract(m.copyCoordinates(), m.copyTets(), m.nodesPerTet(), f, 0.5, ALL);
    assertEquals(1.0, s.area(), 1e-12); // exact geometry: unit square
  }

  @ParameterizedTest
  @ValueSource(ints = {1, 2})
  void tiltedIsosurfaceCutsTheRegularHexagon(int order) {
    TetMesh m = StructuredMesher.box(1.0, 1.0, 1.0, 4, 4, 4, order);
    double[] f = field(m, 1, 1, 1, 0);
    TriangleSoup s =
        Isosurface.extract(m.copyCoordinates(), m.copyTets(), m.nodesPerTet(), f, 1.5, ALL);
    // exact geometry: x + y + z = 1.5 cuts the unit cube in a regular hexagon of side sqrt(2)/2,
    // area (3 sqrt(3) / 2) s^2 = 3 sqrt(3) / 4
    assertEquals(3 * Math.sqrt(3) / 4, s.area(), 1e-12);
    double[] p = s.corners();
    for (int i = 0; i < 3 * s.triangleCount(); i++) {
      assertEquals(1.5, p[3 * i] + p[3 * i + 1] + p[3 * i + 2], 1e-13);
    }
  }

  @ParameterizedTest
  @ValueSource(ints = {1, 2})
  void sectionCarriesALinearFieldExactly(int order) {
    TetMesh m = StructuredMesher.box(0.6, 0.4, 0.2, 3, 2, 2, order);
    double[] f = field(m, 2, -1, 3, 0.25);
    TriangleSoup s =
        SectionCut.cut(m.copyCoordinates(), m.copyTets(), m.nodesPerTet(), f, 0, 0, 2, 0.146, ALL);
    // exact geometry: the plane 2z = 0.146 (z = 0.073) meets the box in a 0.6 x 0.4 rectangle
    assertEquals(0.24, s.area(), 1e-13);
    double[] p = s.corners();
    for (int i = 0; i < 3 * s.triangleCount(); i++) {
      assertEquals(0.073, p[3 * i + 2], 1e-14);
      double exact = 2 * p[3 * i] - p[3 * i + 1] + 3 * p[3 * i + 2] + 0.25;
      assertEquals(exact, s.values()[i], 1e-13);
    }
  }

  @Test
  void tiltedSectionAndIncludedTetsOnly() {
    TetMesh m = StructuredMesher.box(1.0, 1.0, 1.0, 3, 3, 3, 1);
    double[] f = field(m, 0, 0, 1, 0);
    double[] xyz = m.copyCoordinates();
    int[] tets = m.copyTets();
    TriangleSoup s = SectionCut.cut(xyz, tets, 4, f, 1, 1, 1, 1.5, ALL);
    assertEquals(3 * Math.sqrt(3) / 4, s.area(), 1e-12); // as above
    // only tetrahedra whose centroid has x < 1/3: the first column of cells
    boolean[] include = new boolean[m.tetCount()];
    for (int t = 0; t < include.length; t++) {
      double cx = 0;
      for (int k = 0; k < 4; k++) {
        cx += m.coord(m.tetNode(t, k), 0) / 4;
      }
      include[t] = cx < 1.0 / 3;
    }
    TriangleSoup half = SectionCut.cut(xyz, tets, 4, f, 1, 0, 0, 0.2, include);
    assertEquals(1.0, half.area(), 1e-12); // exact geometry: the unit square x = 0.2
    for (int tet : half.sourceTets()) {
      assertTrue(include[tet]);
    }
    assertThrows(
        IllegalArgumentException.class, () -> SectionCut.cut(xyz, tets, 4, f, 0, 0, 0, 1, ALL));
  }

  @Test
  void levelOutsideTheFieldGivesNothing() {
    TetMesh m = StructuredMesher.box(1.0, 1.0, 1.0, 2, 2, 2, 2);
    double[] f = field(m, 1, 0, 0, 0);
    TriangleSoup s =
        Isosurface.extract(m.copyCoordinates(), m.copyTets(), m.nodesPerTet(), f, 1.5, ALL);
    assertEquals(0, s.triangleCount());
  }
}
