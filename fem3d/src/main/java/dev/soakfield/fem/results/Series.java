package dev.soakfield.fem.results;

import dev.soakfield.mesh.AtomicFiles;
import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * {@code series.csv} read back, the one reader of it: columns found by name, so columns added later
 * are carried along. Cells hold numbers ("NaN" included); an empty cell is a missing value and
 * reads as NaN; anything else is an error that names the file, the line and the column.
 */
public final class Series {
  private final List<String> names;
  private final double[][] columns;

  private Series(List<String> names, double[][] columns) {
    this.names = List.copyOf(names);
    this.columns = columns;
  }

  /**
   * Reads {@code file}.
   *
   * @throws ResultFolderException when the file cannot be read, a row's cells do not match the
   *     header, or a cell is no number (file, line, column, what was found and what was expected)
   */
  public static Series read(Path file) {
    List<String> lines;
    try {
      lines = Files.readAllLines(file, StandardCharsets.UTF_8);
    } catch (IOException e) {
      throw new ResultFolderException(
          file + ": found an unreadable file (" + e.getMessage() + "), expected a series table", e);
    }
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
        row[c] = parse(file, i + 1, names.get(c), cells.get(c));
      }
      rows.add(row);
    }
    double[][] columns = new double[names.size()][rows.size()];
    for (int r = 0; r < rows.size(); r++) {
      for (int c = 0; c < names.size(); c++) {
        columns[c][r] = rows.get(r)[c];
      }
    }
    return new Series(names, columns);
  }

  private static double parse(Path file, int line, String column, String cell) {
    if (cell.isBlank()) {
      return Double.NaN;
    }
    try {
      return Double.parseDouble(cell.strip());
    } catch (NumberFormatException e) {
      throw new ResultFolderException(
          file
              + ", line "
              + line
              + ", column '"
              + column
              + "': found '"
              + cell
              + "', expected a number");
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

  /** True when the table has a column called {@code name}. */
  public boolean has(String name) {
    return names.contains(name);
  }

  /**
   * The column called {@code name}, a copy, for callers that cannot go on without it.
   *
   * @throws ResultFolderException when there is no such column, naming those there are
   */
  public double[] require(String name) {
    return column(name)
        .orElseThrow(
            () ->
                new ResultFolderException(
                    "series.csv: found no column '" + name + "', expected one of " + names));
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

  /** The column name with its unit, for a run that declared no units. */
  public static String withUnit(String name) {
    return ResultUnits.UNDECLARED.label(name);
  }

  /**
   * Copies series.csv to {@code csv} with each column's unit in its header; returns the rows.
   *
   * @throws ResultFolderException when a cell of the series is no number (line and column)
   */
  public static int copyWithUnits(Path series, Path csv) throws IOException {
    return copyWithUnits(series, csv, ResultUnits.UNDECLARED);
  }

  /**
   * Copies series.csv to {@code csv} with each column's unit (in {@code units}) in its header.
   *
   * @throws ResultFolderException when a cell of the series is no number (line and column)
   */
  public static int copyWithUnits(Path series, Path csv, ResultUnits units) throws IOException {
    Series.read(series); // a bad cell is refused here, with its line and column, before writing
    List<String> lines = Files.readAllLines(series, StandardCharsets.UTF_8);
    List<String> header = Series.split(lines.get(0));
    List<String> named = new ArrayList<>();
    for (String h : header) {
      String u = units.label(h);
      named.add(u.contains(",") || u.contains("\"") ? "\"" + u.replace("\"", "\"\"") + "\"" : u);
    }
    AtomicFiles.write(
        csv,
        f -> {
          try (Writer w = Files.newBufferedWriter(f, StandardCharsets.UTF_8)) {
            w.write(String.join(",", named));
            w.write('\n');
            for (int i = 1; i < lines.size(); i++) {
              w.write(lines.get(i));
              w.write('\n');
            }
          }
        });
    return lines.size() - 1;
  }
}
