package dev.soakfield.fem.assembly;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class StiffnessSymmetryTest {
  private static CsrMatrix stiffness(TetMesh mesh, double... t) {
    SystemAssembler a = new SystemAssembler(FeSpace.of(mesh));
    CsrMatrix k = a.newMatrix();
    a.addStiffness(k, TestMeshes.uniformTensor(mesh, t), 1.0);
    return k;
  }

  @ParameterizedTest
  @ValueSource(ints = {1, 2})
  void stiffnessIsSymmetricForAFullTensor(int order) {
    TetMesh mesh = StructuredMesher.box(0.03, 0.02, 0.01, 3, 2, 2, order);
    CsrMatrix k = stiffness(mesh, 2.0, 0.7, 1.3, 0.2, -0.1, 0.3);
    // common practice: the bilinear form ∫ ∇v · T ∇u is symmetric for a symmetric T
    for (int i = 0; i < k.size(); i++) {
      for (int p = k.rowStart()[i]; p < k.rowStart()[i + 1]; p++) {
        int j = k.cols()[p];
        assertEquals(k.values()[p], k.get(j, i), 1e-15 * Math.abs(k.values()[p]), i + "," + j);
      }
    }
  }

  @ParameterizedTest
  @ValueSource(ints = {1, 2})
  void orthotropicTensorTurnedWithTheMeshGivesTheSameMatrix(int order) {
    TetMesh mesh = StructuredMesher.box(0.03, 0.02, 0.01, 3, 2, 2, order);
    double a = 3.0;
    double b = 1.0;
    double c = 0.5;
    CsrMatrix reference = stiffness(mesh, a, b, c, 0, 0, 0);
    // exact geometry: turning the part by 90° about z swaps the x and y principal directions,
    // R diag(a, b, c) Rᵀ = diag(b, a, c); the stiffness of each node pair is unchanged
    TetMesh turned = TestMeshes.rotatedAboutZ(mesh, Math.PI / 2);
    CsrMatrix swapped = stiffness(turned, b, a, c, 0, 0, 0);
    assertArrayEquals(reference.values(), swapped.values(), 1e-13 * a);
    // and by 45°: R diag(a, b, c) Rᵀ has xx = yy = (a + b)/2, xy = (a − b)/2
    TetMesh turned45 = TestMeshes.rotatedAboutZ(mesh, Math.PI / 4);
    CsrMatrix rotated = stiffness(turned45, (a + b) / 2, (a + b) / 2, c, (a - b) / 2, 0, 0);
    assertArrayEquals(reference.values(), rotated.values(), 1e-12 * a);
    // the swap changes the matrix on the unturned mesh (the test can fail)
    CsrMatrix wrong = stiffness(mesh, b, a, c, 0, 0, 0);
    double diff = 0;
    for (int p = 0; p < wrong.nonZeros(); p++) {
      diff = Math.max(diff, Math.abs(wrong.values()[p] - reference.values()[p]));
    }
    assertEquals(true, diff > 1e-3 * a);
  }
}
