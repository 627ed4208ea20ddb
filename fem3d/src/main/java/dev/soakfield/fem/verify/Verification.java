package dev.soakfield.fem.verify;

import java.util.ArrayList;
import java.util.List;

/**
 * The built-in verification cases, on modest meshes, for {@code soakfield verify} and the tests.
 */
public final class Verification {
  private Verification() {}

  public static List<Check> all() {
    List<Check> checks = new ArrayList<>();
    checks.addAll(PlaneSheet.run(2, 40, 2.5e-4, 1e-3));
    checks.addAll(PlaneSheet.run(1, 80, 2.5e-4, 1e-2));
    checks.addAll(CompositeWall.run());
    checks.addAll(MaximumPrinciple.run());
    checks.add(GradientFluxBalance.run());
    checks.addAll(ExchangeAndSink.run(false));
    checks.addAll(ExchangeAndSink.run(true));
    checks.addAll(ExchangeSheet.run());
    checks.add(DecayingMode.spatialRate(1, 8, 1.9));
    checks.add(DecayingMode.spatialRate(2, 4, 2.9));
    checks.add(DecayingMode.temporalRate(false, 0.9));
    checks.add(DecayingMode.temporalRate(true, 1.9));
    checks.addAll(RoundParts.checks());
    return checks;
  }
}
