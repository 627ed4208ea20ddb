package dev.soakfield.app;

import dev.soakfield.mesh.FaceGroup;
import dev.soakfield.mesh.FaceGroupKind;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.VolumeGroup;
import java.util.ArrayList;
import java.util.List;

/**
 * What the view needs of a mesh, as primitive arrays: nodes, tetrahedra (MSH node order) with their
 * part, the tagged faces with their face group, and the names. Made from a {@link TetMesh}.
 */
public final class PartGeometry {
  final double[] xyz;
  final int[] tets;
  final int nodesPerTet;
  final int[] tetPart;
  final int[] faces;
  final int nodesPerFace;
  final int[] faceGroupOfFace;

  /** Per face group: its faces lie on the outside (each belongs to one tetrahedron). */
  final boolean[] exteriorGroup;

  private final List<String> partNames;
  private final List<String> faceGroupNames;
  private final double[] bounds;

  private PartGeometry(TetMesh mesh) {
    TetMesh.Shared own = mesh.shared(); // read only here: no second copy of a large mesh
    this.xyz = own.xyz();
    this.tets = own.tets();
    this.nodesPerTet = mesh.nodesPerTet();
    this.tetPart = own.tetGroups();
    this.faces = own.faces();
    this.nodesPerFace = mesh.nodesPerFace();
    this.faceGroupOfFace = own.faceGroups();
    List<String> parts = new ArrayList<>();
    for (VolumeGroup g : mesh.volumeGroups()) {
      parts.add(g.name());
    }
    List<String> groups = new ArrayList<>();
    this.exteriorGroup = new boolean[mesh.faceGroups().size()];
    for (FaceGroup g : mesh.faceGroups()) {
      exteriorGroup[groups.size()] = g.kind() == FaceGroupKind.EXTERIOR;
      groups.add(g.name());
    }
    this.partNames = List.copyOf(parts);
    this.faceGroupNames = List.copyOf(groups);
    this.bounds = boundsOf(xyz);
  }

  public static PartGeometry of(TetMesh mesh) {
    return new PartGeometry(mesh);
  }

  public int nodeCount() {
    return xyz.length / 3;
  }

  public int tetCount() {
    return tets.length / nodesPerTet;
  }

  public int nodesPerTet() {
    return nodesPerTet;
  }

  public List<String> partNames() {
    return partNames;
  }

  public List<String> faceGroupNames() {
    return faceGroupNames;
  }

  /** Copy of xmin, ymin, zmin, xmax, ymax, zmax. */
  public double[] bounds() {
    return bounds.clone();
  }

  /** The node coordinates, not copied (for the geometry kernels). */
  public double[] coordinates() {
    return xyz;
  }

  /** The connectivity, not copied (for the geometry kernels). */
  public int[] connectivity() {
    return tets;
  }

  /** Part of each tetrahedron, not copied. */
  public int[] tetParts() {
    return tetPart;
  }

  /** Largest extent of the bounding box. */
  public double size() {
    return Math.max(bounds[3] - bounds[0], Math.max(bounds[4] - bounds[1], bounds[5] - bounds[2]));
  }

  private static double[] boundsOf(double[] p) {
    double[] b = {
      Double.POSITIVE_INFINITY,
      Double.POSITIVE_INFINITY,
      Double.POSITIVE_INFINITY,
      Double.NEGATIVE_INFINITY,
      Double.NEGATIVE_INFINITY,
      Double.NEGATIVE_INFINITY
    };
    for (int i = 0; i < p.length; i += 3) {
      for (int k = 0; k < 3; k++) {
        b[k] = Math.min(b[k], p[i + k]);
        b[3 + k] = Math.max(b[3 + k], p[i + k]);
      }
    }
    return b;
  }
}
