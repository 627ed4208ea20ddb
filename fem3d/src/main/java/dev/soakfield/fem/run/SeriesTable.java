package dev.soakfield.fem.run;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/** {@code series.csv}: a header, then one row of numbers per step, written as the run goes. */
final class SeriesTable implements AutoCloseable {
  private final BufferedWriter out;
  private final int columns;
  private int rowCount;

  SeriesTable(Path file, List<String> header) throws IOException {
    this(file, header, -1);
  }

  /**
   * A table that goes on from a checkpoint: the file keeps its header and first {@code rows} rows
   * (what the checkpoint saw) and later rows are appended; {@code rows} = −1 starts afresh.
   */
  SeriesTable(Path file, List<String> header, int rows) throws IOException {
    columns = header.size();
    if (rows >= 0) {
      List<String> lines = Files.readAllLines(file, StandardCharsets.UTF_8);
      String expected = String.join(",", header.stream().map(SeriesTable::quote).toList());
      if (lines.size() < rows + 1 || !lines.get(0).equals(expected)) {
        throw new IOException(
            file
                + ": holds "
                + (lines.size() - 1)
                + " rows of another table, expected at least "
                + rows
                + " rows of this run's columns");
      }
      List<String> kept = lines.subList(0, rows + 1);
      Files.write(file, kept, StandardCharsets.UTF_8);
      rowCount = rows;
      out =
          Files.newBufferedWriter(
              file, StandardCharsets.UTF_8, java.nio.file.StandardOpenOption.APPEND);
      return;
    }
    out = Files.newBufferedWriter(file, StandardCharsets.UTF_8);
    for (int i = 0; i < header.size(); i++) {
      if (i > 0) {
        out.write(',');
      }
      out.write(quote(header.get(i)));
    }
    out.write('\n');
  }

  /** Writes what is buffered through to the file (before a checkpoint counts its rows). */
  void flush() throws IOException {
    out.flush();
  }

  private static String quote(String s) {
    return s.contains(",") || s.contains("\"") ? "\"" + s.replace("\"", "\"\"") + "\"" : s;
  }

  /** Rows written so far, the header not counted. */
  int rows() {
    return rowCount;
  }

  void row(double[] values) throws IOException {
    rowCount++;
    if (values.length != columns) {
      throw new IllegalArgumentException(values.length + " values for " + columns + " columns");
    }
    for (int i = 0; i < values.length; i++) {
      if (i > 0) {
        out.write(',');
      }
      out.write(Double.toString(values[i]));
    }
    out.write('\n');
  }

  @Override
  public void close() throws IOException {
    out.close();
  }
}
