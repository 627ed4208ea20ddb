package dev.soakfield.fem.laws;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * The plugins folders an application run searches: the default folder {@code ~/.soakfield/plugins}
 * when it exists, then the folders the user names (which must exist).
 */
public final class PluginFolders {
  private PluginFolders() {}

  /** {@code ~/.soakfield/plugins}. */
  public static Path defaultFolder() {
    return Path.of(System.getProperty("user.home"), ".soakfield", "plugins");
  }

  /** The default folder, if it exists, followed by {@code named}. */
  public static List<Path> withDefault(List<Path> named) {
    List<Path> all = new ArrayList<>();
    if (Files.isDirectory(defaultFolder())) {
      all.add(defaultFolder());
    }
    all.addAll(named);
    return List.copyOf(all);
  }
}
