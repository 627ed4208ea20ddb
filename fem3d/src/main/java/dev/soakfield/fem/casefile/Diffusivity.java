package dev.soakfield.fem.casefile;

import java.util.Optional;

/**
 * A symmetric diffusivity tensor in m²/s, stored as its six distinct entries. Isotropic materials
 * have D = d·I; orthotropic ones D = R·diag(d1, d2, d3)·Rᵀ where the columns of R are the principal
 * axes.
 */
public record Diffusivity(double xx, double yy, double zz, double xy, double yz, double zx) {
  /** How far from orthonormal the normalized principal axes may be (largest |aᵢ·aⱼ|, i ≠ j). */
  public static final double AXIS_TOLERANCE = 1e-9;

  public Diffusivity {
    double[] all = {xx, yy, zz, xy, yz, zx};
    for (double v : all) {
      if (!Double.isFinite(v)) {
        throw new IllegalArgumentException("diffusivity entries must be finite, got " + v);
      }
    }
    if (!(xx > 0 && yy > 0 && zz > 0)) {
      throw new IllegalArgumentException(
          "diffusivity diagonal must be positive, got " + xx + ", " + yy + ", " + zz);
    }
  }

  /** D = d·I. */
  public static Diffusivity isotropic(double d) {
    return new Diffusivity(d, d, d, 0, 0, 0);
  }

  /**
   * D = Σₖ dₖ·aₖ·aₖᵀ for principal values d and axes a (each normalized here).
   *
   * @param principal three positive values
   * @param axes three axes of three components; orthonormal after normalizing, within {@link
   *     #AXIS_TOLERANCE}
   */
  public static Diffusivity orthotropic(double[] principal, double[][] axes) {
    if (principal.length != 3 || axes.length != 3) {
      throw new IllegalArgumentException("need 3 principal values and 3 axes");
    }
    for (double d : principal) {
      if (!(d > 0) || !Double.isFinite(d)) {
        throw new IllegalArgumentException("principal diffusivities must be positive, got " + d);
      }
    }
    Optional<String> defect = axisDefect(axes);
    if (defect.isPresent()) {
      throw new IllegalArgumentException(defect.get());
    }
    double[][] unit = normalized(axes);
    double[] t = new double[6];
    for (int k = 0; k < 3; k++) {
      double[] a = unit[k];
      double d = principal[k];
      t[0] += d * a[0] * a[0];
      t[1] += d * a[1] * a[1];
      t[2] += d * a[2] * a[2];
      t[3] += d * a[0] * a[1];
      t[4] += d * a[1] * a[2];
      t[5] += d * a[2] * a[0];
    }
    return new Diffusivity(t[0], t[1], t[2], t[3], t[4], t[5]);
  }

  /**
   * What is wrong with a set of axes, or empty when they are three finite, non-zero vectors that
   * are orthonormal within {@link #AXIS_TOLERANCE} after normalizing each.
   */
  static Optional<String> axisDefect(double[][] axes) {
    for (int k = 0; k < 3; k++) {
      if (axes[k].length != 3) {
        return Optional.of("axis " + (k + 1) + " has " + axes[k].length + " components, not 3");
      }
      double len = length(axes[k]);
      if (!(len > 0) || !Double.isFinite(len)) {
        return Optional.of("axis " + (k + 1) + " has length " + len);
      }
    }
    double[][] unit = normalized(axes);
    for (int i = 0; i < 3; i++) {
      for (int j = i + 1; j < 3; j++) {
        double dot = unit[i][0] * unit[j][0] + unit[i][1] * unit[j][1] + unit[i][2] * unit[j][2];
        if (Math.abs(dot) > AXIS_TOLERANCE) {
          return Optional.of(
              "axes " + (i + 1) + " and " + (j + 1) + " have a dot product of " + dot);
        }
      }
    }
    return Optional.empty();
  }

  private static double length(double[] v) {
    return Math.sqrt(v[0] * v[0] + v[1] * v[1] + v[2] * v[2]);
  }

  private static double[][] normalized(double[][] axes) {
    double[][] unit = new double[3][3];
    for (int k = 0; k < 3; k++) {
      double len = length(axes[k]);
      for (int c = 0; c < 3; c++) {
        unit[k][c] = axes[k][c] / len;
      }
    }
    return unit;
  }

  /** The six entries xx, yy, zz, xy, yz, zx (a new array). */
  public double[] tensor() {
    return new double[] {xx, yy, zz, xy, yz, zx};
  }

  /** True when D = d·I. */
  public boolean isIsotropic() {
    return xx == yy && yy == zz && xy == 0 && yz == 0 && zx == 0;
  }
}
