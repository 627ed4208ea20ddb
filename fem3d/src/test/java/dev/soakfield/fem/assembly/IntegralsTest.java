package dev.soakfield.fem.assembly;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import java.util.Arrays;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** Sums of assembled terms against exact volumes and areas of a box. */
class IntegralsTest {
  private static final double LX = 0.03;
  private static final double LY = 0.02;
  private static final double LZ = 0.01;
  private static final int NX = 3;
  private static final int NY = 2;
  private static final int NZ = 2;
  private static final double VOLUME = LX * LY * LZ; // exact geometry

  private static TetMesh box(int order) {
    return StructuredMesher.box(LX, LY, LZ, NX, NY, NZ, order);
  }

  private static double sum(double[] a) {
    double s = 0;
    for (double v : a) {
      s += v;
    }
    return s;
  }

  @ParameterizedTest
  @ValueSource(ints = {1, 2})
  void capacitySumsToCoefficientTimesVolume(int order) {
    TetMesh mesh = box(order);
    SystemAssembler a = new SystemAssembler(FeSpace.of(mesh));
    // coefficient 1, 2 or 3 by tet; exact geometry: every Kuhn tet of a uniform grid has volume
    // (cell volume)/6, so the total is Σ coef_t · V/(6 nx ny nz)
    double[] coef = new double[mesh.tetCount()];
    double weighted = 0;
    for (int t = 0; t < coef.length; t++) {
      coef[t] = 1 + t % 3;
      weighted += coef[t];
    }
    double expected = weighted * VOLUME / (6.0 * NX * NY * NZ);
    for (boolean lumped : new boolean[] {false, true}) {
      CsrMatrix m = a.newMatrix();
      a.addCapacity(m, coef, lumped, 2.0);
      assertEquals(2 * expected, sum(m.values()), 1e-13 * expected, "lumped " + lumped);
      if (lumped) {
        int offDiagonal = 0;
        for (int i = 0; i < m.size(); i++) {
          assertTrue(m.get(i, i) > 0, "lumped diagonal positive at node " + i);
          for (int k = m.rowStart()[i]; k < m.rowStart()[i + 1]; k++) {
            if (m.cols()[k] != i && m.values()[k] != 0) {
              offDiagonal++;
            }
          }
        }
        assertEquals(0, offDiagonal);
      }
    }
  }

  @ParameterizedTest
  @ValueSource(ints = {1, 2})
  void faceMassAndFaceLoadSumToCoefficientTimesArea(int order) {
    TetMesh mesh = box(order);
    SystemAssembler a = new SystemAssembler(FeSpace.of(mesh));
    int[] faces = TestMeshes.facesOf(mesh, "xmin");
    double area = LY * LZ; // exact geometry
    CsrMatrix m = a.newMatrix();
    a.addFaceMass(m, faces, TestMeshes.filled(faces.length, 5e-8), 1.0);
    assertEquals(5e-8 * area, sum(m.values()), 1e-13 * 5e-8 * area);
    double[] rhs = new double[mesh.nodeCount()];
    a.addFaceLoad(rhs, faces, TestMeshes.filled(faces.length, 3.0), 0.5);
    assertEquals(1.5 * area, sum(rhs), 1e-13 * area);
    // only nodes on x = 0 receive face terms
    for (int i = 0; i < rhs.length; i++) {
      if (mesh.coord(i, 0) > 0) {
        assertEquals(0.0, rhs[i]);
      }
    }
  }

  @ParameterizedTest
  @ValueSource(ints = {1, 2})
  void volumeLoadSumsToValueTimesVolume(int order) {
    TetMesh mesh = box(order);
    SystemAssembler a = new SystemAssembler(FeSpace.of(mesh));
    double[] rhs = new double[mesh.nodeCount()];
    a.addVolumeLoad(rhs, TestMeshes.filled(mesh.tetCount(), 4.0), 1.0);
    assertEquals(4 * VOLUME, sum(rhs), 1e-13 * VOLUME);
  }

  @ParameterizedTest
  @ValueSource(ints = {1, 2})
  void integralOfARepresentableFieldIsExact(int order) {
    TetMesh mesh = box(order);
    SystemAssembler a = new SystemAssembler(FeSpace.of(mesh));
    double[] u =
        order == 1
            ? TestMeshes.nodal(mesh, (x, y, z) -> 2 + 3 * x - y)
            : TestMeshes.nodal(mesh, (x, y, z) -> x * x + 2 * y * z);
    double[] w = TestMeshes.filled(mesh.tetCount(), 1.5);
    double[] result = a.integratePerGroup(u, w);
    assertEquals(1, result.length);
    // exact calculus over [0,lx]x[0,ly]x[0,lz]
    double expected =
        order == 1
            ? VOLUME * (2 + 3 * LX / 2 - LY / 2)
            : (LX * LX * LX / 3) * LY * LZ + 2 * LX * (LY * LY / 2) * (LZ * LZ / 2);
    assertEquals(1.5 * expected, result[0], 1e-13 * Math.abs(expected));
  }

  @ParameterizedTest
  @ValueSource(ints = {1, 2})
  void faceDofsAreTheSortedNodesOfTheFaces(int order) {
    TetMesh mesh = box(order);
    SystemAssembler a = new SystemAssembler(FeSpace.of(mesh));
    int[] dofs = a.faceDofs(TestMeshes.facesOf(mesh, "xmin"));
    // exact geometry: the x = 0 side holds (k ny + 1)(k nz + 1) nodes, k = order
    assertEquals((order * NY + 1) * (order * NZ + 1), dofs.length);
    int[] sorted = dofs.clone();
    Arrays.sort(sorted);
    assertArrayEquals(sorted, dofs);
    for (int k = 0; k < dofs.length; k++) {
      assertEquals(0.0, mesh.coord(dofs[k], 0));
      if (k > 0) {
        assertTrue(dofs[k] > dofs[k - 1]);
      }
    }
  }
}
