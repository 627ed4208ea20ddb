package dev.soakfield.app.fit;

import dev.soakfield.fem.fit.PlaneSheetUptake;
import dev.soakfield.fem.fit.UptakeFit;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * Diffusivity and saturation from weighings of a plate: reads {@code time,mass}, turns the masses
 * into changes since the start of exposure (or of drying) and fits the plane-sheet solution with
 * the Shen–Springer edge correction.
 */
public final class WeighingAnalysis {
  /** Plate edge lengths, m, for the edge correction. */
  public record Edges(double a, double b) {}

  /**
   * What the weighings need besides the file: thickness (m), the plate's edges when not sealed, a
   * dry mass (kg) when the first row is not the reference, and whether the data record drying.
   */
  public record Options(
      double thickness, Optional<Edges> edges, OptionalDouble dryMass, boolean desorption) {}

  private WeighingAnalysis() {}

  public static WeighingReport fit(Path data, Options o) {
    double l = o.thickness();
    double factor = 1;
    String edgeText = "edges sealed or negligible";
    if (o.edges().isPresent()) {
      Edges e = o.edges().get();
      factor = PlaneSheetUptake.edgeFactor(l, e.a(), e.b());
      edgeText =
          String.format(
              Locale.ROOT,
              "edges %s x %s, Shen-Springer factor (1 + L/a + L/b)^2 = %.5f",
              FitText.in(e.a(), "m", "mm") + " mm",
              FitText.in(e.b(), "m", "mm") + " mm",
              factor);
    }
    FitTable table =
        FitTable.read(
            data,
            new FitTable.Column("s", "time", "t"),
            new FitTable.Column("kg", "mass", "weight", "m"));
    table.requireIncreasingFirstColumn();
    boolean firstIsReference = !(o.dryMass().isPresent() && !o.desorption());
    int first = firstIsReference ? 1 : 0;
    table.requireRows(first + 4, "(a fit of two parameters needs at least 4 weighings)");
    double t0 = firstIsReference ? table.x[0] : 0;
    double m0 = firstIsReference ? table.y[0] : o.dryMass().getAsDouble();
    int n = table.x.length - first;
    double[] t = new double[n];
    double[] change = new double[n];
    for (int i = 0; i < n; i++) {
      t[i] = table.x[i + first] - t0;
      change[i] = o.desorption() ? m0 - table.y[i + first] : table.y[i + first] - m0;
    }
    if (t[0] < 0) {
      throw new FitInputException(
          FitTable.place(data, table.lines[first])
              + "found time "
              + table.x[first]
              + " s, expected a time at or after the start of exposure (0)");
    }
    UptakeFit.Result r = UptakeFit.fit(t, change, l, factor);
    if (!(r.level().value() > 0)) {
      // a negative "gain" is data of the other direction, not a result to report
      throw new FitInputException(
          data
              + ": found the mass "
              + (o.desorption() ? "rising" : "falling")
              + " (a fitted change of "
              + r.level().value()
              + " kg), expected "
              + (o.desorption()
                  ? "a mass loss for --desorption; leave --desorption out for uptake data"
                  : "a mass gain; for drying data give --desorption"));
    }
    double dry;
    if (!o.desorption()) {
      dry = m0;
    } else if (o.dryMass().isPresent()) {
      dry = o.dryMass().getAsDouble();
    } else {
      dry = m0 - r.level().value();
    }
    return new WeighingReport(data, o, factor, edgeText, t, change, r, dry);
  }
}
