package dev.soakfield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;

class ProgressLineTest {
  @Test
  void theEtaExtrapolatesTheShareOfSimulatedTimeDone() {
    // a quarter of the simulated time in 10 s leaves three quarters: 30 s (linear extrapolation)
    assertEquals(30.0, ProgressLine.etaSeconds(25, 100, 10), 1e-12);
    assertTrue(Double.isNaN(ProgressLine.etaSeconds(0, 100, 10)));
  }

  @Test
  void aLogLineNamesTimeWithUnitStepsRejectionsAndEta() {
    String s = ProgressLine.line(7200, 86400 * 7, 40, 3, 12);
    assertEquals(
        "soakfield: t = 2.00 h of 7.00 d (1%), 40 steps, 3 rejected, 12.0 s elapsed, ETA 16.6 min"
            + System.lineSeparator(),
        s);
  }

  @Test
  void aTerminalBarIsRedrawnInPlace() {
    ProgressLine p = new ProgressLine(new PrintWriter(new StringWriter()), false, true);
    String bar = p.bar(50, 100, 10, 1, 4);
    assertTrue(bar.startsWith("\r[############............]  50%"), bar);
    assertTrue(bar.contains("t = 50.0 s of 100 s") && bar.contains("10 steps (1 rejected)"), bar);
    assertTrue(bar.contains("ETA 4.00 s"), bar);
  }

  @Test
  void quietPrintsNothing() {
    StringWriter w = new StringWriter();
    ProgressLine p = new ProgressLine(new PrintWriter(w), true, true);
    p.step(50, 100, 10, 1);
    p.done();
    assertEquals("", w.toString());
  }
}
