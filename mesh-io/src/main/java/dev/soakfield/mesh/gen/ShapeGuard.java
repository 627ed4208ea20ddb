package dev.soakfield.mesh.gen;

import java.util.Arrays;
import java.util.function.Function;
import java.util.function.ToDoubleFunction;

/**
 * Cell counts for round parts that keep every tetrahedron's dihedral angles at 10° or more, cell by
 * cell. A Kuhn split of a box whose longest side is ρ times its shortest has a smallest dihedral
 * angle of exactly atan(1/ρ) (measured: 14.04° at ρ = 4, 10.0° at ρ = 5.67), and no split of a thin
 * cell does much better, since a tetrahedron filling a thin cell is flat. Round parts have tapered
 * (pipe) and skewed (the cylinder's ring) cells besides, so the guard does not trust a formula: it
 * builds the cross-section's cells at the thinnest and the thickest axial cell, measures the angles
 * of their tetrahedra, and raises the count of each failing cell's longest direction by about what
 * that cell needs. Refining never costs accuracy, only cells.
 *
 * <p>Directions are the indices of the counts: {@link #RADIAL}, {@link #AROUND}, {@link #AXIAL}. A
 * graded direction is raised by whole multiples of its given count, each given cell cut into equal
 * ones ({@link Grading#split}), so the grading's planes stay and all its cells shrink alike.
 */
final class ShapeGuard {
  /** The promise, degrees. */
  static final double MIN_DIHEDRAL = 10;

  /** The guard's own limit, a hair above the promise against round-off in written files. */
  private static final double LIMIT = MIN_DIHEDRAL + 1e-3;

  /** Longest over shortest side of a box at the promise: 1/tan 10° = 5.67. */
  private static final double BOX_ASPECT = 1 / Math.tan(Math.toRadians(MIN_DIHEDRAL));

  /** A raise that does not settle in this many passes is refused. */
  static final int MAX_PASSES = 64;

  /** The guard refuses to raise a mesh to more tetrahedra than this (or twice those asked). */
  static final double MAX_RAISED_TETS = 1e7;

  /** The least raise, so that a cell failing at a box's good proportions settles in few passes. */
  private static final double MIN_FACTOR = 1.02;

  static final int RADIAL = 0;
  static final int AROUND = 1;
  static final int AXIAL = 2;

  /**
   * The cells the guard measures for given counts: one cross-section, two layers high (the thinnest
   * and the thickest axial cell). The first {@code squareCells} cells of each layer are a square
   * grid whose both sides are set by the around count (the cylinder's core); the rest have local
   * axes (around, radial, axial).
   */
  record Probe(HexGrid grid, int squareCells) {}

  private ShapeGuard() {}

  /**
   * The counts {radial, around, axial} to mesh with: {@code given} raised until every measured cell
   * keeps its angles.
   *
   * @param step each direction's count stays a multiple of this (4 around a cylinder, the given
   *     count of a graded direction)
   * @param probe builds the cells to measure for counts
   * @param cells hexahedral cells of the whole mesh for counts
   * @throws CellCountsException when no counts within {@link #MAX_RAISED_TETS} tetrahedra (or twice
   *     those asked) and {@link #MAX_PASSES} raises do
   */
  static int[] settle(
      int[] given, int[] step, Function<int[], Probe> probe, ToDoubleFunction<int[]> cells) {
    double cap = Math.max(MAX_RAISED_TETS, 12 * cells.applyAsDouble(given));
    int[] n = given.clone();
    for (int pass = 0; pass < MAX_PASSES; pass++) {
      if (6 * cells.applyAsDouble(n) > cap) {
        break;
      }
      double[] need = needs(probe.apply(n));
      if (Arrays.stream(need).allMatch(f -> f == 0)) {
        return trimmed(n, given, step, probe);
      }
      for (int d = 0; d < 3; d++) {
        if (need[d] > 0) {
          n[d] = raise(n[d], need[d], step[d]);
        }
      }
    }
    throw new CellCountsException(given, n, 6 * cells.applyAsDouble(n), cap);
  }

