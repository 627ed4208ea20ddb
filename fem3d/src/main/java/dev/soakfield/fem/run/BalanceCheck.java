package dev.soakfield.fem.run;

import dev.soakfield.fem.casefile.CaseSpec;
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
    why.append(
        ". The usual cause is steps far longer than the time the part needs to even out (its"
            + " size squared over D): round-off in the step's equations then swamps what moves;"
            + " end the run sooner, or cap the step with \"time\": {\"max_step\": ...}");
    why.append(
        ". If this accuracy is enough for the purpose, raise the limit with"
            + " \"time\": {\"balance_limit\": ...}");
    throw new RunFailedException(reached, why.toString(), null);
  }
}
