package dev.soakfield.fem.results;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/**
 * {@code series.csv} written as the run goes: a header, then one row of numbers per step; {@link
 * Series} reads it back.
 */
public final class SeriesWriter implements AutoCloseable {
  private final BufferedWriter out;
  private final int columns;
  private int rowCount;

  public SeriesWriter(Path file, List<String> header) throws IOException {
    this(file, header, -1);
  }

  /**
   * A table that goes on from a checkpoint: the file keeps its header and first {@code rows} rows
   * (what the checkpoint saw) and later rows are appended; {@code rows} = −1 starts afresh.
   */
  public SeriesWriter(Path file, List<String> header, int rows) throws IOException {
    columns = header.size();
    if (rows >= 0) {
      List<String> lines = Files.readAllLines(file, StandardCharsets.UTF_8);
      String expected = String.join(",", header.stream().map(SeriesWriter::quote).toList());
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
  public void flush() throws IOException {
    out.flush();
  }

  private static String quote(String s) {
    return s.contains(",") || s.contains("\"") ? "\"" + s.replace("\"", "\"\"") + "\"" : s;
  }

  /** Rows written so far, the header not counted. */
  public int rows() {
    return rowCount;
  }

  public void row(double[] values) throws IOException {
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
