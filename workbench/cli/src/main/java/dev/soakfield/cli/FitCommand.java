package dev.soakfield.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.soakfield.fem.fit.ArrheniusFit;
import dev.soakfield.fem.fit.Estimate;
import dev.soakfield.fem.fit.FitFailedException;
import dev.soakfield.fem.fit.PermeationEvaluation;
import dev.soakfield.fem.fit.PlaneSheetUptake;
import dev.soakfield.fem.fit.UptakeFit;
import dev.soakfield.fem.units.SiValue;
import dev.soakfield.fem.units.UnitException;
import dev.soakfield.report.FitPlot;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code soakfield fit DATA.csv}: diffusivity and saturation from weighing data, an Arrhenius law
 * from diffusivities at several temperatures, or the evaluations of a hydrogen permeation
 * transient.
 */
@Command(
    name = "fit",
    mixinStandardHelpOptions = true,
    description = {
      "Fits measured diffusion data with 95 %% confidence intervals.",
      "Weighing (default): CSV 'time,mass' (units optional, e.g. 'time [h],mass [mg]'); the first"
          + " row is the dry mass at the start of exposure unless --dry-mass is given. With"
          + " --desorption the first row is the mass when drying starts.",
      "--arrhenius: CSV 'temperature,diffusivity'. --permeation: CSV 'time,flux' or"
          + " 'time,current density' (exit side; J = i/F); the first row is the background at the"
          + " moment charging starts.",
      "Lines starting with # are comments. Values without units are SI."
    })
final class FitCommand implements Callable<Integer> {
  /** Faraday constant, C/mol (CODATA 2018: N_A·e, both exact). */
  static final double FARADAY = 96485.33212;

  static final List<String> CAUTIONS =
      List.of(
          "these estimates rest on the measured data given and assume Fickian diffusion in a"
              + " uniform specimen; look at the residuals for two-stage or non-Fickian behaviour.",
          "moisture-sensitivity classification, hydrogen-embrittlement acceptance and bake"
              + " schedules are governed by the applicable standards and licensed engineering"
              + " judgement, not by this fit.");

  @Spec CommandSpec spec;

  @Parameters(index = "0", paramLabel = "DATA.csv", description = "The measurements.")
  Path data;

  @Option(
      names = "--thickness",
      paramLabel = "LENGTH",
      description = "Specimen or membrane thickness, e.g. 1mm (weighing and permeation).")
  String thickness;

  @Option(
      names = "--edges",
      paramLabel = "A,B",
      description = "Plate edge lengths for the Shen-Springer edge correction, e.g. 50mm,50mm.")
  String edges;

  @Option(names = "--dry-mass", paramLabel = "MASS", description = "Dry mass, e.g. 1.2g.")
  String dryMass;

  @Option(names = "--desorption", description = "The data record drying (mass loss).")
  boolean desorption;

  @Option(names = "--arrhenius", description = "Fit D0 and Q from temperature,diffusivity.")
  boolean arrhenius;

  @Option(names = "--permeation", description = "Evaluate a hydrogen permeation transient.")
  boolean permeation;

  @Option(names = "--json", description = "Print the estimates as JSON in SI units.")
  boolean json;

  @Option(names = "--plot", paramLabel = "FILE.png", description = "Write data and fit as PNG.")
  Path plot;

