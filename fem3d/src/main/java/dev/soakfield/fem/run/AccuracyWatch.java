package dev.soakfield.fem.run;

import dev.soakfield.fem.casefile.CaseSpec;
import dev.soakfield.fem.casefile.ThresholdSpec;
import dev.soakfield.fem.post.SpaceErrorEstimate;
import dev.soakfield.fem.post.ThresholdTimeError;
import dev.soakfield.fem.post.TimeErrorTrack;
import dev.soakfield.fem.results.StateBundle;
import dev.soakfield.mesh.TetMesh;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * How accurate the run is: an estimate of the discretisation error of the uptake, of each probe and
 * of each threshold time, the error in time from the accepted steps ({@link TimeErrorTrack}) plus
 * the error in space from the recovered gradient ({@link SpaceErrorEstimate}). The space estimate
 * is made at every output (its per-element field goes into the frame) and when a threshold is
 * crossed; the summary gives the estimates at the last output. A threshold's time error is the
 * error of the watched value over its rate of change at the crossing, plus the error of
 * interpolating the crossing inside its step, dt²·|Q''|/(8·|Q'|).
 */
final class AccuracyWatch {
  /** The cell field in the frames: the estimated mean |c − c_h| per tetrahedron. */
  static final String FIELD = "error_indicator";

  private final CaseSpec spec;
  private final TetMesh mesh;
  private final int probeCount;
  private final int[] probeTets;
  private final List<ThresholdSpec> thresholds;
  private final int[] thresholdIndex;
  private final double[] partVolume;
  private final double[] scales;
  private final TimeErrorTrack track;
  private final double[] thresholdSeconds;
  private final double[] previousWatched;
  private double previousTime;
  private double amountStart;
  private double[] lastQuantities;
  private SpaceErrorEstimate lastSpace;
  private double[] crossings = new double[0];

  /**
   * @param probeTets the tetrahedron of each probe, −1 for one outside the mesh
   * @param partVolume each part's volume, m³
   * @param scales each part's solve concentration per declared one
   */
  AccuracyWatch(
      CaseSpec spec, TetMesh mesh, int[] probeTets, double[] partVolume, double[] scales) {
    this.spec = spec;
    this.mesh = mesh;
    this.probeCount = probeTets.length;
    this.probeTets = probeTets.clone();
    this.thresholds = spec.thresholds();
    this.partVolume = partVolume.clone();
    this.scales = scales.clone();
    thresholdIndex = new int[thresholds.size()];
    for (int i = 0; i < thresholdIndex.length; i++) {
      ThresholdSpec.Where w = thresholds.get(i).where();
      int k = -1;
      if (w.kind() == ThresholdSpec.Kind.PROBE) {
        for (int p = 0; p < spec.probes().size(); p++) {
          if (spec.probes().get(p).name().equals(w.name())) {
            k = p;
          }
        }
      } else {
        k = mesh.volumeGroupIndex(w.name());
      }
      thresholdIndex[i] = k;
    }
    track = new TimeErrorTrack(1 + probeCount + thresholds.size());
    thresholdSeconds = new double[thresholds.size()];
    java.util.Arrays.fill(thresholdSeconds, Double.NaN);
    previousWatched = new double[thresholds.size()];
  }

  /** The quantities followed: amount, each probe, each threshold's watched value. */
  private double[] quantities(double amount, double[] probes, ThresholdWatch.Reading r) {
    double[] q = new double[1 + probeCount + thresholds.size()];
    q[0] = amount;
    System.arraycopy(probes, 0, q, 1, probeCount);
    for (int i = 0; i < thresholds.size(); i++) {
      q[1 + probeCount + i] = watched(i, r);
    }
    return q;
  }

  private double watched(int i, ThresholdWatch.Reading r) {
    int k = thresholdIndex[i];
    if (k < 0) {
      return Double.NaN;
    }
    return switch (thresholds.get(i).where().kind()) {
      case PART -> r.freeMaxima()[k];
      case MEAN -> r.means()[k];
      case PROBE -> r.probes()[k];
    };
  }

  void start(double amount, double[] probes, ThresholdWatch.Reading r) {
    amountStart = amount;
    lastQuantities = quantities(amount, probes, r);
    track.start(r.t(), lastQuantities);
    for (int i = 0; i < thresholds.size(); i++) {
      previousWatched[i] = watched(i, r);
      if (beyond(i, previousWatched[i])) {
        thresholdSeconds[i] = 0; // crossed at the start: no error in its time
      }
    }
    previousTime = r.t();
  }

  /**
   * Follows an accepted step; when a threshold is first crossed, estimates the error of its time
   * from the field then ({@code phi}, c = tetS·φ).
   */
  void step(
      double dt,
      double theta,
      double amount,
      double[] probes,
      ThresholdWatch.Reading r,
      double[] phi,
      double[] tetS) {
    lastQuantities = quantities(amount, probes, r);
    track.step(r.t(), dt, theta, lastQuantities);
    SpaceErrorEstimate space = null;
    for (int i = 0; i < thresholds.size(); i++) {
      double now = watched(i, r);
      if (Double.isNaN(thresholdSeconds[i]) && beyond(i, now)) {
        if (space == null) {
          space = SpaceErrorEstimate.of(mesh, phi, tetS);
        }
        int q = 1 + probeCount + i;
        double rate = (now - previousWatched[i]) / (r.t() - previousTime);
        thresholdSeconds[i] =
            ThresholdTimeError.of(
                    spaceError(i, space), track.estimates()[q], rate, dt, track.secondDerivative(q))
                .seconds();
      }
      previousWatched[i] = now;
    }
    previousTime = r.t();
  }

  private static double finite(double v) {
    return Double.isNaN(v) ? 0 : v;
  }

  private boolean beyond(int i, double v) {
    ThresholdSpec s = thresholds.get(i);
    return !Double.isNaN(v) && (s.rises() ? v >= s.level() : v < s.level());
  }

  /** The space error of threshold i's watched value, in the case's unit. */
  private double spaceError(int i, SpaceErrorEstimate space) {
    int k = thresholdIndex[i];
    double[] e = space.elementErrors();
    return switch (thresholds.get(i).where().kind()) {
      case PROBE -> probeError(k, space);
      case MEAN -> {
        boolean[] part = new boolean[mesh.volumeGroups().size()];
        part[k] = true;
        yield space.amountError(part, mesh) / (partVolume[k] * scales[k]);
      }
      case PART -> {
        double worst = 0;
        for (int t = 0; t < e.length; t++) {
          if (mesh.tetGroup(t) == k) {
            worst = Math.max(worst, Math.abs(e[t]) / scales[k]);
          }
        }
        yield worst;
      }
    };
  }

  private double probeError(int p, SpaceErrorEstimate space) {
    int t = probeTets[p];
    return t < 0 ? Double.NaN : space.pointError(mesh, t) / scales[mesh.tetGroup(t)];
  }

  /**
   * The estimate at an output: kept for the summary; its per-element field, in the case's
   * concentration unit, for the frame.
   */
  double[] atOutput(double[] phi, double[] tetS) {
    lastSpace = SpaceErrorEstimate.of(mesh, phi, tetS);
    double[] e = lastSpace.elementErrors();
    double[] field = new double[e.length];
    for (int t = 0; t < field.length; t++) {
      field[t] = Math.abs(e[t]) / scales[mesh.tetGroup(t)];
    }
    return field;
  }

  /** The summary's "accuracy" block: relative errors of uptake and probes, threshold seconds. */
  Map<String, Object> summary() {
    Map<String, Object> root = new LinkedHashMap<>();
    double[] q = lastQuantities;
    if (q == null) {
      q = new double[1 + probeCount + thresholds.size()];
      java.util.Arrays.fill(q, Double.NaN); // nothing seen: no estimate
    }
    double[] time = track.estimates();
    double uptake = q[0] - amountStart;
    double amount =
        lastSpace == null
            ? Double.NaN
            : (lastSpace.amountError() + finite(time[0])) / Math.abs(uptake);
    root.put("amount", number(amount));
    Map<String, Object> probes = new LinkedHashMap<>();
    for (int p = 0; p < probeCount; p++) {
      double value = q[1 + p];
      double rel =
          lastSpace == null
              ? Double.NaN
              : (probeError(p, lastSpace) + finite(time[1 + p])) / Math.abs(value);
      probes.put(spec.probes().get(p).name(), number(rel));
    }
    root.put("probes", probes);
    Map<String, Object> times = new LinkedHashMap<>();
    for (int i = 0; i < thresholds.size(); i++) {
      times.put(thresholds.get(i).name(), number(thresholdSeconds[i]));
    }
    root.put("thresholds", times);
    return root;
  }

  private static Object number(double v) {
    return Double.isFinite(v) ? v : null;
  }

  /** Warnings when an estimate exceeds the case's {@code accuracy} level. */
  List<String> warnings() {
    if (spec.accuracy().isEmpty()) {
      return List.of();
    }
    double level = spec.accuracy().getAsDouble();
    List<String> out = new java.util.ArrayList<>();
    Map<String, Object> s = summary();
    if (s.get("amount") instanceof Double a && a > level) {
      out.add(
          String.format(
              Locale.ROOT,
              "accuracy: the uptake's estimated discretisation error is %.2g of it, above the"
                  + " case's accuracy %.2g; refine the mesh where the error_indicator field is"
                  + " largest (for the first outputs, towards exposed faces) or shorten the"
                  + " steps",
              a,
              level));
    }
    @SuppressWarnings("unchecked")
    Map<String, Object> probes = (Map<String, Object>) s.get("probes");
    for (var e : probes.entrySet()) {
      if (e.getValue() instanceof Double d && d > level) {
        out.add(
            String.format(
                Locale.ROOT,
                "accuracy: probe '%s' has an estimated error of %.2g of its value, above the"
                    + " case's accuracy %.2g",
                e.getKey(),
                d,
                level));
      }
    }
    for (int i = 0; i < thresholds.size(); i++) {
      double when = lastCrossing(i);
      if (Double.isFinite(thresholdSeconds[i]) && when > 0 && thresholdSeconds[i] > level * when) {
        out.add(
            String.format(
                Locale.ROOT,
                "accuracy: threshold '%s' is crossed at about %.4g s give or take %.2g s, more"
                    + " than the case's accuracy %.2g of that time",
                thresholds.get(i).name(),
                when,
                thresholdSeconds[i],
                level));
      }
    }
    return out;
  }

  /** The crossing times, as the threshold watch found them (set by the recorder at the end). */
  void crossings(double[] firstTimes) {
    crossings = firstTimes.clone();
  }

  private double lastCrossing(int i) {
    return i < crossings.length ? crossings[i] : Double.NaN;
  }

  void snapshot(StateBundle b) {
    b.put("rec.accuracy.track", track.snapshot());
    b.put("rec.accuracy.thresholds", thresholdSeconds);
    b.put("rec.accuracy.previous", previousWatched);
    b.put("rec.accuracy.scalars", amountStart, previousTime);
    b.put("rec.accuracy.last", lastQuantities);
  }

  void restore(StateBundle b) {
    if (!b.has("rec.accuracy.track")) {
      return; // a checkpoint from before the estimate: it starts afresh
    }
    track.restore(b.get("rec.accuracy.track"));
    System.arraycopy(b.get("rec.accuracy.thresholds"), 0, thresholdSeconds, 0, thresholds.size());
    System.arraycopy(b.get("rec.accuracy.previous"), 0, previousWatched, 0, thresholds.size());
    double[] s = b.get("rec.accuracy.scalars");
    amountStart = s[0];
    previousTime = s[1];
    lastQuantities = b.get("rec.accuracy.last");
  }
}
