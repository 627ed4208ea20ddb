package dev.soakfield.fem.results;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.time.Instant;

/**
 * An advisory lock on a result folder for the length of one run, so that a second run into it is
 * refused at once (naming the first) instead of both failing and the folder's earlier results being
 * marked failed. The operating system drops the lock with the process, so a killed run leaves no
 * stale lock; the small lock file stays and is reused.
 */
public final class FolderLock implements AutoCloseable {
  /** The lock file inside the result folder. */
  public static final String NAME = ".soakfield.lock";

  private final Path folder;
  private final boolean createdFolder;
  private final FileChannel channel;
  private final FileLock lock;

  private FolderLock(Path folder, boolean createdFolder, FileChannel channel, FileLock lock) {
    this.folder = folder;
    this.createdFolder = createdFolder;
    this.channel = channel;
    this.lock = lock;
  }

  /**
   * Takes the lock of {@code folder}, creating the folder if need be.
   *
   * @throws ResultFolderException naming the run that holds it, or when the folder cannot be
   *     written
   */
  public static FolderLock take(Path folder) {
    Path abs = folder.toAbsolutePath().normalize();
    FileChannel channel = null;
    try {
      boolean created = !Files.isDirectory(abs);
      Files.createDirectories(abs);
      channel =
          FileChannel.open(
              abs.resolve(NAME),
              StandardOpenOption.CREATE,
              StandardOpenOption.READ,
              StandardOpenOption.WRITE);
      FileLock lock;
      try {
        lock = channel.tryLock();
      } catch (OverlappingFileLockException e) {
        lock = null; // held by another run in this same process
      }
      if (lock == null) {
        String holder = new String(Files.readAllBytes(abs.resolve(NAME)), StandardCharsets.UTF_8);
        channel.close();
        throw new ResultFolderException(
            abs
                + ": found another run writing into this folder ("
                + (holder.isBlank() ? "process unknown" : holder.strip())
                + "), expected a folder no run is using; wait for it to end, or choose another"
                + " --out");
      }
      channel.truncate(0);
      channel.write(
          ByteBuffer.wrap(
              ("process "
                      + ManagementFactory.getRuntimeMXBean().getPid()
                      + ", started "
                      + Instant.now())
                  .getBytes(StandardCharsets.UTF_8)),
          0);
      return new FolderLock(abs, created, channel, lock);
    } catch (IOException e) {
      if (channel != null) {
        try {
          channel.close();
        } catch (IOException ignored) {
          // the refusal below says what went wrong
        }
      }
      throw ResultFolder.unwritable(abs, e);
    }
  }

  /**
   * Lets go of the folder. Where the run was refused before it wrote anything (no manifest), the
   * lock file, and the folder if the lock made it, are taken away again: a refused run leaves the
   * place as it found it.
   */
  @Override
  public void close() throws IOException {
    try {
      lock.release();
    } finally {
      channel.close();
    }
    if (!Files.exists(folder.resolve(RunManifest.FILE))) {
      Files.deleteIfExists(folder.resolve(NAME));
      if (createdFolder) {
        try (var left = Files.list(folder)) {
          if (left.findAny().isEmpty()) {
            Files.deleteIfExists(folder);
          }
        }
      }
    }
  }
}
