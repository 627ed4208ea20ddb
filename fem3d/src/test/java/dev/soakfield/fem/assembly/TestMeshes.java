package dev.soakfield.fem.assembly;

import dev.soakfield.mesh.TetMesh;
import java.util.Arrays;

/** Helpers over test meshes: faces of a group, interior nodes, rigidly moved copies. */
final class TestMeshes {
  private TestMeshes() {}

  static int[] facesOf(TetMesh mesh, String group) {
    int g = mesh.faceGroupIndex(group);
    int[] out = new int[mesh.faceCount()];
    int n = 0;
    for (int f = 0; f < mesh.faceCount(); f++) {
      if (mesh.faceGroup(f) == g) {
        out[n++] = f;
      }
    }
    return Arrays.copyOf(out, n);
  }

  static int[] allFaces(TetMesh mesh) {
    int[] out = new int[mesh.faceCount()];
    for (int f = 0; f < out.length; f++) {
      out[f] = f;
    }
    return out;
  }

  /** Nodes on no boundary face. */
  static boolean[] interior(TetMesh mesh) {
    boolean[] in = new boolean[mesh.nodeCount()];
    Arrays.fill(in, true);
    for (int f = 0; f < mesh.faceCount(); f++) {
      for (int k = 0; k < mesh.nodesPerFace(); k++) {
        in[mesh.faceNode(f, k)] = false;
      }
    }
    return in;
  }

  /** The same mesh turned by {@code angle} about the z axis (connectivity unchanged). */
  static TetMesh rotatedAboutZ(TetMesh mesh, double angle) {
    double[] xyz = mesh.copyCoordinates();
    double c = Math.cos(angle);
    double s = Math.sin(angle);
    for (int i = 0; i < mesh.nodeCount(); i++) {
      double x = xyz[3 * i];
      double y = xyz[3 * i + 1];
      xyz[3 * i] = c * x - s * y;
      xyz[3 * i + 1] = s * x + c * y;
    }
    return new TetMesh.Builder()
        .nodes(xyz)
        .order(mesh.order())
        .tets(mesh.copyTets(), mesh.copyTetGroups())
        .faces(mesh.copyFaces(), mesh.copyFaceGroups())
        .volumeGroups(mesh.volumeGroups())
        .faceGroups(mesh.faceGroups())
        .build();
  }

  /** The same tensor (xx, yy, zz, xy, yz, zx) for every tetrahedron. */
  static double[] uniformTensor(TetMesh mesh, double... t) {
    double[] out = new double[6 * mesh.tetCount()];
    for (int k = 0; k < out.length; k++) {
      out[k] = t[k % 6];
    }
    return out;
  }

  static double[] filled(int n, double v) {
    double[] a = new double[n];
    Arrays.fill(a, v);
    return a;
  }

  static double[] nodal(TetMesh mesh, Field f) {
    double[] u = new double[mesh.nodeCount()];
    for (int i = 0; i < u.length; i++) {
      u[i] = f.at(mesh.coord(i, 0), mesh.coord(i, 1), mesh.coord(i, 2));
    }
    return u;
  }

  interface Field {
    double at(double x, double y, double z);
  }

  static double maxAbs(double[] a) {
    double m = 0;
    for (double v : a) {
      m = Math.max(m, Math.abs(v));
    }
    return m;
  }
}
