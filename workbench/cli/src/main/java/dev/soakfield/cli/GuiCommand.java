package dev.soakfield.cli;

import dev.soakfield.app.GraphicsServices;
import dev.soakfield.app.WindowLauncher;
import dev.soakfield.app.setup.SetupSession;
import java.io.IOException;
import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code soakfield gui}: the workbench window, where a case is set up, run and looked at. */
@Command(
    name = "gui",
    mixinStandardHelpOptions = true,
    description = {
      "Opens the workbench window on a mesh (.msh: a new case beside it), a case (.json) or a"
          + " result folder: pick face groups into kinds, give parts materials, edit the"
          + " exposure and times, run, and look at the results (section, isosurfaces, time"
          + " slider, probes, uptake plot).",
      "Without PATH it opens a copy of the bundled demo case in ~/soakfield/demo."
    })
final class GuiCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Parameters(
      index = "0",
      arity = "0..1",
      paramLabel = "MESH.msh|CASE.json|RESULTS_DIR",
      description = "What to open (default: a copy of the demo case under your home folder).")
  Path input;

  @Mixin PluginFolderOption pluginFolders;

  @Override
  public Integer call() throws IOException {
    WindowLauncher window = launcher();
    Path what = input;
    if (what == null) {
      what = DemoFiles.copyInto(DemoFiles.windowCopy(), true);
      spec.commandLine().getOut().println("opening the demo case " + what);
      spec.commandLine().getOut().flush();
    }
    window.open(SetupSession.open(what, pluginFolders.catalog()));
    return ExitCodes.OK;
  }

  /** The window service, or a user-facing error saying why there is no window here. */
  static WindowLauncher launcher() {
    WindowLauncher window =
        GraphicsServices.window()
            .orElseThrow(() -> new UserInputException("gui: " + GraphicsServices.NO_WINDOW));
    Optional<String> noWindow = window.whyNoWindow();
    if (noWindow.isPresent()) {
      throw new UserInputException(
          "gui: no display to open a window on ("
              + noWindow.get()
              + "). To work headless, draw pictures with 'soakfield render RESULTS_DIR --time T"
              + " --field c --out PIC.png' (see 'soakfield render --help'), or run under a virtual"
              + " display: xvfb-run -a soakfield gui ...");
    }
    return window;
  }
}
