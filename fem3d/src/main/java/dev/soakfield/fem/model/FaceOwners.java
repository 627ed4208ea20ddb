package dev.soakfield.fem.model;

import dev.soakfield.mesh.TetMesh;

/** The tetrahedron each face of a mesh belongs to (for interface faces: the lower-numbered one). */
public final class FaceOwners {
  private FaceOwners() {}

  /** Owner tet per face, found through node-to-tet incidence (linear time, no hashing). */
  public static int[] of(TetMesh mesh) {
    int n = mesh.nodeCount();
    int[] start = new int[n + 1];
    for (int t = 0; t < mesh.tetCount(); t++) {
      for (int k = 0; k < 4; k++) {
        start[mesh.tetNode(t, k) + 1]++;
      }
    }
    for (int v = 0; v < n; v++) {
      start[v + 1] += start[v];
    }
    int[] tetsOf = new int[start[n]];
    int[] fill = java.util.Arrays.copyOf(start, n);
    for (int t = 0; t < mesh.tetCount(); t++) {
      for (int k = 0; k < 4; k++) {
        tetsOf[fill[mesh.tetNode(t, k)]++] = t; // ascending per node
      }
    }
    int[] owner = new int[mesh.faceCount()];
    for (int f = 0; f < owner.length; f++) {
      int a = mesh.faceNode(f, 0);
      int b = mesh.faceNode(f, 1);
      int c = mesh.faceNode(f, 2);
      owner[f] = -1;
      for (int p = start[a]; p < start[a + 1] && owner[f] < 0; p++) {
        int t = tetsOf[p];
        if (hasCorner(mesh, t, b) && hasCorner(mesh, t, c)) {
          owner[f] = t;
        }
      }
      if (owner[f] < 0) {
        throw new IllegalArgumentException("face " + f + " lies on no tetrahedron");
      }
    }
    return owner;
  }

  private static boolean hasCorner(TetMesh mesh, int t, int v) {
    return mesh.tetNode(t, 0) == v
        || mesh.tetNode(t, 1) == v
        || mesh.tetNode(t, 2) == v
        || mesh.tetNode(t, 3) == v;
  }
}
