package dev.soakfield.fem.casefile;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class TimeTableTest {
  // Reference values: linear interpolation v0 + (t - t0)/(t1 - t0)·(v1 - v0) worked by hand.

  @Test
  void interpolatesLinearlyBetweenBreakpoints() {
    TimeTable t = TimeTable.of(new double[] {0, 100, 300}, new double[] {2, 4, 0});
    assertEquals(2.0, t.at(0));
    assertEquals(3.0, t.at(50), 1e-15); // 2 + 0.5·2
    assertEquals(4.0, t.at(100));
    assertEquals(3.0, t.at(150), 1e-15); // 4 + 0.25·(0 - 4)
    assertEquals(1.0, t.at(250), 1e-15); // 4 + 0.75·(0 - 4)
    assertEquals(0.0, t.at(300));
  }

  @Test
  void holdsTheEndValuesOutsideItsRange() {
    TimeTable t = TimeTable.of(new double[] {10, 20}, new double[] {-1, 5});
    assertEquals(-1.0, t.at(-1e9));
    assertEquals(-1.0, t.at(9.999));
    assertEquals(5.0, t.at(20.001));
    assertEquals(5.0, t.at(1e12));
  }

  @Test
  void breakpointsAreTheTimesAndACopy() {
    TimeTable t = TimeTable.of(new double[] {0, 3600, 7200}, new double[] {0, 1, 1});
    double[] b = t.breakpoints();
    assertArrayEquals(new double[] {0, 3600, 7200}, b);
    b[1] = -5;
    assertArrayEquals(new double[] {0, 3600, 7200}, t.breakpoints());
    assertFalse(t.isConstant());
    assertEquals(0.0, t.min());
  }

  @Test
  void constantTableHasNoBreakpoints() {
    TimeTable c = TimeTable.constant(0.7);
    assertEquals(0, c.breakpoints().length);
    assertEquals(0.7, c.at(-3));
    assertEquals(0.7, c.at(1e9));
    assertTrue(c.isConstant());
    assertEquals(TimeTable.constant(0.7), c);
    assertEquals(TimeTable.constant(0.7).hashCode(), c.hashCode());
  }

  @Test
  void singlePointIsHeldEverywhere() {
    TimeTable t = TimeTable.of(new double[] {5}, new double[] {3});
    assertEquals(3.0, t.at(0));
    assertEquals(3.0, t.at(10));
    assertArrayEquals(new double[] {5}, t.breakpoints());
  }

  @Test
  void rejectsTimesThatDoNotIncreaseStrictly() {
    IllegalArgumentException e =
        assertThrows(
            IllegalArgumentException.class,
            () -> TimeTable.of(new double[] {0, 10, 10}, new double[] {1, 2, 3}));
    assertEquals("time table times must increase strictly, got 10.0 after 10.0", e.getMessage());
    assertThrows(
        IllegalArgumentException.class, () -> TimeTable.of(new double[] {0, 1}, new double[] {1}));
    assertThrows(IllegalArgumentException.class, () -> TimeTable.constant(Double.NaN));
  }
}