  /**
   * The raised counts brought down again, direction by direction, to the least that still passes: a
   * pass raises every direction its failing cells name, and the estimates overshoot a little. Fewer
   * cells in one direction only lengthens cells, so a binary search finds that least count.
   */
  private static int[] trimmed(
      int[] raised, int[] given, int[] step, Function<int[], Probe> probe) {
    int[] n = raised.clone();
    for (int d : new int[] {AROUND, AXIAL, RADIAL}) {
      int lo = given[d] / step[d] - 1; // a multiple known to fail, or below the given count
      int hi = n[d] / step[d]; // a multiple known to pass
      while (hi - lo > 1) {
        int mid = (lo + hi) >>> 1;
        int[] t = n.clone();
        t[d] = mid * step[d];
        if (passes(probe.apply(t))) {
          hi = mid;
        } else {
          lo = mid;
        }
      }
      n[d] = hi * step[d];
    }
    return n;
  }

  private static boolean passes(Probe probe) {
    return Arrays.stream(needs(probe)).allMatch(f -> f == 0);
  }

  /**
   * For each direction, the factor its count should grow by (0: none), from the cells that fail:
   * each one's longest edge is brought to {@link #BOX_ASPECT} times its thickness, the box's bound.
   */
  private static double[] needs(Probe probe) {
    HexGrid grid = probe.grid();
    int perLayer = grid.cellCount() / 2;
    double[] need = new double[3];
    double[] longest = new double[3];
    double[] thickness = new double[3];
    for (int cell = 0; cell < grid.cellCount(); cell++) {
      if (KuhnAngles.smallest(grid.xyz, grid.corners, cell) >= LIMIT) {
        continue;
      }
      measure(grid, cell, longest, thickness);
      int axis = 0;
      for (int a = 1; a < 3; a++) {
        if (longest[a] > longest[axis]) {
          axis = a;
        }
      }
      double thinnest = Math.min(thickness[0], Math.min(thickness[1], thickness[2]));
      boolean square = cell % perLayer < probe.squareCells();
      int direction = axis == 2 ? AXIAL : axis == 0 || square ? AROUND : RADIAL;
      // a little at least: a tapered cell may fail at a box's good proportions
      double factor = Math.max(MIN_FACTOR, longest[axis] / (BOX_ASPECT * thinnest));
      need[direction] = Math.max(need[direction], factor);
    }
    return need;
  }

  /**
   * Per local axis of a cell: its longest edge, and its thickness, the shortest of its edges
   * measured square to the cell side that the other two axes span (less than the edge where the
   * cell is skewed).
   */
  private static void measure(HexGrid grid, int cell, double[] longest, double[] thickness) {
    for (int a = 0; a < 3; a++) {
      double[] across =
          cross(edge(grid, cell, 0, 1 << ((a + 1) % 3)), edge(grid, cell, 0, 1 << ((a + 2) % 3)));
      double norm = Math.sqrt(dot(across, across));
      longest[a] = 0;
      thickness[a] = Double.POSITIVE_INFINITY;
      for (int c = 0; c < 8; c++) {
        if ((c & (1 << a)) == 0) {
          double[] e = edge(grid, cell, c, c | (1 << a));
          longest[a] = Math.max(longest[a], Math.sqrt(dot(e, e)));
          thickness[a] = Math.min(thickness[a], Math.abs(dot(e, across)) / norm);
        }
      }
    }
  }

  private static double[] edge(HexGrid grid, int cell, int from, int to) {
    int p = grid.corners[8 * cell + from];
    int q = grid.corners[8 * cell + to];
    return new double[] {
      grid.xyz[3 * q] - grid.xyz[3 * p],
      grid.xyz[3 * q + 1] - grid.xyz[3 * p + 1],
      grid.xyz[3 * q + 2] - grid.xyz[3 * p + 2]
    };
  }

  private static double[] cross(double[] a, double[] b) {
    return new double[] {
      a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]
    };
  }

  private static double dot(double[] a, double[] b) {
    return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
  }

  /** The count times the factor, by at least one step, rounded up to a multiple of the step. */
  private static int raise(int count, double factor, int step) {
    double wanted = Math.max(count + (double) step, Math.ceil(count * factor - 1e-9));
    double rounded = Math.ceil(wanted / step) * step;
    return (int) Math.min(rounded, Integer.MAX_VALUE / 2.0);
  }

  /** The thinnest and the thickest of the cells between the planes, as a two-layer stack. */
  static double[] extremeLayers(double[] planes) {
    double thin = Double.POSITIVE_INFINITY;
    double thick = 0;
    for (int i = 0; i + 1 < planes.length; i++) {
      double h = planes[i + 1] - planes[i];
      thin = Math.min(thin, h);
      thick = Math.max(thick, h);
    }
    return new double[] {0, thin, thin + thick};
  }
}
