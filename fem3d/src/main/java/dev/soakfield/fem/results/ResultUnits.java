package dev.soakfield.fem.results;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;

/**
 * The units a run's outputs are in, as its summary.json states them ({@code "units"}); a run from
 * before units were declared, or a case that declares none, says {@code c} for a concentration and
 * {@code c*m^3} for an amount.
 *
 * @param concentration e.g. wppm, mol/m^3, kg/m^3
 * @param amount kg, mol, or c*m^3
 */
public record ResultUnits(String concentration, String amount) {
  /** What a run that declared nothing is in. */
  public static final ResultUnits UNDECLARED = new ResultUnits("c", "c*m^3");

  /** The units of the run in {@code folder}; {@link #UNDECLARED} when its summary names none. */
  public static ResultUnits of(Path folder) {
    Path summary = folder.resolve(ResultFiles.SUMMARY);
    if (!Files.isRegularFile(summary)) {
      return UNDECLARED;
    }
    try {
      return of(new ObjectMapper().readTree(summary.toFile()));
    } catch (IOException e) {
      return UNDECLARED; // a broken summary is reported by whoever reads the rest of it
    }
  }

  /** The units a summary.json tree names. */
  public static ResultUnits of(JsonNode summary) {
    JsonNode u = summary.path("units");
    return new ResultUnits(
        u.path("concentration").asText(UNDECLARED.concentration()),
        u.path("amount").asText(UNDECLARED.amount()));
  }

  /** The unit of a series.csv column, empty for columns this version does not know. */
  public String ofColumn(String name) {
    String base = name.contains(":") ? name.substring(0, name.indexOf(':') + 1) : name;
    return switch (base) {
      case "time" -> "s";
      case "amount",
          "amount:",
          "inflow:",
          "balance_error",
          "lattice_amount",
          "trapped_amount",
          "diffusible_amount",
          "trapped:" ->
          amount;
      case "max:", "probe:" -> concentration;
      case "inflow_rate:" -> amount + "/s";
      case "temperature" -> "K";
      case "weight_gain_percent", "weight_gain_percent:" -> "%";
      default -> "";
    };
  }

  /** The column's name with its unit in brackets. */
  public String label(String column) {
    String unit = ofColumn(column);
    return unit.isEmpty() ? column : column + " [" + unit + "]";
  }

  /** As a map, for tables. */
  public Map<String, String> asMap() {
    return Map.of("concentration", concentration, "amount", amount);
  }
}
