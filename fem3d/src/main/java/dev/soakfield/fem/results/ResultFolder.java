package dev.soakfield.fem.results;

import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Stream;

/**
 * The output folder of a run. It exists from the start with a manifest saying "running"; files are
 * written into a hidden staging folder inside it and renamed into place one by one when the run
 * ends, so every file under its real name is complete. A finished run's manifest says "finished"; a
 * failed run's says "failed" with the reason and keeps the files that were complete. A folder
 * holding another case's results, or files that are not Soakfield results, is not touched without
 * {@code force}.
 */
public final class ResultFolder {
  /** The staging folder inside the result folder; never holds finished results. */
  public static final String STAGING = ".running";

  private final Path target;
  private final Path work;
  private final List<String> earlierFiles;
  private RunManifest manifest;

  private ResultFolder(Path target, RunManifest manifest, List<String> earlierFiles) {
    this.target = target;
    this.work = target.resolve(STAGING);
    this.manifest = manifest;
    this.earlierFiles = earlierFiles;
  }

  /**
   * Opens {@code target} for a run described by {@code starting}: checks that the folder may take
   * it, creates it and the staging folder, and writes the manifest with status running.
   *
   * @throws ResultFolderException when the folder holds another case's results or foreign files
   *     (and {@code force} is false), or cannot be written
   */
  public static ResultFolder open(Path target, RunManifest starting, boolean force) {
    Path abs = target.toAbsolutePath().normalize();
    Optional<RunManifest> earlier = Optional.empty();
    if (Files.isDirectory(abs)) {
      try {
        earlier = RunManifest.readFrom(abs);
      } catch (ResultFolderException e) {
        if (!force) {
          throw new ResultFolderException(e.getMessage() + "; use --force to replace it", e);
        }
      }
      if (!force) {
        refuseForeign(abs, starting, earlier);
      }
    } else if (Files.exists(abs)) {
      throw new ResultFolderException(
          abs
              + ": found a file, expected a folder for the results (or a path that does not exist)");
    }
    ResultFolder folder =
        new ResultFolder(abs, starting, earlier.map(RunManifest::files).orElse(List.of()));
    try {
      Files.createDirectories(abs);
      deleteTree(folder.work);
      Files.createDirectories(folder.work);
      starting.writeTo(abs);
    } catch (IOException e) {
      throw unwritable(abs, e);
    }
    return folder;
  }

  /**
   * True when {@code target} holds an interrupted run of this case with a checkpoint to go on from;
   * false when there is nothing to go on from yet (no run there, or one that stopped before its
   * first checkpoint), so the run starts from the beginning.
   *
   * @throws ResultFolderException when the folder holds another case's run or a finished or failed
   *     one, which a resume must not overwrite
   */
  public static boolean canResume(Path target, RunManifest starting, String checkpointName) {
    Path abs = target.toAbsolutePath().normalize();
    Optional<RunManifest> earlier = RunManifest.readFrom(abs);
    if (earlier.isEmpty()) {
      return false;
    }
    checkSameInterruptedRun(abs, earlier.get(), starting);
    return Files.isDirectory(abs.resolve(STAGING))
        && Files.isRegularFile(abs.resolve(checkpointName));
  }

  private static void checkSameInterruptedRun(Path abs, RunManifest earlier, RunManifest starting) {
    if (!earlier.caseSha256().equals(starting.caseSha256())
        || !earlier.meshSha256().equals(starting.meshSha256())) {
      throw new ResultFolderException(
          abs
              + ": found the run of another case or mesh ("
              + earlier.caseFile()
              + "), expected an interrupted run of "
              + starting.caseFile()
              + "; run without --resume to start afresh");
    }
    if (earlier.status() != RunManifest.Status.RUNNING) {
      throw new ResultFolderException(
          abs
              + ": found a run that "
              + earlier.status().word()
              + ", expected an interrupted one; nothing to resume, run again without --resume");
    }
  }

