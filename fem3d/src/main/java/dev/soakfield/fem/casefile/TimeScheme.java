package dev.soakfield.fem.casefile;

/** The time-integration scheme of a case ({@code time.scheme}). */
public enum TimeScheme {
  BACKWARD_EULER("backward-euler", 1.0),
  CRANK_NICOLSON("crank-nicolson", 0.5);

  private final String word;
  private final double theta;

  TimeScheme(String word, double theta) {
    this.word = word;
    this.theta = theta;
  }

  /** The spelling in a case file. */
  public String word() {
    return word;
  }

  /** The weight of the new time level in the theta scheme. */
  public double theta() {
    return theta;
  }
}
