package dev.soakfield.fem.time;

import dev.soakfield.fem.assembly.SystemAssembler;
import dev.soakfield.fem.model.DiffusionModel;
import dev.soakfield.fem.model.FaceCondition;
import dev.soakfield.fem.model.FaceLawUse;
import dev.soakfield.fem.model.FaceOwners;
import dev.soakfield.fem.physics.FaceKind;
import dev.soakfield.fem.physics.HydrogenFugacity;
import dev.soakfield.law.api.FacePoint;
import dev.soakfield.law.api.FluxSink;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;

/**
 * The face laws of a model (surface kinetics), evaluated at the nodes of their face groups: each
 * node carries its share of the group's area (∫N over the faces, so the flux is integrated as the
 * flux faces' loads are) and the solubility of the material behind it; q = Σ area share·J(S·φ) and
 * ∂q/∂φ = area share·S·∂J/∂c join the source laws' in Newton's method. Nodes that a concentration
 * or ambient face prescribes are left to it.
 */
final class FaceLawSources {
  /** One face group with a face law. */
  @SuppressWarnings("ArrayRecordComponent") // built once here and never handed out
  private record Group(
      FaceCondition condition,
      FaceLawUse use,
      int[] dofs,
      double[] weights,
      double[] referenceS,
      int[] material) {}

  /** Reused point handed to laws (single-threaded evaluation). */
  private static final class Probe implements FacePoint, FluxSink {
    double c;
    double temperature;
    double time;
    double pressure;
    double flux;
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
    public double pressure() {
      return pressure;
    }

    @Override
    public void set(double flux, double derivative) {
      this.flux = flux;
      this.derivative = derivative;
    }
  }

  private final DiffusionModel model;
  private final List<Group> groups = new ArrayList<>();
  private final Probe probe = new Probe();

  FaceLawSources(DiffusionModel model, SystemAssembler asm, boolean[] isPrescribed) {
    this.model = model;
    int n = model.space().dofCount();
    int[] owner = FaceOwners.of(model.space().mesh());
    double[] tetS = model.solubility();
    int[] tetMaterial = model.tetMaterial();
    for (FaceCondition fc : model.faces()) {
      if (fc.kind() != FaceKind.LAW) {
        continue;
      }
      int[] faces = fc.faces();
      double[] ones = new double[faces.length];
      Arrays.fill(ones, 1.0);
      double[] load = new double[n];
      asm.addFaceLoad(load, faces, ones, 1.0);
      double[] nodeS = new double[n];
      int[] nodeMaterial = new int[n];
      for (int face : faces) {
        for (int d : asm.faceDofs(new int[] {face})) {
          nodeS[d] = tetS[owner[face]];
          nodeMaterial[d] = tetMaterial[owner[face]];
        }
      }
      int[] dofs = asm.faceDofs(faces);
      double[] weights = new double[dofs.length];
      double[] s = new double[dofs.length];
      int[] m = new int[dofs.length];
      for (int i = 0; i < dofs.length; i++) {
        weights[i] = isPrescribed[dofs[i]] ? 0.0 : load[dofs[i]];
        s[i] = nodeS[dofs[i]];
        m[i] = nodeMaterial[dofs[i]];
      }
      groups.add(new Group(fc, fc.law().orElseThrow(), dofs, weights, s, m));
    }
  }

  boolean isEmpty() {
    return groups.isEmpty();
  }

  /** Adds q and ∂q/∂φ of the face laws at the end of a step to {@code q} and {@code dq}. */
  void add(double[] phi, double t1, double kelvin, double[] q, double[] dq) {
    for (Group g : groups) {
      prepare(g, t1, kelvin);
      for (int i = 0; i < g.dofs.length; i++) {
        if (g.weights[i] == 0) {
          continue;
        }
        double s = solubility(g, i, kelvin);
        int d = g.dofs[i];
        answer(g, s * phi[d], t1, kelvin);
        q[d] += g.weights[i] * probe.flux;
        dq[d] += g.weights[i] * s * probe.derivative;
      }
    }
  }

  /**
   * Adds what each face-law group took in over the step, dt·Σ area share·J at the step's end, to
   * {@code inflow} (by face group index); returns the sum over the groups.
   */
  double addInflow(double[] phi, double t1, double dt, double kelvin, double[] inflow) {
    double total = 0;
    for (Group g : groups) {
      prepare(g, t1, kelvin);
      double sum = 0;
      for (int i = 0; i < g.dofs.length; i++) {
        if (g.weights[i] == 0) {
          continue;
        }
        answer(g, solubility(g, i, kelvin) * phi[g.dofs[i]], t1, kelvin);
        sum += g.weights[i] * probe.flux;
      }
      inflow[g.condition.group()] += dt * sum;
      total += dt * sum;
    }
    return total;
  }

  private void prepare(Group g, double t1, double kelvin) {
    probe.temperature = kelvin;
    probe.time = t1;
    double p = Math.max(g.condition.value().at(t1), 0);
    probe.pressure = p > 0 ? HydrogenFugacity.fugacity(p, kelvin) : 0.0;
  }

  private double solubility(Group g, int i, double kelvin) {
    return g.referenceS[i]
        * model
            .materials()
            .get(g.material[i])
            .solubilityRatio(kelvin, model.referenceTemperature());
  }

  private void answer(Group g, double c, double t1, double kelvin) {
    probe.c = c;
    probe.flux = Double.NaN;
    probe.derivative = Double.NaN;
    try {
      g.use.law().flux(probe, probe);
    } catch (RuntimeException e) {
      throw failure(g, t1, "threw " + e, e);
    }
    if (!Double.isFinite(probe.flux) || !Double.isFinite(probe.derivative)) {
      throw failure(
          g,
          t1,
          String.format(
              Locale.ROOT,
              "returned flux %s and derivative %s at c = %.6g, T = %.2f K",
              probe.flux,
              probe.derivative,
              c,
              kelvin),
          null);
    }
  }

  private static RunFailedException failure(Group g, double t, String what, Throwable cause) {
    return new RunFailedException(
        t,
        String.format(
            Locale.ROOT,
            "face law '%s' (%s) on face group '%s' %s at t = %.6g s; the run stopped there",
            g.use.id(),
            g.use.origin(),
            g.condition.name(),
            what,
            t),
        cause);
  }
}
