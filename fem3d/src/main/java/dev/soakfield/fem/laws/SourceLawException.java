package dev.soakfield.fem.laws;

/**
 * A source law that threw, or answered NaN or infinity: the run stops with a message naming the
 * law, where it came from, the material and the simulated time. A fault of the law's code, not of
 * the user's input, yet shown without a stack trace (the message carries the law's own frame).
 */
public final class SourceLawException extends RuntimeException {
  private static final long serialVersionUID = 1L;
  private final String lawId;
  private final String material;
  private final double simulatedTime;

  SourceLawException(
      String lawId,
      String origin,
      String material,
      double simulatedTime,
      String what,
      Throwable cause) {
    super(
        "source law '"
            + lawId
            + "' ("
            + origin
            + ") failed in material '"
            + material
            + "' "
            + (Double.isNaN(simulatedTime)
                ? "before the run"
                : "at simulated time " + LawBinding.format(simulatedTime) + " s")
            + ": "
            + what,
        cause);
    this.lawId = lawId;
    this.material = material;
    this.simulatedTime = simulatedTime;
  }

  /** The law's id. */
  public String lawId() {
    return lawId;
  }

  /** The material (volume group) whose law failed. */
  public String material() {
    return material;
  }

  /** Simulated time of the failure, s; NaN when it failed before the run started. */
  public double simulatedTime() {
    return simulatedTime;
  }
}
