package dev.soakfield.app;

import java.util.Optional;

/**
 * Ray picking against triangles: a bounding-volume hierarchy (axis-aligned boxes, split at the
 * median of the longest axis down to a few triangles a leaf), walked nearest box first, with the
 * Möller–Trumbore ray–triangle test (T. Möller, B. Trumbore, "Fast, minimum storage ray-triangle
 * intersection", J. Graphics Tools 2(1), 1997). Building is O(n log n); a pick visits a few dozen
 * boxes even on surfaces of millions of triangles.
 */
public final class PickIndex {
  private static final int LEAF = 4;

  /** Barycentric slack, so a ray through a shared edge or corner hits one of its triangles. */
  private static final double EDGE = 1e-9;

  /** The nearest triangle a ray meets and the ray parameter there. */
  public record Hit(int triangle, double distance) {}

  private final double[] tri; // 9 a triangle
  private final int[] order; // triangle ids, grouped by leaf
  private final double[] box; // 6 a node: min xyz, max xyz
  private final int[] child; // 2 a node: left, right (or -1, -1 for a leaf)
  private final int[] range; // 2 a node: first, end in order
  private int nodes;

  /** Indexes the triangles' corners, 9 numbers a triangle (copied). */
  public PickIndex(double[] corners) {
    this.tri = corners.clone();
    int n = corners.length / 9;
    this.order = new int[n];
    for (int i = 0; i < n; i++) {
      order[i] = i;
    }
    int cap = 2 * n + 1; // a binary tree with at most n leaves
    box = new double[6 * cap];
    child = new int[2 * cap];
    range = new int[2 * cap];
    double[] centre = new double[3 * n];
    for (int i = 0; i < n; i++) {
      for (int k = 0; k < 3; k++) {
        centre[3 * i + k] = (tri[9 * i + k] + tri[9 * i + 3 + k] + tri[9 * i + 6 + k]) / 3;
      }
    }
    build(0, n, centre);
  }

  /** The surface's triangles as corners: 9 numbers a triangle. */
  public static double[] corners(BoundarySurface s, double[] xyz) {
    double[] c = new double[9 * s.triangleCount()];
    for (int t = 0; t < s.triangleCount(); t++) {
      for (int k = 0; k < 3; k++) {
        System.arraycopy(xyz, 3 * s.node(t, k), c, 9 * t + 3 * k, 3);
      }
    }
    return c;
  }

  private int build(int first, int end, double[] centre) {
    int id = nodes++;
    double[] b = {
      Double.POSITIVE_INFINITY,
      Double.POSITIVE_INFINITY,
      Double.POSITIVE_INFINITY,
      Double.NEGATIVE_INFINITY,
      Double.NEGATIVE_INFINITY,
      Double.NEGATIVE_INFINITY
    };
    for (int i = first; i < end; i++) {
      int t = order[i];
      for (int c = 0; c < 3; c++) {
        for (int k = 0; k < 3; k++) {
          double v = tri[9 * t + 3 * c + k];
          b[k] = Math.min(b[k], v);
          b[3 + k] = Math.max(b[3 + k], v);
        }
      }
    }
    System.arraycopy(b, 0, box, 6 * id, 6);
    range[2 * id] = first;
    range[2 * id + 1] = end;
    if (end - first <= LEAF) {
      child[2 * id] = -1;
      child[2 * id + 1] = -1;
      return id;
    }
    int axis = 0;
    for (int k = 1; k < 3; k++) {
      if (b[3 + k] - b[k] > b[3 + axis] - b[axis]) {
        axis = k;
      }
    }
    int mid = (first + end) >>> 1;
    select(first, end - 1, mid, axis, centre);
    int left = build(first, mid, centre);
    int right = build(mid, end, centre);
    child[2 * id] = left;
    child[2 * id + 1] = right;
    return id;
  }

  /** Quickselect on the triangles' centres along {@code axis}, so that {@code k} is in place. */
  private void select(int lo, int hi, int k, int axis, double[] centre) {
    while (hi > lo) {
      double pivot = centre[3 * order[(lo + hi) >>> 1] + axis];
      int i = lo;
      int j = hi;
      while (i <= j) {
        while (centre[3 * order[i] + axis] < pivot) {
          i++;
        }
        while (centre[3 * order[j] + axis] > pivot) {
          j--;
        }
        if (i <= j) {
          int tmp = order[i];
          order[i] = order[j];
          order[j] = tmp;
          i++;
          j--;
        }
      }
      if (k <= j) {
        hi = j;
      } else if (k >= i) {
        lo = i;
      } else {
        return;
      }
    }
  }

