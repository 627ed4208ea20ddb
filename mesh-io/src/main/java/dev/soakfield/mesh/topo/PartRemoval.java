package dev.soakfield.mesh.topo;

import dev.soakfield.mesh.FaceGroup;
import dev.soakfield.mesh.FaceGroupKind;
import dev.soakfield.mesh.TetMesh;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The mesh without some parts (volume groups): their tetrahedra and the nodes only they used go; a
 * face group that joined a removed part to a kept one lies on the exterior afterwards. Every group
 * keeps its name and place, so a case's names still fit (a removed part has no tetrahedra).
 */
public final class PartRemoval {
  /** Corner triples of the four faces of a tetrahedron (local corner numbers). */
  private static final int[][] FACES = {{1, 2, 3}, {0, 2, 3}, {0, 1, 3}, {0, 1, 2}};

  private record Corners(int a, int b, int c) {
    static Corners sorted(int x, int y, int z) {
      int[] s = {x, y, z};
      Arrays.sort(s);
      return new Corners(s[0], s[1], s[2]);
    }
  }

  private PartRemoval() {}

  /** The mesh without the volume groups named; the mesh itself when none of them has a tet. */
  public static TetMesh without(TetMesh mesh, Set<String> parts) {
    int per = mesh.nodesPerTet();
    int[] tets = mesh.copyTets();
    int[] tetGroup = mesh.copyTetGroups();
    boolean[] removedGroup = new boolean[mesh.volumeGroups().size()];
    for (int g = 0; g < removedGroup.length; g++) {
      removedGroup[g] = parts.contains(mesh.volumeGroups().get(g).name());
    }
    int kept = 0;
    for (int t = 0; t < tetGroup.length; t++) {
      kept += removedGroup[tetGroup[t]] ? 0 : 1;
    }
    if (kept == tetGroup.length) {
      return mesh;
    }
    int[] newId = new int[mesh.nodeCount()];
    Arrays.fill(newId, -1);
    int[] keptTets = new int[kept * per];
    int[] keptGroups = new int[kept];
    Map<Corners, Integer> faceUse = new HashMap<>();
    int k = 0;
    for (int t = 0; t < tetGroup.length; t++) {
      if (removedGroup[tetGroup[t]]) {
        continue;
      }
      System.arraycopy(tets, t * per, keptTets, k * per, per);
      keptGroups[k++] = tetGroup[t];
      for (int[] f : FACES) {
        faceUse.merge(
            Corners.sorted(tets[t * per + f[0]], tets[t * per + f[1]], tets[t * per + f[2]]),
            1,
            Integer::sum);
      }
    }
    int nodes = 0;
    for (int i = 0; i < keptTets.length; i++) {
      int n = keptTets[i];
      if (newId[n] < 0) {
        newId[n] = nodes++;
      }
    }
    for (int i = 0; i < keptTets.length; i++) {
      keptTets[i] = newId[keptTets[i]];
    }
    double[] xyz = mesh.copyCoordinates();
    double[] keptXyz = new double[3 * nodes];
    for (int n = 0; n < newId.length; n++) {
      if (newId[n] >= 0) {
        System.arraycopy(xyz, 3 * n, keptXyz, 3 * newId[n], 3);
      }
    }
    return withFaces(mesh, faceUse, newId)
        .nodes(keptXyz)
        .order(mesh.order())
        .tets(keptTets, keptGroups)
        .volumeGroups(mesh.volumeGroups())
        .build();
  }

  /** The faces that still bound a kept tetrahedron, their groups' kinds as they are now. */
  private static TetMesh.Builder withFaces(
      TetMesh mesh, Map<Corners, Integer> faceUse, int[] newId) {
    int perFace = mesh.nodesPerFace();
    int[] faces = mesh.copyFaces();
    int[] faceGroup = mesh.copyFaceGroups();
    boolean[] joins = new boolean[mesh.faceGroups().size()];
    List<Integer> keep = new ArrayList<>();
    for (int f = 0; f < faceGroup.length; f++) {
      Integer uses =
          faceUse.get(
              Corners.sorted(faces[f * perFace], faces[f * perFace + 1], faces[f * perFace + 2]));
      if (uses != null) {
        keep.add(f);
        joins[faceGroup[f]] |= uses == 2;
      }
    }
    int[] keptFaces = new int[keep.size() * perFace];
    int[] keptGroups = new int[keep.size()];
    for (int i = 0; i < keep.size(); i++) {
      int f = keep.get(i);
      for (int j = 0; j < perFace; j++) {
        keptFaces[i * perFace + j] = newId[faces[f * perFace + j]];
      }
      keptGroups[i] = faceGroup[f];
    }
    List<FaceGroup> groups = new ArrayList<>();
    for (int g = 0; g < joins.length; g++) {
      FaceGroup old = mesh.faceGroups().get(g);
      groups.add(
          new FaceGroup(
              old.name(), old.tag(), joins[g] ? FaceGroupKind.INTERFACE : FaceGroupKind.EXTERIOR));
    }
    return new TetMesh.Builder().faces(keptFaces, keptGroups).faceGroups(groups);
  }
}
