package dev.soakfield.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import dev.soakfield.fem.model.LawResolver;
import dev.soakfield.fem.run.RunProgress;
import dev.soakfield.fem.tds.KissingerFit;
import dev.soakfield.fem.tds.TdsCurve;
import dev.soakfield.fem.tds.TdsPeaks;
import dev.soakfield.fem.tds.TdsRamp;
import dev.soakfield.fem.tds.TdsRun;
import dev.soakfield.mesh.AtomicFiles;
import dev.soakfield.report.FitPlot;
import dev.soakfield.report.TdsPlot;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code soakfield tds CASE.json --rate 10K/min --to 800K}: a thermal desorption run. */
@Command(
    name = "tds",
    mixinStandardHelpOptions = true,
    description = {
      "Thermal desorption (TDS): heats the case's charged specimen at a constant rate in vacuum"
          + " and records the desorption rate against temperature and its peaks. With --rates,"
          + " one ramp per heating rate and the Kissinger plot with the detrapping energy.",
      "The specimen starts as the case's \"initial\" says, or as an earlier run left it"
          + " (--from DIR, traps included); --rest holds it at the start temperature first."
          + " Faces the case does not seal desorb as the case says (a held concentration of 0,"
          + " or ambient faces, which see no hydrogen or vapour during the ramp).",
      "Writes into --out: tds.csv (time, temperature, desorption rate per unit area and per"
          + " unit mass, cumulative, remaining), tds.png, tds.json and the ramp's result folder"
          + " (run/); with --rates a folder per rate and kissinger.png."
    })
