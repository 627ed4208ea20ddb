package dev.soakfield.fem.assembly;

import dev.soakfield.mesh.TetMesh;
import java.util.Objects;

/**
 * The discrete space: the mesh's nodes are the unknowns (4-node tetrahedra: linear; 10-node
 * tetrahedra: quadratic). Holds the mesh's arrays once for the kernels of this package.
 */
public final class FeSpace {
  private final TetMesh mesh;
  private final double[] xyz;
  private final int[] tets;
  private final int[] faces;

  private FeSpace(TetMesh mesh) {
    this.mesh = mesh;
    TetMesh.Shared own = mesh.shared(); // read only, as this class uses them: no second copy
    this.xyz = own.xyz();
    this.tets = own.tets();
    this.faces = own.faces();
  }

  /** The space of the mesh's order. */
  public static FeSpace of(TetMesh mesh) {
    return new FeSpace(Objects.requireNonNull(mesh, "mesh"));
  }

  public TetMesh mesh() {
    return mesh;
  }

  /** Number of unknowns, one per mesh node. */
  public int dofCount() {
    return mesh.nodeCount();
  }

  /** 1 (linear) or 2 (quadratic). */
  public int order() {
    return mesh.order();
  }

  int nodesPerTet() {
    return mesh.nodesPerTet();
  }

  int nodesPerFace() {
    return mesh.nodesPerFace();
  }

  /** Node coordinates x0, y0, z0, x1, ... (shared; read only). */
  double[] coordinates() {
    return xyz;
  }

  /** Tetrahedron connectivity (shared; read only). */
  int[] tetNodes() {
    return tets;
  }

  /** Face connectivity (shared; read only). */
  int[] faceNodes() {
    return faces;
  }

  /** Copies the coordinates of the {@code per} nodes of element {@code e} into x. */
  static void gather(double[] xyz, int[] conn, int e, int per, double[] x) {
    int base = e * per;
    for (int k = 0; k < per; k++) {
      int p = 3 * conn[base + k];
      x[3 * k] = xyz[p];
      x[3 * k + 1] = xyz[p + 1];
      x[3 * k + 2] = xyz[p + 2];
    }
  }
}
