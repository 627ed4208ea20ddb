package dev.soakfield.render;

import dev.soakfield.app.ColourMap;
import dev.soakfield.app.OrbitCamera;
import dev.soakfield.mesh.TetMesh;

/**
 * What a picture should show at a point: the field of a stored frame interpolated linearly inside
 * the tetrahedron holding the point (a linear mesh's own interpolation, which the renderer's
 * per-pixel ramp coordinate follows), and the ramp entry that value takes between colour limits.
 * Written for the tests from barycentric coordinates alone.
 */
public final class FieldAtPoint {
  private FieldAtPoint() {}

  /** The field at (x, y, z) of a linear mesh. */
  public static double value(TetMesh mesh, double[] field, double x, double y, double z) {
    if (mesh.order() != 1) {
      throw new IllegalArgumentException("linear meshes only");
    }
    double[] p = new double[12];
    for (int t = 0; t < mesh.tetCount(); t++) {
      for (int k = 0; k < 4; k++) {
        for (int r = 0; r < 3; r++) {
          p[3 * k + r] = mesh.coord(mesh.tetNode(t, k), r);
        }
      }
      double[] l = barycentric(p, x, y, z);
      // points come back from the GL as floats: allow their rounding
      if (l[0] >= -1e-6 && l[1] >= -1e-6 && l[2] >= -1e-6 && l[3] >= -1e-6) {
        double v = 0;
        for (int k = 0; k < 4; k++) {
          v += l[k] * field[mesh.tetNode(t, k)];
        }
        return v;
      }
    }
    throw new IllegalArgumentException("no tetrahedron holds (" + x + ", " + y + ", " + z + ")");
  }

  /**
   * The point of the plane n·x = offset that the centre of pixel (px, py) shows: a pixel's colour
   * is the field at its centre, not at the point that was projected to find the pixel.
   */
  public static double[] seenAt(OrbitCamera cam, int px, int py, double[] n, double offset) {
    double[] r = cam.ray(px + 0.5, py + 0.5);
    double s =
        (offset - (n[0] * r[0] + n[1] * r[1] + n[2] * r[2]))
            / (n[0] * r[3] + n[1] * r[4] + n[2] * r[5]);
    return new double[] {r[0] + s * r[3], r[1] + s * r[4], r[2] + s * r[5]};
  }

  /** The ramp entry (0..255) of a value between colour limits: what the picture must show. */
  public static int rampEntry(double value, double low, double high) {
    return ColourMap.index(value, low, high);
  }

  /**
   * The ramp entry whose colour, times a shading factor k, is nearest the pixel (k = 1 for a face
   * seen square on, which the renderer leaves unshaded).
   */
  public static int entryOf(int rgb, double k) {
    ColourMap map = ColourMap.ramp();
    int best = 0;
    double bestD = Double.POSITIVE_INFINITY;
    for (int i = 0; i < ColourMap.SIZE; i++) {
      double dr = k * map.channel(i, 0) - ((rgb >> 16) & 0xff);
      double dg = k * map.channel(i, 1) - ((rgb >> 8) & 0xff);
      double db = k * map.channel(i, 2) - (rgb & 0xff);
      double d = dr * dr + dg * dg + db * db;
      if (d < bestD) {
        bestD = d;
        best = i;
      }
    }
    return best;
  }

  private static double[] barycentric(double[] p, double x, double y, double z) {
    double[] a = new double[9];
    for (int k = 0; k < 3; k++) {
      for (int r = 0; r < 3; r++) {
        a[3 * r + k] = p[3 * (k + 1) + r] - p[r];
      }
    }
    double bx = x - p[0];
    double by = y - p[1];
    double bz = z - p[2];
    double det =
        a[0] * (a[4] * a[8] - a[5] * a[7])
            - a[1] * (a[3] * a[8] - a[5] * a[6])
            + a[2] * (a[3] * a[7] - a[4] * a[6]);
    // Cramer's rule for a·(l1, l2, l3) = b
    double l1 =
        (bx * (a[4] * a[8] - a[5] * a[7])
                - a[1] * (by * a[8] - a[5] * bz)
                + a[2] * (by * a[7] - a[4] * bz))
            / det;
    double l2 =
        (a[0] * (by * a[8] - a[5] * bz)
                - bx * (a[3] * a[8] - a[5] * a[6])
                + a[2] * (a[3] * bz - by * a[6]))
            / det;
    double l3 =
        (a[0] * (a[4] * bz - by * a[7])
                - a[1] * (a[3] * bz - by * a[6])
                + bx * (a[3] * a[7] - a[4] * a[6]))
            / det;
    return new double[] {1 - l1 - l2 - l3, l1, l2, l3};
  }
}
