package org.example.soakfield.saturating;

import dev.soakfield.law.api.LawParameter;
import dev.soakfield.law.api.LawParameters;
import dev.soakfield.law.api.SourceLaw;
import dev.soakfield.law.api.SourceLawProvider;
import java.util.List;

/**
 * Declares the law: its id (what a case file names), a description, its parameters, and how to
 * make the law from checked values. Soakfield finds this class through the file
 * META-INF/services/dev.soakfield.law.api.SourceLawProvider, which names it.
 */
public final class SaturatingConsumptionProvider implements SourceLawProvider {
  @Override
  public String id() {
    return "saturating-consumption";
  }

  @Override
  public String description() {
    return "Consumption that saturates, pi = -v*c/(K + c) (Michaelis & Menten 1913);"
        + " first order below K, constant above it.";
  }

  @Override
  public List<LawParameter> parameters() {
    double noLimit = Double.POSITIVE_INFINITY;
    return List.of(
        LawParameter.required(
            "max-rate", "amount/(m^3*s)", "v, the rate at high concentration", 0, noLimit),
        LawParameter.required(
            "half-saturation", "amount/m^3", "K, where the rate is half of v", 1e-300, noLimit));
  }

  @Override
  public SourceLaw create(LawParameters values) {
    return new SaturatingConsumptionLaw(values.get("max-rate"), values.get("half-saturation"));
  }
}