  /**
   * Finishes a run that wrote all its results but was stopped while its report was being made: the
   * manifest (of this case and mesh) still says running, the staging folder is gone and the summary
   * is there. {@code completion} makes the report, then the manifest says finished with every file
   * of the folder but {@code leaveOut}.
   *
   * @return whether the folder was such a run (and is now finished)
   */
  public static boolean completeUnreported(
      Path target, RunManifest starting, Completion completion, Set<String> leaveOut) {
    Path abs = target.toAbsolutePath().normalize();
    Optional<RunManifest> earlier = RunManifest.readFrom(abs);
    if (earlier.isEmpty()
        || earlier.get().status() != RunManifest.Status.RUNNING
        || !earlier.get().caseSha256().equals(starting.caseSha256())
        || !earlier.get().meshSha256().equals(starting.meshSha256())
        || Files.isDirectory(abs.resolve(STAGING))
        || !Files.isRegularFile(abs.resolve(ResultFiles.SUMMARY))) {
      return false;
    }
    try {
      List<String> files = new ArrayList<>();
      try (Stream<Path> all = Files.walk(abs)) {
        for (Path p : all.filter(Files::isRegularFile).sorted().toList()) {
          String name = abs.relativize(p).toString().replace('\\', '/');
          if (!name.equals(RunManifest.FILE)
              && !name.equals(FolderLock.NAME)
              && !leaveOut.contains(name)) {
            files.add(name);
          }
        }
      }
      RunManifest finished =
          earlier.get().ended(RunManifest.Status.FINISHED, Optional.empty(), files);
      for (String f : completion.complete(abs, finished)) {
        if (!files.contains(f)) {
          files.add(f);
        }
      }
      earlier.get().ended(RunManifest.Status.FINISHED, Optional.empty(), files).writeTo(abs);
    } catch (IOException e) {
      throw unwritable(abs, e);
    }
    return true;
  }

  /**
   * Reopens the folder of an interrupted run of the same case to go on from its checkpoint: the
   * staged files stay, the manifest says running again.
   *
   * @throws ResultFolderException when the folder holds no interrupted run of this case (no
   *     manifest, another case or mesh, a finished or failed run, or no checkpoint yet)
   */
  public static ResultFolder reopen(Path target, RunManifest starting, String checkpointName) {
    Path abs = target.toAbsolutePath().normalize();
    RunManifest earlier =
        RunManifest.readFrom(abs)
            .orElseThrow(
                () ->
                    new ResultFolderException(
                        abs + ": found no run to resume (no " + RunManifest.FILE + ")"));
    checkSameInterruptedRun(abs, earlier, starting);
    if (!Files.isDirectory(abs.resolve(STAGING))
        || !Files.isRegularFile(abs.resolve(checkpointName))) {
      throw new ResultFolderException(
          abs
              + ": found no checkpoint, expected "
              + checkpointName
              + " (the run stopped before its first one); run again without --resume");
    }
    ResultFolder folder = new ResultFolder(abs, starting, earlier.files());
    try {
      starting.writeTo(abs);
    } catch (IOException e) {
      throw unwritable(abs, e);
    }
    return folder;
  }

  private static void refuseForeign(Path abs, RunManifest starting, Optional<RunManifest> earlier) {
    if (earlier.isPresent()) {
      RunManifest m = earlier.get();
      if (!m.caseSha256().equals(starting.caseSha256())) {
        throw new ResultFolderException(
            abs
                + ": found the results of another case ("
                + m.caseFile()
                + ", SHA-256 "
                + m.caseSha256().substring(0, 12)
                + "…, "
                + m.status().word()
                + "), expected results of "
                + starting.caseFile()
                + " or an empty folder; use --force to replace them, or choose another --out");
      }
      return;
    }
    try (Stream<Path> s = Files.list(abs)) {
      if (s.anyMatch(p -> !p.getFileName().toString().equals(FolderLock.NAME))) {
        throw new ResultFolderException(
            abs
                + ": found a folder that is not empty and holds no "
                + RunManifest.FILE
                + ", expected a Soakfield result folder or an empty folder; use --force to write"
                + " into it anyway, or choose another --out");
      }
    } catch (IOException e) {
      throw unwritable(abs, e);
    }
  }

  public static ResultFolderException unwritable(Path folder, IOException e) {
    String reason = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
    return new ResultFolderException(
        folder
            + ": cannot write the results ("
            + e.getClass().getSimpleName()
            + ": "
            + reason
            + "), expected a folder that can be written and a disk with room",
        e);
  }

