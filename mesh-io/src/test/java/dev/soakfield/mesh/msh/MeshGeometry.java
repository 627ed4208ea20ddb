package dev.soakfield.mesh.msh;

import dev.soakfield.mesh.RawMesh;

/** Exact-geometry helpers for the tests: signed tetrahedron volumes and triangle areas. */
final class MeshGeometry {
  private MeshGeometry() {}

  /** Signed volume det(b - a, c - a, d - a) / 6 of tetrahedron {@code t} (corners only). */
  static double tetVolume(RawMesh m, int t) {
    int per = m.order == 1 ? 4 : 10;
    double[] p = new double[12];
    for (int k = 0; k < 4; k++) {
      for (int a = 0; a < 3; a++) {
        p[3 * k + a] = m.xyz[3 * m.tets[per * t + k] + a];
      }
    }
    double[] u = {p[3] - p[0], p[4] - p[1], p[5] - p[2]};
    double[] v = {p[6] - p[0], p[7] - p[1], p[8] - p[2]};
    double[] w = {p[9] - p[0], p[10] - p[1], p[11] - p[2]};
    return (u[0] * (v[1] * w[2] - v[2] * w[1])
            - u[1] * (v[0] * w[2] - v[2] * w[0])
            + u[2] * (v[0] * w[1] - v[1] * w[0]))
        / 6;
  }

  /** Area |(b - a) x (c - a)| / 2 of triangle {@code f} (corners only). */
  static double triArea(RawMesh m, int f) {
    int per = m.order == 1 ? 3 : 6;
    double[] p = new double[9];
    for (int k = 0; k < 3; k++) {
      for (int a = 0; a < 3; a++) {
        p[3 * k + a] = m.xyz[3 * m.tris[per * f + k] + a];
      }
    }
    double ux = p[3] - p[0];
    double uy = p[4] - p[1];
    double uz = p[5] - p[2];
    double vx = p[6] - p[0];
    double vy = p[7] - p[1];
    double vz = p[8] - p[2];
    double cx = uy * vz - uz * vy;
    double cy = uz * vx - ux * vz;
    double cz = ux * vy - uy * vx;
    return Math.sqrt(cx * cx + cy * cy + cz * cz) / 2;
  }
}
