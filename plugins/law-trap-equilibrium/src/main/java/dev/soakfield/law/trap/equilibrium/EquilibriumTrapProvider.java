package dev.soakfield.law.trap.equilibrium;

import dev.soakfield.law.api.LawParameter;
import dev.soakfield.law.api.LawParameters;
import dev.soakfield.law.api.SourceLaw;
import dev.soakfield.law.api.SourceLawProvider;
import java.util.List;

/**
 * {@code trap-equilibrium}: trap sites in local equilibrium with the lattice (Oriani, Acta Metall.
 * 18 (1970) 147): θ/(1 − θ) = (c/N_L)·exp(E_b/(R·T)), trapped amount c_T = N_T·θ. N_T and N_L are
 * in the unit of c (amount per m³). In the dilute limit the lattice diffusivity is slowed to D_eff
 * = D_L/(1 + (N_T/N_L)·exp(E_b/(R·T))).
 */
public final class EquilibriumTrapProvider implements SourceLawProvider {
  static final String TRAP_DENSITY = "trap-density";
  static final String LATTICE_DENSITY = "lattice-density";
  static final String BINDING_ENERGY = "binding-energy";

  @Override
  public String id() {
    return "trap-equilibrium";
  }

  @Override
  public String description() {
    return "Trapping in local equilibrium, theta/(1-theta) = (c/N_L)*exp(Eb/(R*T))"
        + " (Oriani 1970); reports the trapped amount.";
  }

  @Override
  public List<LawParameter> parameters() {
    double inf = Double.POSITIVE_INFINITY;
    return List.of(
        LawParameter.required(
            TRAP_DENSITY, "amount/m^3", "N_T, trap sites per m^3 in the unit of c", 0, inf),
        LawParameter.required(
            LATTICE_DENSITY,
            "amount/m^3",
            "N_L, lattice sites per m^3 in the unit of c",
            Double.MIN_NORMAL,
            inf),
        LawParameter.required(BINDING_ENERGY, "J/mol", "Eb, trap binding energy", 0, 5e5));
  }

  @Override
  public SourceLaw create(LawParameters values) {
    return new EquilibriumTrapLaw(
        values.get(TRAP_DENSITY), values.get(LATTICE_DENSITY), values.get(BINDING_ENERGY));
  }
}
