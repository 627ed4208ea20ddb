package dev.soakfield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/**
 * The benches on small sizes: they run, print every phase, and the whole-run bench's own physics
 * check holds (a flux-fed box with every other face sealed holds exactly flux × area × time).
 */
class BenchCommandsTest {
  @org.junit.jupiter.params.ParameterizedTest
  @org.junit.jupiter.params.provider.ValueSource(strings = {"1", "2"})
  void theWholeRunBenchPrintsItsPhasesAndTheAmountMatchesTheFlux(String order) {
    CliRun r = CliRun.of("bench", "run", "--cells", "6", "--steps", "5", "--order", order);
    assertEquals(ExitCodes.OK, r.exitCode(), r.err());
    for (String phase :
        new String[] {
          "reading case and mesh",
          "model and matrices",
          "linear solves",
          "per-step rest",
          "field outputs",
          "report and pictures",
          "x its pure solve time",
          "per node and step",
          "live heap",
          order.equals("2") ? "quadratic tetrahedra, 2197 nodes" : "linear tetrahedra, 343 nodes"
        }) {
      assertTrue(r.out().contains(phase), phase + " in:\n" + r.out());
    }
    assertTrue(r.out().contains("5 backward-Euler steps"), r.out());
    Matcher m = Pattern.compile("relative difference ([0-9.eE+-]+)").matcher(r.out());
    assertTrue(m.find(), r.out());
    // conservation of a constant flux into a sealed box (exact; the solver's tolerance is 1e-11)
    assertTrue(Double.parseDouble(m.group(1)) < 1e-9, r.out());
  }

  @Test
  void theSolverBenchUsesTheTetrahedralMatrixAndComparesWithTheFloor() {
    CliRun r = CliRun.of("bench", "solver", "--grid", "9");
    assertEquals(ExitCodes.OK, r.exitCode(), r.err());
    // 9 nodes per axis: 729 rows; a 7-point grid stencil would have 4,257 nonzeros, the
    // six-tetrahedra box (14-neighbour stencil inside) has more
    Matcher m = Pattern.compile("SpMV 729 rows, (\\d+) nonzeros").matcher(r.out());
    assertTrue(m.find(), r.out());
    assertTrue(Integer.parseInt(m.group(1)) > 4257, r.out());
    assertTrue(r.out().contains("x its floor"), r.out());
    assertTrue(r.out().contains("over 100 solves: the choice takes"), r.out());
  }

  @Test
  void theSolverBenchTakesQuadraticElementsWithTheSameRows() {
    CliRun r = CliRun.of("bench", "solver", "--grid", "9", "--order", "2");
    assertEquals(ExitCodes.OK, r.exitCode(), r.err());
    // 4³ cells of 10-node tetrahedra: 9 nodes a side, 729 rows; the quadratic stencil reaches
    // more neighbours than the linear one on the same rows
    Matcher m = Pattern.compile("SpMV 729 rows, (\\d+) nonzeros").matcher(r.out());
    assertTrue(m.find(), r.out());
    CliRun linear = CliRun.of("bench", "solver", "--grid", "9");
    Matcher l = Pattern.compile("SpMV 729 rows, (\\d+) nonzeros").matcher(linear.out());
    assertTrue(l.find(), linear.out());
    assertTrue(Integer.parseInt(m.group(1)) > Integer.parseInt(l.group(1)), r.out());
    CliRun even = CliRun.of("bench", "solver", "--grid", "10", "--order", "2");
    assertEquals(2, even.exitCode());
    assertTrue(even.err().contains("expected 1, or 2 with an odd grid"), even.err());
  }
}
