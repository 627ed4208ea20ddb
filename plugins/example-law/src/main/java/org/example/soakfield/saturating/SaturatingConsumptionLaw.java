package org.example.soakfield.saturating;

import dev.soakfield.law.api.LawPoint;
import dev.soakfield.law.api.RateSink;
import dev.soakfield.law.api.SourceLaw;
import dev.soakfield.law.api.StateView;
import java.util.List;

/**
 * π = −v·c/(K + c). No state of its own: nothing is held, the species is used up. The solver asks
 * for π and ∂π/∂c = −v·K/(K + c)² at the end-of-step concentration, from several threads at once;
 * the fields are final, so that is safe.
 */
final class SaturatingConsumptionLaw implements SourceLaw {
  private final double maxRate;
  private final double halfSaturation;

  SaturatingConsumptionLaw(double maxRate, double halfSaturation) {
    this.maxRate = maxRate;
    this.halfSaturation = halfSaturation;
  }

  @Override
  public List<String> stateNames() {
    return List.of();
  }

  @Override
  public void initialState(double concentration, double temperature, double[] state) {
    // no state
  }

  @Override
  public void rate(LawPoint at, StateView start, RateSink out) {
    double c = at.concentration();
    if (c <= 0) {
      // nothing left to consume (a slightly negative c is round-off of the field)
      out.set(0, c == 0 ? -maxRate / halfSaturation : 0);
      return;
    }
    double denominator = halfSaturation + c;
    out.set(
        -maxRate * c / denominator, -maxRate * halfSaturation / (denominator * denominator));
  }

  @Override
  public void advance(LawPoint at, StateView start, double[] end) {
    // no state
  }
}
