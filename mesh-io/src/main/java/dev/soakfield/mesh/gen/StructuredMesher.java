package dev.soakfield.mesh.gen;

import dev.soakfield.mesh.FaceGroup;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.VolumeGroup;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * Tetrahedral meshes of simple parts, built directly: boxes, layered plates, boxes with inserts,
 * cylinders and pipes. Lengths are in metres.
 *
 * <p>Every hexahedral cell is split into the six Kuhn tetrahedra around one main diagonal; the
 * split conforms across cells and, on a cubic grid, has no obtuse dihedral angle. Tetrahedra are
 * positively oriented and exterior faces point outward (right-hand normal). Interface faces point
 * out of the cell that owns them, as each method says.
 *
 * <p>Order 1 gives 4-node tetrahedra and 3-node faces; order 2 adds a node at the midpoint of every
 * edge ({@link MidEdgeNodes}). For {@link #cylinder} and {@link #pipe} at order 2 the mid-edge
 * nodes of edges on a curved wall are then moved radially onto that wall.
 *
 * <p>Wrong arguments throw {@link IllegalArgumentException} with a message that names the value,
 * what was found and what was expected.
 */
public final class StructuredMesher {
  /**
   * One layer of a {@link #layers} plate.
   *
   * @param name volume group name, unique among the layers
   * @param thickness along z, metres
   * @param cells cells across the thickness
   */
  public record Layer(String name, double thickness, int cells) {
    public Layer {
      Objects.requireNonNull(name, "name");
    }
  }

  /**
   * A box-shaped region of a {@link #block}: the cells whose centres lie inside (bounds included).
   *
   * @param name volume group name, unique, not "body"
   */
  public record Insert(
      String name, double x0, double y0, double z0, double x1, double y1, double z1) {
    public Insert {
      Objects.requireNonNull(name, "name");
    }

    boolean contains(double x, double y, double z) {
      return x >= x0 && x <= x1 && y >= y0 && y <= y1 && z >= z0 && z <= z1;
    }
  }

  private static final String BODY = "body";

  private StructuredMesher() {}

  /**
   * A box [0, lx] x [0, ly] x [0, lz] of nx x ny x nz cells; volume group "body", exterior face
   * groups xmin, xmax, ymin, ymax, zmin, zmax.
   */
  public static TetMesh box(double lx, double ly, double lz, int nx, int ny, int nz, int order) {
    return box(lx, ly, lz, nx, ny, nz, order, Grading.NONE);
  }

  /** A box as above, its cells graded toward the faces {@code grading} names (xmin..zmax). */
  public static TetMesh box(
      double lx, double ly, double lz, int nx, int ny, int nz, int order, Grading grading) {
    checkBox(lx, ly, lz, nx, ny, nz, order);
    grading.onlyFaces(BOX_FACES, "box");
    HexGrid grid =
        TensorGrid.build(
            Grading.planes(0, lx, nx, grading.at("xmin"), grading.at("xmax")),
            Grading.planes(0, ly, ny, grading.at("ymin"), grading.at("ymax")),
            Grading.planes(0, lz, nz, grading.at("zmin"), grading.at("zmax")),
            new int[nx * ny * nz],
            new int[1],
            List.of(new VolumeGroup(BODY, 1)),
            TensorGrid.faceGroups(List.of()));
    return finish(grid, order);
  }

  /**
   * A plate [0, lx] x [0, ly] of layers stacked along z from z = 0, each layer evenly divided into
   * its cells. One volume group per layer (in the given order) and exterior groups xmin..zmax as
   * for a box. The interface between consecutive layers "a" (below) and "b" (above) is the
   * INTERFACE face group "a-b", its normals pointing up from a into b.
   */
  public static TetMesh layers(
      double lx, double ly, int nx, int ny, List<Layer> layers, int order) {
    Args.length("length in x", lx);
    Args.length("length in y", ly);
    Args.count("cells in x", nx);
    Args.count("cells in y", ny);
    Args.order(order);
    Objects.requireNonNull(layers, "layers");
    if (layers.isEmpty()) {
      throw new IllegalArgumentException("layers: found none, expected at least one layer");
    }
    Set<String> names = new HashSet<>();
    double nz = 0;
    for (Layer layer : layers) {
      checkName("layer name", layer.name());
      if (!names.add(layer.name())) {
        throw new IllegalArgumentException(
            "layer name: found '" + layer.name() + "' twice, expected unique layer names");
      }
      Args.length("thickness of layer '" + layer.name() + "'", layer.thickness());
      Args.count("cells of layer '" + layer.name() + "'", layer.cells());
      nz += layer.cells();
    }
    Args.size((double) nx * ny * nz, (nx + 1.0) * (ny + 1.0) * (nz + 1), order);

    int layerCount = layers.size();
    double[] zs = new double[(int) nz + 1];
    int[] layerOfPlane = new int[(int) nz];
    int k = 0;
    double z = 0;
    for (int l = 0; l < layerCount; l++) {
      Layer layer = layers.get(l);
      double[] local = TensorGrid.planes(z, layer.thickness(), layer.cells());
      System.arraycopy(local, 0, zs, k, layer.cells());
      Arrays.fill(layerOfPlane, k, k + layer.cells(), l);
      k += layer.cells();
      z = local[layer.cells()];
    }
    zs[k] = z;

    List<VolumeGroup> volumeGroups = new ArrayList<>();
    for (Layer layer : layers) {
      volumeGroups.add(new VolumeGroup(layer.name(), volumeGroups.size() + 1));
    }
    List<String> interfaces = new ArrayList<>();
    int[] interfaceOf = new int[layerCount * layerCount];
    Arrays.fill(interfaceOf, HexGrid.NO_FACE);
    Set<String> interfaceNames = new HashSet<>();
    for (int l = 0; l + 1 < layerCount; l++) {
      String name = layers.get(l).name() + "-" + layers.get(l + 1).name();
      if (!interfaceNames.add(name)) {
        throw new IllegalArgumentException(
            "layer names: interface name '"
                + name
                + "' arises twice, expected layer names whose 'lower-upper' pairs differ");
      }
      interfaces.add(name);
      // The lower cell owns the face, so its outward normal points up into the upper layer.
      interfaceOf[l * layerCount + l + 1] = TensorGrid.EXTERIOR_NAMES.length + l;
    }
    int[] cellGroup = new int[nx * ny * (int) nz];
    for (int kk = 0; kk < nz; kk++) {
      Arrays.fill(cellGroup, kk * nx * ny, (kk + 1) * nx * ny, layerOfPlane[kk]);
    }
    HexGrid grid =
        TensorGrid.build(
            TensorGrid.planes(0, lx, nx),
            TensorGrid.planes(0, ly, ny),
            zs,
            cellGroup,
            interfaceOf,
            volumeGroups,
            TensorGrid.faceGroups(interfaces));
    return finish(grid, order);
  }

  /**
   * A box as in {@link #box} whose cells with centres inside an insert belong to that insert's
   * volume group (later inserts win where they overlap); the other cells form "body" (left out when
   * no cell remains). Exterior groups xmin..zmax include the faces of inserts that reach the
   * outside. The faces between an insert and its surroundings form the INTERFACE group
   * "name-surface", normals pointing out of the insert; a face between two inserts belongs to the
   * later one. An insert surface with no face (the insert fills the box) is left out.
   *
   * @throws IllegalArgumentException when an insert captures no cell (also when later inserts take
   *     all its cells), its bounds are not increasing, or names clash
   */
  public static TetMesh block(
      double lx, double ly, double lz, int nx, int ny, int nz, List<Insert> inserts, int order) {
    checkBox(lx, ly, lz, nx, ny, nz, order);
    Objects.requireNonNull(inserts, "inserts");
    Set<String> names = new HashSet<>();
    names.add(BODY);
    for (Insert insert : inserts) {
      checkName("insert name", insert.name());
      if (!names.add(insert.name())) {
        throw new IllegalArgumentException(
            "insert name: found '"
                + insert.name()
                + "' twice or as 'body', expected unique names other than 'body'");
      }
      checkBounds(insert, "x", insert.x0(), insert.x1());
      checkBounds(insert, "y", insert.y0(), insert.y1());
      checkBounds(insert, "z", insert.z0(), insert.z1());
    }
    double[] xs = TensorGrid.planes(0, lx, nx);
    double[] ys = TensorGrid.planes(0, ly, ny);
    double[] zs = TensorGrid.planes(0, lz, nz);
    // Raw group: 0 = body, 1 + n = insert n; later inserts overwrite earlier ones.
    int[] raw = new int[nx * ny * nz];
    int[] captured = new int[inserts.size() + 1];
    for (int k = 0; k < nz; k++) {
      for (int j = 0; j < ny; j++) {
        for (int i = 0; i < nx; i++) {
          double cx = 0.5 * (xs[i] + xs[i + 1]);
          double cy = 0.5 * (ys[j] + ys[j + 1]);
          double cz = 0.5 * (zs[k] + zs[k + 1]);
          int g = 0;
          for (int n = 0; n < inserts.size(); n++) {
            if (inserts.get(n).contains(cx, cy, cz)) {
              g = n + 1;
            }
          }
          raw[i + nx * (j + ny * k)] = g;
          captured[g]++;
        }
      }
    }
    for (int n = 0; n < inserts.size(); n++) {
      if (captured[n + 1] == 0) {
        throw new IllegalArgumentException(
            "insert '"
                + inserts.get(n).name()
                + "': found no cell centre inside it (or later inserts took them all),"
                + " expected at least one cell; enlarge it or refine the cells");
      }
    }
    // Final group indices: body first when it keeps cells, then the inserts.
    int shift = captured[0] > 0 ? 0 : 1;
    List<VolumeGroup> volumeGroups = new ArrayList<>();
    if (shift == 0) {
      volumeGroups.add(new VolumeGroup(BODY, 1));
    }
    for (Insert insert : inserts) {
      volumeGroups.add(new VolumeGroup(insert.name(), volumeGroups.size() + 1));
    }
    int[] cellGroup = new int[raw.length];
    for (int c = 0; c < raw.length; c++) {
      cellGroup[c] = raw[c] - shift;
    }
    int groupCount = volumeGroups.size();
    int[] interfaceOf = surfaceTable(raw, nx, ny, nz, inserts.size(), shift, groupCount);
    List<String> surfaces = new ArrayList<>();
    int exterior = TensorGrid.EXTERIOR_NAMES.length;
    int[] surfaceIndex = new int[inserts.size() + 1];
    for (int n = 0; n < inserts.size(); n++) {
      if (hasSurface(interfaceOf, n + 1 - shift, groupCount)) {
        surfaceIndex[n + 1] = exterior + surfaces.size();
        surfaces.add(inserts.get(n).name() + "-surface");
      } else {
        surfaceIndex[n + 1] = HexGrid.NO_FACE;
      }
    }
    for (int g = 0; g < groupCount; g++) {
      for (int h = 0; h < groupCount; h++) {
        int owner = g * groupCount + h;
        if (interfaceOf[owner] != HexGrid.NO_FACE) {
          interfaceOf[owner] = surfaceIndex[g + shift];
        }
      }
    }
    List<FaceGroup> faceGroups = TensorGrid.faceGroups(surfaces);
    HexGrid grid = TensorGrid.build(xs, ys, zs, cellGroup, interfaceOf, volumeGroups, faceGroups);
    return finish(grid, order);
  }

  /**
   * A solid cylinder of the given radius, axis along z from 0 to height; volume group "body",
   * exterior groups side, bottom, top. The cross-section is an O-grid: a central square of
   * (nAround/4) x (nAround/4) cells surrounded by a ring of nRadial cells from the square out to
   * the circle and nAround cells around it. The side's nodes lie on the circle, at angles -3pi/4 +
   * 2pi t / nAround; the square's half-side is radius x m / (m + 2 nRadial) with m = nAround/4,
   * kept between 0.3 and 0.5 times the radius.
   *
   * @param nRadial cell layers between the central square and the side, at least 1
   * @param nAround cells around the circumference, a multiple of 4 and at least 8
   * @param nz cells along the axis
   */
  public static TetMesh cylinder(
      double radius, double height, int nRadial, int nAround, int nz, int order) {
    return cylinder(radius, height, nRadial, nAround, nz, order, Grading.NONE, false);
  }

  /** The face groups of {@link #cylinder}. */
  public static final java.util.Set<String> CYLINDER_FACES =
      java.util.Set.of("side", "bottom", "top");

  /** The face groups of {@link #pipe}. */
  public static final java.util.Set<String> PIPE_FACES =
      java.util.Set.of("inner", "outer", "bottom", "top");

  /** The face groups of {@link #box}. */
  public static final java.util.Set<String> BOX_FACES =
      java.util.Set.of("xmin", "xmax", "ymin", "ymax", "zmin", "zmax");

  /**
   * The cell counts {@link #cylinder} meshes with: the given ones, raised where a tetrahedron would
   * have a dihedral angle under 10° ({@link ShapeGuard}), unless {@code asGiven}. A graded
   * direction grows by whole multiples, each given cell cut into equal ones.
   *
   * @throws CellCountsException when the counts needed would make too large a mesh
   */
  public static int[] cylinderCells(
      double radius,
      double height,
      int nRadial,
      int nAround,
      int nz,
      Grading grading,
      boolean asGiven) {
    checkCylinder(radius, height, nRadial, nAround, nz, grading);
    int[] given = {nRadial, nAround, nz};
    if (asGiven) {
      return given;
    }
    int[] step = {radialGraded(grading, "side") ? nRadial : 1, 4, axialGraded(grading) ? nz : 1};
    return ShapeGuard.settle(
        given,
        step,
        c ->
            new ShapeGuard.Probe(
                RoundGrid.cylinder(
                    radius,
                    ShapeGuard.extremeLayers(axialPlanes(height, nz, c[2], grading)),
                    ringWeights(nRadial, c[0], grading),
                    c[1]),
                (c[1] / 4) * (c[1] / 4)),
        c -> (c[1] / 4.0) * (c[1] / 4.0) * c[2] + (double) c[1] * c[0] * c[2]);
  }

  private static boolean radialGraded(Grading grading, String face) {
    return grading.at(face) != 1;
  }

  private static boolean axialGraded(Grading grading) {
    return grading.at("bottom") != 1 || grading.at("top") != 1;
  }

  /**
   * Planes of a direction meshed with {@code used} cells where {@code given} were asked: evenly
   * spaced when ungraded, else the given grading with each cell cut into used / given.
   */
  private static double[] planes(
      double from, double length, int given, int used, double startRatio, double endRatio) {
    if (startRatio == 1 && endRatio == 1) {
      return TensorGrid.planes(from, length, used);
    }
    return Grading.split(Grading.planes(from, length, given, startRatio, endRatio), used / given);
  }

  private static double[] axialPlanes(double height, int given, int used, Grading grading) {
    return planes(0, height, given, used, grading.at("bottom"), grading.at("top"));
  }

  private static double[] ringWeights(int given, int used, Grading grading) {
    return planes(0, 1, given, used, 1, grading.at("side"));
  }

  private static double[] wallRadii(
      double innerRadius, double outerRadius, int given, int used, Grading grading) {
    return planes(
        innerRadius,
        outerRadius - innerRadius,
        given,
        used,
        grading.at("inner"),
        grading.at("outer"));
  }

  /**
   * A cylinder as {@link #cylinder(double, double, int, int, int, int)}, its ring of cells graded
   * toward the side ({@code "side"}) and its length toward {@code "bottom"} and {@code "top"}, with
   * the counts of {@link #cylinderCells}.
   */
  public static TetMesh cylinder(
      double radius,
      double height,
      int nRadial,
      int nAround,
      int nz,
      int order,
      Grading grading,
      boolean asGiven) {
    Args.order(order);
    int[] n = cylinderCells(radius, height, nRadial, nAround, nz, grading, asGiven);
    double m = n[1] / 4.0;
    Args.size((m * m + n[1] * (double) n[0]) * n[2], (m + 1) * (m + 1) * (n[2] + 1.0), order);
    HexGrid grid =
        RoundGrid.cylinder(
            radius,
            axialPlanes(height, nz, n[2], grading),
            ringWeights(nRadial, n[0], grading),
            n[1]);
    TetMesh mesh = finish(grid, order);
    return order == 2 ? CircleSnap.snap(mesh, radius) : mesh;
  }

  /**
   * A pipe (annulus innerRadius..outerRadius, axis along z from 0 to height), periodic around;
   * volume group "body", exterior groups inner, outer, bottom, top. Both walls' nodes lie on their
   * circles, at angles 2pi t / nAround.
   *
   * @param nRadial cells across the wall
   * @param nAround cells around, at least 3
   * @param nz cells along the axis
   */
  public static TetMesh pipe(
      double innerRadius,
      double outerRadius,
      double height,
      int nRadial,
      int nAround,
      int nz,
      int order) {
    return pipe(innerRadius, outerRadius, height, nRadial, nAround, nz, order, Grading.NONE, false);
  }

  /**
   * The cell counts {@link #pipe} meshes with: the given ones, raised where a tetrahedron would
   * have a dihedral angle under 10° ({@link ShapeGuard}), unless {@code asGiven}. A graded
   * direction grows by whole multiples, each given cell cut into equal ones.
   *
   * @throws CellCountsException when the counts needed would make too large a mesh
   */
  public static int[] pipeCells(
      double innerRadius,
      double outerRadius,
      double height,
      int nRadial,
      int nAround,
      int nz,
      Grading grading,
      boolean asGiven) {
    checkPipe(innerRadius, outerRadius, height, nRadial, nAround, nz, grading);
    int[] given = {nRadial, nAround, nz};
    if (asGiven) {
      return given;
    }
    boolean wallGraded = radialGraded(grading, "inner") || radialGraded(grading, "outer");
    int[] step = {wallGraded ? nRadial : 1, 1, axialGraded(grading) ? nz : 1};
    return ShapeGuard.settle(
        given,
        step,
        c ->
            new ShapeGuard.Probe(
                RoundGrid.pipeSector(
                    wallRadii(innerRadius, outerRadius, nRadial, c[0], grading),
                    ShapeGuard.extremeLayers(axialPlanes(height, nz, c[2], grading)),
                    c[1]),
                0),
        c -> (double) c[0] * c[1] * c[2]);
  }

  /**
   * A pipe as {@link #pipe(double, double, double, int, int, int, int)}, graded through the wall
   * toward {@code "inner"} and {@code "outer"} and along it toward {@code "bottom"} and {@code
   * "top"}, with the counts of {@link #pipeCells}.
   */
  public static TetMesh pipe(
      double innerRadius,
      double outerRadius,
      double height,
      int nRadial,
      int nAround,
      int nz,
      int order,
      Grading grading,
      boolean asGiven) {
    Args.order(order);
    int[] n = pipeCells(innerRadius, outerRadius, height, nRadial, nAround, nz, grading, asGiven);
    Args.size((double) n[1] * n[0] * n[2], (double) n[1] * (n[0] + 1) * (n[2] + 1.0), order);
    HexGrid grid =
        RoundGrid.pipe(
            wallRadii(innerRadius, outerRadius, nRadial, n[0], grading),
            axialPlanes(height, nz, n[2], grading),
            n[1]);
    TetMesh mesh = finish(grid, order);
    return order == 2 ? CircleSnap.snap(mesh, innerRadius, outerRadius) : mesh;
  }

  private static TetMesh finish(HexGrid grid, int order) {
    TetMesh linear = KuhnSplit.toTetMesh(grid);
    return order == 2 ? MidEdgeNodes.promote(linear) : linear;
  }

  private static void checkCylinder(
      double radius, double height, int nRadial, int nAround, int nz, Grading grading) {
    grading.onlyFaces(CYLINDER_FACES, "cylinder");
    Args.length("radius", radius);
    Args.length("height", height);
    Args.count("cells across the radius", nRadial);
    Args.count("cells along the height", nz);
    if (nAround < 8 || nAround % 4 != 0) {
      throw new IllegalArgumentException(
          "cells around: found " + nAround + ", expected a multiple of 4, at least 8");
    }
  }

  private static void checkPipe(
      double innerRadius,
      double outerRadius,
      double height,
      int nRadial,
      int nAround,
      int nz,
      Grading grading) {
    grading.onlyFaces(PIPE_FACES, "pipe");
    Args.length("inner radius", innerRadius);
    Args.length("outer radius", outerRadius);
    Args.length("height", height);
    if (innerRadius >= outerRadius) {
      throw new IllegalArgumentException(
          "radii: found inner radius "
              + innerRadius
              + " m and outer radius "
              + outerRadius
              + " m, expected the inner radius below the outer");
    }
    Args.count("cells across the wall", nRadial);
    Args.count("cells along the height", nz);
    if (nAround < 3) {
      throw new IllegalArgumentException(
          "cells around: found " + nAround + ", expected at least 3");
    }
  }

  private static void checkBox(double lx, double ly, double lz, int nx, int ny, int nz, int order) {
    Args.length("length in x", lx);
    Args.length("length in y", ly);
    Args.length("length in z", lz);
    Args.count("cells in x", nx);
    Args.count("cells in y", ny);
    Args.count("cells in z", nz);
    Args.order(order);
    Args.size((double) nx * ny * nz, (nx + 1.0) * (ny + 1.0) * (nz + 1.0), order);
  }

  private static void checkName(String what, String name) {
    if (name.isBlank()) {
      throw new IllegalArgumentException(what + ": found a blank name, expected a name");
    }
  }

  private static void checkBounds(Insert insert, String axis, double lo, double hi) {
    if (!(lo < hi)) {
      throw new IllegalArgumentException(
          "insert '"
              + insert.name()
              + "': found "
              + axis
              + " from "
              + lo
              + " to "
              + hi
              + ", expected increasing bounds");
    }
  }

  /**
   * Which cell owns each face between different groups: the one with the higher raw group (an
   * insert over the body, a later insert over an earlier one). Marks owner entries with 0; the
   * caller replaces them by surface group indices.
   */
  private static int[] surfaceTable(
      int[] raw, int nx, int ny, int nz, int insertCount, int shift, int groupCount) {
    boolean[] touches = new boolean[(insertCount + 1) * (insertCount + 1)];
    int[] stride = {1, nx, nx * ny};
    for (int k = 0; k < nz; k++) {
      for (int j = 0; j < ny; j++) {
        for (int i = 0; i < nx; i++) {
          int cell = i + nx * (j + ny * k);
          boolean[] hasNext = {i + 1 < nx, j + 1 < ny, k + 1 < nz};
          for (int axis = 0; axis < 3; axis++) {
            if (hasNext[axis]) {
              int a = raw[cell];
              int b = raw[cell + stride[axis]];
              if (a != b) {
                touches[Math.max(a, b) * (insertCount + 1) + Math.min(a, b)] = true;
              }
            }
          }
        }
      }
    }
    int[] table = new int[groupCount * groupCount];
    Arrays.fill(table, HexGrid.NO_FACE);
    for (int hi = 1; hi <= insertCount; hi++) {
      for (int lo = 0; lo < hi; lo++) {
        if (touches[hi * (insertCount + 1) + lo]) {
          table[(hi - shift) * groupCount + (lo - shift)] = 0;
        }
      }
    }
    return table;
  }

  private static boolean hasSurface(int[] table, int group, int groupCount) {
    for (int h = 0; h < groupCount; h++) {
      if (table[group * groupCount + h] != HexGrid.NO_FACE) {
        return true;
      }
    }
    return false;
  }
}
