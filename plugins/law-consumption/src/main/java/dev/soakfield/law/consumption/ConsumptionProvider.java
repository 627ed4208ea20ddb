package dev.soakfield.law.consumption;

import dev.soakfield.law.api.LawParameter;
import dev.soakfield.law.api.LawParameters;
import dev.soakfield.law.api.SourceLaw;
import dev.soakfield.law.api.SourceLawProvider;
import java.util.List;

/**
 * {@code consumption}: first-order consumption π = −k(T)·c, with the Arrhenius rate constant k =
 * k0·exp(−Ea/(R·T)) — a species used up by a reaction in the material (oxygen by an oxidising
 * resin, water by a hydrolysing one, hydrogen by a getter).
 */
public final class ConsumptionProvider implements SourceLawProvider {
  static final String RATE_CONSTANT = "rate-constant";
  static final String ACTIVATION_ENERGY = "activation-energy";

  @Override
  public String id() {
    return "consumption";
  }

  @Override
  public String description() {
    return "First-order consumption pi = -k(T)*c with an Arrhenius rate constant"
        + " k = k0*exp(-Ea/(R*T)).";
  }

  @Override
  public List<LawParameter> parameters() {
    return List.of(
        LawParameter.required(
            RATE_CONSTANT,
            "1/s",
            "k0, the rate constant's pre-factor",
            0,
            Double.POSITIVE_INFINITY),
        LawParameter.optional(
            ACTIVATION_ENERGY, "J/mol", "Ea; 0 for a rate independent of temperature", 0, 0, 1e6));
  }

  @Override
  public SourceLaw create(LawParameters values) {
    return new ConsumptionLaw(values.get(RATE_CONSTANT), values.get(ACTIVATION_ENERGY));
  }
}
