package dev.soakfield.app.setup;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Undo and redo over whole states: every edit pushes the state it made, so undoing any kind of edit
 * is the same step back (case states are small; a changed mesh is shared, never copied).
 *
 * @param <S> an immutable state
 */
final class EditHistory<S> {
  private record Entry<S>(S state, String label) {}

  private final List<Entry<S>> entries = new ArrayList<>();
  private int at;
  private int savedAt;

  EditHistory(S first) {
    entries.add(new Entry<>(first, "open"));
  }

  S current() {
    return entries.get(at).state();
  }

  void push(S state, String label) {
    entries.subList(at + 1, entries.size()).clear();
    if (savedAt > at) {
      savedAt = -1; // the saved state can no longer be reached by undo and redo
    }
    entries.add(new Entry<>(state, label));
    at++;
  }

  /** The edit undo would take back, if any. */
  Optional<String> undoLabel() {
    return at > 0 ? Optional.of(entries.get(at).label()) : Optional.empty();
  }

  /** The edit redo would make again, if any. */
  Optional<String> redoLabel() {
    return at + 1 < entries.size() ? Optional.of(entries.get(at + 1).label()) : Optional.empty();
  }

  boolean undo() {
    if (at == 0) {
      return false;
    }
    at--;
    return true;
  }

  boolean redo() {
    if (at + 1 >= entries.size()) {
      return false;
    }
    at++;
    return true;
  }

  void markSaved() {
    savedAt = at;
  }

  boolean unsaved() {
    return savedAt != at;
  }
}
