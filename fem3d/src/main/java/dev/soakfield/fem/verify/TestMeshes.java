package dev.soakfield.fem.verify;

import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.MidEdgeNodes;
import dev.soakfield.mesh.gen.StructuredMesher;
import java.util.SplittableRandom;

/**
 * Meshes of our own for the convergence studies: the structured mesher's tetrahedra with their
 * inner nodes moved at random (a fixed seed, so every run sees the same mesh), a ball mapped from a
 * cube, and quadratic forms whose mid-edge nodes on a curved wall lie on it. Jitter takes away the
 * structured mesh's symmetry, under which errors can cancel and rates look better than they are.
 */
final class TestMeshes {
  /** How far an inner node moves: this fraction of its shortest edge, in a random direction. */
  static final double JITTER = 0.2;

  private TestMeshes() {}

  /**
   * The mesh with every node that lies on no face (exterior or interface) moved by up to {@link
   * #JITTER} of its shortest edge; a move that would turn a tetrahedron inside out is halved until
   * it does not.
   */
  static TetMesh jittered(TetMesh linear, long seed) {
    if (linear.order() != 1) {
      throw new IllegalArgumentException("jitter a linear mesh, then promote it");
    }
    int n = linear.nodeCount();
    double[] original = linear.copyCoordinates();
    double[] xyz = original.clone();
    boolean[] onFace = new boolean[n];
    for (int f = 0; f < linear.faceCount(); f++) {
      for (int k = 0; k < 3; k++) {
        onFace[linear.faceNode(f, k)] = true;
      }
    }
    double[] shortest = new double[n];
    java.util.Arrays.fill(shortest, Double.POSITIVE_INFINITY);
    int[][] tetsOf = tetsOfNodes(linear);
    for (int t = 0; t < linear.tetCount(); t++) {
      for (int a = 0; a < 4; a++) {
        for (int b = a + 1; b < 4; b++) {
          int p = linear.tetNode(t, a);
          int q = linear.tetNode(t, b);
          double len = distance(xyz, p, q);
          shortest[p] = Math.min(shortest[p], len);
          shortest[q] = Math.min(shortest[q], len);
        }
      }
    }
    SplittableRandom random = new SplittableRandom(seed);
    for (int v = 0; v < n; v++) {
      if (onFace[v]) {
        continue;
      }
      double[] d = unitBallPoint(random);
      double[] home = {xyz[3 * v], xyz[3 * v + 1], xyz[3 * v + 2]};
      double amplitude = JITTER * shortest[v];
      for (int tries = 0; tries < 8; tries++) {
        for (int r = 0; r < 3; r++) {
          xyz[3 * v + r] = home[r] + amplitude * d[r];
        }
        if (allPositive(linear, original, xyz, tetsOf[v])) {
          break;
        }
        amplitude *= 0.5;
        if (tries == 7) {
          System.arraycopy(home, 0, xyz, 3 * v, 3);
        }
      }
    }
    return rebuilt(linear, xyz, 1);
  }

