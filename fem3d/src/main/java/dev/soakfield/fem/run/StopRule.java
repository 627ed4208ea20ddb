package dev.soakfield.fem.run;

import dev.soakfield.fem.casefile.CaseSpec;
import dev.soakfield.fem.casefile.StopSpec;
import dev.soakfield.mesh.TetMesh;
import java.util.Optional;

/** The case's {@code time.stop} condition, tested after every accepted step. */
final class StopRule {
  private final Optional<StopSpec> stop;
  private final CaseSpec spec;
  private final TetMesh mesh;
  private double stoppedAt = Double.NaN;

  StopRule(CaseSpec spec, TetMesh mesh) {
    this.stop = spec.time().stop();
    this.spec = spec;
    this.mesh = mesh;
  }

  /**
   * True when the condition holds after the step ending at {@code t > 0}; remembers t.
   *
   * @param maxima the largest c per part after the step, null before the first
   */
  boolean met(double t, double[] maxima, Optional<double[]> probes) {
    if (stop.isEmpty() || maxima == null) {
      return false;
    }
    double value;
    if (stop.get().target().equals("group")) {
      value = maxima[mesh.volumeGroupIndex(stop.get().name())];
    } else {
      int i = 0;
      while (i < spec.probes().size() && !spec.probes().get(i).name().equals(stop.get().name())) {
        i++;
      }
      if (probes.isEmpty() || i >= probes.get().length) {
        return false;
      }
      value = probes.get()[i];
    }
    if (stop.get().met(value) && t > 0) {
      stoppedAt = t;
      return true;
    }
    return false;
  }

  /** When the run stopped on the condition; NaN when it did not. */
  double stoppedAt() {
    return stoppedAt;
  }

  void restore(double time) {
    stoppedAt = time;
  }
}
