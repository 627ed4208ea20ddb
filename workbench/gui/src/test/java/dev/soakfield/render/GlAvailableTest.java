package dev.soakfield.render;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Optional;
import org.junit.jupiter.api.Test;

/** When a GL test runs, skips or fails; needs no GL itself. */
class GlAvailableTest {
  @Test
  void aGlThatDoesNotStartFailsOnCiAndIsSkippedElsewhere() {
    Optional<String> broken = Optional.of("no X display; OSMesa missing");
    assertEquals(GlAvailable.Outcome.FAIL, GlAvailable.decide(broken, "true"));
    assertEquals(GlAvailable.Outcome.FAIL, GlAvailable.decide(broken, "TRUE"));
    assertEquals(GlAvailable.Outcome.SKIP, GlAvailable.decide(broken, null));
    assertEquals(GlAvailable.Outcome.SKIP, GlAvailable.decide(broken, "false"));
    assertEquals(GlAvailable.Outcome.RUN, GlAvailable.decide(Optional.empty(), "true"));
    assertEquals(GlAvailable.Outcome.RUN, GlAvailable.decide(Optional.empty(), null));
  }
}
