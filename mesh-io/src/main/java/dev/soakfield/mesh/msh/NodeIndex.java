package dev.soakfield.mesh.msh;

/**
 * Maps the file's node tags to dense indices in file order: a direct table when the tags are dense
 * enough, a primitive hash map when they are sparse.
 */
final class NodeIndex {
  /** A table may be this many times longer than the node count before hashing wins. */
  private static final long DENSE_FACTOR = 4;

  private final long minTag;
  private final int[] table;
  private final LongIntMap map;

  private NodeIndex(long minTag, int[] table, LongIntMap map) {
    this.minTag = minTag;
    this.table = table;
    this.map = map;
  }

  /**
   * Builds the index of {@code tags[0..count)}.
   *
   * @return the index, or the position (as {@code -1 - j}) of the first repeated tag through {@code
   *     duplicate[0]}
   */
  static NodeIndex build(long[] tags, int count, int[] duplicate) {
    duplicate[0] = -1;
    long min = Long.MAX_VALUE;
    long max = Long.MIN_VALUE;
    for (int i = 0; i < count; i++) {
      min = Math.min(min, tags[i]);
      max = Math.max(max, tags[i]);
    }
    if (count == 0) {
      return new NodeIndex(0, new int[0], null);
    }
    long span = max - min + 1;
    if (span > 0 && span <= DENSE_FACTOR * count + 1024) {
      int[] table = new int[(int) span];
      java.util.Arrays.fill(table, -1);
      for (int i = 0; i < count; i++) {
        int k = (int) (tags[i] - min);
        if (table[k] >= 0) {
          duplicate[0] = i;
          return null;
        }
        table[k] = i;
      }
      return new NodeIndex(min, table, null);
    }
    LongIntMap map = new LongIntMap(count);
    for (int i = 0; i < count; i++) {
      if (map.putIfAbsent(tags[i], i) >= 0) {
        duplicate[0] = i;
        return null;
      }
    }
    return new NodeIndex(min, null, map);
  }

  /** Dense index of node {@code tag}, or -1 when the file has no such node. */
  int indexOf(long tag) {
    if (table != null) {
      long k = tag - minTag;
      return k >= 0 && k < table.length ? table[(int) k] : -1;
    }
    return map.get(tag);
  }
}
