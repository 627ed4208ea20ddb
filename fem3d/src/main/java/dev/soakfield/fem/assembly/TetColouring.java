package dev.soakfield.fem.assembly;

import java.util.Arrays;

/**
 * Greedy colouring of the tetrahedra so that no two tetrahedra of one colour share a node: the
 * tetrahedra of one colour can then add into the matrix from several threads without locks, and the
 * result does not depend on the number of threads. Tetrahedra that share a mid-edge node share that
 * edge's corners, so checking corners is enough.
 */
final class TetColouring {
  private final int[] order;
  private final int[] colourStart;

  private TetColouring(int[] order, int[] colourStart) {
    this.order = order;
    this.colourStart = colourStart;
  }

  /** Tetrahedra grouped by colour, ascending within each colour. */
  int[] order() {
    return order;
  }

  int colourCount() {
    return colourStart.length - 1;
  }

  /** First position in {@link #order()} of colour c; colour c ends where c + 1 starts. */
  int colourStart(int c) {
    return colourStart[c];
  }

  static TetColouring of(int[] tets, int perTet, int nodeCount) {
    int tetCount = tets.length / perTet;
    int[] colour = new int[tetCount];
    Arrays.fill(colour, -1);
    // Colours are handed out 64 at a time, one bit each in a per-node mask; tetrahedra that find
    // all 64 taken wait for the next round.
    long[] used = new long[nodeCount];
    int left = tetCount;
    int base = 0;
    while (left > 0) {
      Arrays.fill(used, 0L);
      for (int t = 0; t < tetCount; t++) {
        if (colour[t] >= 0) {
          continue;
        }
        int p = t * perTet;
        long taken = used[tets[p]] | used[tets[p + 1]] | used[tets[p + 2]] | used[tets[p + 3]];
        if (taken == -1L) {
          continue;
        }
        int bit = Long.numberOfTrailingZeros(~taken);
        long flag = 1L << bit;
        used[tets[p]] |= flag;
        used[tets[p + 1]] |= flag;
        used[tets[p + 2]] |= flag;
        used[tets[p + 3]] |= flag;
        colour[t] = base + bit;
        left--;
      }
      base += 64;
    }
    int colours = 0;
    for (int c : colour) {
      colours = Math.max(colours, c + 1);
    }
    int[] start = new int[colours + 1];
    for (int c : colour) {
      start[c + 1]++;
    }
    for (int c = 0; c < colours; c++) {
      start[c + 1] += start[c];
    }
    int[] fill = Arrays.copyOf(start, colours);
    int[] order = new int[tetCount];
    for (int t = 0; t < tetCount; t++) {
      order[fill[colour[t]]++] = t;
    }
    return new TetColouring(order, start);
  }
}
