package dev.soakfield.mesh.topo;

/**
 * Shape kernels of straight-sided tetrahedra and triangles, on a packed coordinate array (x0, y0,
 * z0, x1, ...) and node indices. Unchecked: callers pass valid indices.
 */
final class TetShape {
  /**
   * A tetrahedron is flat when |V| < this times the cube of its longest edge. A regular tetrahedron
   * has V / l^3 = 1/(6 sqrt 2) = 0.118, so this is 1e-11 of a perfect element, far below anything a
   * mesher makes on purpose; yet it is above the round-off of the determinant (about 3 eps R / l
   * relative, eps = 2.2e-16) for parts up to about 1000 element sizes R from the origin, so
   * arithmetic noise on a flat element is still caught.
   */
  static final double FLAT_RELATIVE_VOLUME = 1e-12;

  /**
   * A triangle has no usable normal when |cross product| <= this times its longest edge squared;
   * same reasoning as {@link #FLAT_RELATIVE_VOLUME}.
   */
  static final double FLAT_RELATIVE_AREA = 1e-12;

  /** 6 sqrt 2: makes the volume ratio of a regular tetrahedron exactly 1. */
  private static final double RATIO_NORMALIZATION = 6.0 * Math.sqrt(2.0);

  /** For each of the six dihedral angles (edges in MSH mid-node order), the two faces meeting. */
  private static final int[][] EDGE_FACES = {{2, 3}, {0, 3}, {1, 3}, {1, 2}, {0, 1}, {0, 2}};

  private TetShape() {}

  /** Signed volume: positive when d lies on the side of a-b-c its right-hand normal points to. */
  static double signedVolume(double[] xyz, int a, int b, int c, int d) {
    double ax = xyz[3 * a];
    double ay = xyz[3 * a + 1];
    double az = xyz[3 * a + 2];
    double ux = xyz[3 * b] - ax;
    double uy = xyz[3 * b + 1] - ay;
    double uz = xyz[3 * b + 2] - az;
    double vx = xyz[3 * c] - ax;
    double vy = xyz[3 * c + 1] - ay;
    double vz = xyz[3 * c + 2] - az;
    double wx = xyz[3 * d] - ax;
    double wy = xyz[3 * d + 1] - ay;
    double wz = xyz[3 * d + 2] - az;
    return (ux * (vy * wz - vz * wy) + uy * (vz * wx - vx * wz) + uz * (vx * wy - vy * wx)) / 6.0;
  }

  static double squaredDistance(double[] xyz, int i, int j) {
    double dx = xyz[3 * j] - xyz[3 * i];
    double dy = xyz[3 * j + 1] - xyz[3 * i + 1];
    double dz = xyz[3 * j + 2] - xyz[3 * i + 2];
    return dx * dx + dy * dy + dz * dz;
  }

  static double longestEdgeSquared(double[] xyz, int a, int b, int c, int d) {
    double m = squaredDistance(xyz, a, b);
    m = Math.max(m, squaredDistance(xyz, a, c));
    m = Math.max(m, squaredDistance(xyz, a, d));
    m = Math.max(m, squaredDistance(xyz, b, c));
    m = Math.max(m, squaredDistance(xyz, b, d));
    return Math.max(m, squaredDistance(xyz, c, d));
  }

  /** True when the tetrahedron is flat in the sense of {@link #FLAT_RELATIVE_VOLUME}. */
  static boolean isFlat(double[] xyz, int a, int b, int c, int d, double signedVolume) {
    double l2 = longestEdgeSquared(xyz, a, b, c, d);
    return Math.abs(signedVolume) < FLAT_RELATIVE_VOLUME * l2 * Math.sqrt(l2) || l2 == 0.0;
  }

  /**
   * Volume ratio 6 sqrt(2) V / l_rms^3 with l_rms the root mean square of the six edge lengths: 1
   * for the regular tetrahedron, 0 for a flat one, negative for an inverted one. (From memory: the
   * volume-length measure V / l_rms^3 listed among tetrahedron quality measures in J. R. Shewchuk,
   * "What Is a Good Linear Finite Element?", 2002; normalized here to 1.)
   */
  static double volumeRatio(double[] xyz, int a, int b, int c, int d) {
    double sum =
        squaredDistance(xyz, a, b)
            + squaredDistance(xyz, a, c)
            + squaredDistance(xyz, a, d)
            + squaredDistance(xyz, b, c)
            + squaredDistance(xyz, b, d)
            + squaredDistance(xyz, c, d);
    if (sum == 0.0) {
      return 0.0;
    }
    double rms = Math.sqrt(sum / 6.0);
    return RATIO_NORMALIZATION * signedVolume(xyz, a, b, c, d) / (rms * rms * rms);
  }

