package dev.soakfield.cli;

import dev.soakfield.app.GraphicsServices;
import dev.soakfield.app.Study;
import dev.soakfield.app.WindowLauncher;
import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code soakfield gui}: the 3D workbench window. */
@Command(
    name = "gui",
    mixinStandardHelpOptions = true,
    description = {
      "Opens the workbench window on a mesh (.msh), a case (.json) or a result folder: the part"
          + " shaded by face group or by a field, section, isosurfaces, time slider, probes and"
          + " the uptake plot."
    })
final class GuiCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Parameters(
      index = "0",
      arity = "0..1",
      paramLabel = "MESH.msh|CASE.json|RESULTS_DIR",
      description = "What to open (a file dialog asks when left out).")
  Path input;

  @Override
  public Integer call() {
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
    Optional<Study> study = input == null ? Optional.empty() : Optional.of(Study.open(input));
    window.open(study);
    return ExitCodes.OK;
  }
}
