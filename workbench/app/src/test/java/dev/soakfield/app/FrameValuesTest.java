package dev.soakfield.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.mesh.gen.StructuredMesher;
import org.junit.jupiter.api.Test;

/** A per-element field spread to the nodes for cuts and isosurfaces. */
class FrameValuesTest {
  @Test
  void aNodeTakesTheVolumeWeightedMeanOfItsTetrahedra() {
    // a 2×1×1 box of six tetrahedra per cell: the left cell's tetrahedra hold 1, the right's 4
    PartGeometry g = PartGeometry.of(StructuredMesher.box(2, 1, 1, 2, 1, 1, 1));
    double[] perTet = new double[g.tetCount()];
    double[] xyz = g.coordinates();
    int[] tets = g.connectivity();
    for (int t = 0; t < perTet.length; t++) {
      double cx = 0;
      for (int k = 0; k < 4; k++) {
        cx += xyz[3 * tets[4 * t + k]] / 4;
      }
      perTet[t] = cx < 1 ? 1 : 4;
    }
    double[] nodal = FrameValues.spreadToNodes(perTet, g);
    for (int n = 0; n < g.nodeCount(); n++) {
      double x = xyz[3 * n];
      // a node of one cell only takes that cell's value; one on the middle plane lies between
      double expected = x < 0.5 ? 1 : x > 1.5 ? 4 : Double.NaN;
      if (!Double.isNaN(expected)) {
        assertEquals(expected, nodal[n], 1e-12, "node at x = " + x);
      } else {
        assertTrue(nodal[n] > 1.01 && nodal[n] < 3.99, "a middle node mixes both: " + nodal[n]);
      }
    }
  }
}
