package dev.soakfield.mesh.topo;

import dev.soakfield.mesh.MeshInputException;
import dev.soakfield.mesh.TetMesh;
import java.util.Locale;
import java.util.Objects;

/**
 * Measures of a {@link TetMesh} from the corner nodes of its elements (straight sides, also for
 * quadratic meshes): volumes, areas, extent, dihedral angles, volume ratio and face normals.
 */
public final class MeshGeometry {
  private MeshGeometry() {}

  /** Signed volume of tetrahedron {@code tet}, m^3; positive for the mesh's own orientation. */
  public static double tetVolume(TetMesh mesh, int tet) {
    double[] p = tetCorners(mesh, tet);
    return TetShape.signedVolume(p, 0, 1, 2, 3);
  }

  /** Area of face {@code face}, m^2. */
  public static double faceArea(TetMesh mesh, int face) {
    double[] p = faceCorners(mesh, face);
    return TetShape.triangleArea(p, 0, 1, 2, new double[3]);
  }

  /** Sum of the signed tetrahedron volumes of each volume group, in group order. */
  public static double[] groupVolumes(TetMesh mesh) {
    Objects.requireNonNull(mesh, "mesh");
    double[] xyz = mesh.copyCoordinates();
    int[] tets = mesh.copyTets();
    int per = mesh.nodesPerTet();
    double[] sum = new double[mesh.volumeGroups().size()];
    for (int t = 0; t < mesh.tetCount(); t++) {
      int b = t * per;
      sum[mesh.tetGroup(t)] +=
          TetShape.signedVolume(xyz, tets[b], tets[b + 1], tets[b + 2], tets[b + 3]);
    }
    return sum;
  }

  /** Sum of the face areas of each face group, in group order. */
  public static double[] groupAreas(TetMesh mesh) {
    Objects.requireNonNull(mesh, "mesh");
    double[] xyz = mesh.copyCoordinates();
    int[] faces = mesh.copyFaces();
    int per = mesh.nodesPerFace();
    double[] scratch = new double[3];
    double[] sum = new double[mesh.faceGroups().size()];
    for (int f = 0; f < mesh.faceCount(); f++) {
      int b = f * per;
      sum[mesh.faceGroup(f)] +=
          TetShape.triangleArea(xyz, faces[b], faces[b + 1], faces[b + 2], scratch);
    }
    return sum;
  }

  /**
   * The box the tetrahedra fill (nodes of no tetrahedron left out): {xmin, ymin, zmin, xmax, ymax,
   * zmax}.
   *
   * @throws IllegalArgumentException for a mesh without tetrahedra
   */
  public static double[] boundingBox(TetMesh mesh) {
    Objects.requireNonNull(mesh, "mesh");
    if (mesh.tetCount() == 0) {
      throw new IllegalArgumentException("a mesh without tetrahedra has no bounding box");
    }
    double[] box = {
      Double.MAX_VALUE, Double.MAX_VALUE, Double.MAX_VALUE,
      -Double.MAX_VALUE, -Double.MAX_VALUE, -Double.MAX_VALUE
    };
    int per = mesh.nodesPerTet();
    for (int t = 0; t < mesh.tetCount(); t++) {
      for (int k = 0; k < per; k++) {
        int node = mesh.tetNode(t, k);
        for (int axis = 0; axis < 3; axis++) {
          double v = mesh.coord(node, axis);
          box[axis] = Math.min(box[axis], v);
          box[axis + 3] = Math.max(box[axis + 3], v);
        }
      }
    }
    return box;
  }

  /**
   * The six dihedral angles of tetrahedron {@code tet} in degrees, at edges (0,1), (1,2), (2,0),
   * (3,0), (3,2), (3,1) (the order of the mid-edge nodes).
   *
   * @throws MeshInputException when a face of the tetrahedron has zero area
   */
  public static double[] dihedralAnglesDeg(TetMesh mesh, int tet) {
    double[] p = tetCorners(mesh, tet);
    double[] angles = new double[6];
    if (!TetShape.dihedralAnglesDeg(p, 0, 1, 2, 3, new double[16], angles)) {
      throw new MeshInputException(
          "mesh",
          "tetrahedron " + tet,
          "a face of zero area (corners " + describe(cornersOfTet(mesh, tet), p) + ")",
          "four corners not in one plane, so that dihedral angles exist");
    }
    return angles;
  }

  /**
   * Volume ratio 6 sqrt(2) V / l_rms^3 (l_rms: root mean square edge length): 1 for the regular
   * tetrahedron, 0 for a flat one, negative for an inverted one. From memory: the volume-length
   * measure in J. R. Shewchuk, "What Is a Good Linear Finite Element?" (2002), normalized to 1.
   */
  public static double volumeRatio(TetMesh mesh, int tet) {
    double[] p = tetCorners(mesh, tet);
    return TetShape.volumeRatio(p, 0, 1, 2, 3);
  }

  /**
   * Unit right-hand normal of face {@code face} (corners 0, 1, 2). The assembler writes exterior
   * faces so that this points out of the mesh, interface faces so that it points out of their
   * lower-numbered tetrahedron.
   *
   * @throws MeshInputException when the face has zero area (no normal exists), naming the face and
   *     the coordinates of its corners
   */
  public static double[] outwardNormal(TetMesh mesh, int face) {
    double[] p = faceCorners(mesh, face);
    double[] n = new double[3];
    if (!TetShape.unitNormal(p, 0, 1, 2, n, 0)) {
      int[] nodes = {mesh.faceNode(face, 0), mesh.faceNode(face, 1), mesh.faceNode(face, 2)};
      throw new MeshInputException(
          "mesh",
          "face " + face,
          "a triangle of zero area with corners " + describe(nodes, p),
          "three corners not on one line, so that a normal exists");
    }
    return n;
  }

  private static double[] tetCorners(TetMesh mesh, int tet) {
    Objects.requireNonNull(mesh, "mesh");
    Objects.checkIndex(tet, mesh.tetCount());
    return gather(mesh, cornersOfTet(mesh, tet));
  }

  private static int[] cornersOfTet(TetMesh mesh, int tet) {
    return new int[] {
      mesh.tetNode(tet, 0), mesh.tetNode(tet, 1), mesh.tetNode(tet, 2), mesh.tetNode(tet, 3)
    };
  }

  private static double[] faceCorners(TetMesh mesh, int face) {
    Objects.requireNonNull(mesh, "mesh");
    Objects.checkIndex(face, mesh.faceCount());
    return gather(
        mesh, new int[] {mesh.faceNode(face, 0), mesh.faceNode(face, 1), mesh.faceNode(face, 2)});
  }

  private static double[] gather(TetMesh mesh, int[] nodes) {
    double[] p = new double[3 * nodes.length];
    for (int k = 0; k < nodes.length; k++) {
      for (int axis = 0; axis < 3; axis++) {
        p[3 * k + axis] = mesh.coord(nodes[k], axis);
      }
    }
    return p;
  }

  /** "node 3 (0, 0, 1), node 7 (...)" with 0-based node indices. */
  private static String describe(int[] nodes, double[] p) {
    StringBuilder sb = new StringBuilder();
    for (int k = 0; k < nodes.length; k++) {
      if (k > 0) {
        sb.append(", ");
      }
      sb.append(
          String.format(
              Locale.ROOT,
              "node %d (%.9g, %.9g, %.9g)",
              nodes[k],
              p[3 * k],
              p[3 * k + 1],
              p[3 * k + 2]));
    }
    return sb.toString();
  }
}
