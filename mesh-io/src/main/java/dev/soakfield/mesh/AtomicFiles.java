package dev.soakfield.mesh;

import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.Set;

/**
 * Writes a file so that readers see either the old content or the complete new one, never a partial
 * file: the content goes to a temporary file beside the target, which is then renamed.
 */
public final class AtomicFiles {
  /** Writes the content of one file to the path it is given. */
  @FunctionalInterface
  public interface Writer {
    void writeTo(Path file) throws IOException;
  }

  private AtomicFiles() {}

  /**
   * A temporary file is private to its owner; the finished file gets the permissions of the file it
   * replaces, or the usual rw-r--r-- when it is new.
   */
  private static void keepPermissions(Path tmp, Path target) throws IOException {
    if (!tmp.getFileSystem().supportedFileAttributeViews().contains("posix")) {
      return;
    }
    Set<PosixFilePermission> perms =
        Files.exists(target)
            ? Files.getPosixFilePermissions(target)
            : PosixFilePermissions.fromString("rw-r--r--");
    Files.setPosixFilePermissions(tmp, perms);
  }

  /**
   * Runs {@code writer} on a temporary file in the target's folder and renames the result onto
   * {@code target}. On failure the temporary file is removed and {@code target} is untouched.
   */
  public static void write(Path target, Writer writer) throws IOException {
    Path abs = target.toAbsolutePath();
    Path dir = abs.getParent();
    if (dir != null) {
      Files.createDirectories(dir);
    }
    Path tmp = Files.createTempFile(dir, "." + abs.getFileName() + ".", ".part");
    boolean done = false;
    try {
      writer.writeTo(tmp);
      keepPermissions(tmp, abs);
      try {
        Files.move(tmp, abs, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
      } catch (AtomicMoveNotSupportedException e) {
        Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING);
      }
      done = true;
    } finally {
      if (!done) {
        Files.deleteIfExists(tmp);
      }
    }
  }
}
