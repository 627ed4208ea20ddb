package dev.soakfield.mesh.topo;

/** Orders a set of indices by a double key per index (stable bottom-up merge sort, no boxing). */
final class IndexSort {
  private IndexSort() {}

  /** Sorts {@code idx} in place so that {@code key[idx[i]]} ascends. */
  static void byKey(int[] idx, double[] key) {
    int n = idx.length;
    int[] src = idx;
    int[] dst = new int[n];
    for (int width = 1; width < n; width *= 2) {
      for (int lo = 0; lo < n; lo += 2 * width) {
        int mid = Math.min(lo + width, n);
        int hi = Math.min(lo + 2 * width, n);
        int i = lo;
        int j = mid;
        int k = lo;
        while (i < mid && j < hi) {
          dst[k++] = key[src[j]] < key[src[i]] ? src[j++] : src[i++];
        }
        while (i < mid) {
          dst[k++] = src[i++];
        }
        while (j < hi) {
          dst[k++] = src[j++];
        }
      }
      int[] t = src;
      src = dst;
      dst = t;
    }
    if (src != idx) {
      System.arraycopy(src, 0, idx, 0, n);
    }
  }
}
