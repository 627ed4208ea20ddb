package dev.soakfield.app.fit;

import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.soakfield.fem.fit.Estimate;
import dev.soakfield.fem.fit.PermeationEvaluation;
import dev.soakfield.fem.units.SiValue;
import dev.soakfield.report.FitPlot;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.OptionalDouble;

/** A permeation transient: time lags, breakthrough, and the fit of the whole membrane solution. */
public final class PermeationReport implements FitReport {
  private final Path data;
  private final double thickness;
  private final boolean fromCurrent;
  private final double background;
  private final double[] t;
  private final double[] flux;
  private final PermeationEvaluation.Result r;

  PermeationReport(
      Path data,
      double thickness,
      boolean fromCurrent,
      double background,
      double[] t,
      double[] flux,
      PermeationEvaluation.Result r) {
    this.data = data;
    this.thickness = thickness;
    this.fromCurrent = fromCurrent;
    this.background = background;
    this.t = t;
    this.flux = flux;
    this.r = r;
  }

  @Override
  public void printText(PrintWriter out) {
    out.printf(
        Locale.ROOT,
        "Permeation transient %s: %d points, membrane %s mm thick%s%n",
        data,
        t.length,
        FitText.in(thickness, "m", "mm"),
        fromCurrent ? ", current density converted by J = i/F (F = 96485.33212 C/mol)" : "");
    out.printf(
        Locale.ROOT,
        "  %-30s %s (first row, subtracted)%n",
        "background flux",
        SiValue.format(background, "mol/(m^2*s)"));
    out.printf(
        Locale.ROOT,
        "  %-30s %s (mean of the last tenth)%n",
        "steady-state flux J_ss",
        SiValue.format(r.steadyFlux(), "mol/(m^2*s)"));
    line(out, "time lag (J/J_ss = 0.63)", r.timeLag(), r.effectiveDiffusivity(), "L²/(6·t_lag)");
    line(
        out,
        "time lag (accumulated amount)",
        r.integratedTimeLag(),
        r.integratedDiffusivity(),
        "L²/(6·t_lag)");
    line(
        out,
        "breakthrough (J/J_ss = 0.1)",
        r.breakthroughTime(),
        r.breakthroughDiffusivity(),
        "L²/(15.3·t_b)");
    if (r.subsurfaceConcentration().isPresent()) {
      out.printf(
          Locale.ROOT,
          "  %-30s %s  (C0 = J_ss·L/D_eff, D_eff from the time lag)%n",
          "subsurface concentration",
          SiValue.format(r.subsurfaceConcentration().getAsDouble(), "mol/m^3"));
    }
    out.println("  fit of the whole transient (Crank's membrane solution):");
    out.printf(
        Locale.ROOT,
        "  %-30s %s%n",
        "diffusivity",
        FitText.interval(r.fit().diffusivity(), "m^2/s"));
    out.printf(
        Locale.ROOT,
        "  %-30s %s%n",
        "steady-state flux",
        FitText.interval(r.fit().level(), "mol/(m^2*s)"));
    out.printf(
        Locale.ROOT,
        "  %-30s %s%n",
        "subsurface concentration",
        FitText.interval(subsurface(), "mol/m^3"));
    out.printf(
        Locale.ROOT,
        "  %-30s rms %s, %d degrees of freedom%n",
        "residuals",
        SiValue.format(r.fit().rmsResidual(), "mol/(m^2*s)"),
        r.fit().degreesOfFreedom());
  }

  private Estimate subsurface() {
    return r.fittedSubsurfaceConcentration();
  }

  private static void line(
      PrintWriter out, String label, OptionalDouble time, OptionalDouble d, String formula) {
    if (time.isEmpty() || d.isEmpty()) {
      out.printf(Locale.ROOT, "  %-30s not reached in the data%n", label);
      return;
    }
    out.printf(
        Locale.ROOT,
        "  %-30s %s  D = %s = %s%n",
        label,
        FitText.time(time.getAsDouble()),
        formula,
        SiValue.format(d.getAsDouble(), "m^2/s"));
  }

  @Override
  public void writePlot(Path png) throws IOException {
    int n = t.length;
    int k = 300;
    double[] xc = new double[k + 1];
    double[] yc = new double[k + 1];
    for (int i = 0; i <= k; i++) {
      double ti = t[n - 1] * i / k;
      xc[i] = ti / 3600;
      yc[i] = r.model(ti) / r.fit().level().value();
    }
    double[] xd = new double[n];
    double[] yd = new double[n];
    for (int i = 0; i < n; i++) {
      xd[i] = t[i] / 3600;
      yd[i] = flux[i] / r.fit().level().value();
    }
    FitPlot.write(
        png,
        "Permeation transient " + data.getFileName(),
        "time / h",
        "J / J_ss (fitted)",
        new FitPlot.Series("measured", xd, yd),
        new FitPlot.Series("membrane fit", xc, yc));
  }

  @Override
  public ObjectNode json() {
    ObjectNode tree = FitJson.tree();
    FitJson.put(tree.putObject("diffusivity"), r.fit().diffusivity());
    FitJson.put(tree.putObject("saturation"), subsurface());
    tree.put("saturationUnit", "mol/m^3 (subsurface concentration C0 = J_ss·L/D)");
    FitJson.put(tree.putObject("fittedSteadyFlux"), r.fit().level());
    tree.put("thickness", thickness);
    tree.put("background", background);
    tree.put("steadyFlux", r.steadyFlux());
    FitJson.putOptional(tree, "timeLag", r.timeLag());
    FitJson.putOptional(tree, "effectiveDiffusivity", r.effectiveDiffusivity());
    FitJson.putOptional(tree, "integratedTimeLag", r.integratedTimeLag());
    FitJson.putOptional(tree, "integratedDiffusivity", r.integratedDiffusivity());
    FitJson.putOptional(tree, "breakthroughTime", r.breakthroughTime());
    FitJson.putOptional(tree, "breakthroughDiffusivity", r.breakthroughDiffusivity());
    FitJson.putOptional(tree, "subsurfaceConcentration", r.subsurfaceConcentration());
    tree.put("rmsResidual", r.fit().rmsResidual());
    return tree;
  }
}
