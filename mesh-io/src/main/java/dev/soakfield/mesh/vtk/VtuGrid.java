package dev.soakfield.mesh.vtk;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.NoSuchElementException;
import java.util.Set;

/**
 * An UnstructuredGrid piece read back from a .vtu file: points, cells (connectivity, offsets, types
 * as VTK stores them) and the named point and cell fields as doubles, components interleaved. The
 * arrays are handed out without copying: a grid is read to be looked at.
 */
public final class VtuGrid {
  private final double[] points;
  private final int[] connectivity;
  private final int[] offsets;
  private final int[] types;
  private final Map<String, double[]> pointFields;
  private final Map<String, double[]> cellFields;
  private final Map<String, Integer> components;

  VtuGrid(
      double[] points,
      int[] connectivity,
      int[] offsets,
      int[] types,
      Map<String, double[]> pointFields,
      Map<String, double[]> cellFields,
      Map<String, Integer> components) {
    this.points = points;
    this.connectivity = connectivity;
    this.offsets = offsets;
    this.types = types;
    this.pointFields = Collections.unmodifiableMap(new LinkedHashMap<>(pointFields));
    this.cellFields = Collections.unmodifiableMap(new LinkedHashMap<>(cellFields));
    this.components = Map.copyOf(components);
  }

  public int pointCount() {
    return points.length / 3;
  }

  public int cellCount() {
    return types.length;
  }

  /** x0, y0, z0, x1, ... */
  public double[] points() {
    return points;
  }

  /** Point indices of all cells, one after another (VTK node order). */
  public int[] connectivity() {
    return connectivity;
  }

  /** End of each cell's run in {@link #connectivity()}. */
  public int[] offsets() {
    return offsets;
  }

  /** VTK cell type of each cell (10 tetra, 24 quadratic tetra, ...). */
  public int[] types() {
    return types;
  }

  /**
   * The tetrahedra in MSH node order (mid-edge nodes 8 and 9 swapped back for quadratic tetra), 4
   * or 10 indices each.
   *
   * @throws IllegalStateException when the cells are not all linear or all quadratic tetrahedra
   */
  public int[] tetsInMshOrder() {
    int per = nodesPerTet();
    int[] out = new int[per * cellCount()];
    for (int c = 0; c < cellCount(); c++) {
      int start = offsets[c] - per;
      System.arraycopy(connectivity, start, out, per * c, per);
      if (per == 10) {
        out[per * c + 8] = connectivity[start + 9];
        out[per * c + 9] = connectivity[start + 8];
      }
    }
    return out;
  }

  /**
   * 4 when every cell is a linear tetra (VTK type 10), 10 when every cell is a quadratic tetra
   * (24).
   *
   * @throws IllegalStateException for any other mix of cells
   */
  public int nodesPerTet() {
    if (types.length == 0) {
      throw new IllegalStateException("the grid has no cells");
    }
    int type = types[0];
    int per = type == 10 ? 4 : type == 24 ? 10 : -1;
    for (int c = 0; c < types.length; c++) {
      int len = offsets[c] - (c == 0 ? 0 : offsets[c - 1]);
      if (types[c] != type || len != per) {
        throw new IllegalStateException(
            "cell "
                + c
                + " is of VTK type "
                + types[c]
                + " with "
                + len
                + " points; expected all tetra (10) or all quadratic tetra (24)");
      }
    }
    return per;
  }

  public Set<String> pointFieldNames() {
    return pointFields.keySet();
  }

  public Set<String> cellFieldNames() {
    return cellFields.keySet();
  }

  /**
   * The point field of that name.
   *
   * @throws NoSuchElementException when the grid has none, naming the fields it has
   */
  public double[] pointField(String name) {
    return field(pointFields, name, "point");
  }

  /**
   * The cell field of that name.
   *
   * @throws NoSuchElementException when the grid has none, naming the fields it has
   */
  public double[] cellField(String name) {
    return field(cellFields, name, "cell");
  }

  /** Components per point or cell of the named field (1 scalar, 3 vector). */
  public int components(String name) {
    Integer c = components.get(name);
    if (c == null) {
      throw new NoSuchElementException("no field '" + name + "' in the grid");
    }
    return c;
  }

  private static double[] field(Map<String, double[]> fields, String name, String where) {
    double[] f = fields.get(name);
    if (f == null) {
      throw new NoSuchElementException(
          "no " + where + " field '" + name + "': the grid has " + fields.keySet());
    }
    return f;
  }
}
