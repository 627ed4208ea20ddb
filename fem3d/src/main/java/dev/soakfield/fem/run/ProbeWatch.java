package dev.soakfield.fem.run;

import dev.soakfield.fem.assembly.FeSpace;
import dev.soakfield.fem.assembly.PointLocator;
import dev.soakfield.fem.casefile.ProbeSpec;
import dev.soakfield.fem.model.ProbeSides;
import dev.soakfield.fem.post.ThresholdClock;
import dev.soakfield.fem.results.StateBundle;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/**
 * The case's probes: c at each point after every step, and when each first reached the threshold.
 */
final class ProbeWatch {
  private final List<Optional<PointLocator.Probe>> probes = new ArrayList<>();
  private final double threshold;
  private final double[] first;
  private final double[] previous;
  private double[] last;

  ProbeWatch(
      List<ProbeSpec> specs,
      FeSpace space,
      double threshold,
      double[] tetS,
      double[] phi0,
      List<String> warnings) {
    // the locator's search tree costs about as much as the matrices: built only for probes
    PointLocator locator = specs.isEmpty() ? null : new PointLocator(space);
    for (ProbeSpec p : specs) {
      Optional<PointLocator.Probe> found = ProbeSides.locate(p, space.mesh(), locator);
      if (found.isEmpty()) {
        warnings.add("probe '" + p.name() + "' lies outside the mesh; its column is empty");
      }
      probes.add(found);
    }
    this.threshold = threshold;
    first = new double[probes.size()];
    Arrays.fill(first, -1);
    previous = values(phi0, tetS);
    for (int i = 0; i < first.length; i++) {
      if (previous[i] >= threshold) {
        first[i] = 0;
      }
    }
  }

  /** c = S·φ at each probe (NaN for a probe outside the mesh). */
  double[] values(double[] phi, double[] tetS) {
    double[] v = new double[probes.size()];
    for (int i = 0; i < v.length; i++) {
      Optional<PointLocator.Probe> p = probes.get(i);
      v[i] = p.isPresent() ? tetS[p.get().tet()] * p.get().value(phi) : Double.NaN;
    }
    return v;
  }

  /** Follows one accepted step ending at t. */
  void step(double t, double dt, double[] phi, double[] tetS) {
    double[] pv = values(phi, tetS);
    for (int i = 0; i < pv.length; i++) {
      if (first[i] < 0 && pv[i] >= threshold) {
        first[i] = ThresholdClock.crossing(t - dt, previous[i], t, pv[i], threshold);
      }
    }
    System.arraycopy(pv, 0, previous, 0, pv.length);
    last = pv;
  }

  /** The tetrahedron each probe lies in, −1 for one outside the mesh. */
  int[] tets() {
    int[] t = new int[probes.size()];
    for (int i = 0; i < t.length; i++) {
      t[i] = probes.get(i).map(PointLocator.Probe::tet).orElse(-1);
    }
    return t;
  }

  /** The values after the last step, empty before the first. */
  Optional<double[]> last() {
    return Optional.ofNullable(last);
  }

  /** The time each probe first reached the threshold, −1 where it has not. */
  double firstTime(int probe) {
    return first[probe];
  }

  void snapshot(StateBundle b) {
    b.put("rec.probe.first", first).put("rec.probe.previous", previous);
    if (last != null) {
      b.put("rec.last.probes", last);
    }
  }

  void restore(StateBundle b) {
    System.arraycopy(b.get("rec.probe.first"), 0, first, 0, first.length);
    System.arraycopy(b.get("rec.probe.previous"), 0, previous, 0, previous.length);
    last = b.has("rec.last.probes") ? b.get("rec.last.probes") : null;
  }
}
