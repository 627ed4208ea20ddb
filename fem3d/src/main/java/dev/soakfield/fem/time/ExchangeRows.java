package dev.soakfield.fem.time;

import dev.soakfield.fem.assembly.CsrMatrix;
import dev.soakfield.fem.model.DiffusionModel;
import dev.soakfield.fem.model.FaceCondition;
import java.util.ArrayList;
import java.util.List;

/**
 * The amount exchange faces let in during a step, read from the equations of their nodes. The
 * environment's formula h·(c_env − c) is exact but, with a transfer coefficient far above D over
 * the element size, c sits within round-off of c_env and the difference loses every digit: at h =
 * 1e6 m/s, D = 1e-10 m²/s and 1 mm elements it is wrong by about 1e-3 of the step's uptake. The
 * rest of a face node's equation — its change of amount and what diffusion carries on to its
 * neighbours, less fluxes and sources — has no such cancellation and, the step being solved, equals
 * what the exchange gave that node. So each exchange node's inflow is that remainder; the formula
 * only splits it where several exchange groups (or a held face) share the node.
 */
final class ExchangeRows {
  private final DiffusionModel model;
  private final BoundarySets boundary;
  private final double[] constantLoad;
  private final int[] nodes; // every dof on an exchange face, once
  private final int[][] groupsAt; // per node: the exchange groups (indices into exchanges) on it

  ExchangeRows(DiffusionModel model, BoundarySets boundary, double[] constantLoad) {
    this.model = model;
    this.boundary = boundary;
    this.constantLoad = constantLoad;
    int n = model.space().dofCount();
    List<List<Integer>> groups = new ArrayList<>(n);
    for (int i = 0; i < n; i++) {
      groups.add(null);
    }
    int count = 0;
    for (int g = 0; g < boundary.exchanges.size(); g++) {
      for (int d : boundary.exchanges.get(g).dofs()) {
        if (groups.get(d) == null) {
          groups.set(d, new ArrayList<>(2));
          count++;
        }
        if (!groups.get(d).contains(g)) {
          groups.get(d).add(g);
        }
      }
    }
    nodes = new int[count];
    groupsAt = new int[count][];
    int k = 0;
    for (int i = 0; i < n; i++) {
      if (groups.get(i) != null) {
        nodes[k] = i;
        groupsAt[k] = groups.get(i).stream().mapToInt(Integer::intValue).toArray();
        k++;
      }
    }
  }

  /** The dofs on exchange faces: their inflow is accounted here, not as a held face's reaction. */
  boolean[] nodeMask() {
    boolean[] mask = new boolean[model.space().dofCount()];
    for (int i : nodes) {
      mask[i] = true;
    }
    return mask;
  }

  /**
   * Adds the step's inflow through every exchange group, and the held faces' reaction at nodes they
   * share with exchange faces, into {@code inflow} (by face group). {@code q} are the source laws'
   * nodal rates at the end of the step (zeros without laws).
   */
  void addInflow(
      double[] inflow,
      CoefficientCache.Coefficients c0,
      CoefficientCache.Coefficients c1,
      Step step,
      double[] phi0,
      double[] phi1,
      double[] q) {
    int exchangeCount = boundary.exchanges.size();
    double[] terms = new double[exchangeCount];
    double[] weights = new double[exchangeCount];
    for (int k = 0; k < nodes.length; k++) {
      int i = nodes[k];
      double rest = remainder(i, c0, c1, step, phi0, phi1) - step.dt * q[i];
      double formula = 0;
      double weightSum = 0;
      for (int g : groupsAt[k]) {
        terms[g] = formulaTerm(g, i, c0, c1, step, phi0, phi1);
        weights[g] = shareWeight(g, i, c0, c1, step);
        formula += terms[g];
        weightSum += weights[g];
      }
      if (boundary.isPrescribed[i]) {
        // the held value takes in whatever the exchange does not bring
        for (int g : groupsAt[k]) {
          inflow[boundary.exchanges.get(g).condition().group()] += terms[g];
        }
        inflow[boundary.prescribedOwner[i]] += rest - formula;
        continue;
      }
      double correction = rest - formula;
      for (int g : groupsAt[k]) {
        double share = weightSum > 0 ? weights[g] / weightSum : 1.0 / groupsAt[k].length;
        inflow[boundary.exchanges.get(g).condition().group()] += terms[g] + share * correction;
      }
    }
  }

