package dev.soakfield.fem.bake;

import dev.soakfield.fem.casefile.CaseSpec;
import dev.soakfield.fem.casefile.MaterialSpec;
import dev.soakfield.fem.results.Series;
import dev.soakfield.fem.run.RunPipeline;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.topo.MeshGeometry;
import java.util.ArrayList;
import java.util.List;

/** What a bake target reads from a run's series, in which unit, and whether the case has it. */
final class BakeTargets {
  private BakeTargets() {}

  /**
   * @throws IllegalArgumentException naming what exists when the target's part or probe does not,
   *     or when the case cannot weigh its amounts
   */
  static void check(CaseSpec spec, BakeSearch.Target t) {
    switch (t.target()) {
      case "group", "mean" -> {
        MaterialSpec m = spec.materials().get(t.name());
        if (m == null || m.impermeable()) {
          List<String> parts = new ArrayList<>();
          spec.materials()
              .forEach(
                  (k, v) -> {
                    if (!v.impermeable()) {
                      parts.add(k);
                    }
                  });
          throw unknown(t, "part", parts);
        }
      }
      case "probe" -> {
        if (spec.probes().stream().noneMatch(p -> p.name().equals(t.name()))) {
          throw unknown(t, "probe", spec.probes().stream().map(p -> p.name()).toList());
        }
      }
      case "weight_gain" -> {
        for (MaterialSpec m : spec.materials().values()) {
          if (!m.impermeable() && m.density().isEmpty()) {
            throw new IllegalArgumentException(
                "bake target weight_gain: found part '"
                    + m.volumeGroup()
                    + "' without a density, expected every part's \"density\" to weigh it");
          }
        }
        if (spec.quantities().massPerAmount().isEmpty()) {
          throw new IllegalArgumentException(
              "bake target weight_gain: found amounts in mol and no \"species\", expected the"
                  + " species (water, hydrogen or {\"molar_mass\": ...}) to weigh them");
        }
      }
      case "amount", "total", "diffusible" -> {
        // always there: without source laws every amount is lattice and diffusible
      }
      default -> throw new IllegalArgumentException("bake target: unknown kind " + t.target());
    }
  }

  private static IllegalArgumentException unknown(
      BakeSearch.Target t, String what, List<String> names) {
    return new IllegalArgumentException(
        "bake target "
            + t.spelling()
            + ": found no "
            + what
            + " '"
            + t.name()
            + "', expected one of "
            + (names.isEmpty() ? "(none in the case)" : String.join(", ", names)));
  }

  static String unit(CaseSpec spec, BakeSearch.Target t) {
    return switch (t.target()) {
      case "amount", "total", "diffusible" -> spec.quantities().amount();
      case "weight_gain" -> "%";
      default -> spec.quantities().concentration();
    };
  }

  /** The target's value at every row of {@code s}. */
  static double[] values(Series s, RunPipeline.Prepared base, BakeSearch.Target t) {
    CaseSpec spec = base.spec();
    return switch (t.target()) {
      case "group" -> s.require("max:" + t.name());
      case "probe" -> s.require("probe:" + t.name());
      case "amount", "total" -> s.require("amount");
      case "diffusible" ->
          s.has("diffusible_amount") ? s.require("diffusible_amount") : s.require("amount");
      case "mean" -> {
        MaterialSpec m = spec.materials().get(t.name());
        double f = spec.quantities().perPart(m.density().orElse(Double.NaN));
        yield scaled(s.require("amount:" + t.name()), 1 / (f * volume(base.mesh(), t.name())));
      }
      case "weight_gain" -> {
        double dryMass = 0;
        TetMesh mesh = base.mesh();
        for (MaterialSpec m : spec.materials().values()) {
          if (!m.impermeable()) {
            dryMass += m.density().orElseThrow() * volume(mesh, m.volumeGroup());
          }
        }
        double kgPerAmount = spec.quantities().massPerAmount().orElseThrow();
        yield scaled(s.require("amount"), 100 * kgPerAmount / dryMass);
      }
      default -> throw new IllegalArgumentException("bake target: unknown kind " + t.target());
    };
  }

  private static double[] scaled(double[] v, double factor) {
    double[] out = new double[v.length];
    for (int i = 0; i < v.length; i++) {
      out[i] = v[i] * factor;
    }
    return out;
  }

  private static double volume(TetMesh mesh, String part) {
    int g = mesh.volumeGroupIndex(part);
    double v = 0;
    for (int t = 0; t < mesh.tetCount(); t++) {
      if (mesh.tetGroup(t) == g) {
        v += MeshGeometry.tetVolume(mesh, t);
      }
    }
    return v;
  }
}
