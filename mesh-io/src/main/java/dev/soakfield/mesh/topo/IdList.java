package dev.soakfield.mesh.topo;

/** Collects the file ids of offending items for a finding: counts all, remembers the first few. */
final class IdList {
  /** How many ids a finding lists at most; the rest are only counted. */
  static final int LIMIT = 20;

  private final long[] ids = new long[LIMIT];
  private int count;

  void add(long id) {
    if (count < LIMIT) {
      ids[count] = id;
    }
    count++;
  }

  int count() {
    return count;
  }

  boolean isEmpty() {
    return count == 0;
  }

  /** "4, 9, 12" or "4, 9, ... (and 31 more)". */
  String describe() {
    StringBuilder sb = new StringBuilder();
    int shown = Math.min(count, LIMIT);
    for (int i = 0; i < shown; i++) {
      if (i > 0) {
        sb.append(", ");
      }
      sb.append(ids[i]);
    }
    if (count > LIMIT) {
      sb.append(" (and ").append(count - LIMIT).append(" more)");
    }
    return sb.toString();
  }
}