  /** The times and weight of one step. */
  record Step(double t0, double t1, double dt, double theta) {}

  /**
   * Node i's equation without the exchange terms: M₁φ₁ − M₀φ₀ + dt·(θ L₁φ₁ + (1−θ) L₀φ₀) − dt·(θ f₁
   * + (1−θ) f₀), L and f without exchange (diffusion, first-order sources, fluxes, constant
   * sources).
   */
  private double remainder(
      int i,
      CoefficientCache.Coefficients c0,
      CoefficientCache.Coefficients c1,
      Step s,
      double[] phi0,
      double[] phi1) {
    double r = row(c1.capacity, i, phi1) - row(c0.capacity, i, phi0);
    r += s.theta * s.dt * transport(c1, i, phi1);
    if (s.theta < 1.0) {
      r += (1 - s.theta) * s.dt * transport(c0, i, phi0);
    }
    double load = constantLoad[i];
    for (BoundarySets.Flux f : boundary.fluxes) {
      FaceCondition fc = f.condition();
      double value =
          s.theta * fc.value().at(s.t1) + (s.theta < 1.0 ? (1 - s.theta) * fc.value().at(s.t0) : 0);
      load += value * f.unitLoad()[i];
    }
    return r - s.dt * load;
  }

  private double transport(CoefficientCache.Coefficients co, int i, double[] phi) {
    double v = row(co.stiffness, i, phi);
    return model.hasFirstOrderSource() ? v - row(co.sink, i, phi) : v;
  }

  /** Exchange group g's own formula at node i: dt·h·(∫S N c_env − (H φ)_i), theta-weighted. */
  private double formulaTerm(
      int g,
      int i,
      CoefficientCache.Coefficients c0,
      CoefficientCache.Coefficients c1,
      Step s,
      double[] phi0,
      double[] phi1) {
    double v = s.theta * s.dt * exchangeRate(g, i, c1, s.t1, phi1);
    if (s.theta < 1.0) {
      v += (1 - s.theta) * s.dt * exchangeRate(g, i, c0, s.t0, phi0);
    }
    return v;
  }

  private double exchangeRate(
      int g, int i, CoefficientCache.Coefficients co, double t, double[] phi) {
    BoundarySets.Exchange e = boundary.exchanges.get(g);
    FaceCondition c = e.condition();
    double h = c.coefficient().at(t);
    if (h == 0) {
      return 0;
    }
    double[] u = c.valueIsPotential() ? co.exchangeSLoad.get(g) : e.unitLoad();
    return h * (c.value().at(t) * u[i] - row(co.exchangeMass.get(g), i, phi));
  }

  /** How much of node i's exchange group g conducts: h·(H_g)_ii. */
  private double shareWeight(
      int g, int i, CoefficientCache.Coefficients c0, CoefficientCache.Coefficients c1, Step s) {
    double w = s.theta * conductance(g, i, c1, s.t1);
    if (s.theta < 1.0) {
      w += (1 - s.theta) * conductance(g, i, c0, s.t0);
    }
    return w;
  }

  private double conductance(int g, int i, CoefficientCache.Coefficients co, double t) {
    return boundary.exchanges.get(g).condition().coefficient().at(t)
        * diagonal(co.exchangeMass.get(g), i);
  }

  private static double diagonal(CsrMatrix a, int i) {
    int[] rs = a.rowStart();
    int[] cols = a.cols();
    for (int k = rs[i]; k < rs[i + 1]; k++) {
      if (cols[k] == i) {
        return a.values()[k];
      }
    }
    return 0;
  }

  private static double row(CsrMatrix a, int i, double[] x) {
    int[] rs = a.rowStart();
    int[] cols = a.cols();
    double[] v = a.values();
    double s = 0;
    for (int k = rs[i]; k < rs[i + 1]; k++) {
      s += v[k] * x[cols[k]];
    }
    return s;
  }
}
