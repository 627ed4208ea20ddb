package dev.soakfield.fem.casefile;

import dev.soakfield.fem.physics.FaceKind;
import dev.soakfield.mesh.FaceGroup;
import dev.soakfield.mesh.FaceGroupKind;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.VolumeGroup;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/** Checks that a case fits the mesh it names: every group matched, every face kind possible. */
public final class CaseChecks {
  private CaseChecks() {}

  /**
   * Checks {@code spec} against {@code mesh}.
   *
   * @return warnings the user should see (exterior face groups left sealed by default, probes
   *     outside the mesh's bounding box)
   * @throws CaseInputException listing every mismatch: a material for a volume group the mesh
   *     lacks, a volume group with no material, a face entry for a face group the mesh lacks (with
   *     the closest name), a concentration condition or a sealed entry on an interface group
   */
  public static List<String> againstMesh(CaseSpec spec, TetMesh mesh) {
    Objects.requireNonNull(spec, "spec");
    Objects.requireNonNull(mesh, "mesh");
    Path name = spec.caseFile().getFileName();
    ProblemList problems = new ProblemList(name == null ? "case" : name.toString());
    String meshName = String.valueOf(spec.mesh().getFileName());
    checkVolumeGroups(spec, mesh, meshName, problems);
    checkFaceGroups(spec, mesh, meshName, problems);
    List<String> warnings = new ArrayList<>();
    EnvironmentChecks.check(spec, problems, warnings);
    problems.throwIfAny();
    for (FaceGroup g : mesh.faceGroups()) {
      if (g.kind() == FaceGroupKind.EXTERIOR && !spec.faces().containsKey(g.name())) {
        warnings.add("face group '" + g.name() + "' has no entry in faces: sealed by default");
      }
    }
    warnings.addAll(ProbeBounds.outside(spec, mesh));
    return List.copyOf(warnings);
  }

  private static void checkVolumeGroups(
      CaseSpec spec, TetMesh mesh, String meshName, ProblemList problems) {
    List<String> groups = new ArrayList<>();
    for (VolumeGroup g : mesh.volumeGroups()) {
      groups.add(g.name());
    }
    for (String material : spec.materials().keySet()) {
      if (mesh.volumeGroupIndex(material) < 0) {
        String path = CasePaths.child("materials", material);
        SourcePlace at = spec.placeOf(path);
        problems.add(
            at.line(),
            at.column(),
            path,
            "found no volume group '"
                + material
                + "' in "
                + meshName
                + ", expected one of "
                + String.join(", ", groups)
                + suggestion(material, groups));
      }
    }
    SourcePlace at = spec.placeOf("materials");
    for (String group : groups) {
      if (!spec.materials().containsKey(group)) {
        problems.add(
            at.line(),
            at.column(),
            "materials",
            "found no material for volume group '"
                + group
                + "' of "
                + meshName
                + ", expected a material for every volume group");
      }
    }
  }

  private static void checkFaceGroups(
      CaseSpec spec, TetMesh mesh, String meshName, ProblemList problems) {
    List<String> groups = new ArrayList<>();
    for (FaceGroup g : mesh.faceGroups()) {
      groups.add(g.name());
    }
    for (Map.Entry<String, FaceSpec> e : spec.faces().entrySet()) {
      String path = CasePaths.child("faces", e.getKey());
      int index = mesh.faceGroupIndex(e.getKey());
      if (index < 0) {
        SourcePlace at = spec.placeOf(path);
        problems.add(
            at.line(),
            at.column(),
            path,
            "found no face group '"
                + e.getKey()
                + "' in "
                + meshName
                + (groups.isEmpty() ? ", which has no face groups" : "")
                + suggestion(e.getKey(), groups));
        continue;
      }
      FaceGroup group = mesh.faceGroups().get(index);
      if (group.kind() == FaceGroupKind.INTERFACE
          && e.getValue().kind() == FaceKind.CONCENTRATION) {
        String kindPath = CasePaths.child(path, "kind");
        SourcePlace at = spec.placeOf(kindPath);
        problems.add(
            at.line(),
            at.column(),
            kindPath,
            "found a concentration condition on interface group '"
                + e.getKey()
                + "', expected concentration only on exterior face groups");
      }
      // the parts share the interface's nodes, so nothing could seal it: the entry would be
      // ignored while the user believes in a barrier
      if (group.kind() == FaceGroupKind.INTERFACE && e.getValue().kind() == FaceKind.SEALED) {
        String kindPath = CasePaths.child(path, "kind");
        SourcePlace at = spec.placeOf(kindPath);
        problems.add(
            at.line(),
            at.column(),
            kindPath,
            "found 'sealed' on interface group '"
                + e.getKey()
                + "', expected an interface to stay continuous (its parts share nodes); remove"
                + " the entry, or mesh the parts apart for a barrier");
      }
    }
  }

  private static String suggestion(String name, List<String> candidates) {
    Optional<String> best = NameSuggestion.closest(name, candidates);
    return best.map(b -> "; did you mean '" + b + "'?").orElse("");
  }
}