  /** Where files are written while the run goes on (a hidden folder inside {@link #target}). */
  public Path work() {
    return work;
  }

  /** The folder the results end up in. */
  public Path target() {
    return target;
  }

  /** The manifest as last written. */
  public RunManifest manifest() {
    return manifest;
  }

  /** Moves every staged file into place and marks the run finished. */
  public void finish() {
    finish(Completion.NONE);
  }

  /**
   * What is made of a run's results in its folder before the folder says finished: the report and
   * pictures. It gets the folder (all result files in place, the manifest still saying running) and
   * the manifest the folder is about to get, and returns the names of the files it wrote.
   */
  @FunctionalInterface
  public interface Completion {
    Completion NONE = (folder, finished) -> List.of();

    List<String> complete(Path folder, RunManifest finished) throws IOException;
  }

  /**
   * Moves the results into place, lets {@code completion} make the report of them, and only then
   * writes the manifest that says finished: a run killed before that says running, not finished
   * without its report.
   */
  public void finish(Completion completion) {
    try {
      List<String> files = new ArrayList<>(moveStaged());
      dropEarlier(files);
      RunManifest finished = manifest.ended(RunManifest.Status.FINISHED, Optional.empty(), files);
      for (String f : completion.complete(target, finished)) {
        if (!files.contains(f)) {
          files.add(f);
        }
      }
      manifest = manifest.ended(RunManifest.Status.FINISHED, Optional.empty(), files);
      manifest.writeTo(target);
    } catch (IOException e) {
      markFailed("writing the results failed: " + e.getMessage(), false);
      throw unwritable(target, e);
    }
  }

  /**
   * Marks the run failed with {@code message}. With {@code keepStaged} the staged files are
   * complete (the run stopped between writes) and move into place; without it (a write failed, so
   * one file may be cut short) they are dropped.
   */
  public void fail(String message, boolean keepStaged) {
    markFailed(message, keepStaged);
  }

  private void markFailed(String message, boolean keepStaged) {
    try {
      List<String> files = List.of();
      if (keepStaged) {
        files = moveStaged();
        dropEarlier(files);
      } else {
        deleteTree(work);
        files = stillThere(earlierFiles);
      }
      manifest = manifest.ended(RunManifest.Status.FAILED, Optional.of(message), files);
      manifest.writeTo(target);
    } catch (IOException e) {
      // the manifest keeps saying "running" (never "finished"); the caller reports the first error
    }
  }

  private List<String> stillThere(List<String> names) {
    List<String> out = new ArrayList<>();
    for (String n : names) {
      if (Files.isRegularFile(target.resolve(n))) {
        out.add(n);
      }
    }
    return out;
  }

  private List<String> moveStaged() throws IOException {
    List<String> names = new ArrayList<>();
    if (!Files.isDirectory(work)) {
      return names;
    }
    List<Path> staged;
    try (Stream<Path> s = Files.walk(work)) {
      staged = s.filter(Files::isRegularFile).sorted().toList();
    }
    for (Path p : staged) {
      String name = work.relativize(p).toString().replace('\\', '/');
      if (name.endsWith(".part")) {
        continue; // an atomic write cut short: not a result
      }
      Path to = target.resolve(name);
      Files.createDirectories(to.getParent());
      move(p, to);
      names.add(name);
    }
    deleteTree(work);
    return names;
  }

  /** Removes the earlier run's files this run did not replace (stale frames, old logs). */
  private void dropEarlier(List<String> kept) throws IOException {
    Set<String> keep = new HashSet<>(kept);
    Path root = target.toAbsolutePath().normalize();
    for (String name : earlierFiles) {
      Path earlier = root.resolve(name).normalize();
      // the manifest reader refuses names outside the folder; this keeps a delete inside it anyway
      if (!keep.contains(name) && earlier.startsWith(root) && !earlier.equals(root)) {
        Files.deleteIfExists(earlier);
      }
    }
  }

  private static void move(Path from, Path to) throws IOException {
    try {
      Files.move(from, to, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
    } catch (AtomicMoveNotSupportedException e) {
      Files.move(from, to, StandardCopyOption.REPLACE_EXISTING);
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