  /**
   * A ball of the given radius about the origin. The cube [−1, 1]³ of n cells a side is read as
   * logical coordinates ξ; with m = max|ξ_i|, the middle (m ≤ ½) becomes a cube of half-width
   * 0.35·R, and each point of the rest moves along the line from its point q = ξ/(2m) on that
   * cube's surface (scaled) out to R·q/|q| on the sphere, in proportion to (m − ½)/½. Each cell is
   * cut into 24 tetrahedra about its centre and its faces' centres: the six-tetrahedra split would
   * put four corners of some tetrahedra on the sphere along the cube's edges, slivers that flatten
   * as the mesh is refined. Then the inner nodes are jittered. The six face groups xmin … zmax
   * together are the sphere.
   */
  static TetMesh ball(double radius, int n, long seed) {
    int g = 2 * n + 1; // the doubled grid: corners even, face centres two odd, cell centres odd
    int[] index = new int[g * g * g];
    java.util.Arrays.fill(index, -1);
    double[] xyz = new double[3 * g * g * g];
    int nodes = 0;
    for (int k = 0; k < g; k++) {
      for (int j = 0; j < g; j++) {
        for (int i = 0; i < g; i++) {
          int odd = (i & 1) + (j & 1) + (k & 1);
          if (odd == 1) {
            continue; // edge midpoints are not nodes
          }
          index[i + g * (j + g * k)] = nodes;
          double[] p =
              ballPoint(radius, -1 + i / (double) n, -1 + j / (double) n, -1 + k / (double) n);
          System.arraycopy(p, 0, xyz, 3 * nodes, 3);
          nodes++;
        }
      }
    }
    int[] tets = new int[4 * 24 * n * n * n];
    int tetCount = 0;
    int[] faceNodes = new int[3 * 4 * 6 * n * n];
    int[] faceGroup = new int[4 * 6 * n * n];
    int faceCount = 0;
    // the six faces of a cell: axis, side (0 low, 1 high); their corners in cyclic order
    for (int k = 0; k < n; k++) {
      for (int j = 0; j < n; j++) {
        for (int i = 0; i < n; i++) {
          int centre = index[(2 * i + 1) + g * ((2 * j + 1) + g * (2 * k + 1))];
          for (int axis = 0; axis < 3; axis++) {
            for (int side = 0; side < 2; side++) {
              int[] c = {2 * i + 1, 2 * j + 1, 2 * k + 1};
              c[axis] += side == 0 ? -1 : 1;
              int faceCentre = index[c[0] + g * (c[1] + g * c[2])];
              int u = (axis + 1) % 3;
              int w = (axis + 2) % 3;
              int[][] around = {{-1, -1}, {1, -1}, {1, 1}, {-1, 1}};
              int[] ring = new int[4];
              for (int q = 0; q < 4; q++) {
                int[] p = c.clone();
                p[u] += around[q][0];
                p[w] += around[q][1];
                ring[q] = index[p[0] + g * (p[1] + g * p[2])];
              }
              boolean boundary = c[axis] == 0 || c[axis] == g - 1;
              for (int q = 0; q < 4; q++) {
                int a = ring[q];
                int b = ring[(q + 1) % 4];
                int base = 4 * tetCount;
                tets[base] = centre;
                tets[base + 1] = faceCentre;
                tets[base + 2] = a;
                tets[base + 3] = b;
                if (signedVolume(xyz, tets, tetCount) < 0) {
                  tets[base + 2] = b;
                  tets[base + 3] = a;
                }
                tetCount++;
                if (boundary) {
                  faceNodes[3 * faceCount] = faceCentre;
                  faceNodes[3 * faceCount + 1] = a;
                  faceNodes[3 * faceCount + 2] = b;
                  faceGroup[faceCount++] = 2 * axis + side;
                }
              }
            }
          }
        }
      }
    }
    String[] names = {"xmin", "xmax", "ymin", "ymax", "zmin", "zmax"};
    java.util.List<dev.soakfield.mesh.FaceGroup> groups = new java.util.ArrayList<>();
    for (int f = 0; f < 6; f++) {
      groups.add(
          new dev.soakfield.mesh.FaceGroup(
              names[f], f + 1, dev.soakfield.mesh.FaceGroupKind.EXTERIOR));
    }
    TetMesh mesh =
        new TetMesh.Builder()
            .nodes(java.util.Arrays.copyOf(xyz, 3 * nodes))
            .order(1)
            .tets(tets, new int[tetCount])
            .faces(faceNodes, faceGroup)
            .volumeGroups(java.util.List.of(new dev.soakfield.mesh.VolumeGroup("body", 1)))
            .faceGroups(groups)
            .build();
    return jittered(mesh, seed);
  }

  /** The O-grid map of logical point ξ onto the ball (see {@link #ball}). */
  private static double[] ballPoint(double radius, double x, double y, double z) {
    double c = 0.5;
    double inner = 0.35 * radius;
    double[] xi = {x, y, z};
    double m = Math.max(Math.abs(x), Math.max(Math.abs(y), Math.abs(z)));
    double[] p = new double[3];
    if (m <= c) {
      for (int r = 0; r < 3; r++) {
        p[r] = xi[r] * inner / c;
      }
      return p;
    }
    double qn = 0;
    for (int r = 0; r < 3; r++) {
      qn += (xi[r] * c / m) * (xi[r] * c / m);
    }
    qn = Math.sqrt(qn);
    double s = (m - c) / (1 - c);
    for (int r = 0; r < 3; r++) {
      double q = xi[r] * c / m;
      p[r] = (1 - s) * q * inner / c + s * radius * q / qn;
    }
    return p;
  }

  private static double signedVolume(double[] xyz, int[] tets, int t) {
    int a = tets[4 * t];
    double[] e = new double[9];
    for (int k = 0; k < 3; k++) {
      int b = tets[4 * t + k + 1];
      for (int r = 0; r < 3; r++) {
        e[3 * k + r] = xyz[3 * b + r] - xyz[3 * a + r];
      }
    }
    return e[0] * (e[4] * e[8] - e[5] * e[7])
        - e[1] * (e[3] * e[8] - e[5] * e[6])
        + e[2] * (e[3] * e[7] - e[4] * e[6]);
  }

