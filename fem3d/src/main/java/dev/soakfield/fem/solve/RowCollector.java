package dev.soakfield.fem.solve;

import java.util.Arrays;

/** Growable storage for sparse rows produced one after another (one collector per thread). */
final class RowCollector {
  private int[] cols;
  private double[] values;
  private int size;
  private int rowBegin;
  private int[] rowEnds;
  private int rows;

  RowCollector(int expectedEntries, int expectedRows) {
    cols = new int[Math.max(16, expectedEntries)];
    values = new double[cols.length];
    rowEnds = new int[Math.max(4, expectedRows)];
  }

  void put(int col, double value) {
    if (size == cols.length) {
      int grown = cols.length + (cols.length >> 1);
      cols = Arrays.copyOf(cols, grown);
      values = Arrays.copyOf(values, grown);
    }
    cols[size] = col;
    values[size] = value;
    size++;
  }

  /** Closes the current row, sorting its entries by column when asked. */
  void endRow(boolean sort) {
    if (sort) {
      sortSegment(rowBegin, size);
    }
    if (rows == rowEnds.length) {
      rowEnds = Arrays.copyOf(rowEnds, rows + (rows >> 1) + 1);
    }
    rowEnds[rows++] = size;
    rowBegin = size;
  }

  int rows() {
    return rows;
  }

  int size() {
    return size;
  }

  /** Copies the rows into {@code rowStart} (from row {@code firstRow}) and the entry arrays. */
  void copyInto(int firstRow, int firstEntry, int[] rowStart, int[] outCols, double[] outValues) {
    System.arraycopy(cols, 0, outCols, firstEntry, size);
    System.arraycopy(values, 0, outValues, firstEntry, size);
    for (int r = 0; r < rows; r++) {
      rowStart[firstRow + r + 1] = firstEntry + rowEnds[r];
    }
  }

  /** Insertion sort: rows are short (tens of entries). */
  private void sortSegment(int from, int to) {
    for (int i = from + 1; i < to; i++) {
      int c = cols[i];
      double v = values[i];
      int j = i - 1;
      while (j >= from && cols[j] > c) {
        cols[j + 1] = cols[j];
        values[j + 1] = values[j];
        j--;
      }
      cols[j + 1] = c;
      values[j + 1] = v;
    }
  }
}
