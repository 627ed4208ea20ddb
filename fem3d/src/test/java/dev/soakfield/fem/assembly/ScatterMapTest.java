package dev.soakfield.fem.assembly;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Both ways of keeping an entry's place (an offset byte within its row, or its position as an int)
 * put every element entry where a search of the pattern finds it.
 */
class ScatterMapTest {
  @ParameterizedTest
  @ValueSource(ints = {1, 2})
  void byteOffsetsAndIntPositionsFindTheSameEntries(int order) {
    TetMesh mesh = StructuredMesher.box(1, 1, 1, 3, 2, 2, order);
    FeSpace space = FeSpace.of(mesh);
    CsrMatrix pattern = SparsityPattern.build(space, 1, 1);
    int per = space.nodesPerTet();
    int[] conn = space.tetNodes();
    ScatterMap bytes = ScatterMap.build(pattern, conn, per, 2, 1, 256);
    ScatterMap ints = ScatterMap.build(pattern, conn, per, 2, 1, 0);
    double[] ke = new double[per * per];
    for (int t = 0; t < mesh.tetCount(); t++) {
      for (int e = 0; e < ke.length; e++) {
        ke[e] = 1 + e + 100 * t; // a different value at every place, so a misplaced one shows
      }
      CsrMatrix viaBytes = pattern.zeroCopy();
      CsrMatrix viaInts = pattern.zeroCopy();
      bytes.add(viaBytes.values(), t, ke, 2.0);
      ints.add(viaInts.values(), t, ke, 2.0);
      for (int i = 0; i < per; i++) {
        for (int j = 0; j < per; j++) {
          int row = conn[t * per + i];
          int col = conn[t * per + j];
          // each (row, col) of a tetrahedron is distinct: the entry holds exactly its own value
          assertEquals(2.0 * ke[i * per + j], viaBytes.get(row, col), 0.0);
          assertEquals(2.0 * ke[i * per + j], viaInts.get(row, col), 0.0);
        }
      }
      CsrMatrix diagonal = pattern.zeroCopy();
      bytes.addDiagonal(diagonal.values(), t, ke, 1.0);
      for (int i = 0; i < per; i++) {
        int node = conn[t * per + i];
        assertEquals(ke[i], diagonal.get(node, node), 0.0);
      }
    }
  }
}
