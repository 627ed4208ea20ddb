package dev.soakfield.fem.sweep;

import java.io.Serializable;
import java.util.List;

/**
 * What one case of a sweep gave: its id and varied values (JSON text), the collected outputs by
 * column name (NaN where a case has no value, e.g. a threshold never crossed), its status ({@code
 * finished}, or {@code failed: } and the reason) and the wall time it took.
 */
public record CaseRow(
    String id,
    List<String> values,
    List<String> names,
    List<Double> numbers,
    String status,
    double seconds)
    implements Serializable {
  private static final long serialVersionUID = 1L;

  public static final String FINISHED = "finished";

  public CaseRow {
    values = List.copyOf(values);
    names = List.copyOf(names);
    numbers = List.copyOf(numbers);
    if (names.size() != numbers.size()) {
      throw new IllegalArgumentException("names and numbers differ in length");
    }
  }

  /** A case that failed, with its reason on one line. */
  public static CaseRow failed(PlannedCase c, String reason, double seconds) {
    String line = String.valueOf(reason).replaceAll("\\s*[\\r\\n]+\\s*", "; ").strip();
    return new CaseRow(c.id(), c.values(), List.of(), List.of(), "failed: " + line, seconds);
  }

  public boolean finished() {
    return status.equals(FINISHED);
  }

  /** The output named {@code name}; NaN when this row has none. */
  public double value(String name) {
    int i = names.indexOf(name);
    return i < 0 ? Double.NaN : numbers.get(i);
  }
}
