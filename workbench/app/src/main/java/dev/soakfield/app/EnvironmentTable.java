package dev.soakfield.app;

import dev.soakfield.fem.casefile.CaseSpec;
import dev.soakfield.fem.casefile.MaterialSpec;
import dev.soakfield.fem.physics.AmbientPotential;
import dev.soakfield.fem.physics.Arrhenius;
import dev.soakfield.fem.physics.ExposureHistory;
import dev.soakfield.fem.physics.SorptionLaw;
import dev.soakfield.fem.physics.TimeFunction;
import dev.soakfield.fem.units.ConcentrationUnit;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * What each part's material is at the run's temperatures: D and S at each exposure segment's
 * temperature (mid-segment for a ramp) and the saturation level c = S·potential the environment
 * drives the part towards, so pre-factors are never read as values.
 */
final class EnvironmentTable {
  /** Segments listed at most; a long repeated history is cut with a count. */
  static final int MAX_SEGMENTS = 12;

  private EnvironmentTable() {}

  static String of(CaseSpec c) {
    StringBuilder sb = new StringBuilder();
    Optional<ExposureHistory> h = c.exposure();
    if (h.isEmpty()) {
      double t = c.temperatureHistory().at(0);
      sb.append(String.format(Locale.ROOT, "  at %.1f °C:%n", t - 273.15));
      parts(sb, c, t, Optional.empty());
      return sb.toString();
    }
    Optional<TimeFunction> ambient =
        c.law() == SorptionLaw.PLAIN
            ? Optional.empty()
            : Optional.of(AmbientPotential.of(c.law(), h.get()));
    List<ExposureHistory.Segment> segments = h.get().segments();
    for (int i = 0; i < Math.min(MAX_SEGMENTS, segments.size()); i++) {
      ExposureHistory.Segment s = segments.get(i);
      double mid = 0.5 * (s.start() + s.end());
      double t = h.get().temperature(mid);
      sb.append(
          String.format(
              Locale.ROOT,
              "  segment %d, %s to %s, %.1f °C%s:%n",
              i + 1,
              Annotations.time(s.start()),
              Annotations.time(s.end()),
              t - 273.15,
              s.temperatureStart() != s.temperatureEnd() ? " (mid-ramp)" : ""));
      Optional<Double> potential = ambient.map(a -> a.at(mid));
      parts(sb, c, t, potential);
    }
    if (segments.size() > MAX_SEGMENTS) {
      sb.append("  ... and ").append(segments.size() - MAX_SEGMENTS).append(" more segments\n");
    }
    return sb.toString();
  }

  private static void parts(StringBuilder sb, CaseSpec c, double kelvin, Optional<Double> phi) {
    String cUnit =
        c.quantities().unit() == ConcentrationUnit.UNDECLARED
            ? "amount/m³"
            : c.quantities().concentration();
    String sUnit =
        switch (c.law()) {
          case HENRY -> " (" + cUnit + ")/Pa";
          case SIEVERTS -> " (" + cUnit + ")/√Pa";
          case PLAIN -> "";
        };
    for (MaterialSpec m : c.materials().values()) {
      if (m.impermeable()) {
        continue;
      }
      double[] d = m.diffusivity().tensor();
      double dFactor = new Arrhenius(1.0, m.diffusivityEnergy()).at(kelvin);
      double meanD = (d[0] + d[1] + d[2]) / 3 * dFactor;
      double s = new Arrhenius(m.solubility(), m.solubilityEnergy()).at(kelvin);
      sb.append(
          String.format(
              Locale.ROOT,
              "    %-14s D = %.4g m²/s%s, S = %.4g%s",
              m.volumeGroup(),
              meanD,
              m.diffusivity().isIsotropic() ? "" : " (mean of the tensor's diagonal)",
              s,
              sUnit));
      phi.ifPresent(
          p -> sb.append(String.format(Locale.ROOT, ", saturation c = %.4g %s", s * p, cUnit)));
      sb.append('\n');
    }
  }
}
