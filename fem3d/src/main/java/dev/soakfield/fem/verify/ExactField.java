package dev.soakfield.fem.verify;

/** A closed-form solution at one time: its value and gradient at a point. */
interface ExactField {
  double value(double x, double y, double z);

  /** ∇u at the point into g (3 numbers). */
  void gradient(double x, double y, double z, double[] g);
}
