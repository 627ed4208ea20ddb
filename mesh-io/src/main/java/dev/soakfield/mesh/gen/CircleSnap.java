package dev.soakfield.mesh.gen;

import dev.soakfield.mesh.TetMesh;

/**
 * Moves the mid-edge nodes of a quadratic round part onto its curved surface: a mid-edge node whose
 * edge has both ends at radius rho (about the z axis) is pushed radially out to rho, its z kept.
 * Edges joining two nodes of one circle wall all lie in that wall's faces, so only boundary edges
 * move.
 */
final class CircleSnap {
  /** Relative radius tolerance for "on the circle": far below any cell size, far above rounding. */
  private static final double TOLERANCE = 1e-9;

  private CircleSnap() {}

  static TetMesh snap(TetMesh quadratic, double... radii) {
    double[] xyz = quadratic.copyCoordinates();
    int tetCount = quadratic.tetCount();
    for (int t = 0; t < tetCount; t++) {
      for (int k = 0; k < 6; k++) {
        int a = quadratic.tetNode(t, MidEdgeNodes.TET_EDGES[k][0]);
        int b = quadratic.tetNode(t, MidEdgeNodes.TET_EDGES[k][1]);
        int mid = quadratic.tetNode(t, 4 + k);
        for (double rho : radii) {
          if (onCircle(xyz, a, rho) && onCircle(xyz, b, rho)) {
            double x = xyz[3 * mid];
            double y = xyz[3 * mid + 1];
            double scale = rho / Math.hypot(x, y);
            xyz[3 * mid] = x * scale;
            xyz[3 * mid + 1] = y * scale;
          }
        }
      }
    }
    return new TetMesh.Builder()
        .nodes(xyz)
        .order(2)
        .tets(quadratic.copyTets(), quadratic.copyTetGroups())
        .faces(quadratic.copyFaces(), quadratic.copyFaceGroups())
        .volumeGroups(quadratic.volumeGroups())
        .faceGroups(quadratic.faceGroups())
        .build();
  }

  private static boolean onCircle(double[] xyz, int node, double rho) {
    return Math.abs(Math.hypot(xyz[3 * node], xyz[3 * node + 1]) - rho) <= TOLERANCE * rho;
  }
}
