package dev.soakfield.fem.run;

import dev.soakfield.fem.assembly.FeSpace;
import dev.soakfield.fem.casefile.CaseSpec;
import dev.soakfield.fem.casefile.FaceSpec;
import dev.soakfield.fem.casefile.MaterialSpec;
import dev.soakfield.fem.casefile.SourceSpec;
import dev.soakfield.fem.physics.DiffusionModel;
import dev.soakfield.fem.physics.FaceCondition;
import dev.soakfield.fem.physics.FaceGroupMembers;
import dev.soakfield.fem.physics.FaceKind;
import dev.soakfield.fem.physics.FaceOwners;
import dev.soakfield.mesh.TetMesh;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/** Turns a checked case and its mesh into the discrete model the stepper solves. */
public final class ModelBuilder {
  private ModelBuilder() {}

  /**
   * Coefficients per tetrahedron, conditions per face group and the initial potential.
   *
   * @param spec a case already checked against {@code mesh} (every volume group has a material,
   *     every face entry names a face group of the mesh)
   * @param warnings receives what the user should know (e.g. mixed solubility on one face group)
   */
  public static DiffusionModel build(CaseSpec spec, TetMesh mesh, List<String> warnings) {
    int tets = mesh.tetCount();
    MaterialSpec[] byGroup = new MaterialSpec[mesh.volumeGroups().size()];
    for (int g = 0; g < byGroup.length; g++) {
      byGroup[g] = spec.materials().get(mesh.volumeGroups().get(g).name());
    }
    double[] solubility = new double[tets];
    double[] conductance = new double[6 * tets];
    double[] firstOrder = new double[tets];
    double[] constant = new double[tets];
    for (int t = 0; t < tets; t++) {
      MaterialSpec m = byGroup[mesh.tetGroup(t)];
      double s = m.solubility();
      solubility[t] = s;
      double[] d = m.diffusivity().tensor();
      for (int k = 0; k < 6; k++) {
        conductance[6 * t + k] = d[k] * s;
      }
      SourceSpec src = m.source();
      if (src instanceof SourceSpec.FirstOrder f) {
        firstOrder[t] = f.rate();
      } else if (src instanceof SourceSpec.ConstantRate c) {
        constant[t] = c.rate();
      }
    }
    int[] owner = FaceOwners.of(mesh);
    List<FaceCondition> faces = new ArrayList<>();
    for (FaceSpec f : spec.faces().values()) {
      if (f.kind() == FaceKind.SEALED) {
        continue;
      }
      int g = mesh.faceGroupIndex(f.faceGroup());
      int[] members = FaceGroupMembers.of(mesh, g);
      double[] faceS = new double[members.length];
      for (int i = 0; i < members.length; i++) {
        faceS[i] = solubility[owner[members[i]]];
      }
      double lo = Arrays.stream(faceS).min().orElse(1);
      double hi = Arrays.stream(faceS).max().orElse(1);
      if (f.kind() == FaceKind.CONCENTRATION && hi > lo) {
        warnings.add(
            "face group '"
                + f.faceGroup()
                + "' touches materials of different solubility; where they meet, the prescribed"
                + " concentration is applied in the material of smaller solubility");
      }
      faces.add(
          new FaceCondition(
              g, f.faceGroup(), f.kind(), f.value(), f.coefficient(), members, faceS));
    }
    double[] phi0 = new double[mesh.nodeCount()];
    double[] nodeS = new double[mesh.nodeCount()];
    for (int t = 0; t < tets; t++) {
      double c0 = spec.initial().valueFor(mesh.volumeGroups().get(mesh.tetGroup(t)).name());
      for (int k = 0; k < mesh.nodesPerTet(); k++) {
        int v = mesh.tetNode(t, k);
        // an interface node takes the potential of the side with the larger solubility
        if (solubility[t] >= nodeS[v]) {
          nodeS[v] = solubility[t];
          phi0[v] = c0 / solubility[t];
        }
      }
    }
    return new DiffusionModel(
        FeSpace.of(mesh), solubility, conductance, firstOrder, constant, faces, phi0);
  }
}
