package dev.soakfield.fem.model;

import dev.soakfield.fem.assembly.FeSpace;
import dev.soakfield.fem.assembly.PointLocator;
import dev.soakfield.fem.casefile.CaseInputException;
import dev.soakfield.fem.casefile.CaseSpec;
import dev.soakfield.fem.casefile.FaceSpec;
import dev.soakfield.fem.casefile.MaterialSpec;
import dev.soakfield.fem.casefile.SourcePlace;
import dev.soakfield.fem.casefile.SourceSpec;
import dev.soakfield.fem.physics.AmbientPotential;
import dev.soakfield.fem.physics.Arrhenius;
import dev.soakfield.fem.physics.FaceKind;
import dev.soakfield.fem.physics.TimeFunction;
import dev.soakfield.fem.results.StateFile;
import dev.soakfield.mesh.TetMesh;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/** Turns a checked case and its mesh into the discrete model the stepper solves. */
public final class ModelBuilder {
  private ModelBuilder() {}

  /** {@link #build(CaseSpec, TetMesh, List, LawResolver)} for cases without source laws. */
  public static DiffusionModel build(CaseSpec spec, TetMesh mesh, List<String> warnings) {
    return build(spec, mesh, warnings, LawResolver.none());
  }

  /**
   * Coefficients per tetrahedron at the starting temperature, how they follow the temperature,
   * conditions per face group and the initial potential.
   *
   * @param spec a case already checked against {@code mesh} (every volume group has a material,
   *     every face entry names a face group of the mesh)
   * @param warnings receives what the user should know (e.g. mixed solubility on one face group)
   * @param laws resolves the materials' source laws
   */
  public static DiffusionModel build(
      CaseSpec spec, TetMesh mesh, List<String> warnings, LawResolver laws) {
    int tets = mesh.tetCount();
    TimeFunction temperature = spec.temperatureHistory();
    double tRef = temperature.at(0);
    int groups = mesh.volumeGroups().size();
    MaterialSpec[] byGroup = new MaterialSpec[groups];
    List<MaterialBehaviour> behaviours = new ArrayList<>();
    double[] scale = ConcentrationScales.of(spec, mesh);
    String caseName = String.valueOf(spec.caseFile().getFileName());
    for (int g = 0; g < groups; g++) {
      String name = mesh.volumeGroups().get(g).name();
      byGroup[g] = spec.materials().get(name);
      List<LawUse> uses = new ArrayList<>();
      for (SourceSpec.LawSource l : byGroup[g].laws()) {
        uses.add(laws.resolve(caseName, name, l));
      }
      behaviours.add(
          new MaterialBehaviour(
              name, byGroup[g].solubilityEnergy(), byGroup[g].diffusivityEnergy(), uses, scale[g]));
    }
    double[] solubility = new double[tets];
    double[] meanD = new double[tets];
    double[] conductance = new double[6 * tets];
    double[] firstOrder = new double[tets];
    double[] constant = new double[tets];
    int[] tetMaterial = new int[tets];
    for (int t = 0; t < tets; t++) {
      int g = mesh.tetGroup(t);
      tetMaterial[t] = g;
      MaterialSpec m = byGroup[g];
      double s = scale[g] * new Arrhenius(m.solubility(), m.solubilityEnergy()).at(tRef);
      double dFactor = new Arrhenius(1.0, m.diffusivityEnergy()).at(tRef);
      solubility[t] = s;
      double[] d = m.diffusivity().tensor();
      meanD[t] = (d[0] + d[1] + d[2]) / 3 * dFactor;
      for (int k = 0; k < 6; k++) {
        conductance[6 * t + k] = d[k] * dFactor * s;
      }
      SourceSpec src = m.source();
      if (src instanceof SourceSpec.FirstOrder f) {
        firstOrder[t] = f.rate();
      } else if (src instanceof SourceSpec.ConstantRate c) {
        constant[t] = c.rate();
      }
    }
    Optional<TimeFunction> ambient =
        spec.exposure().isPresent() && spec.law() != dev.soakfield.fem.physics.SorptionLaw.PLAIN
            ? Optional.of(AmbientPotential.of(spec.law(), spec.exposure().get()))
            : Optional.empty();
    int[] owner = FaceOwners.of(mesh);
    warnings.addAll(NearSurfaceCheck.warnings(spec, mesh, owner, meanD));
    warnings.addAll(ConcentrationScales.warnings(spec));
    List<FaceCondition> faces = new ArrayList<>();
    for (FaceSpec f : spec.faces().values()) {
      if (f.kind() == FaceKind.SEALED) {
        continue;
      }
      int g = mesh.faceGroupIndex(f.faceGroup());
      int[] members = FaceGroupMembers.of(mesh, g);
      double[] faceS = new double[members.length];
      double[] faceScale = new double[members.length];
      for (int i = 0; i < members.length; i++) {
        faceS[i] = solubility[owner[members[i]]];
        faceScale[i] = scale[mesh.tetGroup(owner[members[i]])];
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
      if (f.kind() == FaceKind.LAW) {
        TimeFunction pressure =
            f.ambientValue() && spec.exposure().isPresent()
                ? spec.exposure().get().function(spec.exposure().get()::pressure)
                : f.value();
        faces.add(
            new FaceCondition(
                g,
                f.faceGroup(),
                f.kind(),
                pressure,
                f.coefficient(),
                members,
                faceS,
                false,
                Optional.of(laws.resolveFace(caseName, f.faceGroup(), f.law().orElseThrow()))));
        continue;
      }
      TimeFunction value =
          f.ambientValue()
              ? ambient.orElseThrow()
              : f.kind() == FaceKind.FLUX
                  ? f.value()
                  : ConcentrationScales.faceValue(spec, f, f.value(), faceScale);
      faces.add(
          new FaceCondition(
              g,
              f.faceGroup(),
              f.kind(),
              value,
              f.coefficient(),
              members,
              faceS,
              f.ambientValue()));
    }
    FeSpace space = FeSpace.of(mesh);
    if (!spec.probes().isEmpty()) {
      ProbeSides.check(spec, mesh, new PointLocator(space));
    }
    double[] phi0 =
        spec.initial().from().isPresent()
            ? RestartState.potential(spec, mesh, space, solubility, warnings)
            : initialPotential(spec, mesh, solubility, scale);
    return new DiffusionModel(
        space,
        solubility,
        conductance,
        firstOrder,
        constant,
        faces,
        phi0,
        tetMaterial,
        behaviours,
        temperature,
        spec.law());
  }

  private static double[] initialPotential(
      CaseSpec spec, TetMesh mesh, double[] solubility, double[] scale) {
    double[] phi0 = new double[mesh.nodeCount()];
    double[] nodeS = new double[mesh.nodeCount()];
    for (int t = 0; t < mesh.tetCount(); t++) {
      int g = mesh.tetGroup(t);
      double c0 = scale[g] * spec.initial().valueFor(mesh.volumeGroups().get(g).name());
      for (int k = 0; k < mesh.nodesPerTet(); k++) {
        int v = mesh.tetNode(t, k);
        // an interface node takes the potential of the side with the larger solubility
        if (solubility[t] >= nodeS[v]) {
          nodeS[v] = solubility[t];
          phi0[v] = c0 / solubility[t];
        }
      }
    }
    return phi0;
  }

  /**
   * The final state of an earlier run on the same mesh.
   *
   * @throws CaseInputException when the folder holds no final state or one of another mesh
   */
  public static StateFile.State earlierRun(CaseSpec spec, TetMesh mesh, Path folder) {
    Path file = folder.resolve(StateFile.NAME);
    String caseName = String.valueOf(spec.caseFile().getFileName());
    SourcePlace at = spec.placeOf("initial.from");
    if (!Files.isRegularFile(file)) {
      throw problem(
          caseName,
          at,
          "found no finished run in "
              + folder
              + " (no "
              + StateFile.NAME
              + "), expected the"
              + " result folder of an earlier run");
    }
    StateFile.State state;
    try {
      state = StateFile.read(file);
    } catch (IOException e) {
      throw problem(caseName, at, "found an unreadable state: " + e.getMessage());
    }
    if (state.phi().length != mesh.nodeCount()) {
      throw problem(
          caseName,
          at,
          "found a state of "
              + state.phi().length
              + " nodes, expected one of this case's mesh ("
              + mesh.nodeCount()
              + " nodes; the earlier run must use the same mesh and element order)");
    }
    return state;
  }

  private static CaseInputException problem(String caseName, SourcePlace at, String message) {
    return new CaseInputException(
        caseName,
        List.of(new CaseInputException.Problem(at.line(), at.column(), "initial.from", message)));
  }
}
