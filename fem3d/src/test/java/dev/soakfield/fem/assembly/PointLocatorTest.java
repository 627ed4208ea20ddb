package dev.soakfield.fem.assembly;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import java.util.Optional;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class PointLocatorTest {
  private static final double LX = 0.03;
  private static final double LY = 0.02;
  private static final double LZ = 0.01;

  @ParameterizedTest
  @ValueSource(ints = {1, 2})
  void centroidOfEveryTetrahedronIsFoundInThatTetrahedron(int order) {
    TetMesh mesh = StructuredMesher.box(LX, LY, LZ, 3, 3, 2, order);
    PointLocator locator = new PointLocator(FeSpace.of(mesh));
    for (int t = 0; t < mesh.tetCount(); t++) {
      double[] c = new double[3];
      for (int k = 0; k < 4; k++) {
        for (int a = 0; a < 3; a++) {
          c[a] += mesh.coord(mesh.tetNode(t, k), a) / 4;
        }
      }
      // exact geometry: a centroid lies inside its own tetrahedron only
      PointLocator.Probe p = locator.locate(c[0], c[1], c[2]).orElseThrow();
      assertEquals(t, p.tet());
      double sum = 0;
      for (double w : p.weights()) {
        sum += w;
      }
      assertEquals(1.0, sum, 1e-14);
    }
  }

  @ParameterizedTest
  @ValueSource(ints = {1, 2})
  void probesReproduceFieldsTheElementsRepresent(int order) {
    TetMesh mesh = StructuredMesher.box(LX, LY, LZ, 4, 3, 2, order);
    PointLocator locator = new PointLocator(FeSpace.of(mesh));
    TestMeshes.Field f =
        order == 1
            ? (x, y, z) -> 1 + 30 * x - 20 * y + 50 * z
            : (x, y, z) -> 1 + 900 * x * x - 400 * y * z + 30 * x * y + 10 * z;
    double[] u = TestMeshes.nodal(mesh, f);
    Random random = new Random(12345);
    for (int k = 0; k < 500; k++) {
      double x = LX * random.nextDouble();
      double y = LY * random.nextDouble();
      double z = LZ * random.nextDouble();
      PointLocator.Probe p = locator.locate(x, y, z).orElseThrow();
      // Lagrange interpolation reproduces polynomials of the element's degree (common practice)
      assertEquals(f.at(x, y, z), p.value(u), 1e-12, "at " + x + ", " + y + ", " + z);
      assertTrue(inside(mesh, p.tet(), x, y, z));
    }
  }

  @Test
  void pointsJustOutsideAreTakenAndFartherOnesAreNot() {
    TetMesh mesh = StructuredMesher.box(LX, LY, LZ, 3, 2, 2, 1);
    PointLocator locator = new PointLocator(FeSpace.of(mesh));
    double diag = Math.sqrt(LX * LX + LY * LY + LZ * LZ); // exact geometry
    double[] u = TestMeshes.nodal(mesh, (x, y, z) -> 2 + 100 * x);
    Optional<PointLocator.Probe> near = locator.locate(LX + 1e-10 * diag, 0.5 * LY, 0.5 * LZ);
    assertTrue(near.isPresent());
    assertEquals(2 + 100 * LX, near.get().value(u), 1e-12);
    assertTrue(locator.locate(LX + 1e-6 * diag, 0.5 * LY, 0.5 * LZ).isEmpty());
    assertTrue(locator.locate(-1, 0, 0).isEmpty());
    assertTrue(locator.locate(0.5 * LX, 0.5 * LY, Double.NaN).isEmpty());
    // corners and faces of the box are inside
    assertTrue(locator.locate(0, 0, 0).isPresent());
    assertTrue(locator.locate(LX, LY, LZ).isPresent());
  }

  /** Corner barycentric coordinates all ≥ −1e-12: the point is in the tetrahedron. */
  private static boolean inside(TetMesh mesh, int t, double px, double py, double pz) {
    double[][] c = new double[4][3];
    for (int k = 0; k < 4; k++) {
      for (int a = 0; a < 3; a++) {
        c[k][a] = mesh.coord(mesh.tetNode(t, k), a);
      }
    }
    double[] p = {px, py, pz};
    double v = det(c[0], c[1], c[2], c[3]);
    for (int k = 0; k < 4; k++) {
      double[][] d = c.clone();
      d[k] = p;
      if (det(d[0], d[1], d[2], d[3]) / v < -1e-12) {
        return false;
      }
    }
    return true;
  }

  private static double det(double[] a, double[] b, double[] c, double[] d) {
    double[] e1 = {b[0] - a[0], b[1] - a[1], b[2] - a[2]};
    double[] e2 = {c[0] - a[0], c[1] - a[1], c[2] - a[2]};
    double[] e3 = {d[0] - a[0], d[1] - a[1], d[2] - a[2]};
    return e1[0] * (e2[1] * e3[2] - e2[2] * e3[1])
        - e1[1] * (e2[0] * e3[2] - e2[2] * e3[0])
        + e1[2] * (e2[0] * e3[1] - e2[1] * e3[0]);
  }
}
