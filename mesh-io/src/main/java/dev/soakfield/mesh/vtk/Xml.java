package dev.soakfield.mesh.vtk;

/** Text rules of XML attribute values. */
final class Xml {
  private Xml() {}

  /** Escapes the characters that may not appear literally in a double-quoted attribute. */
  static String escape(String s) {
    StringBuilder b = new StringBuilder(s.length());
    for (int i = 0; i < s.length(); i++) {
      char c = s.charAt(i);
      switch (c) {
        case '&' -> b.append("&amp;");
        case '<' -> b.append("&lt;");
        case '>' -> b.append("&gt;");
        case '"' -> b.append("&quot;");
        default -> b.append(c);
      }
    }
    return b.toString();
  }

  /** True when the text holds no character that XML 1.0 forbids or that an attribute would fold. */
  static boolean isPlainText(String s) {
    for (int i = 0; i < s.length(); i++) {
      if (Character.isISOControl(s.charAt(i))) {
        return false;
      }
    }
    return true;
  }
}
