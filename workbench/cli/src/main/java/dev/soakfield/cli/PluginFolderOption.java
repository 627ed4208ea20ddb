package dev.soakfield.cli;

import dev.soakfield.fem.laws.PluginFolders;
import dev.soakfield.fem.laws.SourceLawCatalog;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import picocli.CommandLine.Option;

/** {@code --plugins DIR}, repeatable, for the commands that bind a case's source laws. */
final class PluginFolderOption {
  @Option(
      names = "--plugins",
      paramLabel = "DIR",
      description =
          "A folder of source-law plugin jars, searched after ~/.soakfield/plugins; repeatable."
              + " Plugins are code with full trust.")
  List<Path> plugins = new ArrayList<>();

  /** The laws of the class path and the plugin folders; a broken plugin stops here. */
  SourceLawCatalog catalog() {
    return SourceLawCatalog.load(PluginFolders.withDefault(plugins));
  }
}
