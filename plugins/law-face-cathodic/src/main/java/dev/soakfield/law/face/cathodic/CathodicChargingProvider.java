package dev.soakfield.law.face.cathodic;

import dev.soakfield.law.api.FaceLaw;
import dev.soakfield.law.api.FaceLawProvider;
import dev.soakfield.law.api.LawParameter;
import dev.soakfield.law.api.LawParameters;
import java.util.List;

/**
 * {@code cathodic-charging}: hydrogen entering a metal from a cathodic charging current (Faraday's
 * law: one hydrogen atom per electron, a share η of them absorbed) and leaving it again by
 * recombination: J = η·i/F·a − k_r·c², k_r = k_r0·exp(−E_r/(R·T)), with a the case's amount per
 * mole of hydrogen atoms (1 for mol; 1.008e-3 for kg). The entry flux is common practice for
 * electrochemical charging (the charging side of ISO 17081 permeation cells).
 */
public final class CathodicChargingProvider implements FaceLawProvider {
  static final String CURRENT_DENSITY = "current-density";
  static final String EFFICIENCY = "efficiency";
  static final String RECOMBINATION_RATE = "recombination-rate";
  static final String RECOMBINATION_ENERGY = "recombination-energy";
  static final String AMOUNT_PER_MOL = "amount-per-mol";

  @Override
  public String id() {
    return "cathodic-charging";
  }

  @Override
  public String description() {
    return "Hydrogen entry from a cathodic current, J = eta*i/F - kr*c^2 (Faraday's law with"
        + " an absorption efficiency and recombination).";
  }

  @Override
  public List<LawParameter> parameters() {
    double inf = Double.POSITIVE_INFINITY;
    return List.of(
        LawParameter.required(CURRENT_DENSITY, "A/m^2", "i, cathodic current density", 0, inf),
        LawParameter.optional(EFFICIENCY, "1", "eta, share of the current absorbed", 1, 0, 1),
        LawParameter.optional(
            RECOMBINATION_RATE, "m^4/(amount*s)", "kr0, pre-factor of recombination", 0, 0, inf),
        LawParameter.optional(RECOMBINATION_ENERGY, "J/mol", "activation energy of kr", 0, 0, 1e6),
        LawParameter.optional(
            AMOUNT_PER_MOL,
            "amount/mol",
            "the case's amount per mol of H (1 for mol, 1.008e-3 for kg)",
            1,
            Double.MIN_NORMAL,
            inf));
  }

  @Override
  public FaceLaw create(LawParameters values) {
    return new CathodicChargingLaw(
        values.get(CURRENT_DENSITY)
            * values.get(EFFICIENCY)
            / CathodicChargingLaw.FARADAY
            * values.get(AMOUNT_PER_MOL),
        values.get(RECOMBINATION_RATE),
        values.get(RECOMBINATION_ENERGY));
  }
}
