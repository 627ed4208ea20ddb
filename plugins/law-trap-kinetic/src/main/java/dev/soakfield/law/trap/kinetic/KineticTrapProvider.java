package dev.soakfield.law.trap.kinetic;

import dev.soakfield.law.api.LawParameter;
import dev.soakfield.law.api.LawParameters;
import dev.soakfield.law.api.SourceLaw;
import dev.soakfield.law.api.SourceLawProvider;
import java.util.List;

/**
 * {@code trap-kinetic}: one kind of trap site exchanging with the mobile species at finite rates
 * (McNabb &amp; Foster, Trans. Metall. Soc. AIME 227 (1963) 618). Per node the trap occupancy θ
 * follows dθ/dt = k·c·(1 − θ) − p·θ, with capture k = k0·exp(−Ek/(R·T)) and release p =
 * p0·exp(−Ed/(R·T)); the lattice balance loses π = −N_T·dθ/dt, and the trapped amount N_T·θ is
 * held.
 *
 * <p>Units follow the case's concentration c (amount per m³, whatever the amount is: atoms, mol,
 * kg): N_T is in the same amount per m³, k in m³/(amount·s), p in 1/s. Several trap kinds in one
 * material are several {@code trap-kinetic} entries.
 *
 * <p>Moisture's two-stage (Langmuir-type) absorption (Carter &amp; Kibler, J. Compos. Mater. 12
 * (1978) 118) is the same exchange: mobile molecules become bound with probability γ per unit time
 * and bound ones free with probability β. With unsaturable sites (N_T far above the bound amount,
 * so that θ ≪ 1) dN/dt = k·N_T·c − p·N for the bound amount N = N_T·θ; hence γ = k·N_T and β = p:
 * choose N_T (say a thousand times the expected bound amount), then k0 = γ/N_T, p0 = β and both
 * energies 0.
 */
public final class KineticTrapProvider implements SourceLawProvider {
  static final String TRAP_DENSITY = "trap-density";
  static final String CAPTURE_RATE = "capture-rate";
  static final String CAPTURE_ENERGY = "capture-energy";
  static final String RELEASE_RATE = "release-rate";
  static final String RELEASE_ENERGY = "release-energy";

  @Override
  public String id() {
    return "trap-kinetic";
  }

  @Override
  public String description() {
    return "Kinetic trapping, d(theta)/dt = k*c*(1-theta) - p*theta with Arrhenius k and p"
        + " (McNabb & Foster 1963); also two-stage absorption (Carter & Kibler 1978).";
  }

  @Override
  public List<LawParameter> parameters() {
    double inf = Double.POSITIVE_INFINITY;
    return List.of(
        LawParameter.required(
            TRAP_DENSITY, "amount/m^3", "N_T, trap sites per m^3 in the unit of c", 0, inf),
        LawParameter.required(
            CAPTURE_RATE, "m^3/(amount*s)", "k0, pre-factor of the capture rate k", 0, inf),
        LawParameter.optional(CAPTURE_ENERGY, "J/mol", "Ek, activation energy of k", 0, 0, 1e6),
        LawParameter.required(RELEASE_RATE, "1/s", "p0, pre-factor of the release rate p", 0, inf),
        LawParameter.optional(RELEASE_ENERGY, "J/mol", "Ed, activation energy of p", 0, 0, 1e6));
  }

  @Override
  public SourceLaw create(LawParameters values) {
    return new KineticTrapLaw(
        values.get(TRAP_DENSITY),
        values.get(CAPTURE_RATE),
        values.get(CAPTURE_ENERGY),
        values.get(RELEASE_RATE),
        values.get(RELEASE_ENERGY));
  }
}
