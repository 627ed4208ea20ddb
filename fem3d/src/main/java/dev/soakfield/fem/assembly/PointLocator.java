package dev.soakfield.fem.assembly;

import dev.soakfield.fem.element.TetBasis;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.function.IntPredicate;

/**
 * Where a point lies: the containing tetrahedron and the shape-function values there, to
 * interpolate probes. A uniform bucket grid over the tetrahedra's bounding boxes (grown by the
 * tolerance) narrows the search to a few candidates.
 *
 * <p>The position inside a tetrahedron is found from its corners, which is exact for straight
 * edges; on a curved quadratic tetrahedron it is the position in the straight one with the same
 * corners. Thread-safe after construction.
 */
public final class PointLocator {
  /** Relative tolerance (to the mesh's bounding-box diagonal) for points just outside. */
  private static final double RELATIVE_TOLERANCE = 1e-9;

  private final FeSpace space;
  private final double[] xyz;
  private final int[] tets;
  private final int per;
  private final double tol;
  private final double[] min = new double[3];
  private final int[] dims = new int[3];
  private final double[] max = new double[3];
  private final double[] cell = new double[3];
  private final int[] bucketStart;
  private final int[] bucketTets;

  /** A point in a tetrahedron: its dofs and the weights that interpolate a nodal field there. */
  @SuppressWarnings("ArrayRecordComponent") // the agreed API; the arrays are copied in and out
  public record Probe(int tet, int[] dofs, double[] weights) {
    public Probe {
      Objects.requireNonNull(dofs, "dofs");
      Objects.requireNonNull(weights, "weights");
      if (dofs.length != weights.length) {
        throw new IllegalArgumentException(
            dofs.length + " dofs but " + weights.length + " weights");
      }
      dofs = dofs.clone();
      weights = weights.clone();
    }

    @Override
    public int[] dofs() {
      return dofs.clone();
    }

    @Override
    public double[] weights() {
      return weights.clone();
    }

    /** The nodal field u interpolated at the point. */
    public double value(double[] u) {
      double s = 0;
      for (int k = 0; k < dofs.length; k++) {
        s += weights[k] * u[dofs[k]];
      }
      return s;
    }
  }

  public PointLocator(FeSpace space) {
    this.space = Objects.requireNonNull(space, "space");
    this.xyz = space.coordinates();
    this.tets = space.tetNodes();
    this.per = space.nodesPerTet();
    int tetCount = tets.length / per;
    for (int a = 0; a < 3; a++) {
      min[a] = Double.POSITIVE_INFINITY;
      max[a] = Double.NEGATIVE_INFINITY;
    }
    for (int p = 0; p < xyz.length; p++) {
      min[p % 3] = Math.min(min[p % 3], xyz[p]);
      max[p % 3] = Math.max(max[p % 3], xyz[p]);
    }
    double diag = Math.sqrt(sq(max[0] - min[0]) + sq(max[1] - min[1]) + sq(max[2] - min[2]));
    this.tol = RELATIVE_TOLERANCE * diag;
    for (int a = 0; a < 3; a++) {
      min[a] -= tol;
      max[a] += tol;
    }
    // About one bucket per two tetrahedra, cubic buckets.
    double box = (max[0] - min[0]) * (max[1] - min[1]) * (max[2] - min[2]);
    double side = Math.cbrt(box / Math.max(1, tetCount / 2));
    long limit = 2L * tetCount + 8;
    while (true) {
      long product = 1;
      for (int a = 0; a < 3; a++) {
        dims[a] = (int) Math.max(1, Math.min(1024, Math.ceil((max[a] - min[a]) / side)));
        product *= dims[a];
      }
      if (product <= limit) {
        break;
      }
      // a thin part rounds its thin side up to one bucket: widen the buckets instead
      side *= 1.25;
    }
    for (int a = 0; a < 3; a++) {
      cell[a] = (max[a] - min[a]) / dims[a];
    }
    int buckets = dims[0] * dims[1] * dims[2];
    int[] range = new int[6];
    long[] counts = new long[buckets + 1];
    for (int t = 0; t < tetCount; t++) {
      bucketRange(t, range);
      for (int i = range[0]; i <= range[3]; i++) {
        for (int j = range[1]; j <= range[4]; j++) {
          for (int k = range[2]; k <= range[5]; k++) {
            counts[bucket(i, j, k) + 1]++;
          }
        }
      }
    }
    for (int b = 0; b < buckets; b++) {
      counts[b + 1] += counts[b];
    }
    if (counts[buckets] > Integer.MAX_VALUE - 8) {
      throw new IllegalArgumentException("the locator's bucket grid would be too large");
    }
    this.bucketStart = new int[buckets + 1];
    for (int b = 0; b <= buckets; b++) {
      bucketStart[b] = (int) counts[b];
    }
    this.bucketTets = new int[bucketStart[buckets]];
    int[] fill = new int[buckets];
    for (int t = 0; t < tetCount; t++) {
      bucketRange(t, range);
      for (int i = range[0]; i <= range[3]; i++) {
        for (int j = range[1]; j <= range[4]; j++) {
          for (int k = range[2]; k <= range[5]; k++) {
            int b = bucket(i, j, k);
            bucketTets[bucketStart[b] + fill[b]++] = t;
          }
        }
      }
    }
  }

