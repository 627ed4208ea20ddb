package dev.soakfield.mesh;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class AtomicFilesTest {
  @TempDir Path dir;

  private long filesIn(Path d) throws IOException {
    try (Stream<Path> s = Files.list(d)) {
      return s.count();
    }
  }

  @Test
  void finishedWriteReplacesTheTarget() throws IOException {
    Path target = dir.resolve("out.txt");
    Files.writeString(target, "old");
    AtomicFiles.write(target, f -> Files.writeString(f, "new"));
    assertEquals("new", Files.readString(target));
    assertEquals(1, filesIn(dir));
  }

  @Test
  void aDurableWriteReplacesTheTargetAndLeavesNoTemporary() throws IOException {
    Path target = dir.resolve("nested/state.bin");
    AtomicFiles.writeDurably(target, f -> Files.writeString(f, "first"));
    AtomicFiles.writeDurably(target, f -> Files.writeString(f, "second"));
    assertEquals("second", Files.readString(target));
    assertEquals(1, filesIn(dir.resolve("nested")));
  }

  @Test
  void aFolderThatTakesNoFilesIsReportedWithTheTargetsName() {
    // /proc takes no new files, not even for root (Linux; common practice for this test)
    org.junit.jupiter.api.Assumptions.assumeTrue(Files.isDirectory(Path.of("/proc/self")));
    Path target = Path.of("/proc/soakfield-picture.png");
    java.nio.file.FileSystemException e =
        assertThrows(
            java.nio.file.FileSystemException.class,
            () -> AtomicFiles.write(target, f -> Files.writeString(f, "x")));
    assertEquals(target.toString(), e.getFile());
    org.junit.jupiter.api.Assertions.assertTrue(
        e.getReason().contains("cannot hold new files"), e.getReason());
  }

  @Test
  void failedWriteLeavesTheOldFileAndNoTemporary() throws IOException {
    Path target = dir.resolve("out.txt");
    Files.writeString(target, "old");
    assertThrows(
        IOException.class,
        () ->
            AtomicFiles.write(
                target,
                f -> {
                  Files.writeString(f, "half");
                  throw new IOException("disk full");
                }));
    assertEquals("old", Files.readString(target));
    assertEquals(1, filesIn(dir));
  }

  @Test
  void newFilesAreReadableByOthersAndReplacedOnesKeepTheirPermissions() throws IOException {
    org.junit.jupiter.api.Assumptions.assumeTrue(
        dir.getFileSystem().supportedFileAttributeViews().contains("posix"));
    Path fresh = dir.resolve("fresh.txt");
    AtomicFiles.write(fresh, f -> Files.writeString(f, "x"));
    assertEquals("rw-r--r--", perms(fresh));
    Path kept = dir.resolve("kept.txt");
    Files.writeString(kept, "old");
    Files.setPosixFilePermissions(
        kept, java.nio.file.attribute.PosixFilePermissions.fromString("rw-rw----"));
    AtomicFiles.write(kept, f -> Files.writeString(f, "new"));
    assertEquals("rw-rw----", perms(kept));
  }

  private static String perms(Path p) throws IOException {
    return java.nio.file.attribute.PosixFilePermissions.toString(Files.getPosixFilePermissions(p));
  }

  @Test
  void createsMissingFolders() throws IOException {
    Path target = dir.resolve("a/b/out.txt");
    AtomicFiles.write(target, f -> Files.writeString(f, "x"));
    assertEquals("x", Files.readString(target));
  }
}