final class TdsCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Mixin PluginFolderOption pluginFolders;

  @Parameters(index = "0", paramLabel = "CASE.json", description = "The specimen's case file.")
  Path caseFile;

  @Option(
      names = "--rate",
      paramLabel = "RATE",
      description = "Heating rate, e.g. 10K/min, \"0.5 K/s\" (SI: K/s).")
  String rate;

  @Option(
      names = "--rates",
      split = ",",
      paramLabel = "RATE",
      description =
          "Several heating rates, comma separated (e.g. 2K/min,5K/min,10K/min,20K/min): one ramp"
              + " each and the Kissinger plot; three or more give the energy's 95 % interval.")
  List<String> rates;

  @Option(
      names = "--to",
      required = true,
      paramLabel = "T",
      description = "Temperature the ramp ends at, e.g. 800K or \"500 degC\".")
  String to;

  @Option(
      names = "--start",
      defaultValue = "20 degC",
      paramLabel = "T",
      description = "Temperature of the rest and of the ramp's start (default 20 degC).")
  String start;

  @Option(
      names = "--rest",
      defaultValue = "0",
      paramLabel = "TIME",
      description =
          "Time at the start temperature before the ramp, e.g. \"1 h\" (the lattice hydrogen"
              + " leaves; default 0).")
  String rest;

  @Option(
      names = "--from",
      paramLabel = "DIR",
      description =
          "An earlier run's result folder: its final state (traps included) is the start.")
  Path from;

  @Option(
      names = "--max-step-change",
      defaultValue = "0.5K",
      paramLabel = "DT",
      description = "Largest temperature change within one time step (default 0.5K).")
  String maxStepChange;

  @Option(names = "--out", required = true, paramLabel = "DIR", description = "Output folder.")
  Path out;

  @Option(names = "--json", description = "Print tds.json instead of the text summary.")
  boolean json;

  @Override
  public Integer call() throws Exception {
    List<String> rateTexts = rateTexts();
    double toK = OptionValues.si(to, "K", "--to");
    double startK = OptionValues.si(start, "K", "--start");
    double restS = OptionValues.si(rest, "s", "--rest");
    double stepK = OptionValues.positive("--max-step-change", maxStepChange, "K");
    if (from != null && !Files.isDirectory(from)) {
      throw new UserInputException(
          "--from: found no folder " + from + ", expected an earlier run's result folder");
    }
    List<TdsRamp> ramps = new ArrayList<>();
    try {
      for (String r : rateTexts) {
        ramps.add(
            new TdsRamp(startK, restS, OptionValues.positive("--rate", r, "K/s"), toK, stepK));
      }
    } catch (IllegalArgumentException e) {
      throw new UserInputException(e.getMessage());
    }
    Files.createDirectories(out);
    LawResolver laws = pluginFolders.catalog().resolver();
    boolean several = ramps.size() > 1;
    List<TdsRun.Result> results = new ArrayList<>();
    for (int i = 0; i < ramps.size(); i++) {
      Path folder = several ? out.resolve(label(rateTexts.get(i))) : out;
      Files.createDirectories(folder);
      TdsRun.Result r;
      try {
        r =
            TdsRun.run(
                caseFile,
                ramps.get(i),
                Optional.ofNullable(from).map(Path::toAbsolutePath),
                laws,
                folder.resolve("run"),
                RunProgress.SILENT);
      } catch (IllegalArgumentException e) {
        throw new UserInputException(e.getMessage());
      }
      r.curve().write(folder.resolve(TdsCurve.FILE));
      plot(List.of(r), List.of(rateTexts.get(i)), folder.resolve("tds.png"));
      results.add(r);
    }
    Optional<KissingerFit> kissinger = Optional.empty();
    if (several) {
      kissinger = kissinger(results);
      plot(results, rateTexts, out.resolve("tds.png"));
      if (kissinger.isPresent()) {
        kissingerPlot(kissinger.get(), out.resolve("kissinger.png"));
      }
    }
    Map<String, Object> root = summary(rateTexts, results, kissinger);
    String text =
        new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT).writeValueAsString(root);
    AtomicFiles.write(
        out.resolve("tds.json"), f -> Files.writeString(f, text, StandardCharsets.UTF_8));
    PrintWriter pw = spec.commandLine().getOut();
    if (json) {
      pw.println(text);
    } else {
      print(pw, rateTexts, results, kissinger);
    }
    pw.flush();
    return ExitCodes.OK;
  }

  private List<String> rateTexts() {
    if (rates != null && !rates.isEmpty() && rate != null) {
      throw new UserInputException(
          "--rate and --rates: found both, expected one heating rate or a list of them");
    }
    if (rates != null && !rates.isEmpty()) {
      if (rates.size() < 2) {
        throw new UserInputException(
            "--rates: found one rate, expected two or more for a Kissinger plot (or --rate)");
      }
      return rates.stream().map(String::strip).toList();
    }
    if (rate == null) {
      throw new UserInputException("--rate: missing, expected a heating rate such as 10K/min");
    }
    return List.of(rate.strip());
  }

  /** A folder name for a rate as the user wrote it: "10K/min" becomes "rate-10K-min". */
  static String label(String rateText) {
    return "rate-" + rateText.replaceAll("[^A-Za-z0-9.]+", "-");
  }

  private static Optional<KissingerFit> kissinger(List<TdsRun.Result> results) {
    double[] betas = new double[results.size()];
    double[] peaks = new double[results.size()];
    for (int i = 0; i < betas.length; i++) {
      TdsRun.Result r = results.get(i);
      if (r.peaks().isEmpty()) {
        return Optional.empty();
      }
      betas[i] = r.ramp().rate();
      peaks[i] = TdsPeaks.highest(r.peaks()).temperature();
    }
    try {
      return Optional.of(KissingerFit.of(betas, peaks));
    } catch (IllegalArgumentException e) {
      return Optional.empty();
    }
  }

  private static void plot(List<TdsRun.Result> results, List<String> labels, Path target)
      throws IOException {
    TdsCurve first = results.get(0).curve();
    TdsPlot plot = new TdsPlot("desorption rate [" + first.amountUnit() + "/(m²·s)]");
    for (int i = 0; i < results.size(); i++) {
      TdsCurve c = results.get(i).curve();
      int from = c.rampIndex();
      double[] t = Arrays.copyOfRange(c.stepTemperatures(), from, c.rate().length);
      double[] r = Arrays.copyOfRange(c.rate(), from, c.rate().length);
      for (int k = 0; k < r.length; k++) {
        r[k] /= c.area();
      }
      List<double[]> marks = new ArrayList<>();
      for (TdsPeaks.Peak p : results.get(i).peaks()) {
        marks.add(new double[] {p.temperature(), p.rate() / c.area()});
      }
      plot.curve(labels.get(i), t, r, marks);
    }
    plot.write(target);
  }

  private static void kissingerPlot(KissingerFit k, Path target) throws IOException {
    double lo = Arrays.stream(k.x()).min().orElseThrow();
    double hi = Arrays.stream(k.x()).max().orElseThrow();
    double slope = -k.energy() / KissingerFit.GAS_CONSTANT;
    double[] x = {1000 * lo, 1000 * hi};
    double[] y = {k.intercept() + slope * lo, k.intercept() + slope * hi};
    double[] px = Arrays.stream(k.x()).map(v -> 1000 * v).toArray();
    FitPlot.write(
        target,
        String.format(Locale.ROOT, "Kissinger plot: E_d = %.1f kJ/mol", k.energy() / 1000),
        "1000 / T_p (1/K)",
        "ln(rate / T_p^2)  (rate in K/s, T_p in K)",
        new FitPlot.Series("peaks", px, k.y()),
        new FitPlot.Series("fit", x, y));
  }

  private Map<String, Object> summary(
      List<String> texts, List<TdsRun.Result> results, Optional<KissingerFit> kissinger) {
    Map<String, Object> root = new LinkedHashMap<>();
    root.put("case", caseFile.toString());
    root.put("from", from == null ? null : from.toString());
    List<Map<String, Object>> runs = new ArrayList<>();
    for (int i = 0; i < results.size(); i++) {
      TdsRun.Result r = results.get(i);
      TdsCurve c = r.curve();
      Map<String, Object> m = new LinkedHashMap<>();
      m.put("rate", texts.get(i));
      m.put("rate_si", r.ramp().rate());
      m.put("folder", r.folder().toString());
      List<Map<String, Object>> peaks = new ArrayList<>();
      for (TdsPeaks.Peak p : r.peaks()) {
        peaks.add(
            Map.of(
                "temperature", p.temperature(), "desorption_rate_per_area", p.rate() / c.area()));
      }
      m.put("peaks", peaks);
      int n = c.time().length - 1;
      m.put("charged", c.charged());
      m.put("desorbed", c.cumulative()[n]);
      m.put("remaining", c.remaining()[n]);
      m.put("closure", c.closure());
      m.put("area", c.area());
      m.put("mass", Double.isNaN(c.mass()) ? null : c.mass());
      runs.add(m);
    }
    root.put("runs", runs);
    if (kissinger.isPresent()) {
      KissingerFit k = kissinger.get();
      Map<String, Object> m = new LinkedHashMap<>();
      m.put("detrapping_energy", k.energy());
      m.put("low", Double.isNaN(k.low()) ? null : k.low());
      m.put("high", Double.isNaN(k.high()) ? null : k.high());
      m.put("peak", "the highest peak of each rate");
      root.put("kissinger", m);
    } else {
      root.put("kissinger", null);
    }
    root.put("units", Map.of("amount", results.get(0).curve().amountUnit(), "energy", "J/mol"));
    root.put("caution", CAUTION);
    return root;
  }

  static final String CAUTION =
      "Model estimates from the trap and diffusion data given; a TDS spectrum of a real specimen"
          + " also depends on its surface, thickness and the time between charging and the"
          + " ramp. Hydrogen-embrittlement assessment is governed by the applicable standards and"
          + " needs licensed engineering judgement.";

  private static void print(
      PrintWriter out,
      List<String> texts,
      List<TdsRun.Result> results,
      Optional<KissingerFit> kissinger) {
    for (int i = 0; i < results.size(); i++) {
      TdsRun.Result r = results.get(i);
      TdsCurve c = r.curve();
      int n = c.time().length - 1;
      out.printf(
          Locale.ROOT,
          "TDS at %s to %.1f K: desorbed %.6g %s of %.6g charged, %.6g left (closure %.1e)%n",
          texts.get(i),
          r.ramp().endTemperature(),
          c.cumulative()[n],
          c.amountUnit(),
          c.charged(),
          c.remaining()[n],
          c.closure());
      if (r.peaks().isEmpty()) {
        out.println("  no desorption peak on the ramp");
      }
      for (TdsPeaks.Peak p : r.peaks()) {
        out.printf(
            Locale.ROOT,
            "  peak at %.1f K (%.1f °C): %.4g %s/(m²·s)%n",
            p.temperature(),
            p.temperature() - 273.15,
            p.rate() / c.area(),
            c.amountUnit());
      }
    }
    kissinger.ifPresent(
        k ->
            out.printf(
                Locale.ROOT,
                "Kissinger: detrapping energy %.2f kJ/mol%s%n",
                k.energy() / 1000,
                Double.isNaN(k.low())
                    ? " (two rates: no interval)"
                    : String.format(
                        Locale.ROOT,
                        " (95 %% interval %.2f to %.2f kJ/mol)",
                        k.low() / 1000,
                        k.high() / 1000)));
    out.println("caution: " + CAUTION);
  }
}
