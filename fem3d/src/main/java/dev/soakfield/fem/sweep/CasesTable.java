package dev.soakfield.fem.sweep;

import dev.soakfield.mesh.AtomicFiles;
import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

/**
 * {@code cases.csv}: a row per case in id order with the columns {@code case}, each varied key,
 * then the outputs ({@code amount@<time>}, {@code weight_gain_percent@<time>}, {@code
 * threshold:<name>}, {@code max:<part>}, {@code balance}) in the order the cases gave them, and
 * {@code status}. Numbers at full precision; an empty cell is a value the case does not have.
 */
public final class CasesTable {
  public static final String FILE = "cases.csv";

  private final List<String> keys;
  private final List<String> outputs;
  private final List<CaseRow> rows;

  public CasesTable(List<String> keys, List<CaseRow> rows) {
    this.keys = List.copyOf(keys);
    List<CaseRow> sorted = new ArrayList<>(rows);
    sorted.sort(Comparator.comparing(CaseRow::id));
    this.rows = List.copyOf(sorted);
    Set<String> names = new LinkedHashSet<>();
    for (CaseRow r : this.rows) {
      names.addAll(r.names());
    }
    this.outputs = List.copyOf(names);
  }

  public List<String> keys() {
    return keys;
  }

  /** The output columns (between the keys and status). */
  public List<String> outputs() {
    return outputs;
  }

  public List<CaseRow> rows() {
    return rows;
  }

  /** Every column, in the order of the file. */
  public List<String> header() {
    List<String> h = new ArrayList<>();
    h.add("case");
    h.addAll(keys);
    h.addAll(outputs);
    h.add("status");
    return h;
  }

  /** The cells of a row, as the file holds them. */
  public List<String> cells(CaseRow r) {
    List<String> c = new ArrayList<>();
    c.add(r.id());
    for (String v : r.values()) {
      c.add(value(v));
    }
    for (String o : outputs) {
      c.add(SweepColumns.number(r.value(o)));
    }
    c.add(r.status());
    return c;
  }

  /** A varied value's JSON text as a cell: numbers as numbers, strings without quotes. */
  static String value(String json) {
    try {
      var n = SweepFile.JSON.readTree(json);
      if (n.isNumber()) {
        return SweepColumns.number(n.asDouble());
      }
      return n.isTextual() ? n.asText() : json;
    } catch (IOException e) {
      return json;
    }
  }

  public void write(Path file) throws IOException {
    AtomicFiles.write(
        file,
        f -> {
          try (Writer w = Files.newBufferedWriter(f, StandardCharsets.UTF_8)) {
            w.write(line(header()));
            for (CaseRow r : rows) {
              w.write(line(cells(r)));
            }
          }
        });
  }

  private static String line(List<String> cells) {
    StringBuilder sb = new StringBuilder();
    for (int i = 0; i < cells.size(); i++) {
      sb.append(i > 0 ? "," : "").append(quote(cells.get(i)));
    }
    return sb.append('\n').toString();
  }

  /** RFC 4180: a cell with a comma, quote or line break is quoted, its quotes doubled. */
  static String quote(String cell) {
    if (cell.indexOf(',') < 0
        && cell.indexOf('"') < 0
        && cell.indexOf('\n') < 0
        && cell.indexOf('\r') < 0) {
      return cell;
    }
    return '"' + cell.replace("\"", "\"\"") + '"';
  }
}
