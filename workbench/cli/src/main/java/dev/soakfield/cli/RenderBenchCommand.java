package dev.soakfield.cli;

import dev.soakfield.app.GraphicsServices;
import dev.soakfield.app.ViewBenchmark;
import java.io.IOException;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code soakfield bench render}: speed of the 3D view on a large generated box. */
@Command(
    name = "render",
    mixinStandardHelpOptions = true,
    description = {
      "Times the view on a box of 6*N^3 tetrahedra (N = 55: about 1M) with two result frames:"
          + " open to first frame, frames while orbiting, a time-slider step, isosurface"
          + " extraction; prints ratios to the aims (50 ms a frame, 100 ms an isosurface) and to"
          + " references measured in the same run."
    })
final class RenderBenchCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Option(names = "--cells", defaultValue = "55", description = "Cells per axis (default 55).")
  int cells;

  @Option(
      names = "--size",
      defaultValue = "1024x768",
      paramLabel = "WxH",
      description = "Picture size (default ${DEFAULT-VALUE}).")
  String size;

  @Override
  public Integer call() throws IOException {
    ViewBenchmark bench =
        GraphicsServices.viewBenchmark()
            .orElseThrow(
                () -> new UserInputException("bench render: " + GraphicsServices.NO_WINDOW));
    if (cells < 2 || cells > 120) {
      throw new UserInputException("--cells: found " + cells + ", expected 2 to 120");
    }
    int[] wh = ViewOptions.size(size);
    bench.measure(spec.commandLine().getOut(), cells, wh[0], wh[1]);
    return ExitCodes.OK;
  }
}
