package dev.soakfield.fem.time;

import dev.soakfield.fem.assembly.CsrMatrix;
import dev.soakfield.fem.assembly.SystemAssembler;
import dev.soakfield.fem.model.DiffusionModel;
import dev.soakfield.fem.model.LawUse;
import dev.soakfield.fem.model.MaterialBehaviour;
import dev.soakfield.law.api.LawPoint;
import dev.soakfield.law.api.RateSink;
import dev.soakfield.law.api.StateView;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The source laws of a model, evaluated at nodes: each material's nodes with their lumped volume
 * (nodal quadrature, so a law's state lives at nodes and an interface node keeps one state per
 * material), the committed state at the start of the next step, and the Newton pieces q(φ) and
 * ∂q/∂φ. A law's failure (a throw, NaN or infinity) stops the run with a message naming the law,
 * its origin, the material and the simulated time.
 */
final class LawSources implements NodalSources {
  /** One law acting in one material. */
  private static final class Part {
    final LawUse use;
    final String material;
    final int materialIndex;
    final int[] nodes;
    final double[] weights;
    final double referenceS;
    final int stateCount;
    double[] state; // committed, nodes.length × stateCount

    Part(LawUse use, String material, int materialIndex, int[] nodes, double[] weights, double s) {
      this.use = use;
      this.material = material;
      this.materialIndex = materialIndex;
      this.nodes = nodes;
      this.weights = weights;
      this.referenceS = s;
      this.stateCount = use.law().stateNames().size();
      this.state = new double[nodes.length * stateCount];
    }
  }

  /** Reused point and state views handed to laws (single-threaded evaluation). */
  private static final class Probe implements LawPoint, StateView, RateSink {
    double c;
    double temperature;
    double time;
    double dt;
    double[] state;
    int offset;
    double rate;
    double derivative;

    @Override
    public double concentration() {
      return c;
    }

    @Override
    public double temperature() {
      return temperature;
    }

    @Override
    public double time() {
      return time;
    }

    @Override
    public double dt() {
      return dt;
    }

    @Override
    public double get(int k) {
      return state[offset + k];
    }

    @Override
    public void set(double rate, double derivative) {
      this.rate = rate;
      this.derivative = derivative;
    }
  }

  private final DiffusionModel model;
  private final List<Part> parts = new ArrayList<>();
  private final Probe probe = new Probe();

  LawSources(DiffusionModel model, SystemAssembler asm) {
    this.model = model;
    var mesh = model.space().mesh();
    int[] tetMaterial = model.tetMaterial();
    List<MaterialBehaviour> materials = model.materials();
    for (int m = 0; m < materials.size(); m++) {
      MaterialBehaviour b = materials.get(m);
      if (b.laws().isEmpty()) {
        continue;
      }
      double[] inM = new double[mesh.tetCount()];
      double s = Double.NaN;
      for (int t = 0; t < inM.length; t++) {
        if (tetMaterial[t] == m) {
          inM[t] = 1.0;
          s = model.solubility()[t];
        }
      }
      CsrMatrix lumped = asm.newMatrix();
      asm.addCapacity(lumped, inM, true, 1.0);
      double[] diag = lumped.diagonal();
      int count = 0;
      for (double w : diag) {
        count += w > 0 ? 1 : 0;
      }
      int[] nodes = new int[count];
      double[] weights = new double[count];
      int k = 0;
      for (int i = 0; i < diag.length; i++) {
        if (diag[i] > 0) {
          nodes[k] = i;
          weights[k++] = diag[i];
        }
      }
      for (LawUse use : b.laws()) {
        parts.add(new Part(use, b.name(), m, nodes, weights, s));
      }
    }
  }

  boolean isEmpty() {
    return parts.isEmpty();
  }

  private double solubility(Part p, double kelvin) {
    return p.referenceS
        * model
            .materials()
            .get(p.materialIndex)
            .solubilityRatio(kelvin, model.referenceTemperature());
  }

