package dev.soakfield.fem.casefile;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;

/**
 * A case file that cannot be used, caused by the user's input. It lists one or more problems, each
 * with its line, column and JSON key path; callers show the message as it is, without a stack
 * trace.
 */
public final class CaseInputException extends RuntimeException {
  private static final long serialVersionUID = 1L;

  /**
   * One thing wrong in a case file.
   *
   * @param line 1-based line of the offending value, 0 when the whole file is meant
   * @param column 1-based column, 0 when unknown
   * @param path JSON key path such as {@code materials.body.diffusivity} or {@code
   *     faces.xmax.value[1][0]}; empty for the document itself
   * @param message what was found and what was expected
   */
  public record Problem(int line, int column, String path, String message) {
    public Problem {
      Objects.requireNonNull(path, "path");
      Objects.requireNonNull(message, "message");
    }

    /** The problem as one line: place, path, message. */
    public String describe() {
      StringBuilder sb = new StringBuilder();
      if (line > 0) {
        sb.append("line ").append(line);
        if (column > 0) {
          sb.append(", column ").append(column);
        }
        sb.append(", ");
      }
      if (!path.isEmpty()) {
        sb.append(path).append(": ");
      }
      return sb.append(message).toString();
    }
  }

  private final String source;
  private final List<Problem> problems;

  /**
   * @param source the case file's name as the user knows it
   * @param problems at least one problem; listed in the order of the file
   */
  public CaseInputException(String source, List<Problem> problems) {
    super(format(source, sorted(problems)));
    this.source = source;
    this.problems = sorted(problems);
  }

  private static List<Problem> sorted(List<Problem> problems) {
    if (problems.isEmpty()) {
      throw new IllegalArgumentException("a CaseInputException needs at least one problem");
    }
    List<Problem> copy = new ArrayList<>(problems);
    copy.sort(Comparator.comparingInt(Problem::line).thenComparingInt(Problem::column));
    return List.copyOf(copy);
  }

  private static String format(String source, List<Problem> problems) {
    if (problems.size() == 1) {
      return source + ", " + problems.get(0).describe();
    }
    StringBuilder sb = new StringBuilder(source).append(": ").append(problems.size());
    sb.append(" problems");
    for (Problem p : problems) {
      sb.append(System.lineSeparator()).append("  ").append(p.describe());
    }
    return sb.toString();
  }

  /** The case file's name. */
  public String source() {
    return source;
  }

  /** Every problem, in the order of the file. */
  public List<Problem> problems() {
    return problems;
  }
}
