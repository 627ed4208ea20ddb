package dev.soakfield.fem.solve;

/**
 * Greedy aggregation on the strong-connection graph (Vaněk, Mandel & Brezina 1996): (1) every node
 * whose strong neighbourhood is still free forms an aggregate with it; (2) each remaining node
 * joins the first-pass aggregate it is most strongly tied to; (3) what is left forms aggregates of
 * its free neighbourhoods. Nodes without strong neighbours are left out (index −1): the smoother
 * alone handles them, as their rows are dominated by the diagonal.
 */
final class GreedyAggregation {
  private final int[] aggregateOf;
  private final int count;

  private GreedyAggregation(int[] aggregateOf, int count) {
    this.aggregateOf = aggregateOf;
    this.count = count;
  }

  /** Aggregate index of each node, −1 for isolated nodes. */
  int[] aggregateOf() {
    return aggregateOf;
  }

  /** Number of aggregates (coarse unknowns). */
  int count() {
    return count;
  }

  /** Aggregates the graph of the off-diagonal entries of {@code strong} (symmetric pattern). */
  static GreedyAggregation of(SparseRows strong) {
    int n = strong.rows;
    int[] rowStart = strong.rowStart;
    int[] cols = strong.cols;
    double[] values = strong.values;
    int[] agg = new int[n];
    java.util.Arrays.fill(agg, -1);
    boolean[] isolated = new boolean[n];
    for (int i = 0; i < n; i++) {
      isolated[i] = rowStart[i + 1] - rowStart[i] <= (hasDiagonal(strong, i) ? 1 : 0);
    }
    int count = 0;
    // Pass 1: whole free neighbourhoods become aggregates.
    for (int i = 0; i < n; i++) {
      if (isolated[i] || agg[i] >= 0) {
        continue;
      }
      boolean free = true;
      for (int k = rowStart[i]; k < rowStart[i + 1] && free; k++) {
        free = agg[cols[k]] < 0;
      }
      if (free) {
        for (int k = rowStart[i]; k < rowStart[i + 1]; k++) {
          agg[cols[k]] = count;
        }
        agg[i] = count++;
      }
    }
    // Pass 2: join the strongest-connected first-pass aggregate (no chaining through pass 2).
    int[] firstPass = agg.clone();
    for (int i = 0; i < n; i++) {
      if (isolated[i] || agg[i] >= 0) {
        continue;
      }
      double best = -1;
      for (int k = rowStart[i]; k < rowStart[i + 1]; k++) {
        int j = cols[k];
        if (j != i && firstPass[j] >= 0 && Math.abs(values[k]) > best) {
          best = Math.abs(values[k]);
          agg[i] = firstPass[j];
        }
      }
    }
    // Pass 3: leftovers form aggregates of their free neighbourhoods.
    for (int i = 0; i < n; i++) {
      if (isolated[i] || agg[i] >= 0) {
        continue;
      }
      for (int k = rowStart[i]; k < rowStart[i + 1]; k++) {
        if (agg[cols[k]] < 0) {
          agg[cols[k]] = count;
        }
      }
      agg[i] = count++;
    }
    return new GreedyAggregation(agg, count);
  }

  private static boolean hasDiagonal(SparseRows m, int i) {
    for (int k = m.rowStart[i]; k < m.rowStart[i + 1]; k++) {
      if (m.cols[k] == i) {
        return true;
      }
    }
    return false;
  }
}
