package dev.soakfield.app;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;

import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * With every part shown, the surface comes from the exterior face groups; it must be the very
 * faces, in the very order, that matching every tetrahedron face finds, and a mesh whose groups
 * leave the outside open must fall back to the matching.
 */
class BoundarySurfaceTest {
  private static final boolean[] ALL = {true, true};

  @Test
  void theExteriorGroupsGiveTheFacesMatchingFinds() {
    for (TetMesh m :
        List.of(
            StructuredMesher.box(0.3, 0.2, 0.1, 5, 4, 3, 1),
            StructuredMesher.box(0.3, 0.2, 0.1, 3, 2, 2, 2),
            StructuredMesher.layers(
                0.2,
                0.1,
                3,
                2,
                List.of(
                    new StructuredMesher.Layer("lower", 0.1, 2),
                    new StructuredMesher.Layer("upper", 0.05, 1)),
                1))) {
      PartGeometry g = PartGeometry.of(m);
      int[] fast = BoundarySurface.exteriorFaces(g, g.nodesPerTet);
      assertNotNull(fast, "the generated meshes' groups cover their outside");
      assertArrayEquals(BoundarySurface.unsharedFaces(g, ALL, g.nodesPerTet), fast);
    }
  }

  @Test
  void groupsThatLeaveTheOutsideOpenFallBackToMatching() {
    TetMesh whole = StructuredMesher.box(0.3, 0.2, 0.1, 4, 3, 2, 1);
    PartGeometry g = PartGeometry.of(whole);
    // the same mesh with the xmin group's faces moved into an interface-kind group: the exterior
    // groups then leave the xmin side open
    int xmin = g.faceGroupNames().indexOf("xmin");
    boolean[] exterior = g.exteriorGroup.clone();
    g.exteriorGroup[xmin] = false;
    try {
      assertNull(BoundarySurface.exteriorFaces(g, g.nodesPerTet), "an open outside is refused");
      BoundarySurface s = BoundarySurface.of(g, ALL);
      // negative control of the fallback: the surface still has the xmin side (2 triangles per cell
      // face: 2·(4·3 + 4·2 + 3·2) cell faces)
      int[] groups = new int[s.triangleCount()];
      for (int t = 0; t < groups.length; t++) {
        groups[t] = s.faceGroup(t);
      }
      assertEquals(2 * 2 * (12 + 8 + 6), s.triangleCount());
      assertEquals(2 * 3 * 2, Arrays.stream(groups).filter(x -> x == xmin).count());
    } finally {
      System.arraycopy(exterior, 0, g.exteriorGroup, 0, exterior.length);
    }
  }
}
