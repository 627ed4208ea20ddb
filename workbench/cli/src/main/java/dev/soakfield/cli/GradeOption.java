package dev.soakfield.cli;

import dev.soakfield.mesh.gen.Grading;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
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

  /**
   * The ratios by face, each face one of {@code faces} and named once.
   *
   * @throws UserInputException naming the option, what was found and what was expected
   */
  Grading grading(Set<String> faces, String shape) {
    Map<String, Double> ratios = new LinkedHashMap<>();
    Map<String, String> given = new LinkedHashMap<>();
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
      String face = g.substring(0, colon).strip();
      if (!faces.contains(face)) {
        throw new UserInputException(
            "--grade: found face '"
                + face
                + "', expected a face of the "
                + shape
                + ": "
                + String.join(", ", new TreeSet<>(faces)));
      }
      String before = given.put(face, g);
      if (before != null) {
        throw new UserInputException(
            "--grade: found face '"
                + face
                + "' twice ('"
                + before
                + "' and '"
                + g
                + "'), expected each face at most once");
      }
      ratios.put(face, r);
    }
    try {
      return Grading.of(ratios);
    } catch (IllegalArgumentException e) {
      throw new UserInputException("--grade: " + e.getMessage());
    }
  }
}
