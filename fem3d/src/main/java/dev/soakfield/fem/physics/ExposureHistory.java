package dev.soakfield.fem.physics;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.TreeSet;

/**
 * The environment over time: temperature, relative humidity and gas pressure, piecewise linear in
 * segments that may jump where one segment ends and the next begins. Values at a time t are left
 * limits (the end of the segment that ends at t), because a time step ending at t belongs to that
 * segment; at t ≤ 0 they are the first segment's starting values.
 */
public final class ExposureHistory {
  /** 20 °C, the temperature of a case that names none (common practice for "room temperature"). */
  public static final double ROOM_TEMPERATURE = 293.15;

  /**
   * One stretch of the history with values varying linearly from its start to its end. Humidity or
   * pressure is NaN where the segment does not give it.
   */
  public record Segment(
      double start,
      double end,
      double temperatureStart,
      double temperatureEnd,
      double humidityStart,
      double humidityEnd,
      double pressureStart,
      double pressureEnd) {
    public Segment {
      if (!(end > start)) {
        throw new IllegalArgumentException(
            "segment end " + end + " must follow its start " + start);
      }
      if (!(temperatureStart > 0 && temperatureEnd > 0)) {
        throw new IllegalArgumentException("segment temperatures must be positive kelvin");
      }
    }

    double interpolate(double a, double b, double t) {
      double s = (t - start) / (end - start);
      return a + (b - a) * Math.min(1.0, Math.max(0.0, s));
    }
  }

  private final List<Segment> segments;

  /** A history of consecutive segments (each starting where the previous ended, the first at 0). */
  public ExposureHistory(List<Segment> segments) {
    if (segments.isEmpty()) {
      throw new IllegalArgumentException("an exposure history needs at least one segment");
    }
    this.segments = List.copyOf(segments);
    double t = 0;
    for (Segment s : this.segments) {
      Objects.requireNonNull(s, "segment");
      if (Math.abs(s.start() - t) > 1e-9 * Math.max(1, Math.abs(t))) {
        throw new IllegalArgumentException(
            "segment starting at " + s.start() + " should start at " + t);
      }
      t = s.end();
    }
  }

  /** A constant temperature for ever (no humidity, no pressure). */
  public static ExposureHistory isothermal(double kelvin, double end) {
    return new ExposureHistory(
        List.of(
            new Segment(0, end, kelvin, kelvin, Double.NaN, Double.NaN, Double.NaN, Double.NaN)));
  }

  public List<Segment> segments() {
    return segments;
  }

  /** Where the history ends, s. */
  public double end() {
    return segments.get(segments.size() - 1).end();
  }

  private Segment segmentAt(double t) {
    // binary search for the first segment whose end is ≥ t (left-limit semantics)
    int lo = 0;
    int hi = segments.size() - 1;
    while (lo < hi) {
      int mid = (lo + hi) >>> 1;
      if (segments.get(mid).end() >= t) {
        hi = mid;
      } else {
        lo = mid + 1;
      }
    }
    return segments.get(lo);
  }

  /** Temperature at t, K. */
  public double temperature(double t) {
    Segment s = segmentAt(t);
    return s.interpolate(s.temperatureStart(), s.temperatureEnd(), t);
  }

  /** Relative humidity at t (0–1), NaN where the history gives none. */
  public double humidity(double t) {
    Segment s = segmentAt(t);
    return s.interpolate(s.humidityStart(), s.humidityEnd(), t);
  }

  /** Gas pressure at t, Pa, NaN where the history gives none. */
  public double pressure(double t) {
    Segment s = segmentAt(t);
    return s.interpolate(s.pressureStart(), s.pressureEnd(), t);
  }

  /** True when the temperature changes anywhere. */
  public boolean varies() {
    double t0 = segments.get(0).temperatureStart();
    for (Segment s : segments) {
      if (s.temperatureStart() != t0 || s.temperatureEnd() != t0) {
        return true;
      }
    }
    return false;
  }

  /** Segment ends (where values may jump or change slope), excluding 0. */
  public double[] breakpoints() {
    TreeSet<Double> all = new TreeSet<>();
    for (Segment s : segments) {
      if (s.start() > 0) {
        all.add(s.start());
      }
      all.add(s.end());
    }
    return all.stream().mapToDouble(Double::doubleValue).toArray();
  }

  /** Temperature as a time function (breakpoints where segments meet). */
  public TimeFunction temperatureFunction() {
    return function(this::temperature);
  }

  /** A quantity derived from the history as a time function with the history's breakpoints. */
  public TimeFunction function(java.util.function.DoubleUnaryOperator valueAtTime) {
    double[] kinks = breakpoints();
    return new TimeFunction() {
      @Override
      public double at(double t) {
        return valueAtTime.applyAsDouble(t);
      }

      @Override
      public double[] breakpoints() {
        return kinks.clone();
      }
    };
  }

  /** Segments repeated {@code times} times, shifted to follow each other from {@code start}. */
  public static List<Segment> repeat(List<Segment> block, int times, double start) {
    List<Segment> out = new ArrayList<>();
    double t = start;
    for (int k = 0; k < times; k++) {
      for (Segment s : block) {
        double len = s.end() - s.start();
        out.add(
            new Segment(
                t,
                t + len,
                s.temperatureStart(),
                s.temperatureEnd(),
                s.humidityStart(),
                s.humidityEnd(),
                s.pressureStart(),
                s.pressureEnd()));
        t += len;
      }
    }
    return out;
  }
}
