package dev.soakfield.report;

/**
 * Charts are drawn into images, never on a screen: AWT runs headless unless the application has
 * already decided otherwise (the GUI may open a display of its own).
 */
final class HeadlessAwt {
  private HeadlessAwt() {}

  static void ensure() {
    if (System.getProperty("java.awt.headless") == null) {
      System.setProperty("java.awt.headless", "true");
    }
  }
}
