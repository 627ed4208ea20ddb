package dev.soakfield.mesh.topo;

/**
 * Local faces of a positively oriented tetrahedron (MSH node order) and how to reverse one. Local
 * face f is the face opposite corner f; its nodes are listed so that its right-hand normal points
 * out of the tetrahedron, corners first, then (for 10-node tetrahedra) the mid-edge nodes on the
 * face's edges (0,1), (1,2), (2,0) as a 6-node triangle wants them.
 */
final class TetFaces {
  /**
   * Outward node lists of the four local faces. Mid-edge nodes of a 10-node tetrahedron sit on
   * edges (0,1)=4, (1,2)=5, (2,0)=6, (3,0)=7, (3,2)=8, (3,1)=9.
   */
  private static final int[][] FACE_NODES = {
    {1, 2, 3, 5, 8, 9}, {0, 3, 2, 7, 8, 6}, {0, 1, 3, 4, 9, 7}, {0, 2, 1, 6, 5, 4}
  };

  private TetFaces() {}

  /** Local node number of node {@code k} (0..5) of local face {@code face}. */
  static int localNode(int face, int k) {
    return FACE_NODES[face][k];
  }

  /**
   * Writes the outward node list of tetrahedron face {@code ref} (= 4 * tet + local face) into
   * {@code out} from {@code at}: 3 nodes for 4-node tetrahedra, 6 for 10-node ones.
   */
  static void writeOutward(int[] tets, int nodesPerTet, int ref, int[] out, int at) {
    int base = (ref >>> 2) * nodesPerTet;
    int[] local = FACE_NODES[ref & 3];
    int count = nodesPerTet == 4 ? 3 : 6;
    for (int k = 0; k < count; k++) {
      out[at + k] = tets[base + local[k]];
    }
  }

  /** Corner {@code k} (0..2) of tetrahedron face {@code ref}, outward order. */
  static int corner(int[] tets, int nodesPerTet, int ref, int k) {
    return tets[(ref >>> 2) * nodesPerTet + FACE_NODES[ref & 3][k]];
  }

  /**
   * Reverses the orientation of tetrahedron {@code tet} by swapping corners 1 and 2; for a 10-node
   * tetrahedron the mid-edge nodes follow: (0,1) trades with (2,0), (3,2) with (3,1), and (1,2)
   * stays.
   */
  static void reverse(int[] tets, int nodesPerTet, int tet) {
    int base = tet * nodesPerTet;
    swap(tets, base + 1, base + 2);
    if (nodesPerTet == 10) {
      swap(tets, base + 4, base + 6);
      swap(tets, base + 8, base + 9);
    }
  }

  private static void swap(int[] a, int i, int j) {
    int t = a[i];
    a[i] = a[j];
    a[j] = t;
  }
}
