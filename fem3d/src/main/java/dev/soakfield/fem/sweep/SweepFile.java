package dev.soakfield.fem.sweep;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.json.JsonReadFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.node.DoubleNode;
import dev.soakfield.fem.casefile.NameSuggestion;
import dev.soakfield.fem.units.SiValue;
import dev.soakfield.fem.units.UnitException;
import java.io.IOException;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

/**
 * A sweep file read and checked: the base case, the keys it varies (listed levels, ranges,
 * distributions, values from a fit), how many samples with which seed and sampling, and the times
 * at which each case's amount is collected. Every mistake names the file and the key.
 */
public record SweepFile(
    Path file,
    Path base,
    List<Varied> vary,
    int samples,
    long seed,
    Sampling sampling,
    List<Double> collectTimes) {
  static final JsonMapper JSON =
      JsonMapper.builder()
          .enable(JsonReadFeature.ALLOW_JAVA_COMMENTS)
          .enable(JsonParser.Feature.STRICT_DUPLICATE_DETECTION)
          .build();

  private static final Set<String> TOP =
      Set.of("base", "vary", "samples", "seed", "sampling", "collect");

  public SweepFile {
    vary = List.copyOf(vary);
    collectTimes = List.copyOf(collectTimes);
  }

  /** The keys drawn from distributions, in the order of the file. */
  public List<Varied.Sampled> sampled() {
    List<Varied.Sampled> s = new ArrayList<>();
    vary.forEach(
        v -> {
          if (v instanceof Varied.Sampled d) {
            s.add(d);
          }
        });
    return s;
  }

  /**
   * Reads {@code file}.
   *
   * @throws SweepInputException naming the file and key when something is missing or wrong
   */
  public static SweepFile read(Path file) {
    JsonNode root = readJson(file, "a sweep file (JSON)");
    String f = file.toString();
    if (!root.isObject()) {
      throw new SweepInputException(f + ": found " + kind(root) + ", expected a JSON object");
    }
    onlyKeys(f, root, "", TOP);
    JsonNode base = root.path("base");
    if (!base.isTextual() || base.asText().isBlank()) {
      throw new SweepInputException(
          f + ": base: found " + found(base) + ", expected the case file the sweep starts from");
    }
    Path folder = file.toAbsolutePath().getParent();
    Path basePath = folder.resolve(base.asText()).normalize();
    JsonNode vary = root.path("vary");
    if (!vary.isObject() || vary.isEmpty()) {
      throw new SweepInputException(
          f + ": vary: found " + found(vary) + ", expected an object: key path → how it varies");
    }
    List<Varied> varied = new ArrayList<>();
    for (Map.Entry<String, JsonNode> e : vary.properties()) {
      varied.add(varied(f, folder, e.getKey(), e.getValue()));
    }
    refuseNested(f, varied);
    boolean sampling = varied.stream().anyMatch(v -> v instanceof Varied.Sampled);
    int samples = 1;
    if (root.has("samples")) {
      JsonNode s = root.get("samples");
      if (!s.canConvertToInt() || !s.isIntegralNumber() || s.asInt() < 1) {
        throw new SweepInputException(
            f + ": samples: found " + found(s) + ", expected a whole number of 1 or more");
      }
      if (!sampling) {
        throw new SweepInputException(
            f
                + ": samples: found "
                + s.asInt()
                + " samples but no distribution under vary,"
                + " expected samples only with a distribution (a case without one gives the same"
                + " numbers every time)");
      }
      samples = s.asInt();
    } else if (sampling) {
      throw new SweepInputException(
          f + ": samples: found none, expected how many times the distributions are sampled");
    }
    long seed = 1;
    if (root.has("seed")) {
      JsonNode s = root.get("seed");
      if (!s.isIntegralNumber() || !s.canConvertToLong()) {
        throw new SweepInputException(
            f + ": seed: found " + found(s) + ", expected a whole number");
      }
      seed = s.asLong();
    }
    Sampling how = Sampling.RANDOM;
    if (root.has("sampling")) {
      JsonNode s = root.get("sampling");
      how = s.isTextual() ? Sampling.of(s.asText()) : null;
      if (how == null) {
        throw new SweepInputException(
            f + ": sampling: found " + found(s) + ", expected \"random\" or \"latin-hypercube\"");
      }
    }
    return new SweepFile(file, basePath, varied, samples, seed, how, collectTimes(f, root));
  }

  private static List<Double> collectTimes(String f, JsonNode root) {
    if (!root.has("collect")) {
      return List.of();
    }
    JsonNode c = root.get("collect");
    if (!c.isObject()) {
      throw new SweepInputException(
          f + ": collect: found " + found(c) + ", expected an object such as {\"times\": [3600]}");
    }
    onlyKeys(f, c, "collect", Set.of("times"));
    JsonNode times = c.path("times");
    if (!times.isArray()) {
      throw new SweepInputException(
          f + ": collect.times: found " + found(times) + ", expected a list of times");
    }
    TreeSet<Double> out = new TreeSet<>();
    for (int i = 0; i < times.size(); i++) {
      JsonNode t = times.get(i);
      String at = f + ": collect.times." + i + ": found " + found(t);
      double seconds;
      if (t.isNumber()) {
        seconds = t.asDouble();
      } else if (t.isTextual()) {
        try {
          seconds = SiValue.parse(t.asText(), "s");
        } catch (UnitException e) {
          throw new SweepInputException(at + ", expected a time (" + e.getMessage() + ")", e);
        }
      } else {
        seconds = Double.NaN;
      }
      if (!(seconds > 0) || Double.isInfinite(seconds)) {
        throw new SweepInputException(at + ", expected a time above 0 (seconds, or \"24 h\")");
      }
      out.add(seconds);
    }
    return List.copyOf(out);
  }

  private static Varied varied(String f, Path folder, String key, JsonNode how) {
    String at = f + ": vary." + key;
    if (key.equals("mesh") || key.startsWith("mesh.")) {
      throw new SweepInputException(
          at + ": found the mesh, expected case keys other than mesh (a sweep runs on one mesh)");
    }
    if (!how.isObject()) {
      throw new SweepInputException(
          at
              + ": found "
              + found(how)
              + ", expected an object with values, range, distribution"
              + " or from-fit");
    }
    if (how.has("values")) {
      onlyKeys(f, how, "vary." + key, Set.of("values"));
      JsonNode v = how.get("values");
      if (!v.isArray() || v.isEmpty()) {
        throw new SweepInputException(
            at + ".values: found " + found(v) + ", expected a non-empty list of values");
      }
      List<JsonNode> levels = new ArrayList<>();
      v.forEach(levels::add);
      return new Varied.Levels(key, levels);
    }
    if (how.has("range")) {
      onlyKeys(f, how, "vary." + key, Set.of("range", "count", "spacing"));
      return range(at, key, how);
    }
    if (how.has("distribution")) {
      return new Varied.Sampled(key, distribution(f, key, how));
    }
    if (how.has("from-fit")) {
      onlyKeys(f, how, "vary." + key, Set.of("from-fit", "take", "scale"));
      return new Varied.Sampled(key, FitValues.distribution(at, folder, key, how));
    }
    throw new SweepInputException(
        at + ": found none of values, range, distribution, from-fit, expected one of them");
  }

  private static Varied range(String at, String key, JsonNode how) {
    JsonNode r = how.get("range");
    if (!r.isArray() || r.size() != 2 || !r.get(0).isNumber() || !r.get(1).isNumber()) {
      throw new SweepInputException(
          at + ".range: found " + found(r) + ", expected two numbers [first, last]");
    }
    JsonNode c = how.path("count");
    if (!c.isIntegralNumber() || !c.canConvertToInt() || c.asInt() < 2) {
      throw new SweepInputException(
          at + ".count: found " + found(c) + ", expected how many levels, 2 or more");
    }
    boolean log = false;
    if (how.has("spacing")) {
      String s = how.get("spacing").asText("");
      if (!s.equals("linear") && !s.equals("log")) {
        throw new SweepInputException(
            at
                + ".spacing: found "
                + found(how.get("spacing"))
                + ", expected \"linear\" or"
                + " \"log\"");
      }
      log = s.equals("log");
    }
    double first = r.get(0).asDouble();
    double last = r.get(1).asDouble();
    if (log && !(first > 0 && last > 0)) {
      throw new SweepInputException(
          at + ".range: found " + found(r) + ", expected two numbers above 0 for log spacing");
    }
    int n = c.asInt();
    List<JsonNode> levels = new ArrayList<>();
    for (int i = 0; i < n; i++) {
      double w = (double) i / (n - 1);
      double v =
          i == n - 1 ? last : log ? first * Math.pow(last / first, w) : first + (last - first) * w;
      levels.add(DoubleNode.valueOf(v));
    }
    return new Varied.Levels(key, levels);
  }

  private static Distribution distribution(String f, String key, JsonNode how) {
    String at = f + ": vary." + key;
    String kind = how.get("distribution").asText("");
    switch (kind) {
      case "normal" -> {
        onlyKeys(f, how, "vary." + key, Set.of("distribution", "mean", "sd"));
        return Distribution.normal(
            number(at, how, "mean", Double.NEGATIVE_INFINITY), number(at, how, "sd", 0));
      }
      case "log-normal" -> {
        if (how.has("median") || how.has("gsd")) {
          onlyKeys(f, how, "vary." + key, Set.of("distribution", "median", "gsd"));
          double median = number(at, how, "median", 0);
          double gsd = number(at, how, "gsd", 1);
          return Distribution.logNormal(
              Math.log(median),
              Math.log(gsd),
              "log-normal, median " + median + ", geometric sd " + gsd);
        }
        onlyKeys(f, how, "vary." + key, Set.of("distribution", "mean", "sd"));
        return Distribution.logNormalOfMoments(
            number(at, how, "mean", 0), number(at, how, "sd", 0));
      }
      case "uniform" -> {
        onlyKeys(f, how, "vary." + key, Set.of("distribution", "low", "high"));
        double low = number(at, how, "low", Double.NEGATIVE_INFINITY);
        double high = number(at, how, "high", Double.NEGATIVE_INFINITY);
        if (!(high > low)) {
          throw new SweepInputException(
              at + ".high: found " + high + ", expected a number above low (" + low + ")");
        }
        return Distribution.uniform(low, high);
      }
      default ->
          throw new SweepInputException(
              at
                  + ".distribution: found "
                  + found(how.get("distribution"))
                  + ", expected \"normal\", \"log-normal\" or \"uniform\"");
    }
  }

  /** A finite number above {@code above}. */
  private static double number(String at, JsonNode how, String name, double above) {
    JsonNode v = how.path(name);
    if (!v.isNumber() || !Double.isFinite(v.asDouble()) || !(v.asDouble() > above)) {
      String expected =
          above == Double.NEGATIVE_INFINITY ? "a number" : "a number above " + plain(above);
      throw new SweepInputException(
          at + "." + name + ": found " + found(v) + ", expected " + expected);
    }
    return v.asDouble();
  }

  private static String plain(double v) {
    return v == Math.rint(v) ? Long.toString((long) v) : Double.toString(v);
  }

  /** Two keys where one lies inside the other would overwrite each other. */
  private static void refuseNested(String f, List<Varied> varied) {
    for (Varied a : varied) {
      for (Varied b : varied) {
        if (a != b && b.key().startsWith(a.key() + ".")) {
          throw new SweepInputException(
              f
                  + ": vary."
                  + b.key()
                  + ": found it inside vary."
                  + a.key()
                  + ", expected keys that do not contain each other");
        }
      }
    }
  }

  static void onlyKeys(String f, JsonNode obj, String path, Set<String> allowed) {
    for (Iterator<String> it = obj.fieldNames(); it.hasNext(); ) {
      String k = it.next();
      if (!allowed.contains(k)) {
        String near =
            NameSuggestion.likely(k, allowed).map(n -> "; did you mean '" + n + "'?").orElse("");
        throw new SweepInputException(
            f
                + ": "
                + (path.isEmpty() ? "" : path + ".")
                + k
                + ": unknown key, expected one of "
                + String.join(", ", new TreeSet<>(allowed))
                + near);
      }
    }
  }

  /** A JSON file read as a tree; a missing or malformed file names itself and what it should be. */
  static JsonNode readJson(Path file, String expected) {
    try {
      return JSON.readTree(file.toFile());
    } catch (java.io.FileNotFoundException | NoSuchFileException e) {
      throw new SweepInputException(file + ": found no such file, expected " + expected, e);
    } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
      var l = e.getLocation();
      String where = l == null ? "" : " at line " + l.getLineNr() + ", column " + l.getColumnNr();
      throw new SweepInputException(
          file + where + ": malformed JSON (" + e.getOriginalMessage() + "), expected " + expected,
          e);
    } catch (IOException e) {
      throw new SweepInputException(
          file + ": found an unreadable file (" + e.getMessage() + "), expected " + expected, e);
    }
  }

  static String found(JsonNode n) {
    return n == null || n.isMissingNode() ? "nothing" : kind(n);
  }

  private static String kind(JsonNode n) {
    if (n.isObject()) {
      return "an object";
    }
    if (n.isArray()) {
      return "a list of " + n.size();
    }
    return n.toString();
  }
}
