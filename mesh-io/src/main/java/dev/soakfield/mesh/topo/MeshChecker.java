package dev.soakfield.mesh.topo;

import dev.soakfield.mesh.MeshFinding;
import dev.soakfield.mesh.MeshQuality;
import java.util.List;

/**
 * Checks of nodes and tetrahedra that need no face topology: orientation and flatness, unused and
 * coincident nodes, shape quality. Each check appends its findings; arrays are the assembler's
 * working copies.
 */
final class MeshChecker {
  /**
   * A warning is raised below this smallest dihedral angle, degrees (common practice: slivers below
   * a few degrees spoil the conditioning of the stiffness matrix).
   */
  static final double LOW_DIHEDRAL_DEG = 5.0;

  /** Nodes closer than this times the bounding-box diagonal (in each axis) count as one place. */
  static final double COINCIDENT_RELATIVE = 1e-12;

  /** How many coincident pairs a finding spells out. */
  private static final int PAIRS_LISTED = 5;

  // Weights of a projection on which grid-aligned nodes rarely tie (powers of the plastic number,
  // an irrational), so the sweep window holds few candidates.
  private static final double WY = 0.7548776662466927;
  private static final double WZ = 0.5698402909980532;

  private MeshChecker() {}

  /**
   * Reverses inverted tetrahedra (negative volume) and reports them; reports flat ones (see {@link
   * TetShape#FLAT_RELATIVE_VOLUME}) as an error and leaves them as they are.
   */
  static void orient(
      double[] xyz, int[] tets, int nodesPerTet, long[] tetIds, List<MeshFinding> out) {
    IdList inverted = new IdList();
    IdList flat = new IdList();
    int n = tets.length / nodesPerTet;
    for (int t = 0; t < n; t++) {
      int base = t * nodesPerTet;
      int a = tets[base];
      int b = tets[base + 1];
      int c = tets[base + 2];
      int d = tets[base + 3];
      double v = TetShape.signedVolume(xyz, a, b, c, d);
      if (TetShape.isFlat(xyz, a, b, c, d, v)) {
        flat.add(tetIds[t]);
      } else if (v < 0.0) {
        TetFaces.reverse(tets, nodesPerTet, t);
        inverted.add(tetIds[t]);
      }
    }
    if (!inverted.isEmpty()) {
      out.add(
          MeshFinding.warning(
              "inverted-tets",
              inverted.count()
                  + " tetrahedra had their nodes in inside-out order (negative volume) and were"
                  + " reordered: elements "
                  + inverted.describe()));
    }
    if (!flat.isEmpty()) {
      out.add(
          MeshFinding.error(
              "degenerate-tets",
              flat.count()
                  + " tetrahedra are flat (volume below "
                  + TetShape.FLAT_RELATIVE_VOLUME
                  + " of the cube of their longest edge): elements "
                  + flat.describe()));
    }
  }

  /** Marks the nodes some tetrahedron uses and warns about the others (kept, not renumbered). */
  static boolean[] usedNodes(int nodeCount, int[] tets, long[] nodeIds, List<MeshFinding> out) {
    boolean[] used = new boolean[nodeCount];
    for (int node : tets) {
      used[node] = true;
    }
    IdList unused = new IdList();
    for (int i = 0; i < nodeCount; i++) {
      if (!used[i]) {
        unused.add(nodeIds[i]);
      }
    }
    if (!unused.isEmpty()) {
      out.add(
          MeshFinding.warning(
              "unused-nodes",
              unused.count()
                  + " nodes belong to no tetrahedron; they are kept so that node ids stay those of"
                  + " the file: nodes "
                  + unused.describe()));
    }
    return used;
  }

