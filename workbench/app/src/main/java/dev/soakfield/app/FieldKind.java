package dev.soakfield.app;

import java.util.Locale;

/** The nodal fields a result holds and how the view labels them. */
public enum FieldKind {
  CONCENTRATION("c", "concentration c"),
  POTENTIAL("phi", "potential phi"),
  FIRST_EXCEED("first_exceed", "first time over threshold");

  /** Name of the field in the result files. */
  public final String fileName;

  /** Words for the colour bar. */
  public final String words;

  FieldKind(String fileName, String words) {
    this.fileName = fileName;
    this.words = words;
  }

  /** The field of a command-line name: c, phi or first_exceed (also first-exceed). */
  public static FieldKind parse(String name) {
    String n = name.strip().toLowerCase(Locale.ROOT).replace('-', '_');
    for (FieldKind k : values()) {
      if (k.fileName.equals(n)) {
        return k;
      }
    }
    throw new IllegalArgumentException(
        "field: found '" + name + "', expected c, phi or first_exceed");
  }
}
