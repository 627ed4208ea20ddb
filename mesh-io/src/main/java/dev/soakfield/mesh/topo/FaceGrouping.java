package dev.soakfield.mesh.topo;

import dev.soakfield.mesh.FaceGroup;
import dev.soakfield.mesh.FaceGroupKind;
import dev.soakfield.mesh.MeshFinding;
import dev.soakfield.mesh.RawMesh;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Builds the face groups of a mesh: finds the exterior by counting how often each tetrahedron face
 * occurs, matches the file's tagged triangles against the tetrahedron faces, and puts the exterior
 * nobody tagged into an "untagged" group, or, when the file tags no triangles at all, into patches
 * split at a feature angle.
 *
 * <p>Faces are written in the node order of the tetrahedron they belong to: outward for exterior
 * faces; for interface faces, out of the lower-numbered of the two tetrahedra. Output order: tagged
 * faces in the order of their triangles in the file, then the untagged (or patch) faces in (tet,
 * local face) order. Face groups come in the order the file names them (then by first triangle),
 * the exterior part of a split tag right before its interface part, the untagged group last.
 */
final class FaceGrouping {
  private static final byte EXTERIOR = 1;
  private static final byte INTERIOR = 2;

  private final int[] faces;
  private final int[] faceGroup;
  private final List<FaceGroup> groups;

  private FaceGrouping(int[] faces, int[] faceGroup, List<FaceGroup> groups) {
    this.faces = faces;
    this.faceGroup = faceGroup;
    this.groups = groups;
  }

  int[] faces() {
    return faces;
  }

  int[] faceGroup() {
    return faceGroup;
  }

  List<FaceGroup> groups() {
    return groups;
  }

