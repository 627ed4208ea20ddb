package dev.soakfield.fem.assembly;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The patch test (B. M. Irons and A. Razzaque, in "The Mathematical Foundations of the Finite
 * Element Method", 1972; common practice): a field the elements can represent exactly must give
 * zero residual at every node that carries no boundary term.
 */
class PatchTest {
  private static final double LX = 0.03;
  private static final double LY = 0.02;
  private static final double LZ = 0.01;
  private static final double[] T = {2.0e-9, 0.7e-9, 1.3e-9, 0.2e-9, -0.1e-9, 0.3e-9};

  private static CsrMatrix stiffness(TetMesh mesh) {
    SystemAssembler a = new SystemAssembler(FeSpace.of(mesh));
    CsrMatrix k = a.newMatrix();
    a.addStiffness(k, TestMeshes.uniformTensor(mesh, T), 1.0);
    return k;
  }

  @ParameterizedTest
  @ValueSource(ints = {1, 2})
  void constantFieldHasZeroResidualEverywhere(int order) {
    TetMesh mesh = StructuredMesher.box(LX, LY, LZ, 3, 3, 2, order);
    CsrMatrix k = stiffness(mesh);
    double[] r = new double[mesh.nodeCount()];
    k.multiply(TestMeshes.filled(mesh.nodeCount(), 1.0), r);
    double scale = TestMeshes.maxAbs(k.values());
    assertTrue(scale > 0);
    for (int i = 0; i < r.length; i++) {
      assertEquals(0.0, r[i], 1e-13 * scale, "row " + i);
    }
  }

  @ParameterizedTest
  @ValueSource(ints = {1, 2})
  void linearFieldHasZeroResidualAtInteriorNodes(int order) {
    TetMesh mesh = StructuredMesher.box(LX, LY, LZ, 3, 3, 3, order);
    CsrMatrix k = stiffness(mesh);
    double[] u = TestMeshes.nodal(mesh, (x, y, z) -> 1 + 40 * x - 25 * y + 70 * z);
    double[] r = new double[mesh.nodeCount()];
    k.multiply(u, r);
    boolean[] interior = TestMeshes.interior(mesh);
    double scale = TestMeshes.maxAbs(k.values()) * TestMeshes.maxAbs(u);
    int checked = 0;
    for (int i = 0; i < r.length; i++) {
      if (interior[i]) {
        assertEquals(0.0, r[i], 1e-13 * scale, "interior node " + i);
        checked++;
      }
    }
    assertTrue(checked > 0);
  }

  @ParameterizedTest
  @ValueSource(ints = {1, 2})
  void bilinearFormOfLinearFieldsIsVolumeTimesGradientProduct(int order) {
    TetMesh mesh = StructuredMesher.box(LX, LY, LZ, 2, 3, 2, order);
    CsrMatrix k = stiffness(mesh);
    double[] gu = {40, -25, 70};
    double[] gv = {-10, 15, 5};
    double[] u = TestMeshes.nodal(mesh, (x, y, z) -> gu[0] * x + gu[1] * y + gu[2] * z);
    double[] v = TestMeshes.nodal(mesh, (x, y, z) -> 3 + gv[0] * x + gv[1] * y + gv[2] * z);
    double[] ku = new double[u.length];
    k.multiply(u, ku);
    double vku = 0;
    for (int i = 0; i < u.length; i++) {
      vku += v[i] * ku[i];
    }
    // exact calculus: ∫ ∇v · T ∇u dV = V ∇v · T ∇u for linear fields; V = lx ly lz
    double tgx = T[0] * gu[0] + T[3] * gu[1] + T[5] * gu[2];
    double tgy = T[3] * gu[0] + T[1] * gu[1] + T[4] * gu[2];
    double tgz = T[5] * gu[0] + T[4] * gu[1] + T[2] * gu[2];
    double expected = LX * LY * LZ * (gv[0] * tgx + gv[1] * tgy + gv[2] * tgz);
    assertEquals(expected, vku, 1e-12 * Math.abs(expected));
  }
}
