package dev.soakfield.mesh.topo;

import java.util.Arrays;

/**
 * The distinct values of a tag array in order of first appearance, and each item's dense index into
 * them; by sorting and binary search, without boxing.
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

  int size() {
    return distinct.length;
  }

  /** The g-th distinct tag, in order of first appearance. */
  int tag(int g) {
    return distinct[g];
  }

  /** Dense index (into the distinct tags) of item i. */
  int indexOf(int i) {
    return indexOf[i];
  }
}