  static FaceGrouping build(
      RawMesh raw,
      double[] xyz,
      int[] tets,
      int[] tetGroup,
      double featureAngleDeg,
      List<MeshFinding> out) {
    int nodesPerTet = raw.order == 1 ? 4 : 10;
    int nodesPerTri = raw.order == 1 ? 3 : 6;
    int triCount = raw.triCount();
    FaceRuns runs = FaceRuns.build(tets, nodesPerTet, raw.tris, nodesPerTri, xyz.length / 3);
    int tetFaceCount = runs.tetFaceCount();

    int[] triFace = new int[triCount];
    Arrays.fill(triFace, -1);
    byte[] triPlace = new byte[triCount];
    int[] bare = new int[runs.runCount()];
    int bareCount = 0;
    int nonManifoldFaces = 0;
    boolean[] nonManifoldTet = new boolean[tets.length / nodesPerTet];
    IdList nonConforming = new IdList();
    IdList duplicates = new IdList();
    IdList insideOneVolume = new IdList();
    for (int r = 0; r < runs.runCount(); r++) {
      int s = runs.runStart(r);
      int e = runs.runEnd(r);
      int tetFaces = 0;
      while (s + tetFaces < e && runs.item(s + tetFaces) < tetFaceCount) {
        tetFaces++;
      }
      if (tetFaces >= 3) {
        nonManifoldFaces++;
        for (int p = s; p < s + tetFaces; p++) {
          nonManifoldTet[runs.item(p) >>> 2] = true;
        }
      }
      if (tetFaces == e - s) {
        if (tetFaces == 1) {
          bare[bareCount++] = runs.item(s);
        }
        continue;
      }
      if (tetFaces == 0) {
        for (int p = s; p < e; p++) {
          nonConforming.add(raw.triIds[runs.item(p) - tetFaceCount]);
        }
        continue;
      }
      int tri = runs.item(s + tetFaces) - tetFaceCount;
      triFace[tri] = runs.item(s);
      triPlace[tri] = tetFaces == 1 ? EXTERIOR : INTERIOR;
      if (tetFaces == 2 && tetGroup[runs.item(s) >>> 2] == tetGroup[runs.item(s + 1) >>> 2]) {
        insideOneVolume.add(raw.triIds[tri]);
      }
      for (int p = s + tetFaces + 1; p < e; p++) {
        duplicates.add(raw.triIds[runs.item(p) - tetFaceCount]);
      }
    }
    reportTopology(raw, nonManifoldFaces, nonManifoldTet, nonConforming, duplicates, out);
    if (!insideOneVolume.isEmpty()) {
      out.add(
          MeshFinding.warning(
              "interface-within-volume",
              insideOneVolume.count()
                  + " tagged triangles lie inside one volume group, between two of its"
                  + " tetrahedra; they are kept as interface faces: elements "
                  + insideOneVolume.describe()));
    }

    int[] untagged = Arrays.copyOf(bare, bareCount);
    Arrays.sort(untagged); // (tet, local face) order
    int accepted = 0;
    for (int t = 0; t < triCount; t++) {
      if (triFace[t] >= 0) {
        accepted++;
      }
    }
    int faceTotal = accepted + untagged.length;
    int[] faces = new int[faceTotal * nodesPerTri];
    int[] faceGroup = new int[faceTotal];
    List<FaceGroup> groups = new ArrayList<>();
    NameBook names = new NameBook();
    int next = 0;
    if (triCount > 0) {
      TagIndex tags = TagIndex.of(raw.triTags).namedFirst(raw.surfaceNames);
      int[] exteriorGroup = new int[tags.size()];
      int[] interfaceGroup = new int[tags.size()];
      nameTaggedGroups(
          raw, tags, triFace, triPlace, names, groups, exteriorGroup, interfaceGroup, out);
      for (int t = 0; t < triCount; t++) {
        if (triFace[t] >= 0) {
          TetFaces.writeOutward(tets, nodesPerTet, triFace[t], faces, next * nodesPerTri);
          alignToFile(
              faces,
              next * nodesPerTri,
              nodesPerTri,
              raw.tris,
              t * nodesPerTri,
              triPlace[t] == INTERIOR);
          int g = tags.indexOf(t);
          faceGroup[next++] = triPlace[t] == EXTERIOR ? exteriorGroup[g] : interfaceGroup[g];
        }
      }
      if (untagged.length > 0) {
        int group = groups.size();
        groups.add(
            new FaceGroup(names.claim(FaceGroup.UNTAGGED), freeTag(tags), FaceGroupKind.EXTERIOR));
        for (int ref : untagged) {
          TetFaces.writeOutward(tets, nodesPerTet, ref, faces, next * nodesPerTri);
          faceGroup[next++] = group;
        }
        out.add(
            MeshFinding.warning(
                "untagged-faces",
                untagged.length
                    + " exterior faces carry no tag; they form the group '"
                    + groups.get(group).name()
                    + "'"));
      }
    } else {
      FeaturePatches patches =
          FeaturePatches.split(xyz, tets, nodesPerTet, untagged, featureAngleDeg);
      for (int p = 0; p < patches.patchCount(); p++) {
        groups.add(new FaceGroup(names.claim("patch-" + (p + 1)), p + 1, FaceGroupKind.EXTERIOR));
      }
      for (int e = 0; e < untagged.length; e++) {
        TetFaces.writeOutward(tets, nodesPerTet, untagged[e], faces, next * nodesPerTri);
        faceGroup[next++] = patches.patchOf(e);
      }
      out.add(
          MeshFinding.info(
              "feature-patches",
              "the file tags no triangles; the exterior was split into "
                  + patches.patchCount()
                  + " patches where neighbouring faces turn by "
                  + featureAngleDeg
                  + " degrees or more"));
    }
    if (!names.renames().isEmpty()) {
      out.add(
          MeshFinding.warning(
              "group-name-clash",
              "face group names occur twice, renamed: " + String.join(", ", names.renames())));
    }
    return new FaceGrouping(faces, faceGroup, groups);
  }

  /**
   * Rotates the face just written at {@code at} so that it starts at the file triangle's first
   * corner, and, for interface faces ({@code keepSide}), turns it to the file's side: a mesh that
   * was written and read back then has the very same faces. Exterior faces stay outward.
   */
  static void alignToFile(
      int[] faces, int at, int nodesPerTri, int[] tris, int triAt, boolean keepSide) {
    int a = faces[at];
    int b = faces[at + 1];
    int c = faces[at + 2];
    int t0 = tris[triAt];
    int t1 = tris[triAt + 1];
    boolean sameSide = (t0 == a && t1 == b) || (t0 == b && t1 == c) || (t0 == c && t1 == a);
    if (keepSide && !sameSide) {
      // reverse: corners (0,2,1), mid-edge nodes on (0,2), (2,1), (1,0)
      faces[at + 1] = c;
      faces[at + 2] = b;
      if (nodesPerTri == 6) {
        int m = faces[at + 3];
        faces[at + 3] = faces[at + 5];
        faces[at + 5] = m;
      }
    }
    int shift = faces[at + 1] == t0 ? 1 : faces[at + 2] == t0 ? 2 : 0;
    if (shift != 0) {
      rotate(faces, at, shift);
      if (nodesPerTri == 6) {
        rotate(faces, at + 3, shift);
      }
    }
  }