  public FeSpace space() {
    return space;
  }

  /**
   * The tetrahedron that contains the point, or, for a point just outside the mesh, the nearest one
   * within 1e-9 of the bounding-box diagonal; empty when the point is farther out.
   */
  public Optional<Probe> locate(double x, double y, double z) {
    return locate(x, y, z, t -> true);
  }

  /** As {@link #locate(double, double, double)}, among the tetrahedra {@code accept} takes. */
  public Optional<Probe> locate(double x, double y, double z, IntPredicate accept) {
    int b = bucketOf(x, y, z);
    if (b < 0) {
      return Optional.empty();
    }
    double[] l = new double[4];
    double[] best = new double[4];
    int bestTet = -1;
    double bestOut = Double.POSITIVE_INFINITY;
    for (int m = bucketStart[b]; m < bucketStart[b + 1]; m++) {
      int t = bucketTets[m];
      if (!accept.test(t)) {
        continue;
      }
      double out = barycentric(t, x, y, z, l);
      if (out < bestOut) {
        bestOut = out;
        bestTet = t;
        System.arraycopy(l, 0, best, 0, 4);
        if (out <= 0) {
          break;
        }
      }
    }
    if (bestTet < 0 || bestOut > tol) {
      return Optional.empty();
    }
    // Just outside: move to the closest barycentric point of the tetrahedron.
    double sum = 0;
    for (int a = 0; a < 4; a++) {
      best[a] = Math.max(0, best[a]);
      sum += best[a];
    }
    for (int a = 0; a < 4; a++) {
      best[a] /= sum;
    }
    double[] w = new double[per];
    TetBasis.values(space.order(), best, w);
    int[] dofs = new int[per];
    System.arraycopy(tets, bestTet * per, dofs, 0, per);
    return Optional.of(new Probe(bestTet, dofs, w));
  }

  /** Every tetrahedron the point lies in or on (within the locator's tolerance). */
  public List<Integer> tetsAt(double x, double y, double z) {
    List<Integer> out = new ArrayList<>();
    int b = bucketOf(x, y, z);
    if (b < 0) {
      return out;
    }
    double[] l = new double[4];
    for (int m = bucketStart[b]; m < bucketStart[b + 1]; m++) {
      if (barycentric(bucketTets[m], x, y, z, l) <= tol) {
        out.add(bucketTets[m]);
      }
    }
    return out;
  }

  /** The bucket holding the point, or -1 outside the mesh's bounding box. */
  private int bucketOf(double x, double y, double z) {
    if (!(x >= min[0] && y >= min[1] && z >= min[2] && x <= max[0] && y <= max[1] && z <= max[2])) {
      return -1;
    }
    int i = Math.min(dims[0] - 1, (int) ((x - min[0]) / cell[0]));
    int j = Math.min(dims[1] - 1, (int) ((y - min[1]) / cell[1]));
    int k = Math.min(dims[2] - 1, (int) ((z - min[2]) / cell[2]));
    return bucket(i, j, k);
  }

