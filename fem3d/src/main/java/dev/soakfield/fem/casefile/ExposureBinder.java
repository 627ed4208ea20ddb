package dev.soakfield.fem.casefile;

import dev.soakfield.fem.physics.ExposureHistory;
import dev.soakfield.fem.physics.ExposureHistory.Segment;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;

/**
 * Reads {@code exposure}: segments of duration, temperature, humidity and pressure, each value
 * constant or a linear ramp [from, to], and {@code {"repeat": N, "segments": [...]}} blocks for
 * cycling. A value a segment leaves out carries over from where the previous segment ended.
 */
final class ExposureBinder {
  private static final Set<String> SEGMENT_KEYS =
      Set.of("duration", "temperature", "humidity", "pressure");
  private static final Set<String> REPEAT_KEYS = Set.of("repeat", "segments");
  private static final int MAX_SEGMENTS = 1_000_000;

  private final CaseFields fields;
  private double t;
  private double[] last; // temperature, humidity, pressure at the end of the previous segment
  private boolean ok = true;

  ExposureBinder(CaseFields fields) {
    this.fields = fields;
  }

  /**
   * @param startTemperature the case's "temperature", the first segment's default, or NaN
   */
  Optional<ExposureHistory> bind(CaseNode node, String path, double startTemperature) {
    t = 0;
    last = new double[] {startTemperature, Double.NaN, Double.NaN};
    List<Segment> out = new ArrayList<>();
    list(node, path, out, 0);
    if (!ok) {
      return Optional.empty();
    }
    if (out.isEmpty()) {
      fields.problems().found(node, path, "at least one segment");
      return Optional.empty();
    }
    return Optional.of(new ExposureHistory(out));
  }

  private void list(CaseNode node, String path, List<Segment> out, int depth) {
    if (!(node instanceof CaseNode.Arr arr)) {
      fields.problems().found(node, path, "an array of segments");
      ok = false;
      return;
    }
    for (int i = 0; i < arr.items().size() && ok; i++) {
      CaseNode item = arr.items().get(i);
      String itemPath = CasePaths.item(path, i);
      Optional<CaseNode.Obj> obj =
          fields.object(
              item, itemPath, "a segment {duration, temperature, ...} or {repeat, segments}");
      if (obj.isEmpty()) {
        ok = false;
        return;
      }
      if (obj.get().members().containsKey("repeat")) {
        repeat(obj.get(), itemPath, out, depth);
      } else {
        segment(obj.get(), itemPath, out);
      }
      if (out.size() > MAX_SEGMENTS) {
        fields.problems().found(item, itemPath, "at most " + MAX_SEGMENTS + " segments in all");
        ok = false;
      }
    }
  }

  private void repeat(CaseNode.Obj obj, String path, List<Segment> out, int depth) {
    fields.onlyKeys(obj, path, REPEAT_KEYS);
    String rPath = CasePaths.child(path, "repeat");
    OptionalDouble n =
        fields.positive(obj.members().get("repeat").value(), rPath, "a whole number ≥ 1");
    Optional<CaseNode> body = fields.required(obj, path, "segments", "an array of segments");
    if (n.isEmpty() || body.isEmpty() || depth > 8) {
      ok = false;
      return;
    }
    if (n.getAsDouble() != Math.rint(n.getAsDouble())) {
      fields.problems().found(obj.members().get("repeat").value(), rPath, "a whole number ≥ 1");
      ok = false;
      return;
    }
    int times = (int) Math.min(n.getAsDouble(), MAX_SEGMENTS);
    List<Segment> block = new ArrayList<>();
    double start = t;
    list(body.get(), CasePaths.child(path, "segments"), block, depth + 1);
    if (!ok) {
      return;
    }
    out.addAll(ExposureHistory.repeat(block, times, start));
    if (!block.isEmpty()) {
      Segment lastSegment = out.get(out.size() - 1);
      t = lastSegment.end();
    }
  }

  private void segment(CaseNode.Obj obj, String path, List<Segment> out) {
    fields.onlyKeys(obj, path, SEGMENT_KEYS);
    String dPath = CasePaths.child(path, "duration");
    OptionalDouble duration =
        fields
            .required(obj, path, "duration", "a positive duration (\"168 h\")")
            .map(n -> fields.positiveQuantity(n, dPath, "s", "a positive duration (\"168 h\")"))
            .orElse(OptionalDouble.empty());
    double[] temperature = ramp(obj, path, "temperature", "K", 0, "a temperature above 0 K");
    double[] humidity = ramp(obj, path, "humidity", "1", 1, "a relative humidity in [0, 1]");
    double[] pressure = ramp(obj, path, "pressure", "Pa", 2, "a pressure ≥ 0 (\"10 MPa\")");
    if (duration.isEmpty() || temperature == null || humidity == null || pressure == null) {
      ok = false;
      return;
    }
    if (!(temperature[0] > 0 && temperature[1] > 0)) {
      fields.problems().missing(obj, path, "a temperature (here or in the case's \"temperature\")");
      ok = false;
      return;
    }
    for (double h : humidity) {
      if (h < 0 || h > 1) {
        fields
            .problems()
            .found(
                obj.members().get("humidity").value(),
                CasePaths.child(path, "humidity"),
                "a relative humidity in [0, 1] (0.85 or \"85 %\")");
        ok = false;
        return;
      }
    }
    double end = t + duration.getAsDouble();
    if (!(end > t) || Double.isInfinite(end)) {
      // a duration too small to move the clock on at this time (or one that overflows it)
      fields
          .problems()
          .found(
              obj.members().get("duration").value(),
              dPath,
              String.format(
                  java.util.Locale.ROOT,
                  "a duration that moves the history on from t = %.6g s (at least %.3g s)",
                  t,
                  Math.ulp(t) * 2));
      ok = false;
      return;
    }
    out.add(
        new Segment(
            t,
            end,
            temperature[0],
            temperature[1],
            humidity[0],
            humidity[1],
            pressure[0],
            pressure[1]));
    t = end;
    last = new double[] {temperature[1], humidity[1], pressure[1]};
  }

  /** [from, to] of a key: a value, a two-value ramp, or carried over; null on a problem. */
  private double[] ramp(
      CaseNode.Obj obj, String path, String key, String unit, int slot, String what) {
    CaseNode.Member m = obj.members().get(key);
    if (m == null) {
      return new double[] {last[slot], last[slot]};
    }
    String p = CasePaths.child(path, key);
    if (m.value() instanceof CaseNode.Arr arr) {
      Optional<double[]> v =
          fields.numbers(arr, p, 2, "[from, to]: " + what, new String[] {unit, unit});
      if (v.isEmpty() || v.get()[0] < 0 || v.get()[1] < 0) {
        if (v.isPresent()) {
          fields.problems().found(arr, p, what);
        }
        return null;
      }
      return v.get();
    }
    OptionalDouble v = fields.nonNegativeQuantity(m.value(), p, unit, what);
    return v.isPresent() ? new double[] {v.getAsDouble(), v.getAsDouble()} : null;
  }
}
