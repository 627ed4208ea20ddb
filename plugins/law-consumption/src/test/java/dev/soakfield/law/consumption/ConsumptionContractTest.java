package dev.soakfield.law.consumption;

import dev.soakfield.law.api.SourceLawProvider;
import dev.soakfield.law.testkit.SourceLawContract;
import java.util.List;
import java.util.Map;

class ConsumptionContractTest extends SourceLawContract {
  @Override
  protected SourceLawProvider provider() {
    return new ConsumptionProvider();
  }

  @Override
  protected Map<String, Object> parameters() {
    return Map.of("rate-constant", 2.0e3, "activation-energy", "4.5e4");
  }

  @Override
  protected List<Sample> samples() {
    return List.of(new Sample(1, 0.8, 300, 60), new Sample(0.2, 0.5, 350, 3600));
  }
}
