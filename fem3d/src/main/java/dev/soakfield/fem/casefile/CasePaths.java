package dev.soakfield.fem.casefile;

/** Spelling of JSON key paths in messages: {@code materials.body.diffusivity}, {@code a.b[2]}. */
final class CasePaths {
  private CasePaths() {}

  static String child(String parent, String key) {
    return parent.isEmpty() ? key : parent + "." + key;
  }

  static String item(String parent, int index) {
    return parent + "[" + index + "]";
  }
}
