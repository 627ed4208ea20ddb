package dev.soakfield.app.setup;

import dev.soakfield.mesh.AtomicFiles;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * The files opened last, newest first, kept in a plain text file (one path a line) so that a
 * damaged or missing list costs nothing but the list.
 */
public final class RecentFiles {
  /** How many the list keeps. */
  public static final int KEEP = 10;

  private final Path store;

  public RecentFiles(Path store) {
    this.store = store;
  }

  /** The list in the user's settings folder ({@code ~/.soakfield/recent.txt}). */
  public static RecentFiles ofUser() {
    return new RecentFiles(Path.of(System.getProperty("user.home"), ".soakfield", "recent.txt"));
  }

  /** The files that still exist, newest first. */
  public List<Path> list() {
    List<Path> out = new ArrayList<>();
    try {
      for (String line : Files.readAllLines(store, StandardCharsets.UTF_8)) {
        if (!line.isBlank() && Files.exists(Path.of(line))) {
          out.add(Path.of(line));
        }
      }
    } catch (IOException | RuntimeException e) {
      return List.of(); // no list yet, or one that cannot be read: start a new one
    }
    return out;
  }

  /** Puts {@code file} first; a failure to write the list is not worth the user's attention. */
  public void opened(Path file) {
    List<Path> l = new ArrayList<>(list());
    Path abs = file.toAbsolutePath().normalize();
    l.remove(abs);
    l.add(0, abs);
    List<String> lines = new ArrayList<>();
    for (Path p : l.subList(0, Math.min(KEEP, l.size()))) {
      lines.add(p.toString());
    }
    try {
      Files.createDirectories(store.getParent());
      AtomicFiles.write(store, f -> Files.write(f, lines, StandardCharsets.UTF_8));
    } catch (IOException e) {
      // the recent list is a convenience; opening the file matters, not remembering it
    }
  }
}
