package dev.soakfield.app.fit;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.soakfield.fem.fit.Estimate;
import dev.soakfield.fem.fit.UptakeFit;
import dev.soakfield.fem.units.SiValue;
import dev.soakfield.report.FitPlot;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

/** A weighing fit: the changes since the reference, the plane-sheet fit and the dry mass. */
public final class WeighingReport implements FitReport {
  private final Path data;
  private final WeighingAnalysis.Options options;
  private final double edgeFactor;
  private final String edgeText;
  private final double[] t;
  private final double[] change;
  private final UptakeFit.Result fit;
  private final double dryMass;

  WeighingReport(
      Path data,
      WeighingAnalysis.Options options,
      double edgeFactor,
      String edgeText,
      double[] t,
      double[] change,
      UptakeFit.Result fit,
      double dryMass) {
    this.data = data;
    this.options = options;
    this.edgeFactor = edgeFactor;
    this.edgeText = edgeText;
    this.t = t;
    this.change = change;
    this.fit = fit;
    this.dryMass = dryMass;
  }

  /** Saturation as a mass fraction of the dry mass. */
  public Estimate saturation() {
    return fit.level().scaled(1 / dryMass);
  }

  private boolean desorption() {
    return options.desorption();
  }

  @Override
  public void printText(PrintWriter out) {
    int n = t.length;
    Estimate sat = saturation();
    out.printf(
        Locale.ROOT,
        "%s fit of %s: %d weighings, plate %s mm thick, %s%n",
        desorption() ? "Desorption" : "Uptake",
        data,
        n,
        FitText.in(options.thickness(), "m", "mm"),
        edgeText);
    out.printf(
        Locale.ROOT, "  %-22s %s%n", "diffusivity", FitText.interval(fit.diffusivity(), "m^2/s"));
    out.printf(
        Locale.ROOT,
        "  %-22s = %s mm²/h%n",
        "",
        SiValue.formatNumber(FitText.in(fit.diffusivity().value(), "m^2/s", "mm^2/h")));
    out.printf(
        Locale.ROOT,
        "  %-22s %s wt%% (%s, 95 %% interval %s to %s wt%%)%n",
        desorption() ? "moisture lost" : "saturation gain",
        SiValue.formatNumber(100 * sat.value()),
        FitText.mg(fit.level().value()) + " of " + FitText.mg(dryMass) + " dry",
        SiValue.formatNumber(100 * sat.low()),
        SiValue.formatNumber(100 * sat.high()));
    if (fit.halfTimeDiffusivity().isPresent()) {
      out.printf(
          Locale.ROOT,
          "  %-22s %s  (D = 0.049183·L²/t½, t½ = %s)%n",
          "half-time estimate",
          SiValue.format(fit.halfTimeDiffusivity().getAsDouble(), "m^2/s"),
          FitText.time(fit.halfTime().getAsDouble()));
    } else {
      out.printf(
          Locale.ROOT, "  %-22s not available: the data never reach half the level%n", "half-time");
    }
    out.printf(
        Locale.ROOT,
        "  %-22s rms %s, %d degrees of freedom%n",
        "residuals",
        FitText.mg(fit.fit().rmsResidual()),
        fit.fit().degreesOfFreedom());
    out.printf(
        Locale.ROOT, "  %12s %14s %14s %12s%n", "time", "change [mg]", "fit [mg]", "residual");
    List<Double> res = fit.fit().residuals();
    // four decimals of a milligram for a usual coupon; a gain far outside that range (a thin film's
    // nanograms, a part's kilograms) in scientific notation rather than as 0.0000 or 20 digits
    double levelMg = Math.abs(fit.level().value()) * 1e6;
    String row =
        levelMg >= 0.1 && levelMg < 1e5
            ? "  %12s %14.4f %14.4f %12.4f%n"
            : "  %12s %14.4e %14.4e %12.3e%n";
    for (int i = 0; i < n; i++) {
      out.printf(
          Locale.ROOT,
          row,
          FitText.time(t[i]),
          change[i] * 1e6,
          fit.model(t[i]) * 1e6,
          res.get(i) * 1e6);
    }
  }

  @Override
  public void writePlot(Path png) throws IOException {
    int n = t.length;
    int k = 200;
    double[] xc = new double[k + 1];
    double[] yc = new double[k + 1];
    double tEnd = t[n - 1];
    for (int i = 0; i <= k; i++) {
      double ti = tEnd * i * i / (double) (k * k);
      xc[i] = Math.sqrt(ti / 3600);
      yc[i] = 100 * fit.model(ti) / dryMass;
    }
    double[] xd = new double[n];
    double[] yd = new double[n];
    for (int i = 0; i < n; i++) {
      xd[i] = Math.sqrt(t[i] / 3600);
      yd[i] = 100 * change[i] / dryMass;
    }
    FitPlot.write(
        png,
        (desorption() ? "Desorption" : "Uptake") + " of " + data.getFileName(),
        "√(time / h)",
        (desorption() ? "mass lost" : "mass gained") + ", % of dry mass",
        new FitPlot.Series("measured", xd, yd),
        new FitPlot.Series("plane-sheet fit", xc, yc));
  }

  @Override
  public ObjectNode json() {
    ObjectNode tree = FitJson.tree();
    FitJson.put(tree.putObject("diffusivity"), fit.diffusivity());
    FitJson.put(tree.putObject("saturation"), saturation());
    tree.put("saturationUnit", "kg/kg (mass fraction of the dry mass)");
    FitJson.put(tree.putObject("saturationMass"), fit.level());
    tree.put("dryMass", dryMass);
    tree.put("thickness", options.thickness());
    tree.put("edgeFactor", edgeFactor);
    tree.put("desorption", desorption());
    FitJson.putOptional(tree, "halfTime", fit.halfTime());
    FitJson.putOptional(tree, "halfTimeDiffusivity", fit.halfTimeDiffusivity());
    tree.put("rmsResidual", fit.fit().rmsResidual());
    ArrayNode points = tree.putArray("points");
    for (int i = 0; i < t.length; i++) {
      ObjectNode p = points.addObject();
      p.put("time", t[i]);
      p.put("change", change[i]);
      p.put("fitted", fit.model(t[i]));
      p.put("residual", fit.fit().residuals().get(i));
    }
    return tree;
  }
}
