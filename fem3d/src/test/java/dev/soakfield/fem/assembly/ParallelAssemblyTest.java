package dev.soakfield.fem.assembly;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.element.TetKernel;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import java.util.Arrays;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class ParallelAssemblyTest {
  private static final double[] T = {2.0, 0.7, 1.3, 0.2, -0.1, 0.3};

  private static double[] coefficients(TetMesh mesh) {
    double[] c = new double[mesh.tetCount()];
    for (int t = 0; t < c.length; t++) {
      c[t] = 1 + 0.37 * (t % 7);
    }
    return c;
  }

  @ParameterizedTest
  @ValueSource(ints = {1, 2})
  void severalThreadsGiveTheSameBitsAsOne(int order) {
    TetMesh mesh = StructuredMesher.box(1, 1, 1, 6, 5, 4, order);
    FeSpace space = FeSpace.of(mesh);
    SystemAssembler serial = new SystemAssembler(space, 1, 1, 5);
    SystemAssembler parallel = new SystemAssembler(space, 3, 4, 5);
    assertArrayEquals(serial.newMatrix().cols(), parallel.newMatrix().cols());
    double[] tensor = TestMeshes.uniformTensor(mesh, T);
    double[] coef = coefficients(mesh);
    for (SystemAssembler a : new SystemAssembler[] {serial, parallel}) {
      assertTrue(a.colourCount() > 1);
    }
    CsrMatrix k1 = serial.newMatrix();
    CsrMatrix k2 = parallel.newMatrix();
    serial.addStiffness(k1, tensor, 1.0);
    parallel.addStiffness(k2, tensor, 1.0);
    serial.addCapacity(k1, coef, false, 0.5);
    parallel.addCapacity(k2, coef, false, 0.5);
    // colour order fixes the order of additions: bit for bit (not just close)
    assertArrayEquals(k1.values(), k2.values(), 0.0);
    double[] f1 = new double[mesh.nodeCount()];
    double[] f2 = new double[mesh.nodeCount()];
    serial.addVolumeLoad(f1, coef, 1.0);
    parallel.addVolumeLoad(f2, coef, 1.0);
    assertArrayEquals(f1, f2, 0.0);
  }

  @ParameterizedTest
  @ValueSource(ints = {1, 2})
  void colouredAssemblyMatchesAPlainElementLoop(int order) {
    TetMesh mesh = StructuredMesher.box(1, 1, 1, 4, 4, 3, order);
    FeSpace space = FeSpace.of(mesh);
    SystemAssembler a = new SystemAssembler(space, 2, 4, 3);
    CsrMatrix k = a.newMatrix();
    double[] tensor = TestMeshes.uniformTensor(mesh, T);
    a.addStiffness(k, tensor, 1.0);
    // reference: tets in index order, each entry found by search (common practice)
    CsrMatrix ref = a.newMatrix();
    int n = mesh.nodesPerTet();
    TetKernel kernel = TetKernel.forOrder(order);
    double[] x = new double[3 * n];
    double[] ke = new double[n * n];
    for (int t = 0; t < mesh.tetCount(); t++) {
      for (int i = 0; i < n; i++) {
        for (int axis = 0; axis < 3; axis++) {
          x[3 * i + axis] = mesh.coord(mesh.tetNode(t, i), axis);
        }
      }
      kernel.stiffness(x, tensor, 6 * t, ke);
      for (int i = 0; i < n; i++) {
        for (int j = 0; j < n; j++) {
          int p = ref.indexOf(mesh.tetNode(t, i), mesh.tetNode(t, j));
          ref.values()[p] += ke[n * i + j];
        }
      }
    }
    double scale = TestMeshes.maxAbs(ref.values());
    assertArrayEquals(ref.values(), k.values(), 1e-14 * scale);
  }

  @ParameterizedTest
  @ValueSource(ints = {1, 2})
  void noTwoBlocksOfOneColourShareANode(int order) {
    TetMesh mesh = StructuredMesher.box(1, 1, 1, 4, 3, 3, order);
    int per = mesh.nodesPerTet();
    TetColouring colouring = TetColouring.of(mesh.copyTets(), per, mesh.nodeCount(), 7);
    int[] lastColour = new int[mesh.nodeCount()];
    int[] lastBlock = new int[mesh.nodeCount()];
    Arrays.fill(lastColour, -1);
    boolean[] seen = new boolean[mesh.tetCount()];
    int blocks = 0;
    for (int c = 0; c < colouring.colourCount(); c++) {
      for (int k = colouring.colourStart(c); k < colouring.colourStart(c + 1); k++) {
        int b = colouring.block(k);
        blocks++;
        for (int t = colouring.firstTet(b); t < colouring.endTet(b); t++) {
          assertTrue(!seen[t], "tet listed twice");
          seen[t] = true;
          for (int i = 0; i < per; i++) {
            int node = mesh.tetNode(t, i);
            assertTrue(
                lastColour[node] != c || lastBlock[node] == b,
                "colour " + c + " has two blocks on node " + node);
            lastColour[node] = c;
            lastBlock[node] = b;
          }
        }
      }
    }
    // 216 tets in blocks of 7; every tet listed once
    assertEquals((mesh.tetCount() + 6) / 7, blocks);
    for (boolean s : seen) {
      assertTrue(s);
    }
    assertTrue(colouring.colourCount() > 1);
  }
}
