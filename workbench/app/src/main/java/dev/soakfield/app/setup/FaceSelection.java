package dev.soakfield.app.setup;

import java.util.ArrayList;
import java.util.List;

/**
 * The face groups selected for an edit, shared by the view and the list so both stay in step: a
 * click selects one group, a click with Shift adds it (or takes it away again), a click on nothing
 * clears the selection. Kept in the order the groups were picked.
 */
public final class FaceSelection {
  private final List<String> selected = new ArrayList<>();

  /** A plain click on a face group (or on nothing, {@code null}). */
  public void click(String group) {
    selected.clear();
    if (group != null) {
      selected.add(group);
    }
  }

  /** A click with Shift: adds the group, or takes it away when it was selected. */
  public void toggle(String group) {
    if (!selected.remove(group)) {
      selected.add(group);
    }
  }

  /** The list's check box of a group set on or off. */
  public void set(String group, boolean on) {
    selected.remove(group);
    if (on) {
      selected.add(group);
    }
  }

  public boolean contains(String group) {
    return selected.contains(group);
  }

  public List<String> groups() {
    return List.copyOf(selected);
  }

  public boolean isEmpty() {
    return selected.isEmpty();
  }

  /** Keeps only groups that still exist (after a split or rename of the mesh's groups). */
  public void retain(List<String> existing) {
    selected.retainAll(existing);
  }
}
