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
    checks.addAll(RoundParts.checks());
    checks.addAll(Manufactured.checks());
    checks.addAll(DampedStart.checks());
    checks.addAll(AccuracyEstimates.checks());
    return checks;
  }
}
