package dev.soakfield.mesh.topo;

import dev.soakfield.mesh.FaceGroup;
import dev.soakfield.mesh.TetMesh;
import java.util.ArrayList;
import java.util.List;

/**
 * Changes to a mesh's face groups made while a case is set up: one big group (say every exterior
 * face a mesher left untagged) split into patches at sharp edges, and groups renamed. Nodes,
 * tetrahedra and every other group stay as they were.
 */
public final class FaceGroupEdit {
  private FaceGroupEdit() {}

  /**
   * Replaces {@code group} by its patches, named {@code <group>-1}, {@code <group>-2}, ... in the
   * order of their lowest face; a group that stays one patch comes back unchanged.
   *
   * @throws IllegalArgumentException for a group the mesh lacks, or an angle outside (0, 180)
   */
  public static TetMesh splitByFeatureAngle(TetMesh mesh, String group, double angleDeg) {
    new AssemblyOptions(angleDeg); // checks the angle's range, with its message
    int g = index(mesh, group);
    int per = mesh.nodesPerFace();
    int[] faces = mesh.copyFaces();
    int[] groups = mesh.copyFaceGroups();
    List<Integer> members = new ArrayList<>();
    for (int f = 0; f < groups.length; f++) {
      if (groups[f] == g) {
        members.add(f);
      }
    }
    int[] corner = new int[3 * members.size()];
    for (int i = 0; i < members.size(); i++) {
      System.arraycopy(faces, per * members.get(i), corner, 3 * i, 3);
    }
    FeaturePatches patches = FeaturePatches.ofTriangles(mesh.copyCoordinates(), corner, angleDeg);
    if (patches.patchCount() <= 1) {
      return mesh;
    }
    List<FaceGroup> named = new ArrayList<>(mesh.faceGroups());
    FaceGroup old = named.get(g);
    int tag = 0;
    for (FaceGroup fg : named) {
      tag = Math.max(tag, fg.tag());
    }
    List<String> taken = names(mesh);
    int[] indexOfPatch = new int[patches.patchCount()];
    for (int p = 0; p < patches.patchCount(); p++) {
      String name = old.name() + "-" + (p + 1);
      if (taken.contains(name)) {
        throw new IllegalArgumentException(
            "cannot split '" + group + "': the mesh already has a face group '" + name + "'");
      }
      FaceGroup patch = new FaceGroup(name, p == 0 ? old.tag() : ++tag, old.kind());
      if (p == 0) {
        named.set(g, patch);
        indexOfPatch[p] = g;
      } else {
        named.add(patch);
        indexOfPatch[p] = named.size() - 1;
      }
    }
    for (int i = 0; i < members.size(); i++) {
      groups[members.get(i)] = indexOfPatch[patches.patchOf(i)];
    }
    return rebuilt(mesh, groups, named);
  }

  /**
   * The mesh with face group {@code from} named {@code to}.
   *
   * @throws IllegalArgumentException for a group the mesh lacks, or a name that is empty, taken, or
   *     holds a quote or line break (which an MSH physical name cannot keep)
   */
  public static TetMesh rename(TetMesh mesh, String from, String to) {
    int g = index(mesh, from);
    String name = to.strip();
    if (name.isEmpty() || name.contains("\"") || name.contains("\n") || name.contains("\r")) {
      throw new IllegalArgumentException(
          "found the name '" + to + "', expected a name without quotes or line breaks");
    }
    if (names(mesh).contains(name) && !name.equals(from)) {
      throw new IllegalArgumentException("the mesh already has a face group '" + name + "'");
    }
    List<FaceGroup> named = new ArrayList<>(mesh.faceGroups());
    FaceGroup old = named.get(g);
    named.set(g, new FaceGroup(name, old.tag(), old.kind()));
    return rebuilt(mesh, mesh.copyFaceGroups(), named);
  }

  private static int index(TetMesh mesh, String group) {
    int g = mesh.faceGroupIndex(group);
    if (g < 0) {
      throw new IllegalArgumentException(
          "found no face group '" + group + "', expected one of " + String.join(", ", names(mesh)));
    }
    return g;
  }

  private static List<String> names(TetMesh mesh) {
    List<String> out = new ArrayList<>();
    for (FaceGroup fg : mesh.faceGroups()) {
      out.add(fg.name());
    }
    return out;
  }

  private static TetMesh rebuilt(TetMesh mesh, int[] faceGroups, List<FaceGroup> named) {
    return new TetMesh.Builder()
        .nodes(mesh.copyCoordinates())
        .order(mesh.order())
        .tets(mesh.copyTets(), mesh.copyTetGroups())
        .faces(mesh.copyFaces(), faceGroups)
        .volumeGroups(mesh.volumeGroups())
        .faceGroups(named)
        .build();
  }
}