  /** A solid cylinder on the z axis (the structured O-grid), inner nodes jittered. */
  static TetMesh cylinder(
      double radius, double height, int nRadial, int nAround, int nz, long seed) {
    TetMesh mesh =
        StructuredMesher.cylinder(
            radius, height, nRadial, nAround, nz, 1, dev.soakfield.mesh.gen.Grading.NONE, true);
    return jittered(mesh, seed);
  }

  /**
   * The quadratic form of a linear mesh, with every mid-edge node whose edge joins two nodes of a
   * curved wall moved onto it: a sphere about the origin ({@code axial} false) or a cylinder about
   * the z axis ({@code axial} true) of the given radius.
   */
  static TetMesh quadratic(TetMesh linear, double radius, boolean axial) {
    TetMesh q = MidEdgeNodes.promote(linear);
    double[] xyz = q.copyCoordinates();
    for (int t = 0; t < q.tetCount(); t++) {
      for (int e = 0; e < 6; e++) {
        int a = q.tetNode(t, dev.soakfield.fem.element.TetBasis.edgeStart(e));
        int b = q.tetNode(t, dev.soakfield.fem.element.TetBasis.edgeEnd(e));
        int mid = q.tetNode(t, 4 + e);
        if (onWall(xyz, a, radius, axial) && onWall(xyz, b, radius, axial)) {
          double s = radius / radialDistance(xyz, mid, axial);
          xyz[3 * mid] *= s;
          xyz[3 * mid + 1] *= s;
          if (!axial) {
            xyz[3 * mid + 2] *= s;
          }
        }
      }
    }
    return rebuilt(q, xyz, 2);
  }

  private static boolean onWall(double[] xyz, int v, double radius, boolean axial) {
    return Math.abs(radialDistance(xyz, v, axial) - radius) <= 1e-9 * radius;
  }

  private static double radialDistance(double[] xyz, int v, boolean axial) {
    double x = xyz[3 * v];
    double y = xyz[3 * v + 1];
    double z = axial ? 0 : xyz[3 * v + 2];
    return Math.sqrt(x * x + y * y + z * z);
  }

  private static TetMesh rebuilt(TetMesh m, double[] xyz, int order) {
    return new TetMesh.Builder()
        .nodes(xyz)
        .order(order)
        .tets(m.copyTets(), m.copyTetGroups())
        .faces(m.copyFaces(), m.copyFaceGroups())
        .volumeGroups(m.volumeGroups())
        .faceGroups(m.faceGroups())
        .build();
  }

  private static double[] unitBallPoint(SplittableRandom random) {
    while (true) {
      double x = 2 * random.nextDouble() - 1;
      double y = 2 * random.nextDouble() - 1;
      double z = 2 * random.nextDouble() - 1;
      if (x * x + y * y + z * z <= 1) {
        return new double[] {x, y, z};
      }
    }
  }

  private static double distance(double[] xyz, int p, int q) {
    double dx = xyz[3 * p] - xyz[3 * q];
    double dy = xyz[3 * p + 1] - xyz[3 * q + 1];
    double dz = xyz[3 * p + 2] - xyz[3 * q + 2];
    return Math.sqrt(dx * dx + dy * dy + dz * dz);
  }

  private static int[][] tetsOfNodes(TetMesh m) {
    int[] count = new int[m.nodeCount()];
    for (int t = 0; t < m.tetCount(); t++) {
      for (int k = 0; k < 4; k++) {
        count[m.tetNode(t, k)]++;
      }
    }
    int[][] out = new int[m.nodeCount()][];
    for (int v = 0; v < out.length; v++) {
      out[v] = new int[count[v]];
      count[v] = 0;
    }
    for (int t = 0; t < m.tetCount(); t++) {
      for (int k = 0; k < 4; k++) {
        int v = m.tetNode(t, k);
        out[v][count[v]++] = t;
      }
    }
    return out;
  }

  /** Whether each listed tetrahedron keeps the orientation it had on the unmoved mesh. */
  private static boolean allPositive(TetMesh m, double[] original, double[] xyz, int[] tets) {
    for (int t : tets) {
      if (signedVolume(m, xyz, t) * signedVolume(m, original, t) <= 0) {
        return false;
      }
    }
    return true;
  }

  private static double signedVolume(TetMesh m, double[] xyz, int t) {
    int a = m.tetNode(t, 0);
    double[] e = new double[9];
    for (int k = 0; k < 3; k++) {
      int b = m.tetNode(t, k + 1);
      for (int r = 0; r < 3; r++) {
        e[3 * k + r] = xyz[3 * b + r] - xyz[3 * a + r];
      }
    }
    return e[0] * (e[4] * e[8] - e[5] * e[7])
        - e[1] * (e[3] * e[8] - e[5] * e[6])
        + e[2] * (e[3] * e[7] - e[4] * e[6]);
  }
}
