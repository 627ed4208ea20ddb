package dev.soakfield.fem.fit;

import java.util.function.DoubleUnaryOperator;

/**
 * A dimensionless response y/y_final of a diffusion experiment as a function of the dimensionless
 * time τ = D·t/L², with its derivative dy/dτ (for the Jacobian of a fit).
 */
public record TransientShape(String name, DoubleUnaryOperator value, DoubleUnaryOperator slope) {
  /** The response at τ. */
  public double at(double tau) {
    return value.applyAsDouble(tau);
  }

  /** Its derivative with respect to τ. */
  public double slopeAt(double tau) {
    return slope.applyAsDouble(tau);
  }
}
