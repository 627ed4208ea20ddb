package dev.soakfield.app;

import java.io.IOException;
import java.io.PrintWriter;

/**
 * Times the 3D view on a generated box; the gui module provides it (see {@link GraphicsServices}).
 */
public interface ViewBenchmark {
  /**
   * Measures on a box of {@code cells}³ cubes drawn at {@code width}×{@code height}; prints to out.
   */
  void measure(PrintWriter out, int cells, int width, int height) throws IOException;
}
