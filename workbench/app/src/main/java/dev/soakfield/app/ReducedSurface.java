package dev.soakfield.app;

/**
 * A coarse copy of a surface for drawing while the view moves: vertex clustering (J. Rossignac, P.
 * Borrel, "Multi-resolution 3D approximations for rendering complex scenes", 1993). Corners are
 * gathered into the cells of a uniform grid over the bounding box and replaced by their cell's
 * mean; triangles whose corners fall into fewer than three cells vanish. Colours and ramp values
 * are averaged the same way, so the picture keeps its look at a fraction of the triangles.
 */
public final class ReducedSurface {
  private ReducedSurface() {}

  /** The clustered surface on a grid of {@code cells} cells along the longest side. */
  public static Scene.Mesh of(Scene.Mesh full, int cells) {
    float[] p = full.positions;
    int corners = p.length / 3;
    if (corners == 0) {
      return full;
    }
    float[] lo = {Float.MAX_VALUE, Float.MAX_VALUE, Float.MAX_VALUE};
    float[] hi = {-Float.MAX_VALUE, -Float.MAX_VALUE, -Float.MAX_VALUE};
    for (int i = 0; i < corners; i++) {
      for (int k = 0; k < 3; k++) {
        lo[k] = Math.min(lo[k], p[3 * i + k]);
        hi[k] = Math.max(hi[k], p[3 * i + k]);
      }
    }
    float size = Math.max(hi[0] - lo[0], Math.max(hi[1] - lo[1], hi[2] - lo[2]));
    float h = size / cells;
    if (!(h > 0)) {
      return full;
    }
    int[] n = new int[3];
    for (int k = 0; k < 3; k++) {
      n[k] = Math.max(1, (int) Math.ceil((hi[k] - lo[k]) / h) + 1);
    }
    int total = n[0] * n[1] * n[2];
    float[] sum = new float[3 * total];
    float[] colour = new float[3 * total];
    float[] ramp = new float[total];
    int[] count = new int[total];
    int[] cellOf = new int[corners];
    for (int i = 0; i < corners; i++) {
      int ix = (int) ((p[3 * i] - lo[0]) / h);
      int iy = (int) ((p[3 * i + 1] - lo[1]) / h);
      int iz = (int) ((p[3 * i + 2] - lo[2]) / h);
      int c = ix + n[0] * (iy + n[1] * iz);
      cellOf[i] = c;
      count[c]++;
      ramp[c] += full.ramp[i];
      for (int k = 0; k < 3; k++) {
        sum[3 * c + k] += p[3 * i + k];
        colour[3 * c + k] += full.colours[3 * i + k];
      }
    }
    int kept = 0;
    for (int t = 0; t < corners / 3; t++) {
      int a = cellOf[3 * t];
      int b = cellOf[3 * t + 1];
      int c = cellOf[3 * t + 2];
      if (a != b && b != c && a != c) {
        kept++;
      }
    }
    double[] pos = new double[9 * kept];
    float[] col = new float[9 * kept];
    float[] rmp = new float[3 * kept];
    int o = 0;
    for (int t = 0; t < corners / 3; t++) {
      int a = cellOf[3 * t];
      int b = cellOf[3 * t + 1];
      int c = cellOf[3 * t + 2];
      if (a == b || b == c || a == c) {
        continue;
      }
      for (int cell : new int[] {a, b, c}) {
        for (int k = 0; k < 3; k++) {
          pos[3 * o + k] = sum[3 * cell + k] / count[cell];
          col[3 * o + k] = colour[3 * cell + k] / count[cell];
        }
        rmp[o] = ramp[cell] / count[cell];
        o++;
      }
    }
    float[] fp = new float[pos.length];
    for (int i = 0; i < pos.length; i++) {
      fp[i] = (float) pos[i];
    }
    return new Scene.Mesh(fp, Scene.flatNormals(pos), col, rmp);
  }
}
