package dev.soakfield.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class LengthsTest {
  @Test
  void unitsConvertToMetres() {
    // SI prefixes (BIPM, The International System of Units, 9th ed., Table 7); 1 in = 0.0254 m
    // exactly (international yard and pound agreement, 1959)
    assertEquals(0.002, Lengths.parse("2mm", "--size"), 1e-18);
    assertEquals(0.002, Lengths.parse("2 mm", "--size"), 1e-18);
    assertEquals(0.03, Lengths.parse("3cm", "--size"), 1e-18);
    assertEquals(5e-6, Lengths.parse("5um", "--size"), 1e-21);
    assertEquals(0.0254, Lengths.parse("1in", "--size"), 1e-18);
    assertEquals(0.5, Lengths.parse("0.5", "--size"), 0);
  }

  @Test
  void listsNeedTheRightCount() {
    assertArrayEquals(new double[] {1, 2, 3}, Lengths.parseList("1,2,3", 3, "--size"), 0);
    UserInputException e =
        assertThrows(UserInputException.class, () -> Lengths.parseList("1,2", 3, "--size"));
    assertTrue(e.getMessage().contains("found 2 value(s)"), e.getMessage());
  }

  @Test
  void nonPositiveAndGarbageAreRejected() {
    assertThrows(UserInputException.class, () -> Lengths.parse("0", "--size"));
    assertThrows(UserInputException.class, () -> Lengths.parse("-1", "--size"));
    assertThrows(UserInputException.class, () -> Lengths.parse("abc", "--size"));
    assertThrows(UserInputException.class, () -> Lengths.parse("NaN", "--size"));
    assertThrows(UserInputException.class, () -> Lengths.parseCount("1.5", "--cells"));
  }

  @Test
  void pointsAllowZeroAndNegativeCoordinates() {
    assertArrayEquals(
        new double[] {0, -0.002, 0.001}, Coordinates.parse("0,-2mm,1mm", "--insert"), 1e-18);
  }
}
