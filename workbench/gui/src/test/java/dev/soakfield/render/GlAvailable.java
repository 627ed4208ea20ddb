package dev.soakfield.render;

import static org.junit.jupiter.api.Assumptions.assumeTrue;

/** Skips a GL test when neither X11 nor OSMesa can render here, saying why on stderr. */
public final class GlAvailable {
  private GlAvailable() {}

  public static void orSkip() {
    String why = "";
    try {
      GlRuntime.start();
      GlRuntime.describe(System.err);
    } catch (IllegalStateException | UnsatisfiedLinkError e) {
      why = e.getMessage();
      System.err.println("GL test skipped: " + why);
    }
    assumeTrue(why.isEmpty(), why);
  }
}
