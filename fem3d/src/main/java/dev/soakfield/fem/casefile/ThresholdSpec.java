package dev.soakfield.fem.casefile;

import java.util.Objects;

/**
 * A level whose first crossing the results report.
 *
 * @param name the case's name for it
 * @param level the concentration, in the case's concentration unit
 * @param where what is watched
 * @param rises true: first time at or above the level; false: first time below it
 */
public record ThresholdSpec(String name, double level, Where where, boolean rises) {
  public ThresholdSpec {
    Objects.requireNonNull(name, "name");
    Objects.requireNonNull(where, "where");
  }

  /** What a threshold watches. */
  public enum Kind {
    /** The part's largest concentration (nodes held at a face's value left out). */
    PART,
    /** The part's mean concentration. */
    MEAN,
    /** A probe's value. */
    PROBE
  }

  /**
   * What is watched, by kind and name.
   *
   * @param kind what is read
   * @param name the part or probe
   */
  public record Where(Kind kind, String name) {
    public Where {
      Objects.requireNonNull(kind, "kind");
      Objects.requireNonNull(name, "name");
    }

    /** As the case writes it: {@code mould}, {@code mean:mould} or the probe's name. */
    public String spelling() {
      return kind == Kind.MEAN ? "mean:" + name : name;
    }
  }

  /** {@code rises} or {@code falls}. */
  public String when() {
    return rises ? "rises" : "falls";
  }
}
