package dev.soakfield.render;

import dev.soakfield.app.ViewBenchmark;
import java.io.IOException;
import java.io.PrintWriter;

/** Offers {@link RenderBench} to {@code soakfield bench render} through app's service interface. */
public final class RenderBenchService implements ViewBenchmark {
  @Override
  public void measure(PrintWriter out, int cells, int width, int height) throws IOException {
    RenderBench.run(out, cells, width, height);
  }
}