  /**
   * Barycentric coordinates of the point in tetrahedron t (from its corners) into l; returns how
   * far the point lies outside: the largest distance beyond a face plane, ≤ 0 when inside.
   */
  private double barycentric(int t, double px, double py, double pz, double[] l) {
    int base = t * per;
    int p0 = 3 * tets[base];
    int p1 = 3 * tets[base + 1];
    int p2 = 3 * tets[base + 2];
    int p3 = 3 * tets[base + 3];
    double x0 = xyz[p0];
    double y0 = xyz[p0 + 1];
    double z0 = xyz[p0 + 2];
    double ax = xyz[p1] - x0;
    double ay = xyz[p1 + 1] - y0;
    double az = xyz[p1 + 2] - z0;
    double bx = xyz[p2] - x0;
    double by = xyz[p2 + 1] - y0;
    double bz = xyz[p2 + 2] - z0;
    double cx = xyz[p3] - x0;
    double cy = xyz[p3 + 1] - y0;
    double cz = xyz[p3 + 2] - z0;
    double dx = px - x0;
    double dy = py - y0;
    double dz = pz - z0;
    // Rows of the inverse edge matrix are the reciprocal basis (b × c, c × a, a × b) / det.
    double g1x = by * cz - bz * cy;
    double g1y = bz * cx - bx * cz;
    double g1z = bx * cy - by * cx;
    double g2x = cy * az - cz * ay;
    double g2y = cz * ax - cx * az;
    double g2z = cx * ay - cy * ax;
    double g3x = ay * bz - az * by;
    double g3y = az * bx - ax * bz;
    double g3z = ax * by - ay * bx;
    double det = ax * g1x + ay * g1y + az * g1z;
    l[1] = (g1x * dx + g1y * dy + g1z * dz) / det;
    l[2] = (g2x * dx + g2y * dy + g2z * dz) / det;
    l[3] = (g3x * dx + g3y * dy + g3z * dz) / det;
    l[0] = 1 - l[1] - l[2] - l[3];
    // Distance beyond the plane opposite corner a is −L_a / |∇L_a|.
    double n1 = Math.sqrt(g1x * g1x + g1y * g1y + g1z * g1z) / det;
    double n2 = Math.sqrt(g2x * g2x + g2y * g2y + g2z * g2z) / det;
    double n3 = Math.sqrt(g3x * g3x + g3y * g3y + g3z * g3z) / det;
    double s0x = g1x + g2x + g3x;
    double s0y = g1y + g2y + g3y;
    double s0z = g1z + g2z + g3z;
    double n0 = Math.sqrt(s0x * s0x + s0y * s0y + s0z * s0z) / det;
    return Math.max(Math.max(-l[0] / n0, -l[1] / n1), Math.max(-l[2] / n2, -l[3] / n3));
  }

  /** Bucket index ranges (i0, j0, k0, i1, j1, k1) of tetrahedron t's grown bounding box. */
  private void bucketRange(int t, int[] range) {
    for (int a = 0; a < 3; a++) {
      double lo = Double.POSITIVE_INFINITY;
      double hi = Double.NEGATIVE_INFINITY;
      for (int c = 0; c < per; c++) {
        double v = xyz[3 * tets[t * per + c] + a];
        lo = Math.min(lo, v);
        hi = Math.max(hi, v);
      }
      range[a] = clamp((int) ((lo - tol - min[a]) / cell[a]), dims[a]);
      range[3 + a] = clamp((int) ((hi + tol - min[a]) / cell[a]), dims[a]);
    }
  }

  private static int clamp(int i, int n) {
    return Math.max(0, Math.min(n - 1, i));
  }

  private int bucket(int i, int j, int k) {
    return (k * dims[1] + j) * dims[0] + i;
  }

  private static double sq(double v) {
    return v * v;
  }
}
