package dev.soakfield.app.setup;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.soakfield.fem.casefile.CaseInputException;
import dev.soakfield.fem.casefile.CaseReader;
import dev.soakfield.mesh.AtomicFiles;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * A material library: a JSON file of our own where users keep measured materials, each with a note,
 * where its values came from, and the material in the case file's own keys, so an entry goes into a
 * case as it is. Every entry is checked by the case reader when the library is read.
 *
 * <pre>
 * { "soakfield-material-library": 1,
 *   "materials": { "NAME": { "note": "...", "source": "...",
 *                            "material": { "diffusivity": ..., "solubility": ... } } } }
 * </pre>
 */
public final class MaterialLibrary {
  /** The format's version key and number. */
  public static final String FORMAT = "soakfield-material-library";

  /** The user's own library, beside the recent list. */
  public static Path ofUser() {
    return Path.of(System.getProperty("user.home"), ".soakfield", "materials.json");
  }

  /**
   * One material of a library.
   *
   * @param name its name in the library
   * @param note what it is (the shipped entries say they are examples)
   * @param source where its values come from
   * @param material the case file's material entry
   */
  public record Entry(String name, String note, String source, ObjectNode material) {}

  private static final ObjectMapper JSON = new ObjectMapper();

  private MaterialLibrary() {}

  /** The examples shipped with the application. */
  public static List<Entry> examples() {
    try (InputStream in =
        MaterialLibrary.class.getResourceAsStream("/materials/example-library.json")) {
      if (in == null) {
        throw new IllegalStateException("the example material library is missing from the jar");
      }
      return parse(new String(in.readAllBytes(), StandardCharsets.UTF_8), "example-library.json");
    } catch (IOException e) {
      throw new IllegalStateException("the example material library cannot be read", e);
    }
  }

  /**
   * Reads a library file; a missing file is an empty library.
   *
   * @throws CaseInputException naming the file, the key path and what was expected
   */
  public static List<Entry> read(Path file) throws IOException {
    if (!Files.exists(file)) {
      return List.of();
    }
    return parse(Files.readString(file, StandardCharsets.UTF_8), file.toString());
  }

  static List<Entry> parse(String text, String source) {
    JsonNode root;
    try {
      root = JSON.readTree(text);
    } catch (JsonProcessingException e) {
      var at = e.getLocation();
      throw problem(
          source, at == null ? 0 : at.getLineNr(), "", "malformed JSON: " + e.getOriginalMessage());
    }
    if (root == null || root.path(FORMAT).asInt(0) != 1) {
      throw problem(source, 0, FORMAT, "found no version 1, expected a Soakfield material library");
    }
    List<Entry> out = new ArrayList<>();
    for (Map.Entry<String, JsonNode> e : root.path("materials").properties()) {
      String path = "materials." + e.getKey();
      if (!(e.getValue().path("material") instanceof ObjectNode material)) {
        throw problem(source, 0, path + ".material", "found none, expected the material's keys");
      }
      check(material, source, path + ".material");
      out.add(
          new Entry(
              e.getKey(),
              e.getValue().path("note").asText(""),
              e.getValue().path("source").asText(""),
              material));
    }
    return out;
  }

  /** Reads the entry as a case file's material: the same keys, units and ranges. */
  private static void check(ObjectNode material, String source, String path) {
    ObjectNode probe = JSON.createObjectNode();
    probe.put("mesh", "library.msh");
    probe.putObject("materials").set("m", material);
    probe.putObject("time").put("end", 1);
    try {
      CaseReader.readText(probe.toString(), Path.of("library.json"), source);
    } catch (CaseInputException e) {
      List<CaseInputException.Problem> moved = new ArrayList<>();
      for (CaseInputException.Problem p : e.problems()) {
        moved.add(
            new CaseInputException.Problem(
                0, 0, p.path().replaceFirst("^materials\\.m", path), p.message()));
      }
      throw new CaseInputException(source, moved);
    }
  }

  private static CaseInputException problem(String source, int line, String path, String message) {
    return new CaseInputException(
        source, List.of(new CaseInputException.Problem(line, 0, path, message)));
  }

  /** Writes the library (complete before it takes the file's name), newest entries last. */
  public static void write(Path file, List<Entry> entries) throws IOException {
    ObjectNode root = JSON.createObjectNode();
    root.put(FORMAT, 1);
    ObjectNode materials = root.putObject("materials");
    for (Entry e : entries) {
      ObjectNode o = materials.putObject(e.name());
      o.put("note", e.note());
      o.put("source", e.source());
      o.set("material", e.material().deepCopy());
    }
    Files.createDirectories(file.toAbsolutePath().getParent());
    String text = JSON.writerWithDefaultPrettyPrinter().writeValueAsString(root) + "\n";
    AtomicFiles.write(file, f -> Files.writeString(f, text, StandardCharsets.UTF_8));
  }

  /** Adds or replaces {@code entry} in the library file. */
  public static void keep(Path file, Entry entry) throws IOException {
    List<Entry> all = new ArrayList<>(read(file));
    all.removeIf(e -> e.name().equals(entry.name()));
    all.add(entry);
    write(file, all);
  }
}
