package dev.soakfield.fem.assembly;

import java.util.Arrays;

/**
 * Greedy colouring of blocks of consecutive tetrahedra so that no two blocks of one colour share a
 * node: the blocks of one colour can then add into the matrix from several threads without locks,
 * and every matrix entry receives its contributions in the same order whatever the number of
 * threads. Blocks (rather than single tetrahedra) keep the mesh's own memory order inside each
 * block; colouring single tetrahedra scatters every pass over the whole matrix and measured about
 * seven times slower. Tetrahedra that share a mid-edge node share that edge's corners, so checking
 * corners is enough.
 */
final class TetColouring {
  /** Default tetrahedra per block: large enough for locality, small enough for many blocks. */
  static final int BLOCK = 256;

  private final int blockSize;
  private final int tetCount;
  private final int[] blocks;
  private final int[] colourStart;

  private TetColouring(int blockSize, int tetCount, int[] blocks, int[] colourStart) {
    this.blockSize = blockSize;
    this.tetCount = tetCount;
    this.blocks = blocks;
    this.colourStart = colourStart;
  }

  int colourCount() {
    return colourStart.length - 1;
  }

  /** First position in the block list of colour c; colour c ends where c + 1 starts. */
  int colourStart(int c) {
    return colourStart[c];
  }

  /** The block at position k of the colour-ordered block list. */
  int block(int k) {
    return blocks[k];
  }

  /** First tetrahedron of block b. */
  int firstTet(int b) {
    return b * blockSize;
  }

  /** One past the last tetrahedron of block b. */
  int endTet(int b) {
    return Math.min(tetCount, (b + 1) * blockSize);
  }

  static TetColouring of(int[] tets, int perTet, int nodeCount, int blockSize) {
    if (blockSize < 1) {
      throw new IllegalArgumentException("block size must be at least 1, got " + blockSize);
    }
    int tetCount = tets.length / perTet;
    int blockCount = (int) (((long) tetCount + blockSize - 1) / blockSize);
    int[] colour = new int[blockCount];
    Arrays.fill(colour, -1);
    // Colours are handed out 64 at a time, one bit each in a per-node mask; blocks that find all
    // 64 taken wait for the next round.
    long[] used = new long[nodeCount];
    int left = blockCount;
    int base = 0;
    while (left > 0) {
      Arrays.fill(used, 0L);
      for (int b = 0; b < blockCount; b++) {
        if (colour[b] >= 0) {
          continue;
        }
        int from = b * blockSize * perTet;
        int to = Math.min(tetCount, (b + 1) * blockSize) * perTet;
        long taken = 0;
        for (int p = from; p < to; p += perTet) {
          taken |= used[tets[p]] | used[tets[p + 1]] | used[tets[p + 2]] | used[tets[p + 3]];
        }
        if (taken == -1L) {
          continue;
        }
        int bit = Long.numberOfTrailingZeros(~taken);
        long flag = 1L << bit;
        for (int p = from; p < to; p += perTet) {
          used[tets[p]] |= flag;
          used[tets[p + 1]] |= flag;
          used[tets[p + 2]] |= flag;
          used[tets[p + 3]] |= flag;
        }
        colour[b] = base + bit;
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
    int[] blocks = new int[blockCount];
    for (int b = 0; b < blockCount; b++) {
      blocks[fill[colour[b]]++] = b;
    }
    return new TetColouring(blockSize, tetCount, blocks, start);
  }
}
