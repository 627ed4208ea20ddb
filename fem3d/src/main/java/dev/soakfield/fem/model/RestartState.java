package dev.soakfield.fem.model;

import dev.soakfield.fem.assembly.CsrMatrix;
import dev.soakfield.fem.assembly.FeSpace;
import dev.soakfield.fem.assembly.SystemAssembler;
import dev.soakfield.fem.casefile.CapacityForm;
import dev.soakfield.fem.casefile.CaseInputException;
import dev.soakfield.fem.casefile.CaseReader;
import dev.soakfield.fem.casefile.CaseSpec;
import dev.soakfield.fem.casefile.MaterialSpec;
import dev.soakfield.fem.casefile.SourcePlace;
import dev.soakfield.fem.physics.AmbientPotential;
import dev.soakfield.fem.physics.Arrhenius;
import dev.soakfield.fem.physics.SorptionLaw;
import dev.soakfield.fem.results.ResultFiles;
import dev.soakfield.fem.results.StateFile;
import dev.soakfield.fem.units.ConcentrationUnit;
import dev.soakfield.mesh.TetMesh;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;

/**
 * The potential a run starts from when its case names an earlier run ({@code initial.from}). What
 * carries over is the amount at every node, not the potential: c = S·φ, and S changes with
 * temperature and material, so φ is rescaled node by node by the capacity the earlier run had at
 * its end over the capacity this run has at its start. The total amount is then the earlier run's
 * final amount to round-off, with either capacity form (a node's consistent and lumped capacity sum
 * to the same row sum for linear elements; each run's own form is used on its side).
 */
final class RestartState {
  private RestartState() {}

  /**
   * @param startSolubility S of each tetrahedron at this run's start temperature
   * @param warnings gets a line when the temperature or materials differ from the earlier run's
   */
  static double[] potential(
      CaseSpec spec, TetMesh mesh, FeSpace space, double[] startSolubility, List<String> warnings) {
    Path folder = spec.initial().from().orElseThrow();
    StateFile.State state = ModelBuilder.earlierRun(spec, mesh, folder);
    CaseSpec earlier = earlierCase(spec, folder);
    double endTemperature = earlier.temperatureHistory().at(state.time());
    double startTemperature = spec.temperatureHistory().at(0);
    String amountBefore = earlier.quantities().amount();
    String amountNow = spec.quantities().amount();
    boolean undeclared =
        earlier.quantities().unit() == ConcentrationUnit.UNDECLARED
            || spec.quantities().unit() == ConcentrationUnit.UNDECLARED;
    if (!undeclared && !amountBefore.equals(amountNow)) {
      throw problem(
          spec,
          "found an earlier run that counts its amount in "
              + amountBefore
              + ", expected one in "
              + amountNow
              + " as this case's units give (declare the same units.concentration kind)");
    }
    double[] earlierScale = ConcentrationScales.of(earlier, mesh);
    double[] endSolubility = new double[mesh.tetCount()];
    for (int t = 0; t < endSolubility.length; t++) {
      String part = mesh.volumeGroups().get(mesh.tetGroup(t)).name();
      MaterialSpec m = earlier.materials().get(part);
      if (m == null) {
        throw problem(spec, "found an earlier run without a material for part '" + part + "'");
      }
      endSolubility[t] =
          earlierScale[mesh.tetGroup(t)]
              * new Arrhenius(m.solubility(), m.solubilityEnergy()).at(endTemperature);
    }
    SystemAssembler asm = new SystemAssembler(space);
    double[] before = rowSums(asm, endSolubility, lumped(earlier));
    double[] after = rowSums(asm, startSolubility, lumped(spec));
    double[] phi = state.phi().clone();
    boolean rescaled = false;
    for (int i = 0; i < phi.length; i++) {
      if (after[i] != 0 && before[i] != after[i]) {
        phi[i] *= before[i] / after[i];
        rescaled = true;
      }
    }
    if (rescaled) {
      warnings.add(
          String.format(
              Locale.ROOT,
              "initial.from: the earlier run ended at %.2f K and this one starts at %.2f K%s;"
                  + " its concentration was carried over (the amount kept), the potential"
                  + " rescaled by the solubility",
              endTemperature,
              startTemperature,
              Arrays.equals(endSolubility, startSolubility) ? "" : " with other solubilities"));
    }
    environmentChange(spec, earlier, state.time()).ifPresent(warnings::add);
    return phi;
  }

  /** A step in the surroundings at the restart, said because the faces take it at once. */
  private static java.util.Optional<String> environmentChange(
      CaseSpec spec, CaseSpec earlier, double earlierEnd) {
    if (spec.exposure().isEmpty()
        || earlier.exposure().isEmpty()
        || spec.law() == SorptionLaw.PLAIN
        || earlier.law() != spec.law()) {
      return java.util.Optional.empty();
    }
    double before = AmbientPotential.of(earlier.law(), earlier.exposure().get()).at(earlierEnd);
    double after = AmbientPotential.of(spec.law(), spec.exposure().get()).at(0);
    if (before == after) {
      return java.util.Optional.empty();
    }
    String unit = spec.law() == SorptionLaw.HENRY ? "Pa" : "√Pa";
    return java.util.Optional.of(
        String.format(
            Locale.ROOT,
            "initial.from: the earlier run ended at t = %.6g s under an ambient potential of %s %s"
                + " and this one starts (its clock at 0) under %s %s: the exposed faces take"
                + " the new value at once",
            earlierEnd,
            potential(before),
            unit,
            potential(after),
            unit));
  }

  private static String potential(double v) {
    return v == 0 ? "0" : String.format(Locale.ROOT, "%.4g", v);
  }

  private static boolean lumped(CaseSpec spec) {
    return spec.time().capacity() == CapacityForm.LUMPED;
  }

  private static double[] rowSums(SystemAssembler asm, double[] coefPerTet, boolean lumped) {
    CsrMatrix m = asm.newMatrix();
    asm.addCapacity(m, coefPerTet, lumped, 1.0);
    int n = asm.space().dofCount();
    double[] ones = new double[n];
    Arrays.fill(ones, 1.0);
    double[] out = new double[n];
    m.multiply(ones, out);
    return out;
  }

  /** The case the earlier run ran, from the copy its result folder keeps. */
  private static CaseSpec earlierCase(CaseSpec spec, Path folder) {
    try {
      return CaseReader.read(folder.resolve(ResultFiles.CASE_COPY));
    } catch (CaseInputException e) {
      throw problem(
          spec,
          "found an earlier run whose "
              + ResultFiles.CASE_COPY
              + " cannot be read ("
              + e.getMessage()
              + "), expected the case that made it");
    }
  }

  private static CaseInputException problem(CaseSpec spec, String message) {
    SourcePlace at = spec.placeOf("initial.from");
    return new CaseInputException(
        String.valueOf(spec.caseFile().getFileName()),
        List.of(new CaseInputException.Problem(at.line(), at.column(), "initial.from", message)));
  }
}
