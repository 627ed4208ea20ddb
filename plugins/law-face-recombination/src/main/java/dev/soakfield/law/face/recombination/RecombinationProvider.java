package dev.soakfield.law.face.recombination;

import dev.soakfield.law.api.FaceLaw;
import dev.soakfield.law.api.FaceLawProvider;
import dev.soakfield.law.api.LawParameter;
import dev.soakfield.law.api.LawParameters;
import java.util.List;

/**
 * {@code dissociation-recombination}: hydrogen entering a metal from the gas by dissociative
 * adsorption and leaving it by recombination, each at a rate of its own (surface-limited
 * permeation, after Pick &amp; Sonnenberg, J. Nucl. Mater. 131 (1985) 208): the inward flux J =
 * k_d·p − k_r·c², with p the gas fugacity outside, c the concentration just inside, k_d =
 * k_d0·exp(−E_d/ (R·T)) and k_r = k_r0·exp(−E_r/(R·T)). At equilibrium (J = 0) c = √(k_d/k_r)·√p:
 * Sieverts' law, so k_d/k_r is the square of the Sieverts constant.
 *
 * <p>Units follow the case's amount: k_d0 in amount/(m²·s·Pa), k_r0 in m⁴/(amount·s).
 */
public final class RecombinationProvider implements FaceLawProvider {
  static final String DISSOCIATION_RATE = "dissociation-rate";
  static final String DISSOCIATION_ENERGY = "dissociation-energy";
  static final String RECOMBINATION_RATE = "recombination-rate";
  static final String RECOMBINATION_ENERGY = "recombination-energy";

  @Override
  public String id() {
    return "dissociation-recombination";
  }

  @Override
  public String description() {
    return "Surface-limited hydrogen entry and exit, J = kd*p - kr*c^2 with Arrhenius kd and kr"
        + " (Pick & Sonnenberg 1985).";
  }

  @Override
  public List<LawParameter> parameters() {
    double inf = Double.POSITIVE_INFINITY;
    return List.of(
        LawParameter.required(
            DISSOCIATION_RATE,
            "amount/(m^2*s*Pa)",
            "kd0, pre-factor of the dissociation rate",
            0,
            inf),
        LawParameter.optional(DISSOCIATION_ENERGY, "J/mol", "activation energy of kd", 0, 0, 1e6),
        LawParameter.required(
            RECOMBINATION_RATE,
            "m^4/(amount*s)",
            "kr0, pre-factor of the recombination rate",
            0,
            inf),
        LawParameter.optional(RECOMBINATION_ENERGY, "J/mol", "activation energy of kr", 0, 0, 1e6));
  }

  @Override
  public FaceLaw create(LawParameters values) {
    return new RecombinationLaw(
        values.get(DISSOCIATION_RATE),
        values.get(DISSOCIATION_ENERGY),
        values.get(RECOMBINATION_RATE),
        values.get(RECOMBINATION_ENERGY));
  }
}