  /** The nearest triangle the ray origin + s·dir (s > 0) meets, if any. */
  public Optional<Hit> pick(double ox, double oy, double oz, double dx, double dy, double dz) {
    if (order.length == 0) {
      return Optional.empty();
    }
    double ix = 1 / dx;
    double iy = 1 / dy;
    double iz = 1 / dz;
    int[] stack = new int[128];
    int top = 0;
    stack[top++] = 0;
    double best = Double.POSITIVE_INFINITY;
    int bestTri = -1;
    while (top > 0) {
      int node = stack[--top];
      double enter = slab(node, ox, oy, oz, ix, iy, iz);
      if (!(enter < best)) {
        continue;
      }
      if (child[2 * node] < 0) {
        for (int i = range[2 * node]; i < range[2 * node + 1]; i++) {
          double s = intersect(order[i], ox, oy, oz, dx, dy, dz);
          if (s > 0 && s < best) {
            best = s;
            bestTri = order[i];
          }
        }
      } else {
        int l = child[2 * node];
        int r = child[2 * node + 1];
        double el = slab(l, ox, oy, oz, ix, iy, iz);
        double er = slab(r, ox, oy, oz, ix, iy, iz);
        // push the farther first so the nearer is walked first
        if (el < er) {
          stack[top++] = r;
          stack[top++] = l;
        } else {
          stack[top++] = l;
          stack[top++] = r;
        }
      }
    }
    return bestTri < 0 ? Optional.empty() : Optional.of(new Hit(bestTri, best));
  }

  /** Ray parameter where the ray enters the node's box, or +∞ if it misses. */
  private double slab(int node, double ox, double oy, double oz, double ix, double iy, double iz) {
    int o = 6 * node;
    double t0 = 0;
    double t1 = Double.POSITIVE_INFINITY;
    double a = (box[o] - ox) * ix;
    double b = (box[o + 3] - ox) * ix;
    t0 = Math.max(t0, Math.min(a, b));
    t1 = Math.min(t1, Math.max(a, b));
    a = (box[o + 1] - oy) * iy;
    b = (box[o + 4] - oy) * iy;
    t0 = Math.max(t0, Math.min(a, b));
    t1 = Math.min(t1, Math.max(a, b));
    a = (box[o + 2] - oz) * iz;
    b = (box[o + 5] - oz) * iz;
    t0 = Math.max(t0, Math.min(a, b));
    t1 = Math.min(t1, Math.max(a, b));
    return t0 <= t1 ? t0 : Double.POSITIVE_INFINITY;
  }

  private double intersect(
      int t, double ox, double oy, double oz, double dx, double dy, double dz) {
    int o = 9 * t;
    double e1x = tri[o + 3] - tri[o];
    double e1y = tri[o + 4] - tri[o + 1];
    double e1z = tri[o + 5] - tri[o + 2];
    double e2x = tri[o + 6] - tri[o];
    double e2y = tri[o + 7] - tri[o + 1];
    double e2z = tri[o + 8] - tri[o + 2];
    double px = dy * e2z - dz * e2y;
    double py = dz * e2x - dx * e2z;
    double pz = dx * e2y - dy * e2x;
    double det = e1x * px + e1y * py + e1z * pz;
    if (Math.abs(det) < 1e-300) {
      return -1;
    }
    double inv = 1 / det;
    double sx = ox - tri[o];
    double sy = oy - tri[o + 1];
    double sz = oz - tri[o + 2];
    double u = (sx * px + sy * py + sz * pz) * inv;
    if (u < -EDGE || u > 1 + EDGE) {
      return -1;
    }
    double qx = sy * e1z - sz * e1y;
    double qy = sz * e1x - sx * e1z;
    double qz = sx * e1y - sy * e1x;
    double v = (dx * qx + dy * qy + dz * qz) * inv;
    if (v < -EDGE || u + v > 1 + EDGE) {
      return -1;
    }
    return (e2x * qx + e2y * qy + e2z * qz) * inv;
  }
}
