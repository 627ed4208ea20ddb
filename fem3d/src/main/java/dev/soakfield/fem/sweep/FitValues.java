package dev.soakfield.fem.sweep;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * A distribution from what {@code soakfield fit --json} wrote: an entry {@code {"value", "low",
 * "high"}} (the estimate and its two-sided 95 % interval, and {@code standardError} when the fit
 * gave it). A symmetric interval becomes a normal distribution with the standard error as its sd;
 * an asymmetric one (a value fitted as a logarithm) a log-normal one with the value as its median.
 */
final class FitValues {
  /** The two-sided 95 % quantile of the standard normal distribution (common practice). */
  static final double Z95 = 1.959963984540054;

  private FitValues() {}

  static Distribution distribution(String at, Path folder, String key, JsonNode how) {
    JsonNode file = how.get("from-fit");
    if (!file.isTextual() || file.asText().isBlank()) {
      throw new SweepInputException(
          at
              + ".from-fit: found "
              + SweepFile.found(file)
              + ", expected the file that"
              + " 'soakfield fit --json' wrote");
    }
    Path fit = folder.resolve(file.asText()).normalize();
    JsonNode root = SweepFile.readJson(fit, "the JSON that 'soakfield fit --json' writes");
    List<String> keys = KeyPaths.segments(key);
    String take = how.path("take").asText(keys.get(keys.size() - 1));
    JsonNode e = root.path(take);
    if (!e.path("value").isNumber() || !e.path("low").isNumber() || !e.path("high").isNumber()) {
      throw new SweepInputException(
          at
              + ": "
              + fit
              + " has no estimate '"
              + take
              + "' (with value, low and high), expected"
              + " one of "
              + estimates(root)
              + "; name it with \"take\"");
    }
    double scale = 1;
    if (how.has("scale")) {
      JsonNode s = how.get("scale");
      if (!s.isNumber() || !(s.asDouble() > 0) || Double.isInfinite(s.asDouble())) {
        throw new SweepInputException(
            at + ".scale: found " + SweepFile.found(s) + ", expected a number above 0");
      }
      scale = s.asDouble();
    }
    double value = e.get("value").asDouble() * scale;
    double low = e.get("low").asDouble() * scale;
    double high = e.get("high").asDouble() * scale;
    if (!(low < value && value < high)) {
      throw new SweepInputException(
          at
              + ": "
              + fit
              + ", "
              + take
              + ": found value "
              + value
              + " with interval ["
              + low
              + ", "
              + high
              + "], expected an interval around the value");
    }
    String from = " from " + fit.getFileName() + " (" + take + ")";
    double below = value - low;
    double above = high - value;
    if (Math.abs(above - below) <= 1e-6 * (high - low)) {
      double sd =
          e.path("standardError").isNumber()
              ? e.get("standardError").asDouble() * scale
              : (high - low) / (2 * Z95);
      Distribution n = Distribution.normal(value, sd);
      return new Distribution(n.kind(), n.a(), n.b(), n.described() + from);
    }
    if (!(low > 0)) {
      throw new SweepInputException(
          at
              + ": "
              + fit
              + ", "
              + take
              + ": found an asymmetric interval reaching "
              + low
              + ", expected one above 0 (an asymmetric interval is read as log-normal)");
    }
    double sigma = Math.log(high / low) / (2 * Z95);
    return Distribution.logNormal(
        Math.log(value), sigma, "log-normal, median " + value + ", sigma of ln " + sigma + from);
  }

  private static String estimates(JsonNode root) {
    List<String> names = new ArrayList<>();
    for (Map.Entry<String, JsonNode> e : root.properties()) {
      if (e.getValue().path("value").isNumber() && e.getValue().path("low").isNumber()) {
        names.add(e.getKey());
      }
    }
    return names.isEmpty() ? "(none in this file)" : String.join(", ", names);
  }
}
