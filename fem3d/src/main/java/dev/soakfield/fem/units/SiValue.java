package dev.soakfield.fem.units;

import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.DoubleUnaryOperator;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.measure.IncommensurableException;
import javax.measure.MetricPrefix;
import javax.measure.Unit;
import javax.measure.UnitConverter;
import javax.measure.format.MeasurementParseException;
import tech.units.indriya.AbstractUnit;
import tech.units.indriya.format.SimpleUnitFormat;
import tech.units.indriya.unit.Units;

/**
 * Values with units as users write them in case files, CSV headers and on the command line,
 * converted to SI with the JSR 385 reference implementation (Indriya).
 *
 * <p>A value is a number optionally followed by a unit: {@code "2.5e-12 m^2/s"}, {@code "0.009
 * mm^2/h"}, {@code "168 h"}, {@code "85 degC"}, {@code "10 MPa"}, {@code "2 bar"}, {@code "3
 * kg/m^3"}, {@code "42 kJ/mol"}, {@code "1mm"}. A plain number is taken as already in the SI unit
 * asked for. Mass fractions ({@code wt%}, {@code %}, {@code wppm}, {@code ppm}) are pure numbers
 * (SI unit {@code "1"}): {@code "0.3 wt%"} is 0.003. Units are written in Indriya's ASCII-friendly
 * grammar: {@code ^} for powers, {@code *} or {@code ·} for products, {@code /} for quotients, with
 * {@code a/b/c} read as {@code a/(b*c)}; a leading {@code 1/} is allowed ({@code "1/s"}). On top of
 * Indriya's symbols we accept {@code degC}, {@code °C}, {@code bar}, {@code mbar}, {@code um},
 * {@code uA}, {@code ug}, {@code wt%}, {@code wppm} and {@code ppm}.
 *
 * <p>Input only: hot loops never call this. Thread-safe; parsed units and converters are cached, so
 * thousands of values cost little more than their number parsing.
 */
public final class SiValue {
  private static final Pattern NUMBER =
      Pattern.compile("^([+-]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][+-]?\\d+)?)\\s*(.*)$");

  private static final SimpleUnitFormat FORMAT = newFormat();
  private static final Map<String, Unit<?>> UNITS = new ConcurrentHashMap<>();
  private static final Map<String, Affine> CONVERTERS = new ConcurrentHashMap<>();

  /**
   * value_SI = scale·value + offset. Every unit we accept converts affinely; Indriya's converters
   * compute with exact rationals and cost microseconds a call, so each is reduced to two doubles
   * once.
   */
  private record Affine(double scale, double offset) {
    static Affine of(UnitConverter c) {
      double offset = c.convert(0.0);
      double scale = (c.convert(1e6) - offset) / 1e6;
      if (c.isLinear()) {
        scale = c.convert(1.0);
        offset = 0;
      }
      return new Affine(scale, offset);
    }

    double convert(double v) {
      return scale * v + offset;
    }

    Affine inverse() {
      return new Affine(1 / scale, -offset / scale);
    }
  }

  private SiValue() {}

  private static SimpleUnitFormat newFormat() {
    SimpleUnitFormat f = SimpleUnitFormat.getNewInstance();
    f.alias(Units.CELSIUS, "degC");
    f.alias(Units.CELSIUS, "°C");
    f.alias(Units.PASCAL.multiply(1e5), "bar");
    f.alias(Units.PASCAL.multiply(100), "mbar");
    f.alias(MetricPrefix.MICRO(Units.METRE), "um");
    f.alias(MetricPrefix.MICRO(Units.AMPERE), "uA");
    f.alias(MetricPrefix.MICRO(Units.GRAM), "ug");
    f.alias(Units.PERCENT, "wt%");
    f.alias(AbstractUnit.ONE.divide(1e6), "wppm");
    f.alias(AbstractUnit.ONE.divide(1e6), "ppm");
    return f;
  }

  /**
   * Parses "2.5e-12 m^2/s", "168 h", "85 degC", "10 MPa" or a plain number (taken as already in
   * {@code siUnit}) into a value in {@code siUnit}.
   *
   * @param siUnit the SI unit wanted, as users write it ("m^2/s", "s", "K", "Pa", "J/mol", "1")
   * @throws UnitException when the text is not a number with a unit, or its unit has another
   *     dimension than {@code siUnit}; the message says what was found and what was expected
   */
  public static double parse(String text, String siUnit) throws UnitException {
    Matcher m = NUMBER.matcher(text.strip());
    if (!m.matches()) {
      throw new UnitException(
          "'" + text + "'", "a number, optionally with a unit of " + describe(siUnit));
    }
    double number = Double.parseDouble(m.group(1));
    String unit = m.group(2).strip();
    if (unit.isEmpty()) {
      return number;
    }
    return converter("'" + text.strip() + "'", unit, siUnit).convert(number);
  }

  /**
   * A conversion from {@code unit} to {@code siUnit}, for a column of numbers that share one unit
   * (a CSV header such as {@code time [h]}). An empty {@code unit} is the identity.
   *
   * @throws UnitException when {@code unit} is unknown or of another dimension than {@code siUnit}
   */
  public static DoubleUnaryOperator converterTo(String unit, String siUnit) throws UnitException {
    String u = unit.strip();
    if (u.isEmpty()) {
      unitOf(siUnit, "");
      return DoubleUnaryOperator.identity();
    }
    Affine c = converter("", u, siUnit);
    return c::convert;
  }

