package dev.soakfield.report;

import dev.soakfield.fem.run.ResultFolderException;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * {@code series.csv} read back: columns found by name, so columns added later are carried along.
 * Cells hold numbers; an empty or non-numeric cell reads as NaN.
 */
public final class SeriesCsv {
  private final List<String> names;
  private final double[][] columns;

  private SeriesCsv(List<String> names, double[][] columns) {
    this.names = List.copyOf(names);
    this.columns = columns;
  }

  /**
   * Reads {@code file}.
   *
   * @throws ResultFolderException when a row's cells do not match the header (file and line)
   */
  public static SeriesCsv read(Path file) throws IOException {
    List<String> lines = Files.readAllLines(file, StandardCharsets.UTF_8);
    if (lines.isEmpty()) {
      throw new ResultFolderException(file + ": found an empty file, expected a header line");
    }
    List<String> names = split(lines.get(0));
    List<double[]> rows = new ArrayList<>();
    for (int i = 1; i < lines.size(); i++) {
      String line = lines.get(i);
      if (line.isBlank()) {
        continue;
      }
      List<String> cells = split(line);
      if (cells.size() != names.size()) {
        throw new ResultFolderException(
            file
                + ", line "
                + (i + 1)
                + ": found "
                + cells.size()
                + " cells, expected "
                + names.size()
                + " as in the header");
      }
      double[] row = new double[cells.size()];
      for (int c = 0; c < row.length; c++) {
        row[c] = parse(cells.get(c));
      }
      rows.add(row);
    }
    double[][] columns = new double[names.size()][rows.size()];
    for (int r = 0; r < rows.size(); r++) {
      for (int c = 0; c < names.size(); c++) {
        columns[c][r] = rows.get(r)[c];
      }
    }
    return new SeriesCsv(names, columns);
  }

  private static double parse(String cell) {
    try {
      return cell.isEmpty() ? Double.NaN : Double.parseDouble(cell);
    } catch (NumberFormatException e) {
      return Double.NaN;
    }
  }

  /** Splits one CSV line; a quoted cell may hold commas and doubled quotes. */
  public static List<String> split(String line) {
    List<String> cells = new ArrayList<>();
    StringBuilder cell = new StringBuilder();
    boolean quoted = false;
    for (int i = 0; i < line.length(); i++) {
      char ch = line.charAt(i);
      if (quoted) {
        if (ch == '"' && i + 1 < line.length() && line.charAt(i + 1) == '"') {
          cell.append('"');
          i++;
        } else if (ch == '"') {
          quoted = false;
        } else {
          cell.append(ch);
        }
      } else if (ch == '"') {
        quoted = true;
      } else if (ch == ',') {
        cells.add(cell.toString());
        cell.setLength(0);
      } else {
        cell.append(ch);
      }
    }
    cells.add(cell.toString());
    return cells;
  }

  /** Column names in file order. */
  public List<String> names() {
    return names;
  }

  /** Number of data rows. */
  public int rows() {
    return columns.length == 0 ? 0 : columns[0].length;
  }

  /** The column called {@code name}, a copy. */
  public Optional<double[]> column(String name) {
    int i = names.indexOf(name);
    return i < 0 ? Optional.empty() : Optional.of(columns[i].clone());
  }

  /** Names of the columns starting with {@code prefix} (e.g. "probe:"), prefix removed. */
  public List<String> suffixes(String prefix) {
    List<String> out = new ArrayList<>();
    for (String n : names) {
      if (n.startsWith(prefix)) {
        out.add(n.substring(prefix.length()));
      }
    }
    return out;
  }

  /** The last value of column {@code name}, NaN when there is no such column or no row. */
  public double last(String name) {
    Optional<double[]> c = column(name);
    return c.isEmpty() || c.get().length == 0 ? Double.NaN : c.get()[c.get().length - 1];
  }

  /** The largest value of column {@code name} (NaN cells skipped). */
  public double max(String name) {
    double m = Double.NaN;
    for (double v : column(name).orElse(new double[0])) {
      if (!Double.isNaN(v) && (Double.isNaN(m) || v > m)) {
        m = v;
      }
    }
    return m;
  }
}
