package dev.soakfield.fem.run;

import dev.soakfield.fem.casefile.ProbeSpec;
import dev.soakfield.fem.casefile.ThresholdSpec;
import dev.soakfield.fem.post.ThresholdClock;
import dev.soakfield.fem.results.StateBundle;
import dev.soakfield.mesh.TetMesh;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The first crossing of each of the case's {@code thresholds}: a part's largest concentration
 * (nodes a face holds at its value left out), its mean, or a probe, rising to or falling below a
 * level, interpolated linearly within the step that crosses.
 */
final class ThresholdWatch {
  /** What one step shows, all in the case's concentration unit. */
  @SuppressWarnings("ArrayRecordComponent") // one step's figures, handed over and not kept
  record Reading(double t, double[] freeMaxima, double[] means, double[] probes) {}

  private final List<ThresholdSpec> thresholds;
  private final int[] index;
  private final double[] first;
  private double[] previous;
  private double previousTime;

  ThresholdWatch(List<ThresholdSpec> thresholds, TetMesh mesh, List<ProbeSpec> probes) {
    this.thresholds = List.copyOf(thresholds);
    index = new int[thresholds.size()];
    List<String> probeNames = new ArrayList<>();
    probes.forEach(p -> probeNames.add(p.name()));
    for (int i = 0; i < index.length; i++) {
      ThresholdSpec.Where w = thresholds.get(i).where();
      index[i] =
          w.kind() == ThresholdSpec.Kind.PROBE
              ? probeNames.indexOf(w.name())
              : mesh.volumeGroupIndex(w.name());
    }
    first = new double[index.length];
    java.util.Arrays.fill(first, -1);
  }

  /** The state at the start: a level already crossed then is crossed at t = 0. */
  void start(Reading r) {
    previous = values(r);
    previousTime = r.t();
    for (int i = 0; i < first.length; i++) {
      if (beyond(i, previous[i])) {
        first[i] = r.t();
      }
    }
  }

  void step(Reading r) {
    double[] now = values(r);
    for (int i = 0; i < first.length; i++) {
      if (first[i] < 0 && beyond(i, now[i])) {
        double level = thresholds.get(i).level();
        first[i] =
            Double.isNaN(previous[i])
                ? r.t()
                : ThresholdClock.crossing(previousTime, previous[i], r.t(), now[i], level);
      }
    }
    previous = now;
    previousTime = r.t();
  }

  private boolean beyond(int i, double v) {
    ThresholdSpec s = thresholds.get(i);
    return !Double.isNaN(v) && (s.rises() ? v >= s.level() : v < s.level());
  }

  private double[] values(Reading r) {
    double[] v = new double[index.length];
    for (int i = 0; i < v.length; i++) {
      int k = index[i];
      v[i] =
          k < 0
              ? Double.NaN
              : switch (thresholds.get(i).where().kind()) {
                case PART -> r.freeMaxima()[k];
                case MEAN -> r.means()[k];
                case PROBE -> r.probes()[k];
              };
    }
    return v;
  }

  /** First crossing time of each threshold, -1 where not crossed (a copy). */
  double[] firstTimes() {
    return first.clone();
  }

  void snapshot(StateBundle b) {
    b.put("rec.thresholds.first", first);
    if (previous != null) {
      b.put("rec.thresholds.previous", previous);
      b.put("rec.thresholds.time", previousTime);
    }
  }

  void restore(StateBundle b) {
    if (b.has("rec.thresholds.first")) {
      System.arraycopy(b.get("rec.thresholds.first"), 0, first, 0, first.length);
    }
    if (b.has("rec.thresholds.previous")) {
      previous = b.get("rec.thresholds.previous");
      previousTime = b.get("rec.thresholds.time")[0];
    }
  }

  /** The summary's entry per threshold, with its unit. */
  List<Map<String, Object>> summary(String unit) {
    List<Map<String, Object>> out = new ArrayList<>();
    for (int i = 0; i < first.length; i++) {
      ThresholdSpec s = thresholds.get(i);
      Map<String, Object> m = new LinkedHashMap<>();
      m.put("name", s.name());
      m.put("where", s.where().spelling());
      m.put("when", s.when());
      m.put("level", s.level());
      m.put("unit", unit);
      m.put("time", first[i] < 0 ? null : first[i]);
      out.add(m);
    }
    return out;
  }
}
