package dev.soakfield.law.trap.equilibrium;

import dev.soakfield.law.api.SourceLawProvider;
import dev.soakfield.law.testkit.SourceLawContract;
import java.util.List;
import java.util.Map;

class EquilibriumTrapContractTest extends SourceLawContract {
  @Override
  protected SourceLawProvider provider() {
    return new EquilibriumTrapProvider();
  }

  /** Hydrogen atoms per m³ in an iron lattice with one trap kind: a scenario of our own. */
  @Override
  protected Map<String, Object> parameters() {
    return Map.of("trap-density", "1e23", "lattice-density", "5.1e29", "binding-energy", 3.0e4);
  }

  @Override
  protected List<Sample> samples() {
    return List.of(
        new Sample(1e20, 2e20, 300, 10),
        new Sample(4e22, 1e22, 350, 1),
        new Sample(1e24, 1.1e24, 290, 3600));
  }
}
