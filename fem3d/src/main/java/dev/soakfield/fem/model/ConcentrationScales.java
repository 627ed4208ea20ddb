package dev.soakfield.fem.model;

import dev.soakfield.fem.casefile.CaseInputException;
import dev.soakfield.fem.casefile.CaseSpec;
import dev.soakfield.fem.casefile.FaceSpec;
import dev.soakfield.fem.casefile.MaterialSpec;
import dev.soakfield.fem.casefile.SourcePlace;
import dev.soakfield.fem.physics.TimeFunction;
import dev.soakfield.fem.units.ConcentrationUnit;
import dev.soakfield.mesh.TetMesh;
import java.util.List;
import java.util.Locale;

/**
 * The factor f per part from the case's declared concentration unit to the solve's amount per m³
 * (c_solve = f·c_declared; see {@link dev.soakfield.fem.units.Quantities#perPart}). Solubilities
 * and the concentrations a case prescribes are multiplied by it; outputs divide by it again.
 */
final class ConcentrationScales {
  private ConcentrationScales() {}

  /** f per volume group of {@code mesh}. */
  static double[] of(CaseSpec spec, TetMesh mesh) {
    double[] f = new double[mesh.volumeGroups().size()];
    for (int g = 0; g < f.length; g++) {
      MaterialSpec m = spec.materials().get(mesh.volumeGroups().get(g).name());
      f[g] = m == null ? 1.0 : spec.quantities().perPart(m.density().orElse(Double.NaN));
      if (!(f[g] > 0) || Double.isInfinite(f[g])) {
        throw problem(
            spec,
            "materials." + mesh.volumeGroups().get(g).name() + ".density",
            "found a density that turns "
                + spec.quantities().concentration()
                + " into "
                + f[g]
                + " per m³, expected a density of a real material (\"7850 kg/m^3\")");
      }
    }
    return f;
  }

  /** What a user should know about the units: weight gain that rests on a guess, or is missing. */
  static List<String> warnings(CaseSpec spec) {
    boolean densities = spec.materials().values().stream().anyMatch(m -> m.density().isPresent());
    if (!densities) {
      return List.of();
    }
    if (spec.quantities().unit() == ConcentrationUnit.UNDECLARED) {
      return List.of(
          "units.concentration is not declared: the weight gain takes amounts as kg (right for"
              + " concentrations in kg/m^3, wrong for mol/m^3); declare \"units\": {\"concentration\":"
              + " ...} and the \"species\"");
    }
    if (spec.quantities().massPerAmount().isEmpty()) {
      return List.of(
          "no weight gain: amounts are in mol and the case names no \"species\" (water, hydrogen"
              + " or {\"molar_mass\": ...}) to weigh them");
    }
    return List.of();
  }

  /**
   * A face's concentration in the solve's unit: the declared value times the f of the parts the
   * face group bounds. Parts of other densities on one group would each need their own value.
   *
   * @param ownerScales f of the part behind each face of the group
   * @throws CaseInputException naming the face group when its parts' factors differ
   */
  static TimeFunction faceValue(
      CaseSpec spec, FaceSpec face, TimeFunction declared, double[] ownerScales) {
    double f = ownerScales.length == 0 ? 1.0 : ownerScales[0];
    for (double o : ownerScales) {
      if (o != f) {
        throw problem(
            spec,
            "faces." + face.faceGroup(),
            String.format(
                Locale.ROOT,
                "found a concentration in %s on faces of parts with different densities"
                    + " (%.4g and %.4g amount per m³ per %s), expected one part per face"
                    + " group: split the group by part, or declare a volumetric unit",
                spec.quantities().concentration(),
                f,
                o,
                spec.quantities().concentration()));
      }
    }
    return f == 1.0 ? declared : scaled(declared, f);
  }

  /** A problem at {@code path} of the case, where the file has it. */
  private static CaseInputException problem(CaseSpec spec, String path, String message) {
    SourcePlace at = spec.placeOf(path);
    return new CaseInputException(
        String.valueOf(spec.caseFile().getFileName()),
        List.of(new CaseInputException.Problem(at.line(), at.column(), path, message)));
  }

  private static TimeFunction scaled(TimeFunction declared, double f) {
    return new TimeFunction() {
      @Override
      public double at(double t) {
        return f * declared.at(t);
      }

      @Override
      public double[] breakpoints() {
        return declared.breakpoints();
      }
    };
  }
}
