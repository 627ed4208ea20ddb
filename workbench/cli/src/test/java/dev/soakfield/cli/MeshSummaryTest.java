package dev.soakfield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class MeshSummaryTest {
  @Test
  void numbersKeepSixSignificantDigitsWithoutTrailingZeros() {
    assertEquals("0", MeshSummary.num(0));
    assertEquals("0.012", MeshSummary.num(0.012));
    assertEquals("5.4e-07", MeshSummary.num(5.4e-7));
    assertEquals("1.23457", MeshSummary.num(1.234567));
    assertEquals("-2.5e+06", MeshSummary.num(-2.5e6));
    assertEquals("100", MeshSummary.num(100));
  }
}
