package dev.soakfield.fem.run;

import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Comparator;
import java.util.stream.Stream;

/**
 * The output folder of a run, filled in a hidden sibling folder and moved into place only when the
 * run has finished: a failed or interrupted run never leaves results that look complete, and the
 * results of an earlier run stay until the new ones are whole.
 */
public final class ResultFolder {
  private final Path target;
  private final Path work;

  private ResultFolder(Path target, Path work) {
    this.target = target;
    this.work = work;
  }

  public static ResultFolder open(Path target) throws IOException {
    Path abs = target.toAbsolutePath().normalize();
    Path parent = abs.getParent();
    Files.createDirectories(parent);
    Path work = Files.createTempDirectory(parent, "." + abs.getFileName() + ".running-");
    return new ResultFolder(abs, work);
  }

  /** Where files are written while the run goes on. */
  public Path work() {
    return work;
  }

  /** The folder the results end up in. */
  public Path target() {
    return target;
  }

  /** Moves the finished results into place, replacing an earlier run's folder. */
  public void commit() throws IOException {
    if (work.getFileSystem().supportedFileAttributeViews().contains("posix")) {
      // a temporary folder is private to its owner; results are for everyone who may read here
      Files.setPosixFilePermissions(
          work, java.nio.file.attribute.PosixFilePermissions.fromString("rwxr-xr-x"));
    }
    Path old = null;
    if (Files.exists(target)) {
      old = target.resolveSibling("." + target.getFileName() + ".old-" + System.nanoTime());
      move(target, old);
    }
    move(work, target);
    if (old != null) {
      deleteTree(old);
    }
  }

  /** Removes the unfinished results. */
  public void discard() {
    try {
      deleteTree(work);
    } catch (IOException e) {
      // best effort: a hidden folder left behind does not harm anyone
    }
  }

  private static void move(Path from, Path to) throws IOException {
    try {
      Files.move(from, to, StandardCopyOption.ATOMIC_MOVE);
    } catch (AtomicMoveNotSupportedException e) {
      Files.move(from, to);
    }
  }

  static void deleteTree(Path root) throws IOException {
    if (!Files.exists(root)) {
      return;
    }
    try (Stream<Path> s = Files.walk(root)) {
      for (Path p : s.sorted(Comparator.reverseOrder()).toList()) {
        Files.deleteIfExists(p);
      }
    }
  }
}
