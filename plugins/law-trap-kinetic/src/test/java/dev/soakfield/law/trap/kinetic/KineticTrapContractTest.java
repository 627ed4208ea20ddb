package dev.soakfield.law.trap.kinetic;

import dev.soakfield.law.api.SourceLawProvider;
import dev.soakfield.law.testkit.SourceLawContract;
import java.util.List;
import java.util.Map;

class KineticTrapContractTest extends SourceLawContract {
  @Override
  protected SourceLawProvider provider() {
    return new KineticTrapProvider();
  }

  /** Hydrogen in a steel, c in mol/m³: a scenario of our own. */
  @Override
  protected Map<String, Object> parameters() {
    return Map.of(
        "trap-density", 0.8,
        "capture-rate", 40.0,
        "capture-energy", "2e4",
        "release-rate", 1.5e7,
        "release-energy", 5.5e4);
  }

  @Override
  protected List<Sample> samples() {
    return List.of(
        new Sample(0.1, 0.3, 300, 10), new Sample(0.3, 0.05, 450, 1), new Sample(2, 3, 320, 3600));
  }
}
