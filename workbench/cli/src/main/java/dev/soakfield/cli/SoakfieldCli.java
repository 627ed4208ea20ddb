package dev.soakfield.cli;

import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The {@code soakfield} command: entry point of the application jar. */
@Command(
    name = "soakfield",
    mixinStandardHelpOptions = true,
    versionProvider = VersionProvider.class,
    description = "Predicts how moisture and hydrogen get into 3D parts.",
    subcommands = {
      MeshCommand.class,
      InfoCommand.class,
      CheckCommand.class,
      RunCommand.class,
      SweepCommand.class,
      BakeCommand.class,
      TdsCommand.class,
      ReportCommand.class,
      ExportCommand.class,
      DemoCommand.class,
      VerifyCommand.class,
      FitCommand.class,
      BenchCommand.class,
      PluginsCommand.class,
      GuiCommand.class,
      RenderCommand.class,
      CommandLine.HelpCommand.class
    })
public final class SoakfieldCli implements Runnable {
  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  /** With no command: the workbench on the demo case where a window can open, else the usage. */
  @Override
  public void run() {
    boolean window =
        dev.soakfield.app.GraphicsServices.window()
            .map(w -> w.whyNoWindow().isEmpty())
            .orElse(false);
    if (window) {
      spec.commandLine().getSubcommands().get("gui").execute();
      return;
    }
    spec.commandLine().usage(spec.commandLine().getOut());
  }

  public static void main(String[] args) {
    System.exit(ExitCodes.execute(new SoakfieldCli(), args));
  }
}
