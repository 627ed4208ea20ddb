package dev.soakfield.fem.run;

import dev.soakfield.fem.casefile.CaseSpec;
import dev.soakfield.fem.casefile.FaceSpec;
import dev.soakfield.fem.physics.FaceKind;
import dev.soakfield.fem.time.RunFailedException;
import java.util.Locale;

/**
 * The last guard before a run is called finished: the amount must balance (change = inflow +
 * sources) to within the case's {@code time.balance_limit} (1e-8 unless raised) of the amounts
 * moved or present. A run that converged step by step closes it to about 1e-11; one that does not
 * has solved something else than the case, and its numbers must not leave with exit code 0.
 */
final class BalanceCheck {
  private BalanceCheck() {}

  /**
   * @throws RunFailedException when the balance error exceeds the limit (or is not a number)
   */
  static void require(double relativeError, CaseSpec spec, double reached) {
    double limit = spec.time().balanceLimit();
    if (relativeError <= limit) {
      return;
    }
    StringBuilder why =
        new StringBuilder(
            String.format(
                Locale.ROOT,
                "the amount does not balance: error %.3g of the amounts moved or present, more than"
                    + " %.0e;"
                    + " the results are not a solution of the case",
                relativeError,
                limit));
    double strongest = 0;
    String face = "";
    for (FaceSpec f : spec.faces().values()) {
      if (f.kind() == FaceKind.EXCHANGE && f.coefficient().max() > strongest) {
        strongest = f.coefficient().max();
        face = f.faceGroup();
      }
    }
    if (strongest > 0) {
      why.append(
          String.format(
              Locale.ROOT,
              ". The exchange face '%s' has a coefficient of %.3g m/s: a coefficient far above"
                  + " D divided by the element size makes rows of the linear system many orders"
                  + " of magnitude apart, which the solver does not resolve; for a surface at"
                  + " equilibrium with its environment use a concentration (or ambient) face",
              face,
              strongest));
    }
    why.append(
        ". If this accuracy is enough for the purpose, raise the limit with"
            + " \"time\": {\"balance_limit\": ...}");
    throw new RunFailedException(reached, why.toString(), null);
  }
}
