package dev.soakfield.fem.run;

import dev.soakfield.fem.model.DiffusionModel;
import dev.soakfield.fem.model.FaceCondition;
import dev.soakfield.fem.model.MaterialBehaviour;
import dev.soakfield.fem.physics.FaceKind;
import dev.soakfield.fem.physics.TimeFunction;
import dev.soakfield.fem.results.StateBundle;
import dev.soakfield.mesh.TetMesh;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeSet;

/**
 * Watches the maximum principle: diffusion without sources, fed only through faces held at or
 * exchanging with given potentials, keeps the potential between the smallest and the largest of the
 * start state and those potentials (e.g. Evans, Partial Differential Equations, §7.1.4, for the
 * parabolic case). A discrete solution that leaves that range is a discretisation artefact: the
 * consistent capacity overshoots at a step change on a held face (the lumped one with non-obtuse
 * elements does not), and a concentration below zero is the same defect. The watch reports the
 * largest excursion as a warning; it only applies where the principle holds (no sources, no flux
 * faces, solubilities that do not change with time).
 */
final class RangeWatch {
  /** Excursions below this share of the range are round-off. */
  static final double ROUND_OFF = 1e-9;

  private final double lo;
  private final double hi;
  private final TetMesh mesh;
  private double worst; // largest excursion beyond [lo, hi], in potential
  private double worstTime = Double.NaN;
  private int worstNode = -1;
  private boolean below;
  private final List<Map<String, Object>> atOutputs = new ArrayList<>();

  private RangeWatch(double lo, double hi, TetMesh mesh) {
    this.lo = lo;
    this.hi = hi;
    this.mesh = mesh;
  }

  /** A watch for the model, or empty where the maximum principle does not bound its solution. */
  static Optional<RangeWatch> of(DiffusionModel model, double end) {
    if (model.hasSourceLaws() || model.hasFirstOrderSource() || model.hasConstantSource()) {
      return Optional.empty();
    }
    for (MaterialBehaviour m : model.materials()) {
      if (m.solubilityEnergy() != 0 && model.coefficientsVary()) {
        return Optional.empty(); // φ is rescaled when S changes: its range moves with it
      }
    }
    double lo = Double.POSITIVE_INFINITY;
    double hi = Double.NEGATIVE_INFINITY;
    for (double p : model.initialPhi()) {
      lo = Math.min(lo, p);
      hi = Math.max(hi, p);
    }
    for (FaceCondition f : model.faces()) {
      if (f.kind() == FaceKind.SEALED) {
        continue;
      }
      if (f.kind() == FaceKind.FLUX || f.kind() == FaceKind.LAW) {
        return Optional.empty(); // a flux can drive the potential anywhere
      }
      double[] s = f.faceSolubility();
      for (double t : samples(f.value(), model.temperature(), end)) {
        double v = f.value().at(t);
        for (double si : f.valueIsPotential() ? new double[] {1} : s) {
          lo = Math.min(lo, v / si);
          hi = Math.max(hi, v / si);
        }
      }
    }
    return Optional.of(new RangeWatch(lo, hi, model.space().mesh()));
  }

  /** The start, the end, every breakpoint and the midpoints between them (ambient values bend). */
  private static double[] samples(TimeFunction value, TimeFunction temperature, double end) {
    TreeSet<Double> t = new TreeSet<>();
    t.add(0.0);
    t.add(end);
    for (double b : value.breakpoints()) {
      t.add(Math.min(end, Math.max(0, b)));
    }
    for (double b : temperature.breakpoints()) {
      t.add(Math.min(end, Math.max(0, b)));
    }
    double[] points = t.stream().mapToDouble(Double::doubleValue).toArray();
    double[] all = new double[2 * points.length - 1];
    for (int i = 0; i < points.length; i++) {
      all[2 * i] = points[i];
      if (i + 1 < points.length) {
        all[2 * i + 1] = 0.5 * (points[i] + points[i + 1]);
      }
    }
    return all;
  }