  /** Sets every state in equilibrium with the potential phi at temperature T (start of a run). */
  void initialize(double[] phi, double kelvin) {
    for (Part p : parts) {
      double s = solubility(p, kelvin);
      double[] one = new double[p.stateCount];
      for (int j = 0; j < p.nodes.length; j++) {
        double c = s * phi[p.nodes[j]];
        try {
          p.use.law().initialState(c, kelvin, one);
        } catch (RuntimeException e) {
          throw failure(p, 0.0, "failed to give its initial state: " + e, e);
        }
        for (int k = 0; k < one.length; k++) {
          check(p, 0.0, one[k], "initial state", c, kelvin);
          p.state[j * p.stateCount + k] = one[k];
        }
      }
    }
  }

  /**
   * q(φ) into {@code q} (amount per second per node: Σ weight·π) and ∂q/∂φ into {@code dq}, at the
   * end of a step [t1 − dt, t1] at temperature T1, from the committed states.
   */
  @Override
  public void evaluate(double[] phi, double t1, double dt, double kelvin, double[] q, double[] dq) {
    java.util.Arrays.fill(q, 0.0);
    java.util.Arrays.fill(dq, 0.0);
    probe.temperature = kelvin;
    probe.time = t1;
    probe.dt = dt;
    for (Part p : parts) {
      double s = solubility(p, kelvin);
      probe.state = p.state;
      for (int j = 0; j < p.nodes.length; j++) {
        int i = p.nodes[j];
        probe.c = s * phi[i];
        probe.offset = j * p.stateCount;
        try {
          p.use.law().rate(probe, probe, probe);
        } catch (RuntimeException e) {
          throw failure(p, t1, "threw " + e, e);
        }
        check(p, t1, probe.rate, "rate", probe.c, kelvin);
        check(p, t1, probe.derivative, "derivative", probe.c, kelvin);
        q[i] += p.weights[j] * probe.rate;
        dq[i] += p.weights[j] * s * probe.derivative;
      }
    }
  }

  /** The states at the end of a converged step (the committed ones are left alone). */
  double[][] advance(double[] phi, double t1, double dt, double kelvin) {
    double[][] out = new double[parts.size()][];
    probe.temperature = kelvin;
    probe.time = t1;
    probe.dt = dt;
    double[] end = new double[0];
    for (int n = 0; n < parts.size(); n++) {
      Part p = parts.get(n);
      double s = solubility(p, kelvin);
      double[] next = new double[p.state.length];
      if (end.length != p.stateCount) {
        end = new double[p.stateCount];
      }
      probe.state = p.state;
      for (int j = 0; j < p.nodes.length; j++) {
        probe.c = s * phi[p.nodes[j]];
        probe.offset = j * p.stateCount;
        try {
          p.use.law().advance(probe, probe, end);
        } catch (RuntimeException e) {
          throw failure(p, t1, "threw " + e, e);
        }
        for (int k = 0; k < end.length; k++) {
          check(p, t1, end[k], "state", probe.c, kelvin);
          next[j * p.stateCount + k] = end[k];
        }
      }
      out[n] = next;
    }
    return out;
  }

  /** Makes states returned by {@link #advance} the committed ones. */
  void commit(double[][] states) {
    for (int n = 0; n < parts.size(); n++) {
      parts.get(n).state = states[n];
    }
  }

  /** A copy of the committed states, for checkpoints. */
  double[][] committed() {
    double[][] out = new double[parts.size()][];
    for (int n = 0; n < out.length; n++) {
      out[n] = parts.get(n).state.clone();
    }
    return out;
  }

  /** The amount trapped in the committed states, per volume group of the mesh. */
  double[] trappedPerGroup(double kelvin) {
    return trappedPerGroup(committedView(), kelvin);
  }

  private double[][] committedView() {
    double[][] out = new double[parts.size()][];
    for (int n = 0; n < out.length; n++) {
      out[n] = parts.get(n).state;
    }
    return out;
  }

  /** The amount the given states hold, per volume group (material name = volume group name). */
  double[] trappedPerGroup(double[][] states, double kelvin) {
    var groups = model.space().mesh().volumeGroups();
    double[] out = new double[groups.size()];
    for (int n = 0; n < parts.size(); n++) {
      Part p = parts.get(n);
      int g = groupIndex(p.material);
      probe.state = states[n];
      double sum = 0;
      for (int j = 0; j < p.nodes.length; j++) {
        probe.offset = j * p.stateCount;
        sum += p.weights[j] * p.use.law().trappedAmount(probe, kelvin);
      }
      if (g >= 0) {
        out[g] += sum;
      }
    }
    return out;
  }

