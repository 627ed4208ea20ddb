package dev.soakfield.fem.physics;

/**
 * A boundary value or coefficient as a function of time, with the times where its slope changes.
 */
public interface TimeFunction {
  double at(double t);

  /** Times where the function is not smooth; time steps land on them. Empty for constants. */
  double[] breakpoints();

  static TimeFunction constant(double v) {
    return new TimeFunction() {
      @Override
      public double at(double t) {
        return v;
      }

      @Override
      public double[] breakpoints() {
        return new double[0];
      }
    };
  }
}
