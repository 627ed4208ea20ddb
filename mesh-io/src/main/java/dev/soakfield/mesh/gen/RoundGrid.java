package dev.soakfield.mesh.gen;

import dev.soakfield.mesh.FaceGroup;
import dev.soakfield.mesh.FaceGroupKind;
import dev.soakfield.mesh.VolumeGroup;
import java.util.Arrays;
import java.util.List;

/**
 * Grids of round parts along z: the O-grid of a solid cylinder and the periodic grid of a pipe.
 * Local cell axes are (around, radial, z), so side 3 faces outward in radius and sides 4 and 5 face
 * down and up.
 */
final class RoundGrid {
  private RoundGrid() {}

  /**
   * O-grid: a central square of (nAround/4)^2 columns of cells and a ring of nAround x nRadial
   * columns around it, whose outer nodes lie on the circle. Ring node (t, r) blends the square's
   * boundary node t (r = 0) linearly into the circle node at angle -3pi/4 + 2pi t / nAround (r =
   * nRadial), so each square corner faces a 45-degree direction.
   *
   * <p>Ring cells on the top and left sides of the square (t >= nAround/2) run their around axis
   * backwards: the ring counts counter-clockwise while the square's x and y run the other way
   * there, and the reversal makes the ring's inner sides split along the same diagonals as the
   * square's outer sides. Reversing an around axis leaves the around-facing sides' diagonals alone,
   * so the ring stays conforming within itself.
   */
  static HexGrid cylinder(double radius, double height, int nRadial, int nAround, int nz) {
    return cylinder(
        radius, TensorGrid.planes(0, height, nz), TensorGrid.planes(0, 1, nRadial), nAround);
  }

  /** Square half-side: about matching the square's cells and the ring's depth, kept in range. */
  static double squareHalfSide(double radius, int nRadial, int nAround) {
    int m = nAround / 4;
    // kept away from the circle (the corners sit at s * sqrt 2) and from a vanishing square
    return radius * Math.max(0.3, Math.min(0.5, m / (double) (m + 2 * nRadial)));
  }

  /**
   * As {@link #cylinder(double, double, int, int, int)} with the ring's layers at blend weights
   * {@code weights} (0 at the square, 1 at the circle; graded toward the side when they crowd
   * there).
   */
  static HexGrid cylinder(double radius, double[] zs, double[] weights, int nAround) {
    int nRadial = weights.length - 1;
    int nz = zs.length - 1;
    int m = nAround / 4;
    double s = squareHalfSide(radius, nRadial, nAround);
    int sq = (m + 1) * (m + 1);
    int perLevel = sq + nAround * nRadial;
    double[] xyz = new double[3 * perLevel * (nz + 1)];
    double[] ring = new double[2 * nAround * nRadial];
    for (int r = 1; r <= nRadial; r++) {
      double w = weights[r];
      for (int t = 0; t < nAround; t++) {
        double angle = -0.75 * Math.PI + 2 * Math.PI * t / nAround;
        double cx = radius * Math.cos(angle);
        double cy = radius * Math.sin(angle);
        int b = squareBoundaryNode(t, m);
        double bx = squareCoord(b % (m + 1), m, s);
        double by = squareCoord(b / (m + 1), m, s);
        int q = 2 * ((r - 1) * nAround + t);
        ring[q] = r == nRadial ? cx : (1 - w) * bx + w * cx;
        ring[q + 1] = r == nRadial ? cy : (1 - w) * by + w * cy;
      }
    }
    for (int k = 0; k <= nz; k++) {
      int base = k * perLevel;
      for (int j = 0; j <= m; j++) {
        for (int i = 0; i <= m; i++) {
          put(xyz, base + i + (m + 1) * j, squareCoord(i, m, s), squareCoord(j, m, s), zs[k]);
        }
      }
      for (int q = 0; q < nAround * nRadial; q++) {
        put(xyz, base + sq + q, ring[2 * q], ring[2 * q + 1], zs[k]);
      }
    }
    int cells = (m * m + nAround * nRadial) * nz;
    int[] corners = new int[8 * cells];
    int[] sideGroup = new int[6 * cells];
    Arrays.fill(sideGroup, HexGrid.NO_FACE);
    int cell = 0;
    for (int k = 0; k < nz; k++) {
      for (int j = 0; j < m; j++) {
        for (int i = 0; i < m; i++) {
          int base = k * perLevel + i + (m + 1) * j;
          for (int c = 0; c < 8; c++) {
            corners[8 * cell + c] =
                base + (c & 1) + (m + 1) * ((c >> 1) & 1) + perLevel * ((c >> 2) & 1);
          }
          markEnds(sideGroup, cell, k, nz, 1, 2);
          cell++;
        }
      }
      for (int r = 0; r < nRadial; r++) {
        for (int t = 0; t < nAround; t++) {
          boolean reversed = t >= 2 * m;
          for (int c = 0; c < 8; c++) {
            int dt = reversed ? 1 - (c & 1) : c & 1;
            int dr = (c >> 1) & 1;
            int dz = (c >> 2) & 1;
            int rr = r + dr;
            int tt = (t + dt) % nAround;
            int node = rr == 0 ? squareBoundaryNode(tt, m) : sq + (rr - 1) * nAround + tt;
            corners[8 * cell + c] = (k + dz) * perLevel + node;
          }
          if (r == nRadial - 1) {
            sideGroup[6 * cell + 3] = 0;
          }
          markEnds(sideGroup, cell, k, nz, 1, 2);
          cell++;
        }
      }
    }
    int[] cellGroup = new int[cells];
    return new HexGrid(
        xyz,
        corners,
        cellGroup,
        sideGroup,
        List.of(new VolumeGroup("body", 1)),
        List.of(
            new FaceGroup("side", 1, FaceGroupKind.EXTERIOR),
            new FaceGroup("bottom", 2, FaceGroupKind.EXTERIOR),
            new FaceGroup("top", 3, FaceGroupKind.EXTERIOR)));
  }

