package dev.soakfield.fem.casefile;

import java.util.List;
import java.util.Map;

/**
 * A JSON value of a case file with the line and column where it starts, so that every message can
 * point at the value the user wrote. Built by {@link CaseTreeReader}; read by {@link CaseBinder}.
 */
sealed interface CaseNode {
  /** 1-based line of the value's first character. */
  int line();

  /** 1-based column of the value's first character. */
  int column();

  /** What the value is, in the user's words, for "found ..." messages. */
  String describe();

  /** An object; members keep the order of the file. */
  record Obj(Map<String, Member> members, int line, int column) implements CaseNode {
    public Obj {
      members = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(members));
    }

    @Override
    public String describe() {
      return "an object";
    }
  }

  /** One key of an object, with the place of the key itself (for unknown-key messages). */
  record Member(String key, int keyLine, int keyColumn, CaseNode value) {}

  /** An array. */
  record Arr(List<CaseNode> items, int line, int column) implements CaseNode {
    public Arr {
      items = List.copyOf(items);
    }

    @Override
    public String describe() {
      return "an array of " + items.size();
    }
  }

  /**
   * A number; {@code text} is as written, so messages repeat the user's spelling.
   *
   * @param value the number as a double (may be infinite when the text is out of range)
   */
  record Num(double value, String text, int line, int column) implements CaseNode {
    @Override
    public String describe() {
      return text;
    }
  }

  /** A string. */
  record Text(String value, int line, int column) implements CaseNode {
    @Override
    public String describe() {
      return "\"" + value + "\"";
    }
  }

  /** true or false. */
  record Bool(boolean value, int line, int column) implements CaseNode {
    @Override
    public String describe() {
      return Boolean.toString(value);
    }
  }

  /** null. */
  record Null(int line, int column) implements CaseNode {
    @Override
    public String describe() {
      return "null";
    }
  }
}
