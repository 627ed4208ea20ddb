package dev.soakfield.fem.run;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/**
 * One column of a series.csv against time, found by its header name.
 *
 * @param times the time column, s
 * @param values the named column
 */
@SuppressWarnings("ArrayRecordComponent") // read once and handed over
public record SeriesColumn(double[] times, double[] values) {
  /**
   * Reads a column.
   *
   * @throws IOException when the file cannot be read or has no such column (the message names both)
   */
  public static SeriesColumn read(Path csv, String column) throws IOException {
    List<String> lines = Files.readAllLines(csv);
    if (lines.isEmpty()) {
      throw new IOException(csv + ": empty series");
    }
    List<String> header = List.of(lines.get(0).split(",", -1));
    int c = header.indexOf(column);
    int t = header.indexOf("time");
    if (c < 0 || t < 0) {
      throw new IOException(csv + ": found no column '" + column + "', expected one of " + header);
    }
    int n = lines.size() - 1;
    double[] times = new double[n];
    double[] values = new double[n];
    for (int i = 0; i < n; i++) {
      String[] v = lines.get(i + 1).split(",", -1);
      times[i] = Double.parseDouble(v[t]);
      values[i] = v[c].isEmpty() ? Double.NaN : Double.parseDouble(v[c]);
    }
    return new SeriesColumn(times, values);
  }
}