  @Override
  public Integer call() throws IOException {
    if (arrhenius && permeation) {
      throw new UserInputException(
          "--arrhenius and --permeation: found both, expected at most one kind of fit");
    }
    if ((arrhenius || permeation) && (desorption || dryMass != null || edges != null)) {
      throw new UserInputException(
          "--desorption, --dry-mass and --edges apply to weighing data only");
    }
    ObjectNode tree;
    try {
      if (arrhenius) {
        tree = arrhenius();
      } else if (permeation) {
        tree = permeation();
      } else {
        tree = weighing();
      }
    } catch (FitFailedException | IllegalArgumentException e) {
      throw new UserInputException(data + ": " + e.getMessage());
    }
    PrintWriter out = spec.commandLine().getOut();
    ArrayNode cautions = tree.putArray("cautions");
    CAUTIONS.forEach(cautions::add);
    if (json) {
      out.println(
          new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT).writeValueAsString(tree));
    } else {
      for (String c : CAUTIONS) {
        out.println("caution: " + c);
      }
      if (plot != null) {
        out.println("plot written to " + plot);
      }
    }
    out.flush();
    return ExitCodes.OK;
  }

  private ObjectNode weighing() throws IOException {
    double l = positive("--thickness", required("--thickness", thickness), "m");
    double factor = 1;
    String edgeText = "edges sealed or negligible";
    if (edges != null) {
      String[] parts = edges.split(",", -1);
      if (parts.length != 2) {
        throw new UserInputException(
            "--edges: found '" + edges + "', expected two lengths such as 50mm,50mm");
      }
      double a = positive("--edges", parts[0], "m");
      double b = positive("--edges", parts[1], "m");
      factor = PlaneSheetUptake.edgeFactor(l, a, b);
      edgeText =
          String.format(
              Locale.ROOT,
              "edges %s x %s, Shen-Springer factor (1 + L/a + L/b)^2 = %.5f",
              in(a, "m", "mm") + " mm",
              in(b, "m", "mm") + " mm",
              factor);
    }
    FitTable table =
        FitTable.read(
            data,
            new FitTable.Column("s", "time", "t"),
            new FitTable.Column("kg", "mass", "weight", "m"));
    table.requireIncreasingFirstColumn();
    boolean firstIsReference = !(dryMass != null && !desorption);
    int first = firstIsReference ? 1 : 0;
    table.requireRows(first + 4, "(a fit of two parameters needs at least 4 weighings)");
    double t0 = firstIsReference ? table.x[0] : 0;
    double m0 = firstIsReference ? table.y[0] : positive("--dry-mass", dryMass, "kg");
    int n = table.x.length - first;
    double[] t = new double[n];
    double[] change = new double[n];
    for (int i = 0; i < n; i++) {
      t[i] = table.x[i + first] - t0;
      change[i] = desorption ? m0 - table.y[i + first] : table.y[i + first] - m0;
    }
    if (t[0] < 0) {
      throw new UserInputException(
          FitTable.place(data, table.lines[first])
              + "found time "
              + table.x[first]
              + " s, expected a time at or after the start of exposure (0)");
    }
    UptakeFit.Result r = UptakeFit.fit(t, change, l, factor);
    double dry;
    if (!desorption) {
      dry = m0;
    } else if (dryMass != null) {
      dry = positive("--dry-mass", dryMass, "kg");
    } else {
      dry = m0 - r.level().value();
    }
    Estimate sat = r.level().scaled(1 / dry);
    PrintWriter out = spec.commandLine().getOut();
    if (!json) {
      out.printf(
          Locale.ROOT,
          "%s fit of %s: %d weighings, plate %s mm thick, %s%n",
          desorption ? "Desorption" : "Uptake",
          data,
          n,
          in(l, "m", "mm"),
          edgeText);
      out.printf(Locale.ROOT, "  %-22s %s%n", "diffusivity", interval(r.diffusivity(), "m^2/s"));
      out.printf(
          Locale.ROOT,
          "  %-22s = %s mm²/h%n",
          "",
          SiValue.formatNumber(in(r.diffusivity().value(), "m^2/s", "mm^2/h")));
      out.printf(
          Locale.ROOT,
          "  %-22s %s wt%% (%s, 95 %% interval %s to %s wt%%)%n",
          desorption ? "moisture lost" : "saturation gain",
          SiValue.formatNumber(100 * sat.value()),
          mg(r.level().value()) + " of " + mg(dry) + " dry",
          SiValue.formatNumber(100 * sat.low()),
          SiValue.formatNumber(100 * sat.high()));
      if (r.halfTimeDiffusivity().isPresent()) {
        out.printf(
            Locale.ROOT,
            "  %-22s %s  (D = 0.049183·L²/t½, t½ = %s)%n",
            "half-time estimate",
            SiValue.format(r.halfTimeDiffusivity().getAsDouble(), "m^2/s"),
            time(r.halfTime().getAsDouble()));
      } else {
        out.printf(
            Locale.ROOT,
            "  %-22s not available: the data never reach half the level%n",
            "half-time");
      }
      out.printf(
          Locale.ROOT,
          "  %-22s rms %s, %d degrees of freedom%n",
          "residuals",
          mg(r.fit().rmsResidual()),
          r.fit().degreesOfFreedom());
      out.printf(
          Locale.ROOT, "  %12s %14s %14s %12s%n", "time", "change [mg]", "fit [mg]", "residual");
      List<Double> res = r.fit().residuals();
      for (int i = 0; i < n; i++) {
        out.printf(
            Locale.ROOT,
            "  %12s %14.4f %14.4f %12.4f%n",
            time(t[i]),
            change[i] * 1e6,
            r.model(t[i]) * 1e6,
            res.get(i) * 1e6);
      }
    }
    if (plot != null) {
      int k = 200;
      double[] xc = new double[k + 1];
      double[] yc = new double[k + 1];
      double tEnd = t[n - 1];
      for (int i = 0; i <= k; i++) {
        double ti = tEnd * i * i / (double) (k * k);
        xc[i] = Math.sqrt(ti / 3600);
        yc[i] = 100 * r.model(ti) / dry;
      }
      double[] xd = new double[n];
      double[] yd = new double[n];
      for (int i = 0; i < n; i++) {
        xd[i] = Math.sqrt(t[i] / 3600);
        yd[i] = 100 * change[i] / dry;
      }
      FitPlot.write(
          plot,
          (desorption ? "Desorption" : "Uptake") + " of " + data.getFileName(),
          "√(time / h)",
          (desorption ? "mass lost" : "mass gained") + ", % of dry mass",
          new FitPlot.Series("measured", xd, yd),
          new FitPlot.Series("plane-sheet fit", xc, yc));
    }
    ObjectNode tree = new ObjectMapper().createObjectNode();
    put(tree.putObject("diffusivity"), r.diffusivity());
    put(tree.putObject("saturation"), sat);
    tree.put("saturationUnit", "kg/kg (mass fraction of the dry mass)");
    put(tree.putObject("saturationMass"), r.level());
    tree.put("dryMass", dry);
    tree.put("thickness", l);
    tree.put("edgeFactor", factor);
    tree.put("desorption", desorption);
    putOptional(tree, "halfTime", r.halfTime());
    putOptional(tree, "halfTimeDiffusivity", r.halfTimeDiffusivity());
    tree.put("rmsResidual", r.fit().rmsResidual());
    ArrayNode points = tree.putArray("points");
    for (int i = 0; i < n; i++) {
      ObjectNode p = points.addObject();
      p.put("time", t[i]);
      p.put("change", change[i]);
      p.put("fitted", r.model(t[i]));
      p.put("residual", r.fit().residuals().get(i));
    }
    return tree;
  }

  private ObjectNode arrhenius() throws IOException {
    FitTable table =
        FitTable.read(
            data,
            new FitTable.Column("K", "temperature", "t"),
            new FitTable.Column("m^2/s", "diffusivity", "d"));
    table.requireRows(3, "(an Arrhenius fit with intervals needs 3 temperatures)");
    ArrheniusFit.Result r = ArrheniusFit.fit(table.x, table.y);
    PrintWriter out = spec.commandLine().getOut();
    if (!json) {
      out.printf(
          Locale.ROOT,
          "Arrhenius fit of %s: %d points, D = D0·exp(−Q/(R·T)), R² of ln D = %.5f%n",
          data,
          table.x.length,
          r.rSquare());
      out.printf(Locale.ROOT, "  %-10s %s%n", "D0", interval(r.d0(), "m^2/s"));
      out.printf(Locale.ROOT, "  %-10s %s%n", "Q", interval(r.activationEnergy(), "J/mol"));
      out.printf(
          Locale.ROOT,
          "  %-10s %s kJ/mol%n",
          "",
          SiValue.formatNumber(r.activationEnergy().value() / 1e3));
      out.printf(
          Locale.ROOT, "  %10s %14s %14s %10s%n", "T [K]", "D [m²/s]", "fit [m²/s]", "ln resid.");
      for (int i = 0; i < table.x.length; i++) {
        out.printf(
            Locale.ROOT,
            "  %10.2f %14.4e %14.4e %10.4f%n",
            table.x[i],
            table.y[i],
            r.diffusivityAt(table.x[i]),
            r.lnResiduals().get(i));
      }
    }
    if (plot != null) {
      double lo = Double.POSITIVE_INFINITY;
      double hi = 0;
      double[] xd = new double[table.x.length];
      double[] yd = new double[table.x.length];
      for (int i = 0; i < xd.length; i++) {
        xd[i] = 1000 / table.x[i];
        yd[i] = Math.log(table.y[i]);
        lo = Math.min(lo, xd[i]);
        hi = Math.max(hi, xd[i]);
      }
      double[] xc = {lo, hi};
      double[] yc = {Math.log(r.diffusivityAt(1000 / lo)), Math.log(r.diffusivityAt(1000 / hi))};
      FitPlot.write(
          plot,
          "Arrhenius fit of " + data.getFileName(),
          "1000 K / T",
          "ln(D / (m²/s))",
          new FitPlot.Series("measured", xd, yd),
          new FitPlot.Series("fit", xc, yc));
    }
    ObjectNode tree = new ObjectMapper().createObjectNode();
    put(tree.putObject("D0"), r.d0());
    put(tree.putObject("activationEnergy"), r.activationEnergy());
    tree.put("rSquare", r.rSquare());
    ArrayNode res = tree.putArray("lnResiduals");
    r.lnResiduals().forEach(res::add);
    return tree;
  }

  private ObjectNode permeation() throws IOException {
    double l = positive("--thickness", required("--thickness", thickness), "m");
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
    PermeationEvaluation.Result r = PermeationEvaluation.evaluate(t, j, l);
    Estimate c0Fit = r.fittedSubsurfaceConcentration();
    PrintWriter out = spec.commandLine().getOut();
    if (!json) {
      out.printf(
          Locale.ROOT,
          "Permeation transient %s: %d points, membrane %s mm thick%s%n",
          data,
          n,
          in(l, "m", "mm"),
          current ? ", current density converted by J = i/F (F = 96485.33212 C/mol)" : "");
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
          Locale.ROOT, "  %-30s %s%n", "diffusivity", interval(r.fit().diffusivity(), "m^2/s"));
      out.printf(
          Locale.ROOT,
          "  %-30s %s%n",
          "steady-state flux",
          interval(r.fit().level(), "mol/(m^2*s)"));
      out.printf(
          Locale.ROOT, "  %-30s %s%n", "subsurface concentration", interval(c0Fit, "mol/m^3"));
      out.printf(
          Locale.ROOT,
          "  %-30s rms %s, %d degrees of freedom%n",
          "residuals",
          SiValue.format(r.fit().rmsResidual(), "mol/(m^2*s)"),
          r.fit().degreesOfFreedom());
    }
    if (plot != null) {
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
        yd[i] = j[i] / r.fit().level().value();
      }
      FitPlot.write(
          plot,
          "Permeation transient " + data.getFileName(),
          "time / h",
          "J / J_ss (fitted)",
          new FitPlot.Series("measured", xd, yd),
          new FitPlot.Series("membrane fit", xc, yc));
    }
    ObjectNode tree = new ObjectMapper().createObjectNode();
    put(tree.putObject("diffusivity"), r.fit().diffusivity());
    put(tree.putObject("saturation"), c0Fit);
    tree.put("saturationUnit", "mol/m^3 (subsurface concentration C0 = J_ss·L/D)");
    put(tree.putObject("fittedSteadyFlux"), r.fit().level());
    tree.put("thickness", l);
    tree.put("background", background);
    tree.put("steadyFlux", r.steadyFlux());
    putOptional(tree, "timeLag", r.timeLag());
    putOptional(tree, "effectiveDiffusivity", r.effectiveDiffusivity());
    putOptional(tree, "integratedTimeLag", r.integratedTimeLag());
    putOptional(tree, "integratedDiffusivity", r.integratedDiffusivity());
    putOptional(tree, "breakthroughTime", r.breakthroughTime());
    putOptional(tree, "breakthroughDiffusivity", r.breakthroughDiffusivity());
    putOptional(tree, "subsurfaceConcentration", r.subsurfaceConcentration());
    tree.put("rmsResidual", r.fit().rmsResidual());
    return tree;
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
        time(time.getAsDouble()),
        formula,
        SiValue.format(d.getAsDouble(), "m^2/s"));
  }

  private static String required(String option, String value) {
    if (value == null) {
      throw new UserInputException(option + ": missing, expected a length such as 1mm");
    }
    return value;
  }

  private static double positive(String option, String text, String siUnit) {
    double v;
    try {
      v = SiValue.parse(text, siUnit);
    } catch (UnitException e) {
      throw new UserInputException(option + ": found " + e.found() + ", expected " + e.expected());
    }
    if (!(v > 0) || Double.isInfinite(v)) {
      throw new UserInputException(
          option + ": found '" + text + "', expected a positive value in " + siUnit);
    }
    return v;
  }

  /** A value in another unit of the same dimension; the units here are fixed and compatible. */
  private static double in(double si, String siUnit, String unit) {
    try {
      return SiValue.fromSi(si, siUnit, unit);
    } catch (UnitException e) {
      throw new IllegalStateException(e);
    }
  }

  private static String mg(double kg) {
    return SiValue.formatNumber(kg * 1e6) + " mg";
  }

  /** A duration in s, min or h, whichever reads best. */
  static String time(double s) {
    if (s < 120) {
      return SiValue.formatNumber(s) + " s";
    }
    if (s < 7200) {
      return SiValue.formatNumber(s / 60) + " min";
    }
    return SiValue.formatNumber(s / 3600) + " h";
  }

  private static String interval(Estimate e, String siUnit) {
    return SiValue.format(e.value(), siUnit)
        + "  (95 % interval "
        + SiValue.formatNumber(e.low())
        + " to "
        + SiValue.formatNumber(e.high())
        + ")";
  }

  private static void put(ObjectNode node, Estimate e) {
    node.put("value", e.value());
    node.put("low", e.low());
    node.put("high", e.high());
  }

  private static void putOptional(ObjectNode tree, String key, OptionalDouble v) {
    if (v.isPresent()) {
      tree.put(key, v.getAsDouble());
    } else {
      tree.putNull(key);
    }
  }
}
