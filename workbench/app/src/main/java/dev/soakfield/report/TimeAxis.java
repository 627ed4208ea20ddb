package dev.soakfield.report;

/** The unit of a time axis, chosen from the run's end time so the numbers stay readable. */
public enum TimeAxis {
  SECONDS("s", 1),
  MINUTES("min", 60),
  HOURS("h", 3600),
  DAYS("d", 86400);

  private final String unit;
  private final double seconds;

  TimeAxis(String unit, double seconds) {
    this.unit = unit;
    this.seconds = seconds;
  }

  /** The unit's symbol. */
  public String unit() {
    return unit;
  }

  /** Seconds in one unit. */
  public double seconds() {
    return seconds;
  }

  /** The largest unit of which the run spans at least two. */
  public static TimeAxis forEnd(double endSeconds) {
    TimeAxis best = SECONDS;
    for (TimeAxis a : values()) {
      if (endSeconds >= 2 * a.seconds) {
        best = a;
      }
    }
    return best;
  }
}
