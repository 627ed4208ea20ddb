package dev.soakfield.fem.verify;

import dev.soakfield.fem.model.DiffusionModel;
import dev.soakfield.fem.physics.TimeFunction;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import java.util.List;
import java.util.Map;

/**
 * A manufactured solution through two parts stacked along z, written for this test: part A (0 < z <
 * 0.4; D = 1, S = 1, a constant source r = 0.8) and part B (0.4 < z < 1; D = 0.3, S = 2.5, a
 * first-order sink k = −0.5), zmin held at a value that changes with time, zmax exchanging (h =
 * 1.5) with an environment that changes with time, the other faces sealed. The potential is
 *
 * <pre>φ = w(z) + e^(−μt)·v(z),  μ = 2</pre>
 *
 * with, in A, w = A0 + A1 z − r z²/(2 D S) and v = P cos(κ_A z) + Q sin(κ_A z), κ_A² = μ/D_A; in B,
 * w = B0 cosh(β(z−a)) + B1 sinh(β(z−a)), β² = −k/D_B, and v = R cos(κ_B(z−a)) + T sin(κ_B(z−a)),
 * κ_B² = (μ + k)/D_B. Each satisfies its part's balance ∂(Sφ)/∂t = ∇·(D S ∇φ) + k S φ + r; B0, B1,
 * R and T make φ and the flux D S ∂φ/∂z continuous at z = a, so c = S·φ jumps there by the
 * solubility ratio. The held value is S_A·φ(0, t), the environment S_B φ(1, t) + D_B S_B ∂φ/∂z(1,
 * t)/h. (Separation of variables, e.g. J. Crank, The Mathematics of Diffusion, 2nd ed. (1975), ch.
 * 2; the composition is ours.)
 */
final class TwoPartWall {
  static final double A = 0.4;
  static final double LENGTH = 1.0;
  static final double WIDTH = 0.2;
  private static final double DA = 1.0;
  private static final double SA = 1.0;
  private static final double RA = 0.8;
  private static final double DB = 0.3;
  private static final double SB = 2.5;
  private static final double KB = -0.5;
  private static final double MU = 2.0;
  private static final double H = 1.5;
  private static final double A0 = 0.5;
  private static final double A1 = 0.3;
  private static final double P = 0.7;
  private static final double Q = -0.4;
  private static final double KAPPA_A = Math.sqrt(MU / DA);
  private static final double KAPPA_B = Math.sqrt((MU + KB) / DB);
  private static final double BETA = Math.sqrt(-KB / DB);
  private static final double B0 = A0 + A1 * A - RA * A * A / (2 * DA * SA);
  private static final double B1 = DA * SA * (A1 - RA * A / (DA * SA)) / (DB * SB * BETA);
  private static final double R = P * Math.cos(KAPPA_A * A) + Q * Math.sin(KAPPA_A * A);
  private static final double T =
      DA
          * SA
          * KAPPA_A
          * (-P * Math.sin(KAPPA_A * A) + Q * Math.cos(KAPPA_A * A))
          / (DB * SB * KAPPA_B);

  private TwoPartWall() {}

  /** φ and ∂φ/∂z at (z, t). */
  static double[] phi(double z, double t) {
    double e = Math.exp(-MU * t);
    if (z <= A) {
      double w = A0 + A1 * z - RA * z * z / (2 * DA * SA);
      double dw = A1 - RA * z / (DA * SA);
      double v = P * Math.cos(KAPPA_A * z) + Q * Math.sin(KAPPA_A * z);
      double dv = KAPPA_A * (-P * Math.sin(KAPPA_A * z) + Q * Math.cos(KAPPA_A * z));
      return new double[] {w + e * v, dw + e * dv};
    }
    double s = z - A;
    double w = B0 * Math.cosh(BETA * s) + B1 * Math.sinh(BETA * s);
    double dw = BETA * (B0 * Math.sinh(BETA * s) + B1 * Math.cosh(BETA * s));
    double v = R * Math.cos(KAPPA_B * s) + T * Math.sin(KAPPA_B * s);
    double dv = KAPPA_B * (-R * Math.sin(KAPPA_B * s) + T * Math.cos(KAPPA_B * s));
    return new double[] {w + e * v, dw + e * dv};
  }

  /** c = S·φ at time t, S by the side of z = a the point lies on. */
  static ExactField at(double t) {
    return new ExactField() {
      @Override
      public double value(double x, double y, double z) {
        return (z <= A ? SA : SB) * phi(z, t)[0];
      }

      @Override
      public void gradient(double x, double y, double z, double[] g) {
        g[0] = 0;
        g[1] = 0;
        g[2] = (z <= A ? SA : SB) * phi(z, t)[1];
      }
    };
  }

  /** The solubility per tetrahedron, for c = S·φ. */
  static double[] solubility(TetMesh mesh) {
    double[] s = new double[mesh.tetCount()];
    int b = mesh.volumeGroupIndex("B");
    for (int t = 0; t < s.length; t++) {
      s[t] = mesh.tetGroup(t) == b ? SB : SA;
    }
    return s;
  }

  /** The wall with m cells across x and y and 2m, 3m through A and B (cells of 0.2/m), jittered. */
  static TetMesh mesh(int m, long seed) {
    return mesh(m, 2 * m, 3 * m, seed);
  }

  /** The wall with m cells across and the given cells through each part, jittered. */
  static TetMesh mesh(int m, int cellsA, int cellsB, long seed) {
    TetMesh linear =
        StructuredMesher.layers(
            WIDTH,
            WIDTH,
            m,
            m,
            List.of(
                new StructuredMesher.Layer("A", A, cellsA),
                new StructuredMesher.Layer("B", LENGTH - A, cellsB)),
            1);
    return TestMeshes.jittered(linear, seed);
  }

  /** The model on a mesh (either order), starting from the exact field at t = 0. */
  static DiffusionModel model(TetMesh mesh) {
    TimeFunction held = smooth(t -> SA * phi(0, t)[0]);
    TimeFunction env =
        smooth(
            t -> {
              double[] p = phi(LENGTH, t);
              return SB * p[0] + DB * SB * p[1] / H;
            });
    int ia = mesh.volumeGroupIndex("A");
    double[] d = new double[2];
    double[] s = new double[2];
    double[] k = new double[2];
    d[ia] = DA;
    d[1 - ia] = DB;
    s[ia] = SA;
    s[1 - ia] = SB;
    k[1 - ia] = KB;
    double[] r = new double[2];
    r[ia] = RA;
    DiffusionModel m =
        UniformModels.model(
            mesh,
            d,
            s,
            k,
            0,
            Map.of(
                "zmin",
                UniformModels.Condition.concentration(held),
                "zmax",
                UniformModels.Condition.exchange(H, env)));
    m = UniformModels.withConstantSource(m, r);
    double[] phi0 = new double[mesh.nodeCount()];
    for (int v = 0; v < phi0.length; v++) {
      phi0[v] = phi(mesh.coord(v, 2), 0)[0];
    }
    return UniformModels.startingFrom(m, phi0);
  }

  /** A smooth function of time: no breakpoints. */
  static TimeFunction smooth(java.util.function.DoubleUnaryOperator f) {
    return new TimeFunction() {
      @Override
      public double at(double t) {
        return f.applyAsDouble(t);
      }

      @Override
      public double[] breakpoints() {
        return new double[0];
      }
    };
  }
}
