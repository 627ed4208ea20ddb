package dev.soakfield.fem.casefile;

import java.util.ArrayList;
import java.util.List;

/** Collects the independent problems of one case so that the user sees them all at once. */
final class ProblemList {
  private final String source;
  private final List<CaseInputException.Problem> problems = new ArrayList<>();

  ProblemList(String source) {
    this.source = source;
  }

  String source() {
    return source;
  }

  /** A problem at a value: "found (the value), expected (what)". */
  void found(CaseNode node, String path, String expected) {
    add(node.line(), node.column(), path, "found " + node.describe() + ", expected " + expected);
  }

  void add(CaseNode node, String path, String message) {
    add(node.line(), node.column(), path, message);
  }

  void add(int line, int column, String path, String message) {
    problems.add(new CaseInputException.Problem(line, column, path, message));
  }

  boolean isEmpty() {
    return problems.isEmpty();
  }

  /** Throws one exception listing every problem collected, if there is any. */
  void throwIfAny() {
    if (!problems.isEmpty()) {
      throw new CaseInputException(source, problems);
    }
  }
}
