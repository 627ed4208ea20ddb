package dev.soakfield.app.fit;

import dev.soakfield.fem.fit.ArrheniusFit;
import java.nio.file.Path;

/**
 * D0 and Q from diffusivities measured at several temperatures ({@code temperature,diffusivity}).
 */
public final class ArrheniusAnalysis {
  private ArrheniusAnalysis() {}

  public static ArrheniusReport fit(Path data) {
    FitTable table =
        FitTable.read(
            data,
            new FitTable.Column("K", "temperature", "t"),
            new FitTable.Column("m^2/s", "diffusivity", "d"));
    table.requireRows(3, "(an Arrhenius fit with intervals needs 3 temperatures)");
    return new ArrheniusReport(data, table.x, table.y, ArrheniusFit.fit(table.x, table.y));
  }
}