  /**
   * Warns about distinct used nodes at the same place (within {@link #COINCIDENT_RELATIVE} of the
   * bounding-box diagonal): they usually mean tetrahedra that do not share their nodes, a crack.
   * Sorts the nodes along a projection and compares only within a small window.
   */
  static void coincidentNodes(double[] xyz, boolean[] used, long[] nodeIds, List<MeshFinding> out) {
    int count = 0;
    for (boolean u : used) {
      if (u) {
        count++;
      }
    }
    int[] order = new int[count];
    double[] key = new double[used.length];
    double[] box = {
      Double.MAX_VALUE, Double.MAX_VALUE, Double.MAX_VALUE,
      -Double.MAX_VALUE, -Double.MAX_VALUE, -Double.MAX_VALUE
    };
    int k = 0;
    for (int i = 0; i < used.length; i++) {
      if (used[i]) {
        order[k++] = i;
        key[i] = xyz[3 * i] + WY * xyz[3 * i + 1] + WZ * xyz[3 * i + 2];
        for (int axis = 0; axis < 3; axis++) {
          box[axis] = Math.min(box[axis], xyz[3 * i + axis]);
          box[axis + 3] = Math.max(box[axis + 3], xyz[3 * i + axis]);
        }
      }
    }
    if (count < 2) {
      return;
    }
    double dx = box[3] - box[0];
    double dy = box[4] - box[1];
    double dz = box[5] - box[2];
    double tol = COINCIDENT_RELATIVE * Math.sqrt(dx * dx + dy * dy + dz * dz);
    double window = (1.0 + WY + WZ) * tol;
    IndexSort.byKey(order, key);
    boolean[] coincident = new boolean[used.length];
    StringBuilder pairs = new StringBuilder();
    int pairCount = 0;
    for (int i = 0; i < count; i++) {
      int p = order[i];
      for (int j = i + 1; j < count && key[order[j]] - key[p] <= window; j++) {
        int q = order[j];
        if (Math.abs(xyz[3 * p] - xyz[3 * q]) <= tol
            && Math.abs(xyz[3 * p + 1] - xyz[3 * q + 1]) <= tol
            && Math.abs(xyz[3 * p + 2] - xyz[3 * q + 2]) <= tol) {
          coincident[p] = true;
          coincident[q] = true;
          if (pairCount < PAIRS_LISTED) {
            pairs.append(pairCount == 0 ? "" : ", ");
            pairs
                .append(Math.min(nodeIds[p], nodeIds[q]))
                .append(" and ")
                .append(Math.max(nodeIds[p], nodeIds[q]));
          }
          pairCount++;
        }
      }
    }
    if (pairCount == 0) {
      return;
    }
    int nodes = 0;
    for (boolean c : coincident) {
      if (c) {
        nodes++;
      }
    }
    out.add(
        MeshFinding.warning(
            "duplicate-nodes",
            nodes
                + " nodes share their position with another node ("
                + pairCount
                + " pairs, e.g. nodes "
                + pairs
                + "); tetrahedra that do not share nodes leave a crack in the mesh"));
  }

  /** Dihedral extremes and volume-ratio histogram; a warning for sliver tetrahedra. */
  static MeshQuality quality(
      double[] xyz, int[] tets, int nodesPerTet, long[] tetIds, List<MeshFinding> out) {
    // extremes of the cosines: the smallest angle has the largest cosine
    double maxCos = -1.0;
    double minCos = 1.0;
    double sliverCos = Math.cos(Math.toRadians(LOW_DIHEDRAL_DEG));
    double minRatio = 1.0;
    int[] histogram = new int[MeshQuality.BINS];
    double[] scratch = new double[16];
    double[] cosines = new double[6];
    IdList slivers = new IdList();
    int n = tets.length / nodesPerTet;
    for (int t = 0; t < n; t++) {
      int base = t * nodesPerTet;
      int a = tets[base];
      int b = tets[base + 1];
      int c = tets[base + 2];
      int d = tets[base + 3];
      double tetMaxCos;
      double tetMinCos;
      if (TetShape.dihedralCosines(xyz, a, b, c, d, scratch, cosines)) {
        tetMaxCos = -1.0;
        tetMinCos = 1.0;
        for (double cos : cosines) {
          tetMaxCos = Math.max(tetMaxCos, cos);
          tetMinCos = Math.min(tetMinCos, cos);
        }
      } else {
        // A face of zero area: the limits of the flat shape, 0 and 180 degrees.
        tetMaxCos = 1.0;
        tetMinCos = -1.0;
      }
      maxCos = Math.max(maxCos, tetMaxCos);
      minCos = Math.min(minCos, tetMinCos);
      if (tetMaxCos > sliverCos) {
        slivers.add(tetIds[t]);
      }
      double ratio = Math.max(0.0, Math.min(1.0, TetShape.volumeRatio(xyz, a, b, c, d)));
      minRatio = Math.min(minRatio, ratio);
      histogram[Math.min(MeshQuality.BINS - 1, (int) (ratio * MeshQuality.BINS))]++;
    }
    double minAngle = n == 0 ? 180.0 : TetShape.cosineToDegrees(maxCos);
    double maxAngle = n == 0 ? 0.0 : TetShape.cosineToDegrees(minCos);
    if (!slivers.isEmpty()) {
      out.add(
          MeshFinding.warning(
              "low-dihedral",
              slivers.count()
                  + " tetrahedra have a dihedral angle below "
                  + LOW_DIHEDRAL_DEG
                  + " degrees (smallest "
                  + String.format(java.util.Locale.ROOT, "%.3g", minAngle)
                  + "): elements "
                  + slivers.describe()));
    }
    return new MeshQuality(minAngle, maxAngle, minRatio, histogram);
  }
}