  /** Each law instance as "part:name", in the order of {@link #trappedPerInstance}. */
  List<String> instanceLabels() {
    List<String> out = new ArrayList<>();
    for (Part p : parts) {
      out.add(p.material + ":" + p.use.name());
    }
    return out;
  }

  /** Whether each law instance's trapped amount counts as diffusible. */
  boolean[] reversible() {
    boolean[] out = new boolean[parts.size()];
    for (int n = 0; n < out.length; n++) {
      out[n] = parts.get(n).use.reversible();
    }
    return out;
  }

  /** The amount each law instance's committed states hold. */
  double[] trappedPerInstance(double kelvin) {
    double[] out = new double[parts.size()];
    for (int n = 0; n < out.length; n++) {
      Part p = parts.get(n);
      probe.state = p.state;
      double sum = 0;
      for (int j = 0; j < p.nodes.length; j++) {
        probe.offset = j * p.stateCount;
        sum += p.weights[j] * p.use.law().trappedAmount(probe, kelvin);
      }
      out[n] = sum;
    }
    return out;
  }

  /**
   * What one law instance holds per m³ at each node of its material (0 at other nodes): a field of
   * its own, since an interface node belongs to one instance's material only.
   */
  double[] trappedField(int instance, double kelvin) {
    double[] out = new double[model.space().dofCount()];
    Part p = parts.get(instance);
    probe.state = p.state;
    for (int j = 0; j < p.nodes.length; j++) {
      probe.offset = j * p.stateCount;
      out[p.nodes[j]] = p.use.law().trappedAmount(probe, kelvin);
    }
    return out;
  }

  /** Total amount the committed states hold (no copies). */
  double trappedNow(double kelvin) {
    return trapped(committedView(), kelvin);
  }

  /** Total amount the given states hold. */
  double trapped(double[][] states, double kelvin) {
    double s = 0;
    for (double v : trappedPerGroup(states, kelvin)) {
      s += v;
    }
    return s;
  }

  /** Held amount per m³ at each node (the weighted mean over the materials meeting there). */
  double[] trappedField(double kelvin) {
    int n = model.space().dofCount();
    double[] sum = new double[n];
    double[] weight = new double[n];
    for (Part p : parts) {
      probe.state = p.state;
      for (int j = 0; j < p.nodes.length; j++) {
        probe.offset = j * p.stateCount;
        sum[p.nodes[j]] += p.weights[j] * p.use.law().trappedAmount(probe, kelvin);
      }
    }
    // weights of a node summed once per material, not once per law of that material
    boolean[] seen = new boolean[model.materials().size()];
    for (Part p : parts) {
      if (seen[p.materialIndex]) {
        continue;
      }
      seen[p.materialIndex] = true;
      for (int j = 0; j < p.nodes.length; j++) {
        weight[p.nodes[j]] += p.weights[j];
      }
    }
    for (int i = 0; i < n; i++) {
      sum[i] = weight[i] > 0 ? sum[i] / weight[i] : 0.0;
    }
    return sum;
  }

  private int groupIndex(String name) {
    var groups = model.space().mesh().volumeGroups();
    for (int g = 0; g < groups.size(); g++) {
      if (groups.get(g).name().equals(name)) {
        return g;
      }
    }
    return -1;
  }

  private static void check(Part p, double t, double v, String what, double c, double kelvin) {
    if (!Double.isFinite(v)) {
      throw failure(
          p,
          t,
          String.format(
              Locale.ROOT, "returned %s for its %s at c = %.6g, T = %.2f K", v, what, c, kelvin),
          null);
    }
  }

  private static RunFailedException failure(Part p, double t, String what, Throwable cause) {
    return new RunFailedException(
        t,
        String.format(
            Locale.ROOT,
            "source law '%s' (%s) in material '%s' %s at t = %.6g s; the run stopped there",
            p.use.id(),
            p.use.origin(),
            p.material,
            what,
            t),
        cause);
  }
}
