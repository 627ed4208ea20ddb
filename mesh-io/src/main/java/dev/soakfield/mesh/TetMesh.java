package dev.soakfield.mesh;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * An immutable tetrahedral mesh: node coordinates, 4- or 10-node tetrahedra with a volume group
 * each, and 3- or 6-node triangles (boundary and interface faces) with a face group each.
 *
 * <p>Node order follows the MSH convention: a 10-node tetrahedron has its corners 0–3, then
 * mid-edge nodes on edges (0,1), (1,2), (2,0), (3,0), (3,2), (3,1); a 6-node triangle its corners
 * 0–2, then nodes on (0,1), (1,2), (2,0). Tetrahedra are positively oriented (corner 3 lies on the
 * side of face 0-1-2 that its right-hand normal points to).
 *
 * <p>Storage is primitive arrays; accessors read without copying, the {@code copy...} methods hand
 * out copies. Instances are built with {@link Builder}, which checks sizes and index ranges once.
 */
public final class TetMesh {
  private final double[] xyz;
  private final int order;
  private final int[] tets;
  private final int[] tetGroup;
  private final int[] faces;
  private final int[] faceGroup;
  private final List<VolumeGroup> volumeGroups;
  private final List<FaceGroup> faceGroups;

  private TetMesh(Builder b) {
    this.xyz = b.xyz;
    this.order = b.order;
    this.tets = b.tets;
    this.tetGroup = b.tetGroup;
    this.faces = b.faces;
    this.faceGroup = b.faceGroup;
    this.volumeGroups = List.copyOf(b.volumeGroups);
    this.faceGroups = List.copyOf(b.faceGroups);
  }

  /** Element order: 1 for 4-node tetrahedra and 3-node triangles, 2 for 10-node and 6-node. */
  public int order() {
    return order;
  }

  public int nodesPerTet() {
    return order == 1 ? 4 : 10;
  }

  public int nodesPerFace() {
    return order == 1 ? 3 : 6;
  }

  public int nodeCount() {
    return xyz.length / 3;
  }

  public int tetCount() {
    return tetGroup.length;
  }

  public int faceCount() {
    return faceGroup.length;
  }

  /** Coordinate {@code axis} (0 = x, 1 = y, 2 = z) of {@code node}, in metres. */
  public double coord(int node, int axis) {
    return xyz[3 * node + axis];
  }

  /** The {@code k}-th node of tetrahedron {@code tet}. */
  public int tetNode(int tet, int k) {
    return tets[tet * nodesPerTet() + k];
  }

  /** Index into {@link #volumeGroups()} of tetrahedron {@code tet}. */
  public int tetGroup(int tet) {
    return tetGroup[tet];
  }

  /** The {@code k}-th node of face {@code face}. */
  public int faceNode(int face, int k) {
    return faces[face * nodesPerFace() + k];
  }

  /** Index into {@link #faceGroups()} of face {@code face}. */
  public int faceGroup(int face) {
    return faceGroup[face];
  }

  public List<VolumeGroup> volumeGroups() {
    return volumeGroups;
  }

  public List<FaceGroup> faceGroups() {
    return faceGroups;
  }

  /** Index of the volume group named {@code name}, or -1. */
  public int volumeGroupIndex(String name) {
    for (int i = 0; i < volumeGroups.size(); i++) {
      if (volumeGroups.get(i).name().equals(name)) {
        return i;
      }
    }
    return -1;
  }

  /** Index of the face group named {@code name}, or -1. */
  public int faceGroupIndex(String name) {
    for (int i = 0; i < faceGroups.size(); i++) {
      if (faceGroups.get(i).name().equals(name)) {
        return i;
      }
    }
    return -1;
  }

  /** Node coordinates x0, y0, z0, x1, ... (a copy). */
  public double[] copyCoordinates() {
    return xyz.clone();
  }

  /** Tetrahedron connectivity, {@link #nodesPerTet()} entries per tetrahedron (a copy). */
  public int[] copyTets() {
    return tets.clone();
  }

  /** Volume group index per tetrahedron (a copy). */
  public int[] copyTetGroups() {
    return tetGroup.clone();
  }

  /** Face connectivity, {@link #nodesPerFace()} entries per face (a copy). */
  public int[] copyFaces() {
    return faces.clone();
  }

  /** Face group index per face (a copy). */
  public int[] copyFaceGroups() {
    return faceGroup.clone();
  }

  /**
   * The mesh's own arrays, not copies, for readers of millions of entries that must not hold a
   * second copy of a large mesh (the solver's element loops, the picture's geometry). Read only:
   * the mesh stays immutable only as long as these readers never write into them.
   */
  public Shared shared() {
    return new Shared(xyz, tets, tetGroup, faces, faceGroup);
  }

  /**
   * See {@link #shared()}.
   *
   * @param xyz node coordinates x0, y0, z0, x1, ...
   * @param tets connectivity, {@link #nodesPerTet()} entries per tetrahedron
   * @param tetGroups volume group index per tetrahedron
   * @param faces connectivity, {@link #nodesPerFace()} entries per face
   * @param faceGroups face group index per face
   */
  @SuppressWarnings("ArrayRecordComponent") // shared on purpose, see above
  public record Shared(double[] xyz, int[] tets, int[] tetGroups, int[] faces, int[] faceGroups) {}

