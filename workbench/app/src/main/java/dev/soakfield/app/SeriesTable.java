package dev.soakfield.app;

import dev.soakfield.mesh.MeshInputException;
import java.io.BufferedReader;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/** A run's series.csv: named columns of numbers, found by name (new columns may appear). */
public final class SeriesTable {
  private final List<String> names;
  private final double[][] columns;

  private SeriesTable(List<String> names, double[][] columns) {
    this.names = List.copyOf(names);
    this.columns = columns;
  }

  /**
   * Reads the file.
   *
   * @throws MeshInputException when a row has the wrong number of cells or a cell is no number
   */
  public static SeriesTable read(Path file) {
    try (BufferedReader r = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
      String header = r.readLine();
      if (header == null || header.isBlank()) {
        throw new MeshInputException(file.toString(), "line 1", "no header", "column names");
      }
      List<String> names = Arrays.asList(header.strip().split(",", -1));
      List<double[]> rows = new ArrayList<>();
      String line;
      int no = 1;
      while ((line = r.readLine()) != null) {
        no++;
        if (line.isBlank()) {
          continue;
        }
        String[] cells = line.split(",", -1);
        if (cells.length != names.size()) {
          throw new MeshInputException(
              file.toString(),
              "line " + no,
              cells.length + " cells",
              names.size() + " cells, one for each column of the header");
        }
        double[] row = new double[cells.length];
        for (int i = 0; i < cells.length; i++) {
          try {
            row[i] = Double.parseDouble(cells[i].strip());
          } catch (NumberFormatException e) {
            throw new MeshInputException(
                file.toString(),
                "line " + no + ", column '" + names.get(i) + "'",
                "'" + cells[i] + "'",
                "a number");
          }
        }
        rows.add(row);
      }
      double[][] cols = new double[names.size()][rows.size()];
      for (int j = 0; j < rows.size(); j++) {
        for (int i = 0; i < names.size(); i++) {
          cols[i][j] = rows.get(j)[i];
        }
      }
      return new SeriesTable(names, cols);
    } catch (IOException e) {
      throw new MeshInputException(
          file.toString(), "", "an unreadable file (" + e.getMessage() + ")", "series.csv");
    }
  }

  public List<String> names() {
    return names;
  }

  public int rowCount() {
    return columns.length == 0 ? 0 : columns[0].length;
  }

  public boolean has(String name) {
    return names.contains(name);
  }

  /**
   * A copy of the column of that name.
   *
   * @throws IllegalArgumentException when there is no such column, naming those there are
   */
  public double[] column(String name) {
    int i = names.indexOf(name);
    if (i < 0) {
      throw new IllegalArgumentException("no column '" + name + "' in series.csv: " + names);
    }
    return columns[i].clone();
  }

  /** Names of the columns that start with {@code prefix}, with the prefix removed. */
  public List<String> suffixes(String prefix) {
    List<String> out = new ArrayList<>();
    for (String n : names) {
      if (n.startsWith(prefix)) {
        out.add(n.substring(prefix.length()));
      }
    }
    return out;
  }
}