  /** Rotates three entries so that entry {@code shift} comes first. */
  private static void rotate(int[] a, int at, int shift) {
    int x = a[at];
    int y = a[at + 1];
    int z = a[at + 2];
    a[at] = shift == 1 ? y : z;
    a[at + 1] = shift == 1 ? z : x;
    a[at + 2] = shift == 1 ? x : y;
  }

  private static void nameTaggedGroups(
      RawMesh raw,
      TagIndex tags,
      int[] triFace,
      byte[] triPlace,
      NameBook names,
      List<FaceGroup> groups,
      int[] exteriorGroup,
      int[] interfaceGroup,
      List<MeshFinding> out) {
    int[] exteriorCount = new int[tags.size()];
    int[] interiorCount = new int[tags.size()];
    for (int t = 0; t < triFace.length; t++) {
      if (triPlace[t] == EXTERIOR) {
        exteriorCount[tags.indexOf(t)]++;
      } else if (triPlace[t] == INTERIOR) {
        interiorCount[tags.indexOf(t)]++;
      }
    }
    for (int g = 0; g < tags.size(); g++) {
      int tag = tags.tag(g);
      String base = groupName(raw, tag);
      if (exteriorCount[g] > 0) {
        exteriorGroup[g] = groups.size();
        groups.add(new FaceGroup(names.claim(base), tag, FaceGroupKind.EXTERIOR));
      }
      if (interiorCount[g] > 0) {
        String name = exteriorCount[g] > 0 ? base + "-interface" : base;
        interfaceGroup[g] = groups.size();
        groups.add(new FaceGroup(names.claim(name), tag, FaceGroupKind.INTERFACE));
      }
      if (exteriorCount[g] > 0 && interiorCount[g] > 0) {
        out.add(
            MeshFinding.warning(
                "split-face-group",
                "face group '"
                    + groups.get(exteriorGroup[g]).name()
                    + "' has "
                    + exteriorCount[g]
                    + " triangles on the exterior and "
                    + interiorCount[g]
                    + " inside the mesh; the inside ones form '"
                    + groups.get(interfaceGroup[g]).name()
                    + "'"));
      }
    }
  }

  private static void reportTopology(
      RawMesh raw,
      int nonManifoldFaces,
      boolean[] nonManifoldTet,
      IdList nonConforming,
      IdList duplicates,
      List<MeshFinding> out) {
    if (nonManifoldFaces > 0) {
      IdList tets = new IdList();
      for (int t = 0; t < nonManifoldTet.length; t++) {
        if (nonManifoldTet[t]) {
          tets.add(raw.tetIds[t]);
        }
      }
      out.add(
          MeshFinding.error(
              "non-manifold-faces",
              nonManifoldFaces
                  + " faces are shared by three or more tetrahedra; "
                  + tets.count()
                  + " tetrahedra touch them: elements "
                  + tets.describe()));
    }
    if (!nonConforming.isEmpty()) {
      out.add(
          MeshFinding.error(
              "non-conforming-faces",
              nonConforming.count()
                  + " tagged triangles match no tetrahedron face (the surface mesh does not"
                  + " conform to the volume mesh): elements "
                  + nonConforming.describe()));
    }
    if (!duplicates.isEmpty()) {
      out.add(
          MeshFinding.warning(
              "duplicate-faces",
              duplicates.count()
                  + " triangles repeat an earlier triangle on the same face; the first one"
                  + " keeps the face: elements "
                  + duplicates.describe()));
    }
  }

  /** The physical name of a surface tag, else a made-up one. */
  private static String groupName(RawMesh raw, int tag) {
    String name = raw.surfaceNames.get(tag);
    if (name != null && !name.isBlank()) {
      return name;
    }
    return (raw.physicalTags ? "surface-" : "entity-") + tag;
  }

  /** One above the largest tag in use, or the smallest free positive tag if that overflows. */
  private static int freeTag(TagIndex tags) {
    int max = 0;
    for (int g = 0; g < tags.size(); g++) {
      max = Math.max(max, tags.tag(g));
    }
    if (max < Integer.MAX_VALUE) {
      return max + 1;
    }
    int[] sorted = new int[tags.size()];
    for (int g = 0; g < sorted.length; g++) {
      sorted[g] = tags.tag(g);
    }
    Arrays.sort(sorted);
    int candidate = 1;
    for (int tag : sorted) {
      if (tag == candidate) {
        candidate++;
      } else if (tag > candidate) {
        break;
      }
    }
    return candidate;
  }
}