  /** True when both meshes hold the same numbers, connectivity and groups (names, tags, kinds). */
  public boolean sameAs(TetMesh other) {
    return order == other.order
        && Arrays.equals(xyz, other.xyz)
        && Arrays.equals(tets, other.tets)
        && Arrays.equals(tetGroup, other.tetGroup)
        && Arrays.equals(faces, other.faces)
        && Arrays.equals(faceGroup, other.faceGroup)
        && volumeGroups.equals(other.volumeGroups)
        && faceGroups.equals(other.faceGroups);
  }

  @Override
  public String toString() {
    return "TetMesh[nodes="
        + nodeCount()
        + ", tets="
        + tetCount()
        + ", order="
        + order
        + ", faces="
        + faceCount()
        + ", volumeGroups="
        + volumeGroups.size()
        + ", faceGroups="
        + faceGroups.size()
        + "]";
  }

  /** Collects the arrays of a mesh and checks them once; the arrays are taken over, not copied. */
  public static final class Builder {
    private double[] xyz;
    private int order = 1;
    private int[] tets;
    private int[] tetGroup;
    private int[] faces = new int[0];
    private int[] faceGroup = new int[0];
    private final List<VolumeGroup> volumeGroups = new ArrayList<>();
    private final List<FaceGroup> faceGroups = new ArrayList<>();

    /** Node coordinates x0, y0, z0, x1, ... in metres; the array is taken over. */
    public Builder nodes(double[] xyz) {
      this.xyz = Objects.requireNonNull(xyz, "xyz");
      return this;
    }

    /** Element order, 1 (linear) or 2 (quadratic). */
    public Builder order(int order) {
      this.order = order;
      return this;
    }

    /** Tetrahedra (4 or 10 node indices each) and the volume group index of each. */
    public Builder tets(int[] connectivity, int[] groupPerTet) {
      this.tets = Objects.requireNonNull(connectivity, "connectivity");
      this.tetGroup = Objects.requireNonNull(groupPerTet, "groupPerTet");
      return this;
    }

    /** Boundary and interface triangles (3 or 6 node indices each) and their face group index. */
    public Builder faces(int[] connectivity, int[] groupPerFace) {
      this.faces = Objects.requireNonNull(connectivity, "connectivity");
      this.faceGroup = Objects.requireNonNull(groupPerFace, "groupPerFace");
      return this;
    }

    public Builder volumeGroups(List<VolumeGroup> groups) {
      volumeGroups.clear();
      volumeGroups.addAll(groups);
      return this;
    }

    public Builder faceGroups(List<FaceGroup> groups) {
      faceGroups.clear();
      faceGroups.addAll(groups);
      return this;
    }

    /**
     * Checks sizes, index ranges and name uniqueness, then builds the mesh.
     *
     * @throws IllegalArgumentException when the arrays do not fit together (a programming error:
     *     readers report user mistakes as {@link MeshInputException} before they get here)
     */
    public TetMesh build() {
      if (xyz == null || tets == null) {
        throw new IllegalArgumentException("nodes and tetrahedra are required");
      }
      if (order != 1 && order != 2) {
        throw new IllegalArgumentException("order must be 1 or 2, got " + order);
      }
      if (xyz.length % 3 != 0) {
        throw new IllegalArgumentException("coordinate array length is not a multiple of 3");
      }
      int perTet = order == 1 ? 4 : 10;
      int perFace = order == 1 ? 3 : 6;
      checkConnectivity("tetrahedron", tets, tetGroup, perTet, xyz.length / 3, volumeGroups.size());
      checkConnectivity("face", faces, faceGroup, perFace, xyz.length / 3, faceGroups.size());
      checkUnique(volumeGroups.stream().map(VolumeGroup::name).toList(), "volume");
      checkUnique(faceGroups.stream().map(FaceGroup::name).toList(), "face");
      return new TetMesh(this);
    }

    private static void checkConnectivity(
        String what, int[] conn, int[] group, int per, int nodeCount, int groupCount) {
      if (conn.length != group.length * per) {
        throw new IllegalArgumentException(
            what + " connectivity has " + conn.length + " entries for " + group.length + " items");
      }
      for (int i = 0; i < conn.length; i++) {
        if (conn[i] < 0 || conn[i] >= nodeCount) {
          throw new IllegalArgumentException(
              what + " " + (i / per) + " refers to node " + conn[i] + " of " + nodeCount);
        }
      }
      for (int i = 0; i < group.length; i++) {
        if (group[i] < 0 || group[i] >= groupCount) {
          throw new IllegalArgumentException(
              what + " " + i + " has group " + group[i] + " of " + groupCount);
        }
      }
    }

    private static void checkUnique(List<String> names, String what) {
      Set<String> seen = new HashSet<>();
      for (String n : names) {
        if (!seen.add(n)) {
          throw new IllegalArgumentException("duplicate " + what + " group name '" + n + "'");
        }
      }
    }
  }
}
