package dev.soakfield.mesh.msh;

/**
 * Open-addressing hash map from long keys to non-negative int values, for sparse node tags. Plain
 * arrays and linear probing: no boxing on the lookup path.
 */
final class LongIntMap {
  private final long[] keys;
  private final int[] values;
  private final int mask;

  /** A map that holds up to {@code capacity} entries at a load factor of at most one half. */
  LongIntMap(int capacity) {
    int size = Integer.highestOneBit(Math.max(4, capacity) * 2 - 1) << 1;
    keys = new long[size];
    values = new int[size];
    java.util.Arrays.fill(values, -1);
    mask = size - 1;
  }

  private int slot(long key) {
    long h = key * 0x9E3779B97F4A7C15L;
    return (int) (h ^ (h >>> 29)) & mask;
  }

  /** Stores {@code value} under {@code key}; returns the value already stored there, or -1. */
  int putIfAbsent(long key, int value) {
    int i = slot(key);
    while (values[i] >= 0) {
      if (keys[i] == key) {
        return values[i];
      }
      i = (i + 1) & mask;
    }
    keys[i] = key;
    values[i] = value;
    return -1;
  }

  /** The value stored under {@code key}, or -1. */
  int get(long key) {
    int i = slot(key);
    while (values[i] >= 0) {
      if (keys[i] == key) {
        return values[i];
      }
      i = (i + 1) & mask;
    }
    return -1;
  }
}
