package dev.soakfield.app;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;
import org.junit.jupiter.api.Test;

/** The window's section and playback controls, without GL. */
class WorkbenchControlsTest {
  /** A box from (0, 0, 0) to (1, 2, 3). */
  private static final double[] BOX = {0, 0, 0, 1, 2, 3};

  @Test
  void extentIsTheBoxsSupportFunctionBothWays() {
    SectionControl s = new SectionControl(BOX);
    // support function of a box, h(n) = Σ max(n_i·lo_i, n_i·hi_i) (Rockafellar, Convex Analysis,
    // 1970, §13); the low end is −h(−n)
    double r = 1 / Math.sqrt(3);
    assertArrayEquals(new double[] {0, 6 * r}, s.extent(new double[] {r, r, r}), 1e-12);
    assertArrayEquals(new double[] {-2, 1}, s.extent(new double[] {1, -1, 0}), 1e-12);
    assertArrayEquals(new double[] {0, 3}, s.extent(new double[] {0, 0, 1}), 1e-12);
  }

  @Test
  void startsAcrossZAtMidHeightAndPassesOnlyChangesOn() {
    SectionControl s = new SectionControl(BOX);
    assertEquals(2, s.axis());
    assertEquals(1.5f, s.position());
    ViewSettings settings = new ViewSettings();
    double[] n = s.normal(0, new OrbitCamera());
    assertArrayEquals(new double[] {1, 0, 0}, n);
    // a new axis starts at the middle of the part along it
    float start = s.start(0, s.extent(n));
    assertEquals(0.5f, start);
    s.apply(true, 0, start, n, settings);
    assertEquals(Optional.of(new ViewSettings.Plane(1, 0, 0, 0.5)), settings.section());
    int generation = settings.generation();
    s.apply(true, 0, start, n, settings);
    assertEquals(generation, settings.generation(), "nothing changed, nothing passed on");
    s.apply(false, 0, start, n, settings);
    assertTrue(settings.section().isEmpty());
  }

  @Test
  void playbackStepsOnceEachPeriodAndWrapsAround() {
    Playback p = new Playback();
    ViewSettings settings = new ViewSettings();
    settings.frame(2);
    p.advance(10, settings, 3);
    assertEquals(2, settings.frame(), "paused: no step");
    p.toggle();
    p.framesPerSecond(4);
    p.advance(10, settings, 3);
    assertEquals(0, settings.frame(), "the last frame wraps to the first");
    p.advance(10.2, settings, 3);
    assertEquals(0, settings.frame(), "0.2 s is less than the 0.25 s period");
    p.advance(10.25, settings, 3);
    assertEquals(1, settings.frame());
  }
}
