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

  SeriesTable(Path file, List<String> header) throws IOException {
    out = Files.newBufferedWriter(file, StandardCharsets.UTF_8);
    columns = header.size();
    for (int i = 0; i < header.size(); i++) {
      if (i > 0) {
        out.write(',');
      }
      out.write(quote(header.get(i)));
    }
    out.write('\n');
  }

  private static String quote(String s) {
    return s.contains(",") || s.contains("\"") ? "\"" + s.replace("\"", "\"\"") + "\"" : s;
  }

  void row(double[] values) throws IOException {
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