  /**
   * Annulus grid, periodic around: node (t, r) at radius innerRadius + (outer - inner) r / nRadial
   * and angle 2pi t / nAround.
   */
  static HexGrid pipe(
      double innerRadius, double outerRadius, double height, int nRadial, int nAround, int nz) {
    return pipe(
        TensorGrid.planes(innerRadius, outerRadius - innerRadius, nRadial),
        TensorGrid.planes(0, height, nz),
        nAround);
  }

  /** As above with the wall's node circles at {@code radii}, inner to outer. */
  static HexGrid pipe(double[] radii, double[] zs, int nAround) {
    int nRadial = radii.length - 1;
    int nz = zs.length - 1;
    double outerRadius = radii[nRadial];
    int perLevel = (nRadial + 1) * nAround;
    double[] xyz = new double[3 * perLevel * (nz + 1)];
    for (int k = 0; k <= nz; k++) {
      for (int r = 0; r <= nRadial; r++) {
        double rho = r == nRadial ? outerRadius : radii[r];
        for (int t = 0; t < nAround; t++) {
          double angle = 2 * Math.PI * t / nAround;
          put(
              xyz,
              k * perLevel + r * nAround + t,
              rho * Math.cos(angle),
              rho * Math.sin(angle),
              zs[k]);
        }
      }
    }
    int cells = nAround * nRadial * nz;
    int[] corners = new int[8 * cells];
    int[] sideGroup = new int[6 * cells];
    Arrays.fill(sideGroup, HexGrid.NO_FACE);
    int cell = 0;
    for (int k = 0; k < nz; k++) {
      for (int r = 0; r < nRadial; r++) {
        for (int t = 0; t < nAround; t++) {
          for (int c = 0; c < 8; c++) {
            int tt = (t + (c & 1)) % nAround;
            int rr = r + ((c >> 1) & 1);
            int kk = k + ((c >> 2) & 1);
            corners[8 * cell + c] = kk * perLevel + rr * nAround + tt;
          }
          if (r == 0) {
            sideGroup[6 * cell + 2] = 0;
          }
          if (r == nRadial - 1) {
            sideGroup[6 * cell + 3] = 1;
          }
          markEnds(sideGroup, cell, k, nz, 2, 3);
          cell++;
        }
      }
    }
    return new HexGrid(
        xyz,
        corners,
        new int[cells],
        sideGroup,
        List.of(new VolumeGroup("body", 1)),
        List.of(
            new FaceGroup("inner", 1, FaceGroupKind.EXTERIOR),
            new FaceGroup("outer", 2, FaceGroupKind.EXTERIOR),
            new FaceGroup("bottom", 3, FaceGroupKind.EXTERIOR),
            new FaceGroup("top", 4, FaceGroupKind.EXTERIOR)));
  }

  /**
   * One column of cells of {@link #pipe(double[], double[], int)}, the one at angle 0 to 2π /
   * nAround: every column is this one turned, so it stands for all of them when cells are measured.
   */
  static HexGrid pipeSector(double[] radii, double[] zs, int nAround) {
    int nRadial = radii.length - 1;
    int nz = zs.length - 1;
    int perLevel = 2 * (nRadial + 1);
    double[] xyz = new double[3 * perLevel * (nz + 1)];
    double angle = 2 * Math.PI / nAround;
    for (int k = 0; k <= nz; k++) {
      for (int r = 0; r <= nRadial; r++) {
        int node = k * perLevel + 2 * r;
        put(xyz, node, radii[r], 0, zs[k]);
        put(xyz, node + 1, radii[r] * Math.cos(angle), radii[r] * Math.sin(angle), zs[k]);
      }
    }
    int cells = nRadial * nz;
    int[] corners = new int[8 * cells];
    for (int k = 0; k < nz; k++) {
      for (int r = 0; r < nRadial; r++) {
        int cell = k * nRadial + r;
        for (int c = 0; c < 8; c++) {
          corners[8 * cell + c] =
              (k + ((c >> 2) & 1)) * perLevel + 2 * (r + ((c >> 1) & 1)) + (c & 1);
        }
      }
    }
    int[] sideGroup = new int[6 * cells];
    Arrays.fill(sideGroup, HexGrid.NO_FACE);
    return new HexGrid(
        xyz, corners, new int[cells], sideGroup, List.of(new VolumeGroup("body", 1)), List.of());
  }

  /** Square node index (i + (m + 1) j) of boundary position t, counter-clockwise from (0, 0). */
  static int squareBoundaryNode(int t, int m) {
    int i;
    int j;
    if (t < m) {
      i = t;
      j = 0;
    } else if (t < 2 * m) {
      i = m;
      j = t - m;
    } else if (t < 3 * m) {
      i = 3 * m - t;
      j = m;
    } else {
      i = 0;
      j = 4 * m - t;
    }
    return i + (m + 1) * j;
  }

  private static double squareCoord(int i, int m, double s) {
    return i == m ? s : -s + 2 * s * i / m;
  }

  private static void markEnds(int[] sideGroup, int cell, int k, int nz, int bottom, int top) {
    if (k == 0) {
      sideGroup[6 * cell + 4] = bottom;
    }
    if (k == nz - 1) {
      sideGroup[6 * cell + 5] = top;
    }
  }

  private static void put(double[] xyz, int node, double x, double y, double z) {
    xyz[3 * node] = x;
    xyz[3 * node + 1] = y;
    xyz[3 * node + 2] = z;
  }
}
