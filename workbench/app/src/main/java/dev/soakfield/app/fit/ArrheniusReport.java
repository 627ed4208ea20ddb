package dev.soakfield.app.fit;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.soakfield.fem.fit.ArrheniusFit;
import dev.soakfield.fem.units.SiValue;
import dev.soakfield.report.FitPlot;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;

/** An Arrhenius fit: the measured (T, D) pairs and D = D0·exp(−Q/(R·T)) through them. */
public final class ArrheniusReport implements FitReport {
  private final Path data;
  private final double[] kelvin;
  private final double[] diffusivity;
  private final ArrheniusFit.Result fit;

  ArrheniusReport(Path data, double[] kelvin, double[] diffusivity, ArrheniusFit.Result fit) {
    this.data = data;
    this.kelvin = kelvin;
    this.diffusivity = diffusivity;
    this.fit = fit;
  }

  @Override
  public void printText(PrintWriter out) {
    out.printf(
        Locale.ROOT,
        "Arrhenius fit of %s: %d points, D = D0·exp(−Q/(R·T)), R² of ln D = %.5f%n",
        data,
        kelvin.length,
        fit.rSquare());
    out.printf(Locale.ROOT, "  %-10s %s%n", "D0", FitText.interval(fit.d0(), "m^2/s"));
    out.printf(Locale.ROOT, "  %-10s %s%n", "Q", FitText.interval(fit.activationEnergy(), "J/mol"));
    out.printf(
        Locale.ROOT,
        "  %-10s %s kJ/mol%n",
        "",
        SiValue.formatNumber(fit.activationEnergy().value() / 1e3));
    out.printf(
        Locale.ROOT, "  %10s %14s %14s %10s%n", "T [K]", "D [m²/s]", "fit [m²/s]", "ln resid.");
    for (int i = 0; i < kelvin.length; i++) {
      out.printf(
          Locale.ROOT,
          "  %10.2f %14.4e %14.4e %10.4f%n",
          kelvin[i],
          diffusivity[i],
          fit.diffusivityAt(kelvin[i]),
          fit.lnResiduals().get(i));
    }
  }

  @Override
  public void writePlot(Path png) throws IOException {
    double lo = Double.POSITIVE_INFINITY;
    double hi = 0;
    double[] xd = new double[kelvin.length];
    double[] yd = new double[kelvin.length];
    for (int i = 0; i < xd.length; i++) {
      xd[i] = 1000 / kelvin[i];
      yd[i] = Math.log(diffusivity[i]);
      lo = Math.min(lo, xd[i]);
      hi = Math.max(hi, xd[i]);
    }
    double[] xc = {lo, hi};
    double[] yc = {Math.log(fit.diffusivityAt(1000 / lo)), Math.log(fit.diffusivityAt(1000 / hi))};
    FitPlot.write(
        png,
        "Arrhenius fit of " + data.getFileName(),
        "1000 K / T",
        "ln(D / (m²/s))",
        new FitPlot.Series("measured", xd, yd),
        new FitPlot.Series("fit", xc, yc));
  }

  @Override
  public ObjectNode json() {
    ObjectNode tree = FitJson.tree();
    FitJson.put(tree.putObject("D0"), fit.d0());
    FitJson.put(tree.putObject("activationEnergy"), fit.activationEnergy());
    tree.put("rSquare", fit.rSquare());
    ArrayNode res = tree.putArray("lnResiduals");
    fit.lnResiduals().forEach(res::add);
    return tree;
  }
}
