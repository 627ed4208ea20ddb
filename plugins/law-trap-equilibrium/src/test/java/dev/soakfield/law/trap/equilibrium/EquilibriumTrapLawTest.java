package dev.soakfield.law.trap.equilibrium;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.law.api.ParameterBinder;
import dev.soakfield.law.testkit.Answer;
import dev.soakfield.law.testkit.At;
import dev.soakfield.law.testkit.State;
import dev.soakfield.law.testkit.WellMixedCell;
import java.util.Map;
import org.junit.jupiter.api.Test;

class EquilibriumTrapLawTest {
  static final double R = EquilibriumTrapLaw.GAS_CONSTANT;

  /** 1e23, parsed: the literal's nearest double prints as 9.999999999999999e22. */
  static final double TEN_TO_23 = Double.parseDouble("1e23");

  private static EquilibriumTrapLaw law(String nT, String nL, String eb) {
    ParameterBinder.Binding r =
        ParameterBinder.find()
            .bind(
                new EquilibriumTrapProvider(),
                Map.of("trap-density", nT, "lattice-density", nL, "binding-energy", eb));
    return (EquilibriumTrapLaw) new EquilibriumTrapProvider().create(r.parameters().orElseThrow());
  }

  @Test
  void diluteLimitSlowsDiffusionByOrianisFactor() {
    // Oriani, Acta Metall. 18 (1970) 147: D_eff/D_L = 1/(1 + ∂c_T/∂c) and, dilute,
    // 1/(1 + (N_T/N_L)·exp(Eb/(R·T))) = 1.82e-4 for N_T = 1e23 m⁻³, N_L = 5.1e29 m⁻³,
    // Eb = 60 kJ/mol, T = 300 K (computed: 1.8229e-4)
    EquilibriumTrapLaw law = law("1e23", "5.1e29", "6e4");
    double dt = 7.0;
    double[] start = new double[1];
    law.initialState(0, 300, start);
    Answer a = Answer.of(law, new At(1e-3, 300, dt, dt), new State(start));
    double slope = -a.derivative() * dt;
    double ratio = 1 / (1 + slope);
    assertEquals(1.82e-4, ratio, 0.005e-4);
    assertEquals(1 / (1 + TEN_TO_23 / 5.1e29 * Math.exp(6e4 / (R * 300))), ratio, 1e-10);
    // the same slope from the amount trapped over a small step out of c = 0
    double trapped = -a.rate() * dt;
    assertEquals(slope, trapped / 1e-3, 1e-6 * slope);
  }

  @Test
  void theInitialStateIsOrianisEquilibrium() {
    // θ/(1 − θ) = (c/N_L)·exp(Eb/(R·T)) (Oriani 1970)
    EquilibriumTrapLaw law = law("2.5e23", "5.1e29", "4.5e4");
    double c = 3e23;
    double[] s = new double[1];
    law.initialState(c, 330, s);
    double theta = s[0] / 2.5e23;
    assertEquals(c / 5.1e29 * Math.exp(4.5e4 / (R * 330)), theta / (1 - theta), 1e-9);
    assertEquals(s[0], law.trappedAmount(new State(s), 330));
    // far above N_L·exp(−Eb/(R·T)) the traps are full
    law.initialState(1e28, 330, s);
    double x = 1e28 / 5.1e29 * Math.exp(4.5e4 / (R * 330));
    assertTrue(x > 1e5, "x " + x);
    assertEquals(2.5e23 / (1 + x), 2.5e23 - s[0], 1e-6 * 2.5e23 / x);
  }

  @Test
  void aClosedCellKeepsLatticePlusTrappedAmount() {
    // conservation: what the traps take is what the lattice loses (exact for the step form)
    EquilibriumTrapLaw law = law("1e23", "5.1e29", "5e4");
    WellMixedCell cell = WellMixedCell.closed(law, 4e22, 300).withState(0);
    cell.run(100, 1);
    assertEquals(4e22, cell.concentration() + cell.held(), 1e-12 * 4e22);
    // and the partition reached is the equilibrium one
    double theta = cell.held() / TEN_TO_23;
    assertEquals(
        cell.concentration() / 5.1e29 * Math.exp(5e4 / (R * 300)), theta / (1 - theta), 1e-6);
    assertTrue(cell.iterations() <= 3, "Newton iterations " + cell.iterations());
  }

  @Test
  void deepTrapsAtLowTemperatureStayFinite() {
    EquilibriumTrapLaw law = law("1e23", "5.1e29", "5e5");
    double[] s = new double[1];
    law.initialState(1e20, 20, s);
    assertEquals(TEN_TO_23, s[0], 1e-9 * TEN_TO_23);
    assertTrue(Double.isFinite(law.slope(1e20, 20)));
  }
}