  /**
   * Takes the step ending at {@code t}; at an output it also notes how many nodes are out of range
   * and the farthest one, in concentration ({@code nodalS}·φ) and place.
   */
  void step(double t, double[] phi, boolean output, double[] nodalS) {
    int outside = 0;
    int far = -1;
    double farthest = 0;
    double span = span();
    for (int i = 0; i < phi.length; i++) {
      double p = phi[i];
      double out = p < lo ? lo - p : p > hi ? p - hi : 0;
      if (out > ROUND_OFF * span) {
        outside++;
        if (out > farthest) {
          farthest = out;
          far = i;
        }
      }
      if (out > worst) {
        worst = out;
        worstTime = t;
        worstNode = i;
        below = p < lo;
      }
    }
    if (output && far >= 0) {
      Map<String, Object> m = new LinkedHashMap<>();
      m.put("time", t);
      m.put("nodes_out_of_range", outside);
      m.put("farthest", nodalS[far] * phi[far]);
      m.put("at", place(far));
      m.put("share_of_range", farthest / span);
      atOutputs.add(m);
    }
  }

  private double span() {
    return hi - lo > 0 ? hi - lo : Math.max(Math.abs(hi), Double.MIN_NORMAL);
  }

  private double[] place(int node) {
    return new double[] {mesh.coord(node, 0), mesh.coord(node, 1), mesh.coord(node, 2)};
  }

  /** Per output where nodes were out of range: time, count, farthest value and its place. */
  List<Map<String, Object>> outputs() {
    return List.copyOf(atOutputs);
  }

  /** The largest excursion as a share of the range (of hi where the range is a single value). */
  double excursion() {
    return worst / span();
  }

  /** The warning to give, empty when the solution stayed in range. */
  Optional<String> warning(boolean lumped) {
    if (excursion() <= ROUND_OFF) {
      return Optional.empty();
    }
    return Optional.of(
        String.format(
            Locale.ROOT,
            "the solution left the range the data allow (no sources: it must stay between the"
                + " start state and the faces' values) by up to %.3g %% of that range, %s it, at"
                + " t = %.6g s at (%.4g, %.4g, %.4g) m%s (summary.json's range_excursions lists"
                + " every output where it did). This is the %s capacity's overshoot at a step"
                + " change next to a held face, an artefact of the time step and mesh near it; %s",
            100 * excursion(),
            below ? "below" : "above",
            worstTime,
            place(worstNode)[0],
            place(worstNode)[1],
            place(worstNode)[2],
            below && lo == 0 ? " (a negative concentration)" : "",
            lumped ? "lumped" : "consistent",
            advice(lumped)));
  }

  /**
   * What keeps the solution in range. Quadratic elements keep no bound under any capacity: their
   * stiffness couples corner and edge nodes with weights of both signs (common practice; from
   * memory, Thomée, Galerkin Finite Element Methods for Parabolic Problems, ch. 15).
   */
  private String advice(boolean lumped) {
    if (mesh.order() == 2) {
      return "quadratic elements keep no such bound under either capacity (they couple corner and"
          + " edge nodes with weights of both signs): where the bound matters use linear elements"
          + " with \"capacity\": \"lumped\", or refine the mesh near the face.";
    }
    return lumped
        ? "refine the mesh near the face (obtuse elements break the bound)."
        : "\"capacity\": \"lumped\" keeps the solution in range, or refine the mesh"
            + " and the first steps.";
  }

  void snapshot(StateBundle b) {
    b.put("rec.range", worst, worstTime, below ? 1 : 0, worstNode);
  }

  void restore(StateBundle b) {
    if (b.has("rec.range")) {
      double[] r = b.get("rec.range");
      worst = r[0];
      worstTime = r[1];
      below = r[2] != 0;
      worstNode = r.length > 3 ? (int) r[3] : worstNode;
    }
  }
}
