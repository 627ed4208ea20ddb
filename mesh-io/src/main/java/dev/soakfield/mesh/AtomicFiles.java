package dev.soakfield.mesh;

import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
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

  /** Forces a folder's entries (the rename) to the disk where the platform can. */
  private static void forceFolder(Path dir) {
    try (FileChannel c = FileChannel.open(dir, StandardOpenOption.READ)) {
      c.force(true);
    } catch (IOException | UnsupportedOperationException e) {
      // some platforms cannot open a folder as a channel; the rename then is as durable as they are
    }
  }

  /**
   * Runs {@code writer} on a temporary file in the target's folder and renames the result onto
   * {@code target}. On failure the temporary file is removed and {@code target} is untouched.
   */
  public static void write(Path target, Writer writer) throws IOException {
    write(target, writer, false);
  }

  /**
   * As {@link #write(Path, Writer)}, and durable: the content is forced to the disk before the
   * rename and the folder after it, so that after a power cut the target is the old file or the
   * complete new one (what a checkpoint needs; a plain rename may reach the disk before the data).
   */
  public static void writeDurably(Path target, Writer writer) throws IOException {
    write(target, writer, true);
  }

  private static void write(Path target, Writer writer, boolean durable) throws IOException {
    Path abs = target.toAbsolutePath();
    Path dir = abs.getParent();
    if (dir != null) {
      Files.createDirectories(dir);
    }
    Path tmp;
    try {
      tmp = Files.createTempFile(dir, "." + abs.getFileName() + ".", ".part");
    } catch (FileSystemException e) {
      // the user named the target, not our hidden temporary file beside it
      throw new FileSystemException(abs.toString(), null, reason(e));
    }
    boolean done = false;
    try {
      writer.writeTo(tmp);
      keepPermissions(tmp, abs);
      if (durable) {
        try (FileChannel c = FileChannel.open(tmp, StandardOpenOption.WRITE)) {
          c.force(true);
        }
      }
      try {
        Files.move(tmp, abs, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
      } catch (AtomicMoveNotSupportedException e) {
        Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING);
      }
      done = true;
      if (durable && dir != null) {
        forceFolder(dir);
      }
    } finally {
      if (!done) {
        Files.deleteIfExists(tmp);
      }
    }
  }

  private static String reason(FileSystemException e) {
    if (e instanceof java.nio.file.NoSuchFileException) {
      return "its folder cannot hold new files (no such file or folder)";
    }
    if (e instanceof java.nio.file.AccessDeniedException) {
      return "its folder cannot hold new files (permission denied)";
    }
    return e.getReason() != null ? e.getReason() : "the file system refused";
  }
}
