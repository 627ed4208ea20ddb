package dev.soakfield.law.testkit;

import dev.soakfield.law.api.LawPoint;
import dev.soakfield.law.api.SourceLaw;
import dev.soakfield.law.api.StateView;

/**
 * One answer of {@link SourceLaw#rate}: π and ∂π/∂c.
 *
 * @param rate π, amount per m³ per s
 * @param derivative ∂π/∂c, 1/s
 */
public record Answer(double rate, double derivative) {
  /** Asks {@code law} at {@code at} with {@code start}; NaN when the law never answers. */
  public static Answer of(SourceLaw law, LawPoint at, StateView start) {
    double[] got = {Double.NaN, Double.NaN};
    law.rate(
        at,
        start,
        (r, d) -> {
          got[0] = r;
          got[1] = d;
        });
    return new Answer(got[0], got[1]);
  }
}
