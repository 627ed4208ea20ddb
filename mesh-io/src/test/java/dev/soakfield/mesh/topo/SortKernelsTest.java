package dev.soakfield.mesh.topo;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** The primitive sorts checked against the JDK's own sort as the reference. */
class SortKernelsTest {
  @Test
  void radixSortMatchesJdkSortAndIsStable() {
    SplittableRandom random = new SplittableRandom(7);
    int n = 50_000;
    long[] keys = new long[n];
    int[] payload = new int[n];
    for (int i = 0; i < n; i++) {
      keys[i] = random.nextLong(1L << 40) & ~0xFFL; // many ties in the low digit
      keys[i] = random.nextInt(4) == 0 ? 12345L << 8 : keys[i];
      payload[i] = i;
    }
    long[] expected = keys.clone();
    Arrays.sort(expected);
    long[] original = keys.clone();
    RadixSort.sort(keys, payload, 40);
    assertArrayEquals(expected, keys);
    for (int i = 0; i < n; i++) {
      assertEquals(original[payload[i]], keys[i]);
      if (i > 0 && keys[i] == keys[i - 1]) {
        assertTrue(payload[i] > payload[i - 1], "stable at " + i);
      }
    }
  }

  @Test
  void indexSortOrdersByKeyAndIsStable() {
    SplittableRandom random = new SplittableRandom(11);
    int n = 10_001;
    double[] key = new double[n];
    int[] idx = new int[n];
    for (int i = 0; i < n; i++) {
      key[i] = random.nextInt(500) * 0.25;
      idx[i] = i;
    }
    IndexSort.byKey(idx, key);
    double[] expected = key.clone();
    Arrays.sort(expected);
    for (int i = 0; i < n; i++) {
      assertEquals(expected[i], key[idx[i]]);
      if (i > 0 && key[idx[i]] == key[idx[i - 1]]) {
        assertTrue(idx[i] > idx[i - 1]);
      }
    }
  }

  @Test
  void bitsForCoversTheLargestIndex() {
    assertEquals(1, RadixSort.bitsFor(1));
    assertEquals(1, RadixSort.bitsFor(2));
    assertEquals(2, RadixSort.bitsFor(3));
    assertEquals(21, RadixSort.bitsFor(1 << 21));
    assertEquals(22, RadixSort.bitsFor((1 << 21) + 1));
  }
}
