package dev.soakfield.fem.sweep;

import java.io.Serializable;
import java.util.List;

/**
 * One case of a sweep: its id ({@code 0001}, ...) and the value of each varied key as JSON text, in
 * the order of the sweep file's {@code vary}.
 */
public record PlannedCase(String id, List<String> values) implements Serializable {
  private static final long serialVersionUID = 1L;

  public PlannedCase {
    values = List.copyOf(values);
  }
}
