package dev.soakfield.mesh.gen;

import java.util.Arrays;

/**
 * The distinct edges of a set of elements, numbered in order of (lower node, higher node).
 *
 * <p>Compressed rows by lower node: row n lists the higher nodes of n's edges, sorted and without
 * repeats. Building it is two counting passes and a sort of each short row; a look-up scans one
 * row. No object per edge.
 */
final class EdgeTable {
  private final int[] rowStart;
  private final int[] rowEnd;
  private final int[] firstEdge;
  private final int[] higher;
  private final int edgeCount;

  /**
   * @param nodeCount nodes of the mesh
   * @param conns connectivity arrays of the element sets (say tetrahedra and faces)
   * @param perElement node entries per element of each set
   * @param edges per set, the corner pairs of one element's edges
   */
  EdgeTable(int nodeCount, int[][] conns, int[] perElement, int[][][] edges) {
    rowStart = new int[nodeCount + 1];
    for (int s = 0; s < conns.length; s++) {
      int[] conn = conns[s];
      int per = perElement[s];
      for (int base = 0; base < conn.length; base += per) {
        for (int[] e : edges[s]) {
          rowStart[Math.min(conn[base + e[0]], conn[base + e[1]]) + 1]++;
        }
      }
    }
    for (int n = 0; n < nodeCount; n++) {
      rowStart[n + 1] += rowStart[n];
    }
    higher = new int[rowStart[nodeCount]];
    int[] fill = Arrays.copyOf(rowStart, nodeCount);
    for (int s = 0; s < conns.length; s++) {
      int[] conn = conns[s];
      int per = perElement[s];
      for (int base = 0; base < conn.length; base += per) {
        for (int[] e : edges[s]) {
          int a = conn[base + e[0]];
          int b = conn[base + e[1]];
          higher[fill[Math.min(a, b)]++] = Math.max(a, b);
        }
      }
    }
    rowEnd = new int[nodeCount];
    firstEdge = new int[nodeCount];
    int count = 0;
    for (int n = 0; n < nodeCount; n++) {
      int from = rowStart[n];
      int to = rowStart[n + 1];
      Arrays.sort(higher, from, to);
      int end = from;
      for (int i = from; i < to; i++) {
        if (i == from || higher[i] != higher[end - 1]) {
          higher[end++] = higher[i];
        }
      }
      rowEnd[n] = end;
      firstEdge[n] = count;
      count += end - from;
    }
    edgeCount = count;
  }

  int edgeCount() {
    return edgeCount;
  }

  /** Number of the edge between a and b, which must be an edge of the elements given. */
  int edge(int a, int b) {
    int lo = Math.min(a, b);
    int hi = Math.max(a, b);
    int from = rowStart[lo];
    for (int i = from; i < rowEnd[lo]; i++) {
      if (higher[i] == hi) {
        return firstEdge[lo] + i - from;
      }
    }
    throw new IllegalStateException("no edge " + a + "-" + b);
  }

  /** The two nodes (lower, higher) of every edge, in edge order: 2 entries per edge. */
  int[] endpoints() {
    int[] ends = new int[2 * edgeCount];
    for (int lo = 0; lo < rowEnd.length; lo++) {
      int from = rowStart[lo];
      for (int i = from; i < rowEnd[lo]; i++) {
        int e = firstEdge[lo] + i - from;
        ends[2 * e] = lo;
        ends[2 * e + 1] = higher[i];
      }
    }
    return ends;
  }
}
