package dev.soakfield.fem.sweep;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.soakfield.mesh.AtomicFiles;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The rows of a sweep's finished cases, one small JSON file each under {@code DIR/rows/}, written
 * durably (temporary file, forced to the disk, renamed), so that a sweep stopped at any moment
 * keeps every case it finished and a rerun runs only the others.
 */
public final class RowStore {
  public static final String FOLDER = "rows";

  private final Path folder;

  public RowStore(Path sweepFolder) {
    this.folder = sweepFolder.resolve(FOLDER);
  }

  public void write(CaseRow row) throws IOException {
    ObjectNode n = SweepFile.JSON.createObjectNode();
    n.put("case", row.id());
    ArrayNode values = n.putArray("values");
    row.values().forEach(values::add);
    ObjectNode outputs = n.putObject("outputs");
    for (int i = 0; i < row.names().size(); i++) {
      double v = row.numbers().get(i);
      if (Double.isNaN(v)) {
        outputs.putNull(row.names().get(i));
      } else {
        outputs.put(row.names().get(i), v);
      }
    }
    n.put("status", row.status());
    n.put("seconds", row.seconds());
    byte[] bytes = SweepFile.JSON.writerWithDefaultPrettyPrinter().writeValueAsBytes(n);
    AtomicFiles.writeDurably(file(row.id()), f -> Files.write(f, bytes));
  }

  /** The stored row of case {@code c}, when there is one for the same values. */
  public Optional<CaseRow> read(PlannedCase c) throws IOException {
    Path f = file(c.id());
    if (!Files.isRegularFile(f)) {
      return Optional.empty();
    }
    JsonNode n = SweepFile.readJson(f, "a row of this sweep");
    List<String> values = new ArrayList<>();
    n.path("values").forEach(v -> values.add(v.asText()));
    if (!values.equals(c.values())) {
      return Optional.empty(); // another sweep's row: the plan check normally catches this first
    }
    List<String> names = new ArrayList<>();
    List<Double> numbers = new ArrayList<>();
    for (Map.Entry<String, JsonNode> e : n.path("outputs").properties()) {
      names.add(e.getKey());
      numbers.add(e.getValue().isNumber() ? e.getValue().asDouble() : Double.NaN);
    }
    return Optional.of(
        new CaseRow(
            c.id(),
            values,
            names,
            numbers,
            n.path("status").asText(),
            n.path("seconds").asDouble()));
  }

  /** Removes every stored row (a sweep replaced with --force). */
  public void clear() throws IOException {
    CaseRunner.deleteTree(folder);
  }

  private Path file(String id) {
    return folder.resolve(id + ".json");
  }
}
