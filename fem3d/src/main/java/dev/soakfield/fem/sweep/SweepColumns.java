package dev.soakfield.fem.sweep;

/** How sweep tables spell times in column names and numbers in cells. */
final class SweepColumns {
  private SweepColumns() {}

  /** A time in seconds as a column suffix: {@code 3600}, {@code 0.5}. */
  static String time(double seconds) {
    if (seconds == Math.rint(seconds) && Math.abs(seconds) < 1e15) {
      return Long.toString((long) seconds);
    }
    return Double.toString(seconds);
  }

  /** A number in a cell: the shortest text that reads back to the same double; empty for NaN. */
  static String number(double v) {
    return Double.isNaN(v) ? "" : Double.toString(v);
  }
}
