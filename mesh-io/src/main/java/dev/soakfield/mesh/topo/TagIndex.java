package dev.soakfield.mesh.topo;

import java.util.Arrays;
import java.util.Map;

/**
 * The distinct values of a tag array (in order of first appearance unless reordered), and each
 * item's dense index into them; by sorting and binary search, without boxing.
 */
final class TagIndex {
  private final int[] distinct;
  private final int[] indexOf;

  private TagIndex(int[] distinct, int[] indexOf) {
    this.distinct = distinct;
    this.indexOf = indexOf;
  }

  static TagIndex of(int[] tags) {
    int[] sorted = tags.clone();
    Arrays.sort(sorted);
    int unique = 0;
    for (int i = 0; i < sorted.length; i++) {
      if (i == 0 || sorted[i] != sorted[i - 1]) {
        sorted[unique++] = sorted[i];
      }
    }
    int[] rank = new int[unique];
    Arrays.fill(rank, -1);
    int[] distinct = new int[unique];
    int[] indexOf = new int[tags.length];
    int next = 0;
    for (int i = 0; i < tags.length; i++) {
      int j = Arrays.binarySearch(sorted, 0, unique, tags[i]);
      if (rank[j] < 0) {
        rank[j] = next;
        distinct[next] = tags[i];
        next++;
      }
      indexOf[i] = rank[j];
    }
    return new TagIndex(distinct, indexOf);
  }

  /**
   * The same index with the tags that {@code named} lists first, in its order (the order a file
   * names its groups in), then the rest in order of first appearance; so the groups of a written
   * mesh come back in the order they were written.
   */
  TagIndex namedFirst(Map<Integer, String> named) {
    int[] newIndex = new int[distinct.length];
    Arrays.fill(newIndex, -1);
    int next = 0;
    for (Integer tag : named.keySet()) {
      for (int g = 0; g < distinct.length; g++) {
        if (distinct[g] == tag && newIndex[g] < 0) {
          newIndex[g] = next++;
        }
      }
    }
    for (int g = 0; g < distinct.length; g++) {
      if (newIndex[g] < 0) {
        newIndex[g] = next++;
      }
    }
    int[] d = new int[distinct.length];
    for (int g = 0; g < distinct.length; g++) {
      d[newIndex[g]] = distinct[g];
    }
    int[] idx = new int[indexOf.length];
    for (int i = 0; i < idx.length; i++) {
      idx[i] = newIndex[indexOf[i]];
    }
    return new TagIndex(d, idx);
  }

  int size() {
    return distinct.length;
  }

  /** The g-th distinct tag. */
  int tag(int g) {
    return distinct[g];
  }

  /** Dense index (into the distinct tags) of item i. */
  int indexOf(int i) {
    return indexOf[i];
  }
}
