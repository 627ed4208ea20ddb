package dev.soakfield.app.fit;

import dev.soakfield.fem.fit.PermeationEvaluation;
import java.nio.file.Path;
import java.util.List;

/**
 * The evaluations of a hydrogen permeation transient ({@code time,flux} or {@code time,current
 * density} at the exit side): the first row is the background when charging starts and is taken off
 * every later row.
 */
public final class PermeationAnalysis {
  /** Faraday constant, C/mol (CODATA 2018: N_A·e, both exact). */
  public static final double FARADAY = 96485.33212;

  private PermeationAnalysis() {}

  /** Evaluates the transient in {@code data} through a membrane {@code thickness} m thick. */
  public static PermeationReport fit(Path data, double thickness) {
    FitTable table =
        FitTable.read(
            data,
            new FitTable.Column("s", "time", "t"),
            new FitTable.Column("mol/(m^2*s)", "flux", "j"),
            new FitTable.Column("A/m^2", "current density", "current", "i"));
    table.requireIncreasingFirstColumn();
    table.requireRows(7, "(the background row and at least 6 points of the transient)");
    boolean current = !List.of("flux", "j").contains(table.secondName);
    double perUnit = current ? 1 / FARADAY : 1;
    int n = table.x.length - 1;
    double[] t = new double[n];
    double[] j = new double[n];
    double background = table.y[0] * perUnit;
    for (int i = 0; i < n; i++) {
      t[i] = table.x[i + 1] - table.x[0];
      j[i] = table.y[i + 1] * perUnit - background;
    }
    return new PermeationReport(
        data, thickness, current, background, t, j, PermeationEvaluation.evaluate(t, j, thickness));
  }
}