  /** Writes (q - p) x (r - p) into out[at..at+2]: twice the area vector of triangle p-q-r. */
  static void areaVector(double[] xyz, int p, int q, int r, double[] out, int at) {
    double px = xyz[3 * p];
    double py = xyz[3 * p + 1];
    double pz = xyz[3 * p + 2];
    double ux = xyz[3 * q] - px;
    double uy = xyz[3 * q + 1] - py;
    double uz = xyz[3 * q + 2] - pz;
    double vx = xyz[3 * r] - px;
    double vy = xyz[3 * r + 1] - py;
    double vz = xyz[3 * r + 2] - pz;
    out[at] = uy * vz - uz * vy;
    out[at + 1] = uz * vx - ux * vz;
    out[at + 2] = ux * vy - uy * vx;
  }

  static double triangleArea(double[] xyz, int p, int q, int r, double[] scratch3) {
    areaVector(xyz, p, q, r, scratch3, 0);
    return 0.5 * Math.sqrt(dot(scratch3, 0, scratch3, 0));
  }

  /**
   * Unit right-hand normal of p-q-r into out[at..at+2]; false (out untouched) when the triangle is
   * too thin for a normal in the sense of {@link #FLAT_RELATIVE_AREA}.
   */
  static boolean unitNormal(double[] xyz, int p, int q, int r, double[] out, int at) {
    areaVector(xyz, p, q, r, out, at);
    double len = Math.sqrt(dot(out, at, out, at));
    double l2 =
        Math.max(
            squaredDistance(xyz, p, q),
            Math.max(squaredDistance(xyz, q, r), squaredDistance(xyz, r, p)));
    if (!(len > FLAT_RELATIVE_AREA * l2)) {
      return false;
    }
    out[at] /= len;
    out[at + 1] /= len;
    out[at + 2] /= len;
    return true;
  }

  /**
   * The six dihedral angles in degrees, at edges (0,1), (1,2), (2,0), (3,0), (3,2), (3,1), into
   * {@code out}; independent of the orientation. Returns false when a face has zero area (the
   * angles are undefined); {@code scratch} holds 16 doubles.
   */
  static boolean dihedralAnglesDeg(
      double[] xyz, int a, int b, int c, int d, double[] scratch, double[] out) {
    if (!dihedralCosines(xyz, a, b, c, d, scratch, out)) {
      return false;
    }
    for (int k = 0; k < 6; k++) {
      out[k] = cosineToDegrees(out[k]);
    }
    return true;
  }

  /** The angle in degrees whose cosine is {@code cos} (clamped to [-1, 1] against round-off). */
  static double cosineToDegrees(double cos) {
    return Math.toDegrees(Math.acos(Math.max(-1.0, Math.min(1.0, cos))));
  }

  /**
   * Cosines of the six dihedral angles, in the edge order of {@link #dihedralAnglesDeg}: what the
   * quality scan needs, since the smallest angle has the largest cosine and no arc cosine is taken
   * per tetrahedron. Returns false when a face has zero area; {@code scratch} holds 16 doubles.
   */
  static boolean dihedralCosines(
      double[] xyz, int a, int b, int c, int d, double[] scratch, double[] out) {
    // Area vectors of the faces opposite corners 0..3, all outward for a positive tetrahedron.
    areaVector(xyz, b, c, d, scratch, 0);
    areaVector(xyz, a, d, c, scratch, 3);
    areaVector(xyz, a, b, d, scratch, 6);
    areaVector(xyz, a, c, b, scratch, 9);
    for (int f = 0; f < 4; f++) {
      scratch[12 + f] = Math.sqrt(dot(scratch, 3 * f, scratch, 3 * f));
      if (scratch[12 + f] == 0.0) {
        return false;
      }
    }
    for (int k = 0; k < 6; k++) {
      int f = EDGE_FACES[k][0];
      int g = EDGE_FACES[k][1];
      // The interior angle is the supplement of the angle between the outward normals.
      out[k] = -dot(scratch, 3 * f, scratch, 3 * g) / (scratch[12 + f] * scratch[12 + g]);
    }
    return true;
  }

  static double dot(double[] u, int i, double[] v, int j) {
    return u[i] * v[j] + u[i + 1] * v[j + 1] + u[i + 2] * v[j + 2];
  }
}
