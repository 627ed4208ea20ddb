package dev.soakfield.mesh.topo;

import java.util.Arrays;

/** Stable least-significant-digit radix sort of non-negative long keys that carry an int each. */
final class RadixSort {
  private static final int DIGIT_BITS = 11;
  private static final int BUCKETS = 1 << DIGIT_BITS;

  private RadixSort() {}

  /**
   * Sorts {@code keys} ascending and moves {@code payload} along; equal keys keep their order.
   *
   * @param keyBits every key lies in [0, 2^keyBits); fewer bits mean fewer passes
   */
  static void sort(long[] keys, int[] payload, int keyBits) {
    int n = keys.length;
    long[] srcKeys = keys;
    int[] srcLoad = payload;
    long[] dstKeys = new long[n];
    int[] dstLoad = new int[n];
    int[] start = new int[BUCKETS];
    for (int shift = 0; shift < keyBits; shift += DIGIT_BITS) {
      Arrays.fill(start, 0);
      for (int i = 0; i < n; i++) {
        start[(int) ((srcKeys[i] >>> shift) & (BUCKETS - 1))]++;
      }
      int sum = 0;
      for (int d = 0; d < BUCKETS; d++) {
        int c = start[d];
        start[d] = sum;
        sum += c;
      }
      for (int i = 0; i < n; i++) {
        int pos = start[(int) ((srcKeys[i] >>> shift) & (BUCKETS - 1))]++;
        dstKeys[pos] = srcKeys[i];
        dstLoad[pos] = srcLoad[i];
      }
      long[] tk = srcKeys;
      srcKeys = dstKeys;
      dstKeys = tk;
      int[] tl = srcLoad;
      srcLoad = dstLoad;
      dstLoad = tl;
    }
    if (srcKeys != keys) {
      System.arraycopy(srcKeys, 0, keys, 0, n);
      System.arraycopy(srcLoad, 0, payload, 0, n);
    }
  }

  /** Bits needed for a value in [0, count): at least 1. */
  static int bitsFor(int count) {
    return Math.max(1, 32 - Integer.numberOfLeadingZeros(Math.max(count - 1, 0)));
  }
}
