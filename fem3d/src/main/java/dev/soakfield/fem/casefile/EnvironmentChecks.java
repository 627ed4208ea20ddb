package dev.soakfield.fem.casefile;

import dev.soakfield.fem.physics.ExposureHistory;
import dev.soakfield.fem.physics.FaceKind;
import dev.soakfield.fem.physics.SorptionLaw;
import dev.soakfield.fem.physics.WaterVapour;
import java.util.List;

/** Checks that the law, the exposure, the materials and the faces fit together. */
final class EnvironmentChecks {
  private EnvironmentChecks() {}

  static void check(CaseSpec spec, ProblemList problems, List<String> warnings) {
    boolean thermal = false;
    for (MaterialSpec m : spec.materials().values()) {
      thermal |= m.diffusivityEnergy() != 0 || m.solubilityEnergy() != 0;
    }
    if (thermal && spec.exposure().isEmpty() && Double.isNaN(spec.temperature())) {
      add(
          spec,
          problems,
          "materials",
          "found Arrhenius properties but no temperature, expected \"temperature\" or an"
              + " \"exposure\" history");
    }
    for (FaceSpec f : spec.faces().values()) {
      if (!f.ambientValue() || f.kind() == FaceKind.LAW) {
        continue; // a face law without a pressure of its own takes the exposure's, if any, else 0
      }
      String path = CasePaths.child(CasePaths.child("faces", f.faceGroup()), "kind");
      if (f.kind() == FaceKind.EXCHANGE) {
        path = CasePaths.child(CasePaths.child("faces", f.faceGroup()), "value");
      }
      if (spec.law() == SorptionLaw.PLAIN) {
        add(
            spec,
            problems,
            path,
            "found the ambient environment under the plain law, expected \"law\": \"henry\""
                + " (humidity) or \"sieverts\" (hydrogen pressure)");
        continue;
      }
      if (spec.exposure().isEmpty()) {
        add(
            spec,
            problems,
            path,
            "found the ambient environment but no \"exposure\", expected an exposure history"
                + " giving "
                + (spec.law() == SorptionLaw.HENRY ? "humidity" : "pressure"));
        continue;
      }
      checkHistory(spec, spec.exposure().get(), problems);
    }
    if (spec.exposure().isPresent()
        && spec.time().end() > spec.exposure().get().end() * (1 + 1e-12)) {
      warnings.add(
          "time.end lies after the exposure history ends; its last values hold until then");
    }
    spec.time()
        .stop()
        .ifPresent(
            stop -> {
              boolean known =
                  stop.target().equals("group")
                      ? spec.materials().containsKey(stop.name())
                      : spec.probes().stream().anyMatch(p -> p.name().equals(stop.name()));
              if (!known) {
                add(
                    spec,
                    problems,
                    CasePaths.child(CasePaths.child("time", "stop"), stop.target()),
                    "found '"
                        + stop.name()
                        + "', expected the name of a "
                        + (stop.target().equals("group") ? "material's volume group" : "probe"));
              }
            });
  }

  private static void checkHistory(CaseSpec spec, ExposureHistory h, ProblemList problems) {
    List<ExposureHistory.Segment> segments = h.segments();
    for (int i = 0; i < segments.size(); i++) {
      ExposureHistory.Segment s = segments.get(i);
      String path = CasePaths.item("exposure", Math.min(i, segments.size() - 1));
      if (spec.law() == SorptionLaw.HENRY) {
        if (Double.isNaN(s.humidityStart()) || Double.isNaN(s.humidityEnd())) {
          add(
              spec,
              problems,
              path,
              "found no humidity, expected a relative humidity for ambient faces");
          return;
        }
        for (double t : new double[] {s.temperatureStart(), s.temperatureEnd()}) {
          if (t < WaterVapour.MIN_TEMPERATURE || t > WaterVapour.CRITICAL_TEMPERATURE) {
            add(
                spec,
                problems,
                path,
                "found a temperature of "
                    + CaseFields.plain(t)
                    + " K, expected 273.15 K to 647.096 K (the range of the water saturation-pressure"
                    + " equation)");
            return;
          }
        }
      } else if (Double.isNaN(s.pressureStart()) || Double.isNaN(s.pressureEnd())) {
        add(
            spec,
            problems,
            path,
            "found no pressure, expected a hydrogen pressure for ambient faces");
        return;
      }
    }
  }

  private static void add(CaseSpec spec, ProblemList problems, String path, String message) {
    SourcePlace at = spec.placeOf(path);
    problems.add(at.line(), at.column(), path, message);
  }
}