  /**
   * {@code si}, a value in {@code siUnit}, expressed in {@code unit} (for output in the units users
   * think in, e.g. a diffusivity in mm^2/h).
   *
   * @throws UnitException when the two units differ in dimension
   */
  public static double fromSi(double si, String siUnit, String unit) throws UnitException {
    return converter("", unit, siUnit).inverse().convert(si);
  }

  /**
   * A readable form of {@code si}, a value in {@code siUnit}: four significant digits and the unit
   * in Indriya's symbols ({@code "2.500e-12 m²/s"}); a pure number prints without a unit.
   *
   * @throws IllegalArgumentException when {@code siUnit} is not a unit
   */
  public static String format(double si, String siUnit) {
    Unit<?> u;
    try {
      u = unitOf(siUnit, "");
    } catch (UnitException e) {
      throw new IllegalArgumentException(e.getMessage(), e);
    }
    String number = formatNumber(si);
    if (u.equals(AbstractUnit.ONE)) {
      return number;
    }
    return number + " " + FORMAT.format(u);
  }

  /** Four significant digits, plain notation between 0.01 and 1e5, scientific otherwise. */
  public static String formatNumber(double v) {
    double a = Math.abs(v);
    if (v == 0 || (a >= 0.01 && a < 1e5)) {
      return String.format(Locale.ROOT, "%.4g", v);
    }
    return String.format(Locale.ROOT, "%.3e", v);
  }

  /**
   * The physical dimension of a value or a unit, in Indriya's notation: {@code "[L]²/[T]"} for
   * {@code "0.009 mm^2/h"}, {@code "one"} for a pure number or a mass fraction.
   *
   * @throws UnitException when the unit is unknown
   */
  public static String dimensionOf(String text) throws UnitException {
    String t = text.strip();
    Matcher m = NUMBER.matcher(t);
    String unit = m.matches() ? m.group(2).strip() : t;
    if (unit.isEmpty()) {
      return AbstractUnit.ONE.getDimension().toString();
    }
    return unitOf(unit, "'" + t + "'").getDimension().toString();
  }

  private static Affine converter(String found, String unit, String siUnit) throws UnitException {
    String key = unit + "\u0000" + siUnit;
    Affine cached = CONVERTERS.get(key);
    if (cached != null) {
      return cached;
    }
    Unit<?> from = unitOf(unit, found);
    Unit<?> to = unitOf(siUnit, "");
    String shown = found.isEmpty() ? "unit '" + unit + "'" : found;
    if (!from.isCompatible(to)) {
      throw new UnitException(
          shown + " of dimension " + from.getDimension(), "a value in " + describe(siUnit));
    }
    UnitConverter c;
    try {
      c = from.getConverterToAny(to);
    } catch (IncommensurableException e) {
      throw new UnitException(
          shown + " of dimension " + from.getDimension(), "a value in " + describe(siUnit));
    }
    Affine affine = Affine.of(c);
    CONVERTERS.put(key, affine);
    return affine;
  }

  private static String describe(String siUnit) {
    try {
      return siUnit + " (dimension " + unitOf(siUnit, "").getDimension() + ")";
    } catch (UnitException e) {
      return siUnit;
    }
  }

  private static Unit<?> unitOf(String unit, String found) throws UnitException {
    Unit<?> cached = UNITS.get(unit);
    if (cached != null) {
      return cached;
    }
    Unit<?> parsed = parseUnit(unit, found);
    UNITS.put(unit, parsed);
    return parsed;
  }

  /** Indriya's format keeps mutable state while parsing: one parse at a time. */
  private static synchronized Unit<?> parseUnit(String unit, String found) throws UnitException {
    String u = unit.strip();
    if (u.equals("1")) {
      return AbstractUnit.ONE;
    }
    try {
      if (u.startsWith("1/")) {
        return AbstractUnit.ONE.divide(parseUnit(u.substring(2), found));
      }
      return parseWhole(chainedQuotient(u));
    } catch (MeasurementParseException | IllegalArgumentException e) {
      throw new UnitException(
          found.isEmpty() ? "unknown unit '" + u + "'" : found + " with unknown unit '" + u + "'",
          "a unit such as m, mm, h, degC, MPa, bar, kg/m^3, m^2/s, kJ/mol, wppm or wt%");
    }
  }

  private static Unit<?> parseWhole(String u) {
    return FORMAT.parse(u);
  }

  /**
   * Indriya reads {@code mol/m^2/s} as {@code mol·s/m²}; users mean {@code mol/(m^2*s)} (common
   * practice, though the SI brochure advises parentheses). Rewrites the chain when it has none.
   */
  private static String chainedQuotient(String u) {
    if (u.indexOf('(') >= 0) {
      return u;
    }
    String[] parts = u.split("/", -1);
    if (parts.length <= 2) {
      return u;
    }
    StringBuilder b = new StringBuilder(parts[0]).append("/(");
    for (int i = 1; i < parts.length; i++) {
      if (i > 1) {
        b.append('*');
      }
      b.append(parts[i]);
    }
    return b.append(')').toString();
  }
}
