package dev.soakfield.render;

import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.util.Optional;

/**
 * Starts GL for a GL test. On CI (environment variable {@code CI=true}, which CI services set) a GL
 * that does not start fails the test: CI installs Mesa and Xvfb (.ci/run), so a failure there is a
 * broken set-up, not a reason to skip eleven tests in silence. On a developer's machine without a
 * display or GL the test is skipped, and says so on stderr (Surefire hides assumption messages).
 */
public final class GlAvailable {
  private GlAvailable() {}

  /** What a GL test does when GL did or did not start. */
  enum Outcome {
    RUN,
    SKIP,
    FAIL
  }

  public static void orSkip() {
    Optional<String> why = Optional.empty();
    try {
      GlRuntime.start();
      GlRuntime.describe(System.err);
    } catch (IllegalStateException | UnsatisfiedLinkError e) {
      why = Optional.of(String.valueOf(e.getMessage()));
    }
    Outcome o = decide(why, System.getenv("CI"));
    if (o == Outcome.FAIL) {
      throw new AssertionError(
          "GL did not start on CI (CI=true), where the GL tests must run: "
              + why.orElseThrow()
              + "; install Mesa and Xvfb as .ci/run does");
    }
    if (o == Outcome.SKIP) {
      System.err.println(
          "GL test skipped: GL did not start on this machine ("
              + why.orElseThrow()
              + "); on CI (CI=true) this would fail");
    }
    assumeTrue(o == Outcome.RUN, why.orElse(""));
  }

  /** Run when GL started; else fail on CI, skip elsewhere. */
  static Outcome decide(Optional<String> whyNot, String ciVariable) {
    if (whyNot.isEmpty()) {
      return Outcome.RUN;
    }
    return "true".equalsIgnoreCase(ciVariable) ? Outcome.FAIL : Outcome.SKIP;
  }
}
