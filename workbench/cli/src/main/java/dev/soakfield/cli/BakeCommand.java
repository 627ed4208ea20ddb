package dev.soakfield.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import dev.soakfield.fem.bake.BakeSearch;
import dev.soakfield.fem.units.DurationText;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code soakfield bake CASE.json --temperature T --target max:GROUP<LEVEL}: shortest bake. */
@Command(
    name = "bake",
    mixinStandardHelpOptions = true,
    description = {
      "Finds the shortest bake at a temperature that brings a target below a level: a part's"
          + " largest (max:PART) or mean (mean:PART) concentration, a probe (probe:NAME), the whole"
          + " amount (amount or total: lattice and trapped), the diffusible amount (diffusible:"
          + " lattice and reversibly trapped, traps marked \"reversible\": false left out) or the"
          + " weight gain over the dry mass in percent (weight_gain).",
      "The case gives the part, its materials (Arrhenius data make the temperature matter), its"
          + " faces and where the bake starts (\"initial\", e.g. {\"from\": \"soak-run\"}); the"
          + " oven replaces its exposure. One run brackets the time, bisection narrows it."
    })
final class BakeCommand implements Callable<Integer> {
  private static final Pattern TARGET =
      Pattern.compile(
          "(?:(max|probe|mean):([^<]+)|(amount|total|diffusible|weight_gain))\\s*<\\s*([-+0-9.eE]+)\\s*");
  private static final String SPELLINGS =
      "max:PART<LEVEL, mean:PART<LEVEL, probe:NAME<LEVEL, amount<LEVEL, total<LEVEL,"
          + " diffusible<LEVEL or weight_gain<PERCENT";

  @Spec CommandSpec spec;

  @Mixin PluginFolderOption pluginFolders;

  @Parameters(index = "0", paramLabel = "CASE.json", description = "The case file.")
  Path caseFile;

  @Option(
      names = "--temperature",
      required = true,
      paramLabel = "T",
      description = "Oven temperature, e.g. \"125 degC\" or 398.15 (K).")
  String temperature;

  @Option(
      names = "--target",
      required = true,
      paramLabel = "TARGET<LEVEL",
      description =
          "What must fall below the level: max:PART, mean:PART, probe:NAME, amount, total,"
              + " diffusible or weight_gain (percent of the dry mass), e.g. \"max:body<0.05\","
              + " \"weight_gain<0.02\". Levels are in the case's units.")
  String target;

  @Option(
      names = "--humidity",
      defaultValue = "0",
      description = "Relative humidity in the oven, 0 to 1 (Henry's law cases; default 0).")
  double humidity;

  @Option(
      names = "--pressure",
      defaultValue = "0",
      description = "Hydrogen pressure in the oven (Sieverts' law cases; default 0).")
  String pressure;

  @Option(
      names = "--longest",
      defaultValue = "1000 h",
      description = "The longest bake to consider (default 1000 h).")
  String longest;

  @Option(
      names = "--tolerance",
      defaultValue = "1e-3",
      description = "Relative width of the final bracket (default 1e-3).")
  double tolerance;

  @Option(names = "--json", description = "Print the result as JSON for scripts.")
  boolean json;

  @Override
  public Integer call() throws Exception {
    Matcher m = TARGET.matcher(target);
    if (!m.matches()) {
      throw new UserInputException("--target: found '" + target + "', expected " + SPELLINGS);
    }
    if (!(humidity >= 0 && humidity <= 1)) {
      throw new UserInputException("--humidity: found " + humidity + ", expected 0 to 1");
    }
    if (!(tolerance > 0 && tolerance < 0.5)) {
      throw new UserInputException("--tolerance: found " + tolerance + ", expected (0, 0.5)");
    }
    double kelvin = OptionValues.si(temperature, "K", "--temperature");
    double longestS = OptionValues.si(longest, "s", "--longest");
    double pa = OptionValues.si(pressure, "Pa", "--pressure");
    BakeSearch.Target t = target(m);
    Path work = Files.createTempDirectory("soakfield-bake");
    BakeSearch.Result r;
    try {
      r =
          BakeSearch.search(
              caseFile,
              new BakeSearch.Oven(kelvin, humidity, pa, longestS),
              t,
              tolerance,
              pluginFolders.catalog().resolver(),
              work);
    } catch (IllegalArgumentException e) {
      throw new UserInputException(e.getMessage());
    } finally {
      deleteQuietly(work); // a failed clean-up must not hide why the search failed
    }
    PrintWriter out = spec.commandLine().getOut();
    if (json) {
      Map<String, Object> root = new LinkedHashMap<>();
      root.put("met", r.met());
      root.put("bake_time", r.met() ? r.time() : null);
      root.put("not_enough", r.lowerBound());
      root.put("temperature", kelvin);
      root.put("target", target);
      root.put("unit", r.unit());
      root.put("runs", r.runs());
      root.put("curve", Map.of("time", r.curveTimes(), "value", r.curveValues()));
      out.println(
          new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT).writeValueAsString(root));
    } else {
      print(out, r, kelvin);
    }
    out.flush();
    return ExitCodes.OK;
  }

  private static BakeSearch.Target target(Matcher m) {
    double level = Double.parseDouble(m.group(4));
    if (m.group(3) != null) {
      return new BakeSearch.Target(m.group(3), "", level);
    }
    String kind = m.group(1).equals("max") ? "group" : m.group(1);
    return new BakeSearch.Target(kind, m.group(2).strip(), level);
  }

  private void print(PrintWriter out, BakeSearch.Result r, double kelvin) {
    if (r.met()) {
      out.printf(
          Locale.ROOT,
          "bake at %.2f K (%.1f °C): %s brings %s [%s] (between %s and %s; %d runs)%n",
          kelvin,
          kelvin - 273.15,
          DurationText.readable(r.time()),
          target,
          r.unit(),
          DurationText.readable(r.lowerBound()),
          DurationText.readable(r.time()),
          r.runs());
    } else {
      out.printf(
          Locale.ROOT,
          "bake at %.2f K: %s [%s] is not reached within %s; lengthen --longest or raise the"
              + " temperature%n",
          kelvin,
          target,
          r.unit(),
          DurationText.readable(r.lowerBound()));
    }
    out.println("curve (time [h], value [" + r.unit() + "]):");
    int stride = Math.max(1, r.curveTimes().length / 20);
    for (int i = 0; i < r.curveTimes().length; i += stride) {
      out.printf(Locale.ROOT, "  %12.4f  %.6g%n", r.curveTimes()[i] / 3600, r.curveValues()[i]);
    }
    out.println(
        "caution: bake schedules are governed by the applicable standards (moisture-sensitivity"
            + " handling, hydrogen-embrittlement relief); this estimate depends on the material data"
            + " and on Fickian diffusion and needs a qualified engineer's review.");
  }

  private static void deleteQuietly(Path folder) {
    try (var all = Files.walk(folder)) {
      for (Path p : all.sorted(java.util.Comparator.reverseOrder()).toList()) {
        Files.deleteIfExists(p);
      }
    } catch (IOException | java.io.UncheckedIOException e) {
      // the temporary folder stays; the system's clean-up of its temporary files takes it
    }
  }
}
