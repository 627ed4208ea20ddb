package dev.soakfield.app;

import dev.soakfield.fem.results.StoredRun;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;

/**
 * A field a result holds and how the view labels it: the three nodal fields every run writes, the
 * amount each named trap holds ({@code trapped:<part>:<name>}), which runs with source laws write,
 * and the per-element estimate of the discretisation error ({@code error_indicator}), which shows
 * where a finer mesh would help.
 */
public final class FieldKind {
  /** Prefix of the per-trap fields in the frame files. */
  public static final String TRAPPED_PREFIX = "trapped:";

  public static final FieldKind CONCENTRATION = new FieldKind("c", "concentration c");
  public static final FieldKind POTENTIAL = new FieldKind("phi", "potential phi");
  public static final FieldKind FIRST_EXCEED =
      new FieldKind("first_exceed", "first time over threshold");

  /** One value per tetrahedron: the estimated mean |c − c_h| there (runs since accuracy output). */
  public static final FieldKind ERROR_INDICATOR =
      new FieldKind("error_indicator", "estimated error per element", true);

  private static final List<FieldKind> STANDARD = List.of(CONCENTRATION, POTENTIAL, FIRST_EXCEED);

  /** Name of the field in the result files. */
  public final String fileName;

  /** Words for the colour bar. */
  public final String words;

  /** One value per tetrahedron (a cell field of the frames) rather than one per node. */
  public final boolean perElement;

  private FieldKind(String fileName, String words) {
    this(fileName, words, false);
  }

  private FieldKind(String fileName, String words, boolean perElement) {
    this.fileName = fileName;
    this.words = words;
    this.perElement = perElement;
  }

  /** The fields every run writes. */
  public static List<FieldKind> standard() {
    return STANDARD;
  }

  /**
   * The fields of a result: the standard ones, then its per-trap fields in file order, then the
   * error indicator when the frames hold it.
   */
  public static List<FieldKind> of(StoredRun results) {
    List<FieldKind> all = new ArrayList<>(STANDARD);
    for (String name : results.pointFieldNames()) {
      if (name.startsWith(TRAPPED_PREFIX)) {
        all.add(trapped(name));
      }
    }
    if (results.cellFieldNames().contains(ERROR_INDICATOR.fileName)) {
      all.add(ERROR_INDICATOR);
    }
    return List.copyOf(all);
  }

  private static FieldKind trapped(String fileName) {
    // trapped:<part>:<name> reads as "trapped dislocations (body)"
    String[] p = fileName.substring(TRAPPED_PREFIX.length()).split(":", 2);
    String words = p.length == 2 ? "trapped " + p[1] + " (" + p[0] + ")" : "trapped " + p[0];
    return new FieldKind(fileName, words);
  }

  /**
   * The field of a command-line name: c, phi, first_exceed (also first-exceed), error_indicator, or
   * a per-trap field {@code trapped:<part>:<name>} (whether the result holds it is checked when it
   * is read).
   */
  public static FieldKind parse(String name) {
    String stripped = name.strip();
    if (stripped.startsWith(TRAPPED_PREFIX) && stripped.length() > TRAPPED_PREFIX.length()) {
      return trapped(stripped);
    }
    String n = stripped.toLowerCase(Locale.ROOT).replace('-', '_');
    for (FieldKind k : STANDARD) {
      if (k.fileName.equals(n)) {
        return k;
      }
    }
    if (ERROR_INDICATOR.fileName.equals(n)) {
      return ERROR_INDICATOR;
    }
    throw new IllegalArgumentException(
        "field: found '"
            + name
            + "', expected c, phi, first_exceed, error_indicator or trapped:<part>:<name>");
  }

  /** A time field (seconds), shown as times and grey where never reached. */
  public boolean isTime() {
    return equals(FIRST_EXCEED);
  }

  @Override
  public boolean equals(Object o) {
    return o instanceof FieldKind k && k.fileName.equals(fileName);
  }

  @Override
  public int hashCode() {
    return Objects.hash(fileName);
  }

  @Override
  public String toString() {
    return fileName;
  }
}
