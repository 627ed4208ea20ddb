package dev.soakfield.mesh.gen;

import dev.soakfield.mesh.FaceGroup;
import dev.soakfield.mesh.FaceGroupKind;
import dev.soakfield.mesh.VolumeGroup;
import java.util.ArrayList;
import java.util.List;

/**
 * A Cartesian grid with node planes at given x, y and z positions, as a {@link HexGrid}. Local axes
 * are the global x, y, z; cell (i, j, k) has index {@code i + nx * (j + ny * k)}.
 *
 * <p>The exterior sides go to face groups 0..5 = xmin, xmax, ymin, ymax, zmin, zmax. A side between
 * a cell of volume group g and a neighbour of group h goes to face group {@code interfaceOf[g *
 * groupCount + h]} when that is not {@link HexGrid#NO_FACE}; the table decides which of the two
 * cells owns (and orients outward) the face.
 */
final class TensorGrid {
  static final String[] EXTERIOR_NAMES = {"xmin", "xmax", "ymin", "ymax", "zmin", "zmax"};

  private TensorGrid() {}

  /** The six exterior groups followed by {@code interfaces} (INTERFACE kind), tags 1, 2, ... */
  static List<FaceGroup> faceGroups(List<String> interfaces) {
    List<FaceGroup> groups = new ArrayList<>();
    for (String name : EXTERIOR_NAMES) {
      groups.add(new FaceGroup(name, groups.size() + 1, FaceGroupKind.EXTERIOR));
    }
    for (String name : interfaces) {
      groups.add(new FaceGroup(name, groups.size() + 1, FaceGroupKind.INTERFACE));
    }
    return groups;
  }

  static HexGrid build(
      double[] xs,
      double[] ys,
      double[] zs,
      int[] cellGroup,
      int[] interfaceOf,
      List<VolumeGroup> volumeGroups,
      List<FaceGroup> faceGroups) {
    int nx = xs.length - 1;
    int ny = ys.length - 1;
    int nz = zs.length - 1;
    int px = nx + 1;
    int pxy = px * (ny + 1);
    double[] xyz = new double[3 * pxy * (nz + 1)];
    for (int k = 0; k <= nz; k++) {
      for (int j = 0; j <= ny; j++) {
        for (int i = 0; i <= nx; i++) {
          int n = i + px * j + pxy * k;
          xyz[3 * n] = xs[i];
          xyz[3 * n + 1] = ys[j];
          xyz[3 * n + 2] = zs[k];
        }
      }
    }
    int cells = nx * ny * nz;
    int groupCount = volumeGroups.size();
    int[] corners = new int[8 * cells];
    int[] sideGroup = new int[6 * cells];
    int[] ijk = new int[3];
    int[] count = {nx, ny, nz};
    int[] stride = {1, nx, nx * ny};
    for (int k = 0; k < nz; k++) {
      for (int j = 0; j < ny; j++) {
        for (int i = 0; i < nx; i++) {
          int cell = i + nx * (j + ny * k);
          int base = i + px * j + pxy * k;
          for (int c = 0; c < 8; c++) {
            corners[8 * cell + c] = base + (c & 1) + px * ((c >> 1) & 1) + pxy * ((c >> 2) & 1);
          }
          ijk[0] = i;
          ijk[1] = j;
          ijk[2] = k;
          int g = cellGroup[cell];
          for (int axis = 0; axis < 3; axis++) {
            for (int high = 0; high < 2; high++) {
              int side = 2 * axis + high;
              boolean outside = high == 0 ? ijk[axis] == 0 : ijk[axis] == count[axis] - 1;
              int group;
              if (outside) {
                group = side;
              } else {
                int neighbour = cell + (high == 0 ? -stride[axis] : stride[axis]);
                int h = cellGroup[neighbour];
                group = g == h ? HexGrid.NO_FACE : interfaceOf[g * groupCount + h];
              }
              sideGroup[6 * cell + side] = group;
            }
          }
        }
      }
    }
    return new HexGrid(xyz, corners, cellGroup, sideGroup, volumeGroups, faceGroups);
  }

  /** {@code n + 1} evenly spaced positions from {@code from} to {@code from + length}. */
  static double[] planes(double from, double length, int n) {
    double[] p = new double[n + 1];
    for (int i = 0; i <= n; i++) {
      p[i] = from + length * i / n;
    }
    p[n] = from + length;
    return p;
  }
}
