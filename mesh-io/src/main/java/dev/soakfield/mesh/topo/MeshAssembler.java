package dev.soakfield.mesh.topo;

import dev.soakfield.mesh.MeshFinding;
import dev.soakfield.mesh.MeshImport;
import dev.soakfield.mesh.MeshInputException;
import dev.soakfield.mesh.MeshQuality;
import dev.soakfield.mesh.MeshReport;
import dev.soakfield.mesh.RawMesh;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.VolumeGroup;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * Turns what a reader found in a file ({@link RawMesh}) into an analysis-ready {@link TetMesh} and
 * a report of everything noticed on the way.
 *
 * <ul>
 *   <li>Volume groups: one per distinct tetrahedron tag, in the order the file names them, then by
 *       first appearance; named by the file's physical name, else "volume-3" (or "entity-3" when
 *       the tags are entity tags).
 *   <li>Tetrahedra keep file order; inverted ones are reordered, flat ones reported.
 *   <li>Face groups: see {@link FaceGrouping}.
 *   <li>Nodes keep file order and ids, unused ones included; coincident ones are reported.
 * </ul>
 *
 * Findings come in this order: the reader's own, then volume names, orientation, nodes, face
 * topology, face groups, quality. The raw mesh is not changed.
 */
public final class MeshAssembler {
  private MeshAssembler() {}

  /**
   * Builds the mesh and its report.
   *
   * @throws MeshInputException when the file holds no tetrahedra, a non-finite coordinate or a tag
   *     that is not positive
   * @throws IllegalArgumentException when the raw arrays do not fit together (a reader's defect)
   */
  public static MeshImport assemble(RawMesh raw, AssemblyOptions options) {
    Objects.requireNonNull(raw, "raw");
    Objects.requireNonNull(options, "options");
    RawInput.check(raw);
    int nodesPerTet = raw.order == 1 ? 4 : 10;
    List<MeshFinding> findings = new ArrayList<>(raw.findings);
    double[] xyz = raw.xyz.clone();
    int[] tets = raw.tets.clone();

    TagIndex volumeTags = TagIndex.of(raw.tetTags).namedFirst(raw.volumeNames);
    int[] tetGroup = new int[raw.tetCount()];
    for (int t = 0; t < tetGroup.length; t++) {
      tetGroup[t] = volumeTags.indexOf(t);
    }
    List<VolumeGroup> volumes = volumeGroups(raw, volumeTags, findings);

    MeshChecker.orient(xyz, tets, nodesPerTet, raw.tetIds, findings);
    boolean[] used = MeshChecker.usedNodes(raw.nodeCount(), tets, raw.nodeIds, findings);
    MeshChecker.coincidentNodes(xyz, used, raw.nodeIds, findings);
    FaceGrouping faces =
        FaceGrouping.build(raw, xyz, tets, tetGroup, options.featureAngleDeg(), findings);
    MeshQuality quality = MeshChecker.quality(xyz, tets, nodesPerTet, raw.tetIds, findings);

    TetMesh mesh =
        new TetMesh.Builder()
            .nodes(xyz)
            .order(raw.order)
            .tets(tets, tetGroup)
            .faces(faces.faces(), faces.faceGroup())
            .volumeGroups(volumes)
            .faceGroups(faces.groups())
            .build();
    return new MeshImport(mesh, new MeshReport(findings, quality));
  }

  private static List<VolumeGroup> volumeGroups(
      RawMesh raw, TagIndex tags, List<MeshFinding> findings) {
    NameBook names = new NameBook();
    List<VolumeGroup> groups = new ArrayList<>();
    for (int g = 0; g < tags.size(); g++) {
      int tag = tags.tag(g);
      String name = raw.volumeNames.get(tag);
      if (name == null || name.isBlank()) {
        name = (raw.physicalTags ? "volume-" : "entity-") + tag;
      }
      groups.add(new VolumeGroup(names.claim(name), tag));
    }
    if (!names.renames().isEmpty()) {
      findings.add(
          MeshFinding.warning(
              "group-name-clash",
              "volume group names occur twice, renamed: " + String.join(", ", names.renames())));
    }
    return groups;
  }
}
