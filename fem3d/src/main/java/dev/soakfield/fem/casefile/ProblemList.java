package dev.soakfield.fem.casefile;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/** Collects the independent problems of one case so that the user sees them all at once. */
final class ProblemList {
  private final String source;
  private final List<CaseInputException.Problem> problems = new ArrayList<>();
  private final List<CaseInputException.Problem> missing = new ArrayList<>();
  private final Set<String> suggested = new HashSet<>();

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

  /**
   * A required key that is absent. Left out of the report when an unknown key's "did you mean"
   * already names it: one typo, one message.
   */
  void missing(CaseNode.Obj obj, String path, String expected) {
    missing.add(
        new CaseInputException.Problem(
            obj.line(), obj.column(), path, "missing; expected " + expected));
  }

  /** Notes that a misspelt key was matched to {@code path}. */
  void suggested(String path) {
    suggested.add(path);
  }

  /** Throws one exception listing every problem collected, if there is any. */
  void throwIfAny() {
    List<CaseInputException.Problem> all = new ArrayList<>(problems);
    for (CaseInputException.Problem p : missing) {
      if (!suggested.contains(p.path())) {
        all.add(p);
      }
    }
    if (!all.isEmpty()) {
      throw new CaseInputException(source, all);
    }
  }
}
