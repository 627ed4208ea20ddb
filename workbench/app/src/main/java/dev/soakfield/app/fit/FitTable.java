package dev.soakfield.app.fit;

import dev.soakfield.fem.units.SiValue;
import dev.soakfield.fem.units.UnitException;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.DoubleUnaryOperator;

/**
 * A two-column CSV of measurements for {@code soakfield fit}: a header such as {@code time [h],mass
 * [mg]} (units in brackets are optional; without them values are SI), then one row of two numbers
 * per measurement. Blank lines and lines starting with {@code #} are skipped. Every problem is a
 * {@link FitInputException} naming the file, the line, what was found and what was expected.
 */
final class FitTable {
  final Path file;
  final String firstName;
  final String secondName;
  final double[] x;
  final double[] y;
  final int[] lines;

  private FitTable(
      Path file, String firstName, String secondName, double[] x, double[] y, int[] lines) {
    this.file = file;
    this.firstName = firstName;
    this.secondName = secondName;
    this.x = x;
    this.y = y;
    this.lines = lines;
  }

  /** What one column must be called, and the SI unit its values are converted to. */
  static final class Column {
    final String siUnit;
    final String[] names;

    Column(String siUnit, String... names) {
      this.siUnit = siUnit;
      this.names = names.clone();
    }

    String describe() {
      return String.join(" or ", names);
    }
  }

  /**
   * Reads {@code file}; the header's first column must carry one of {@code first}'s names, the
   * second one of the names of one of {@code seconds} (the first match decides the unit).
   */
  static FitTable read(Path file, Column first, Column... seconds) {
    List<String> text;
    try {
      text = Files.readAllLines(file, StandardCharsets.UTF_8);
    } catch (java.nio.file.NoSuchFileException e) {
      throw new FitInputException(file + ": no such file");
    } catch (IOException e) {
      throw new FitInputException(file + ": cannot be read as UTF-8 text (" + e.getMessage() + ")");
    }
    int headerLine = -1;
    for (int i = 0; i < text.size(); i++) {
      if (!skipped(text.get(i))) {
        headerLine = i;
        break;
      }
    }
    if (headerLine < 0) {
      throw new FitInputException(
          file
              + ": found no header, expected a line such as '"
              + first.names[0]
              + ","
              + seconds[0].names[0]
              + "'");
    }
    String[] header = split(text.get(headerLine));
    int line = headerLine + 1;
    if (header.length != 2) {
      throw new FitInputException(
          place(file, line)
              + "found "
              + header.length
              + " columns in the header, expected 2 ("
              + first.describe()
              + ", then "
              + seconds[0].describe()
              + ")");
    }
    String[] c0 = nameAndUnit(header[0]);
    String[] c1 = nameAndUnit(header[1]);
    if (!matches(first, c0[0])) {
      throw new FitInputException(
          place(file, line)
              + "found first column '"
              + header[0].strip()
              + "', expected "
              + first.describe());
    }
    Column second = null;
    for (Column c : seconds) {
      if (matches(c, c1[0])) {
        second = c;
        break;
      }
    }
    if (second == null) {
      StringBuilder names = new StringBuilder();
      for (Column c : seconds) {
        names.append(names.length() == 0 ? "" : " or ").append(c.describe());
      }
      throw new FitInputException(
          place(file, line) + "found second column '" + header[1].strip() + "', expected " + names);
    }
    DoubleUnaryOperator conv0 = converter(file, line, c0, first.siUnit);
    DoubleUnaryOperator conv1 = converter(file, line, c1, second.siUnit);
    List<double[]> rows = new ArrayList<>();
    List<Integer> rowLines = new ArrayList<>();
    for (int i = headerLine + 1; i < text.size(); i++) {
      String row = text.get(i);
      if (skipped(row)) {
        continue;
      }
      String[] cells = split(row);
      if (cells.length != 2) {
        throw new FitInputException(
            place(file, i + 1)
                + "found "
                + cells.length
                + " values, expected 2 ("
                + header[0].strip()
                + ", "
                + header[1].strip()
                + ")");
      }
      double a = conv0.applyAsDouble(number(file, i + 1, cells[0], header[0]));
      double b = conv1.applyAsDouble(number(file, i + 1, cells[1], header[1]));
      rows.add(new double[] {a, b});
      rowLines.add(i + 1);
    }
    double[] x = new double[rows.size()];
    double[] y = new double[rows.size()];
    int[] lines = new int[rows.size()];
    for (int i = 0; i < x.length; i++) {
      x[i] = rows.get(i)[0];
      y[i] = rows.get(i)[1];
      lines[i] = rowLines.get(i);
    }
    return new FitTable(file, c0[0], c1[0], x, y, lines);
  }

  /** Checks that the first column strictly increases, naming the first row that does not. */
  void requireIncreasingFirstColumn() {
    for (int i = 1; i < x.length; i++) {
      if (!(x[i] > x[i - 1])) {
        throw new FitInputException(
            place(file, lines[i])
                + "found "
                + firstName
                + " "
                + x[i]
                + " (SI) after "
                + x[i - 1]
                + ", expected values that increase row by row");
      }
    }
  }

  /** Checks that there are at least {@code min} rows of data. */
  void requireRows(int min, String why) {
    if (x.length < min) {
      throw new FitInputException(
          file + ": found " + x.length + " rows of data, expected at least " + min + " " + why);
    }
  }

  static String place(Path file, int line) {
    return file + ": line " + line + ": ";
  }

  private static boolean skipped(String line) {
    String s = line.strip();
    return s.isEmpty() || s.startsWith("#");
  }

  private static String[] split(String line) {
    String[] cells = line.split(",", -1);
    for (int i = 0; i < cells.length; i++) {
      cells[i] = cells[i].strip();
    }
    return cells;
  }

  /** "time [h]" → {"time", "h"}; "time" → {"time", ""}. */
  private static String[] nameAndUnit(String cell) {
    String s = cell.strip();
    int open = s.indexOf('[');
    if (open >= 0 && s.endsWith("]")) {
      return new String[] {
        s.substring(0, open).strip().toLowerCase(Locale.ROOT), s.substring(open + 1, s.length() - 1)
      };
    }
    return new String[] {s.toLowerCase(Locale.ROOT), ""};
  }

  private static boolean matches(Column c, String name) {
    for (String n : c.names) {
      if (n.equals(name)) {
        return true;
      }
    }
    return false;
  }

  private static DoubleUnaryOperator converter(Path file, int line, String[] col, String siUnit) {
    try {
      return SiValue.converterTo(col[1], siUnit);
    } catch (UnitException e) {
      throw new FitInputException(
          place(file, line)
              + "column '"
              + col[0]
              + "': found "
              + e.found()
              + ", expected "
              + e.expected());
    }
  }

  private static double number(Path file, int line, String cell, String column) {
    try {
      double v = Double.parseDouble(cell);
      if (Double.isFinite(v)) {
        return v;
      }
    } catch (NumberFormatException e) {
      // reported below with the place
    }
    throw new FitInputException(
        place(file, line)
            + "found '"
            + cell
            + "' for "
            + column.strip()
            + ", expected a finite number");
  }
}
