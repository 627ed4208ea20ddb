package dev.soakfield.cli;

import dev.soakfield.mesh.gen.Grading;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import picocli.CommandLine.Option;

/** {@code --grade FACE:RATIO}, repeatable: cells growing geometrically away from named faces. */
final class GradeOption {
  @Option(
      names = "--grade",
      paramLabel = "FACE:RATIO",
      description =
          "Finer cells toward a face: each cell RATIO times as deep as the one before it, counted"
              + " from FACE (e.g. xmin:1.2 or inner:1.15); repeat for more faces.")
  List<String> grades = List.of();

  Grading grading() {
    Map<String, Double> ratios = new LinkedHashMap<>();
    for (String g : grades) {
      int colon = g.lastIndexOf(':');
      double r = Double.NaN;
      if (colon > 0) {
        try {
          r = Double.parseDouble(g.substring(colon + 1).strip());
        } catch (NumberFormatException e) {
          r = Double.NaN;
        }
      }
      if (colon <= 0 || !(r > 0) || Double.isInfinite(r)) {
        throw new UserInputException(
            "--grade: found '" + g + "', expected FACE:RATIO with a ratio above 0, e.g. xmin:1.2");
      }
      ratios.put(g.substring(0, colon).strip(), r);
    }
    try {
      return Grading.of(ratios);
    } catch (IllegalArgumentException e) {
      throw new UserInputException("--grade: " + e.getMessage());
    }
  }
}
