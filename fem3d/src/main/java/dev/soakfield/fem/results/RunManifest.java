package dev.soakfield.fem.results;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.soakfield.mesh.AtomicFiles;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;

/**
 * {@code manifest.json} of a result folder: which case and mesh (by SHA-256) made the results, with
 * which tool version, when, whether the run is running, finished or failed (and why), and which
 * files it wrote.
 *
 * @param caseFile the case file, absolute
 * @param caseSha256 SHA-256 of the case file's bytes
 * @param meshFile the mesh file, absolute
 * @param meshSha256 SHA-256 of the mesh file's bytes
 * @param toolVersion the Soakfield version that ran
 * @param started ISO-8601 instant the run started
 * @param ended ISO-8601 instant the run ended, empty while it runs
 * @param status running, finished or failed
 * @param message why the run failed, empty otherwise
 * @param files the files of the run, relative to the folder, '/'-separated
 */
public record RunManifest(
    Path caseFile,
    String caseSha256,
    Path meshFile,
    String meshSha256,
    String toolVersion,
    String started,
    Optional<String> ended,
    Status status,
    Optional<String> message,
    List<String> files) {
  /** The file name inside a result folder. */
  public static final String FILE = ResultFiles.MANIFEST;

  /** Where a run stands. */
  public enum Status {
    RUNNING,
    FINISHED,
    FAILED;

    /** The word in the manifest. */
    public String word() {
      return name().toLowerCase(Locale.ROOT);
    }
  }

  public RunManifest {
    Objects.requireNonNull(caseFile, "caseFile");
    Objects.requireNonNull(caseSha256, "caseSha256");
    Objects.requireNonNull(meshFile, "meshFile");
    Objects.requireNonNull(meshSha256, "meshSha256");
    Objects.requireNonNull(toolVersion, "toolVersion");
    Objects.requireNonNull(started, "started");
    Objects.requireNonNull(ended, "ended");
    Objects.requireNonNull(status, "status");
    Objects.requireNonNull(message, "message");
    files = List.copyOf(files);
  }

  /** A manifest for a run starting now. */
  public static RunManifest starting(Path caseFile, Path meshFile, String toolVersion)
      throws IOException {
    Path c = caseFile.toAbsolutePath().normalize();
    Path m = meshFile.toAbsolutePath().normalize();
    return new RunManifest(
        c,
        FileHashes.sha256(c),
        m,
        FileHashes.sha256(m),
        toolVersion,
        Instant.now().toString(),
        Optional.empty(),
        Status.RUNNING,
        Optional.empty(),
        List.of());
  }

  /** This manifest ended now with {@code status}, listing {@code files}. */
  public RunManifest ended(Status status, Optional<String> message, List<String> files) {
    return new RunManifest(
        caseFile,
        caseSha256,
        meshFile,
        meshSha256,
        toolVersion,
        started,
        Optional.of(Instant.now().toString()),
        status,
        message,
        files);
  }

  /** This manifest with {@code more} files added (the report, written after the run). */
  public RunManifest withFiles(List<String> more) {
    List<String> all = new ArrayList<>(files);
    for (String f : more) {
      if (!all.contains(f)) {
        all.add(f);
      }
    }
    return new RunManifest(
        caseFile,
        caseSha256,
        meshFile,
        meshSha256,
        toolVersion,
        started,
        ended,
        status,
        message,
        all);
  }

  /** Writes {@code manifest.json} into {@code folder}, atomically. */
  public void writeTo(Path folder) throws IOException {
    ObjectNode root = new ObjectMapper().createObjectNode();
    root.put("format", 1);
    root.put("case", caseFile.toString());
    root.put("case_sha256", caseSha256);
    root.put("mesh", meshFile.toString());
    root.put("mesh_sha256", meshSha256);
    root.put("tool_version", toolVersion);
    root.put("started", started);
    if (ended.isPresent()) {
      root.put("ended", ended.get());
    } else {
      root.putNull("ended");
    }
    root.put("status", status.word());
    if (message.isPresent()) {
      root.put("message", message.get());
    }
    ArrayNode list = root.putArray("files");
    files.forEach(list::add);
    ObjectMapper mapper = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
    AtomicFiles.write(folder.resolve(FILE), f -> mapper.writeValue(f.toFile(), root));
  }

  /**
   * The manifest of {@code folder}; empty when it has none.
   *
   * @throws ResultFolderException when the manifest is there but not one Soakfield wrote
   */
  public static Optional<RunManifest> readFrom(Path folder) {
    Path file = folder.resolve(FILE);
    if (!Files.isRegularFile(file)) {
      return Optional.empty();
    }
    try {
      JsonNode root = new ObjectMapper().readTree(file.toFile());
      List<String> files = new ArrayList<>();
      int index = 0;
      for (JsonNode n : root.path("files")) {
        files.add(insideName(file, index++, n.asText()));
      }
      return Optional.of(
          new RunManifest(
              Path.of(text(root, "case", file)),
              text(root, "case_sha256", file),
              Path.of(text(root, "mesh", file)),
              text(root, "mesh_sha256", file),
              text(root, "tool_version", file),
              text(root, "started", file),
              optionalText(root, "ended"),
              status(root, file),
              optionalText(root, "message"),
              files));
    } catch (IOException e) {
      throw new ResultFolderException(
          file + ": found a manifest that is not valid JSON (" + e.getMessage() + ")", e);
    }
  }

  /**
   * A file entry as a name inside the folder ("fields/c_0001.vtu"). A later run deletes the files
   * of an earlier one it does not replace, so an entry that leaves the folder (absolute, "..", a
   * drive) is refused, never followed.
   */
  private static String insideName(Path file, int index, String name) {
    boolean inside;
    try {
      Path p = Path.of(name);
      inside =
          !name.isEmpty()
              && !p.isAbsolute()
              && p.getRoot() == null
              && !name.contains("\\")
              && p.normalize().equals(p)
              && !p.startsWith("..");
    } catch (java.nio.file.InvalidPathException e) {
      inside = false;
    }
    if (!inside) {
      throw new ResultFolderException(
          file
              + ": files["
              + index
              + "] is '"
              + name
              + "', expected a name inside the folder; this folder is not written (remove the"
              + " entry, or give another --out)");
    }
    return name;
  }

  private static String text(JsonNode root, String key, Path file) {
    JsonNode n = root.get(key);
    if (n == null || !n.isTextual()) {
      throw new ResultFolderException(
          file + ": found no text key '" + key + "', expected a Soakfield result manifest");
    }
    return n.asText();
  }

  private static Optional<String> optionalText(JsonNode root, String key) {
    JsonNode n = root.get(key);
    return n == null || !n.isTextual() ? Optional.empty() : Optional.of(n.asText());
  }

  private static Status status(JsonNode root, Path file) {
    String word = text(root, "status", file);
    for (Status s : Status.values()) {
      if (s.word().equals(word)) {
        return s;
      }
    }
    throw new ResultFolderException(
        file + ": found status '" + word + "', expected running, finished or failed");
  }
}
