package dev.soakfield.mesh.vtk;

import dev.soakfield.mesh.TetMesh;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * Writes a {@link TetMesh} and its fields as a VTK XML UnstructuredGrid (.vtu) file.
 *
 * <p>Points are Float64 with 3 components; cells are given by connectivity and offsets (Int64) and
 * types (UInt8: tetra 10, quadratic tetra 24, triangle 5, quadratic triangle 22). VTK orders a
 * quadratic tetra's mid-edge nodes (0,1), (1,2), (2,0), (0,3), (1,3), (2,3), the mesh (MSH order)
 * (0,1), (1,2), (2,0), (3,0), (3,2), (3,1): nodes 8 and 9 swap on output.
 */
public final class VtuWriter {
  /** Cell data name of the volume group index of each tetrahedron. */
  public static final String VOLUME_GROUP = "volume_group";

  /** Cell data name of the face group index of each surface triangle. */
  public static final String FACE_GROUP = "face_group";

  private static final int VTK_TRIANGLE = 5;
  private static final int VTK_TETRA = 10;
  private static final int VTK_QUADRATIC_TRIANGLE = 22;
  private static final int VTK_QUADRATIC_TETRA = 24;

  /** Output position k of a 10-node tetrahedron takes mesh node TET10_TO_VTK[k]. */
  private static final int[] TET10_TO_VTK = {0, 1, 2, 3, 4, 5, 6, 7, 9, 8};

  /**
   * A named field: {@code components} values per point or per cell, interleaved (x0, y0, z0, x1,
   * ...). The array is held, not copied: fields are large and written at once.
   *
   * @param components 1 (scalar) or 3 (vector)
   */
  @SuppressWarnings("ArrayRecordComponent") // a field is a view of the caller's values
  public record Field(String name, int components, double[] values, String unit) {
    /** A field without a stated unit. */
    public Field(String name, int components, double[] values) {
      this(name, components, values, "");
    }

    public Field {
      Objects.requireNonNull(name, "name");
      Objects.requireNonNull(values, "values");
      Objects.requireNonNull(unit, "unit");
      if (!Xml.isPlainText(unit)) {
        throw new IllegalArgumentException("unit of field '" + name + "': control characters");
      }
      if (name.isBlank() || !Xml.isPlainText(name)) {
        throw new IllegalArgumentException(
            "field name: found '"
                + name
                + "', expected a non-blank name without control characters");
      }
      if (components != 1 && components != 3) {
        throw new IllegalArgumentException(
            "field '" + name + "': found " + components + " components, expected 1 or 3");
      }
    }
  }

  private VtuWriter() {}

  /** Writes the tetrahedra with the given fields and the cell data {@value #VOLUME_GROUP}. */
  public static void write(
      Path file, TetMesh mesh, List<Field> pointFields, List<Field> cellFields, VtuFormat format)
      throws IOException {
    write(file, mesh, pointFields, cellFields, format, true);
  }

  /**
   * Writes the tetrahedra with the given fields.
   *
   * @param withVolumeGroup whether to add the cell data {@value #VOLUME_GROUP} (Int32 index into
   *     {@link TetMesh#volumeGroups()})
   * @throws IllegalArgumentException when a field's length does not fit the mesh or names repeat
   */
  public static void write(
      Path file,
      TetMesh mesh,
      List<Field> pointFields,
      List<Field> cellFields,
      VtuFormat format,
      boolean withVolumeGroup)
      throws IOException {
    Objects.requireNonNull(file, "file");
    Objects.requireNonNull(mesh, "mesh");
    Objects.requireNonNull(format, "format");
    int nodes = mesh.nodeCount();
    int tets = mesh.tetCount();
    checkFields("point", pointFields, nodes, "node", List.of());
    checkFields(
        "cell",
        cellFields,
        tets,
        "tetrahedron",
        withVolumeGroup ? List.of(VOLUME_GROUP) : List.of());

    int per = mesh.nodesPerTet();
    int[] conn = vtkConnectivity(mesh);
    List<VtkArray> cellData = toArrays(cellFields);
    if (withVolumeGroup) {
      cellData.add(VtkArray.integers(VOLUME_GROUP, VtkArray.Type.INT32, 1, mesh.copyTetGroups()));
    }
    new VtuDocument(
            nodes,
            tets,
            toArrays(pointFields),
            cellData,
            VtkArray.float64("Points", 3, mesh.copyCoordinates()),
            cellArrays(conn, tets, per, per == 4 ? VTK_TETRA : VTK_QUADRATIC_TETRA))
        .write(file, format);
  }

  /**
   * Writes the mesh's faces (all face groups, exterior and interface) as a triangle surface with
   * the cell data {@value #FACE_GROUP} (Int32 index into {@link TetMesh#faceGroups()}). Only the
   * nodes the faces use are written, in increasing mesh order; the point fields are given per mesh
   * node and are picked for those nodes.
   */
  public static void writeSurface(
      Path file, TetMesh mesh, List<Field> pointFields, VtuFormat format) throws IOException {
    Objects.requireNonNull(file, "file");
    Objects.requireNonNull(mesh, "mesh");
    Objects.requireNonNull(format, "format");
    int nodes = mesh.nodeCount();
    checkFields("point", pointFields, nodes, "node", List.of());
    int per = mesh.nodesPerFace();
    int faces = mesh.faceCount();
    int[] conn = mesh.copyFaces();
    int[] newIndex = new int[nodes];
    Arrays.fill(newIndex, -1);
    for (int n : conn) {
      newIndex[n] = 0;
    }
    int used = 0;
    for (int n = 0; n < nodes; n++) {
      if (newIndex[n] == 0) {
        newIndex[n] = used++;
      }
    }
    int[] oldIndex = new int[used];
    for (int n = 0; n < nodes; n++) {
      if (newIndex[n] >= 0) {
        oldIndex[newIndex[n]] = n;
      }
    }
    for (int i = 0; i < conn.length; i++) {
      conn[i] = newIndex[conn[i]];
    }
    double[] xyz = new double[3 * used];
    for (int i = 0; i < used; i++) {
      for (int a = 0; a < 3; a++) {
        xyz[3 * i + a] = mesh.coord(oldIndex[i], a);
      }
    }
    List<VtkArray> pointData = new ArrayList<>();
    for (Field f : pointFields) {
      int c = f.components();
      double[] picked = new double[c * used];
      for (int i = 0; i < used; i++) {
        System.arraycopy(f.values(), c * oldIndex[i], picked, c * i, c);
      }
      pointData.add(VtkArray.float64(f.name(), c, picked));
    }
    List<VtkArray> cellData = new ArrayList<>();
    cellData.add(VtkArray.integers(FACE_GROUP, VtkArray.Type.INT32, 1, mesh.copyFaceGroups()));
    new VtuDocument(
            used,
            faces,
            pointData,
            cellData,
            VtkArray.float64("Points", 3, xyz),
            cellArrays(conn, faces, per, per == 3 ? VTK_TRIANGLE : VTK_QUADRATIC_TRIANGLE))
        .write(file, format);
  }

  /** The tetrahedra's node indices in VTK order (mid-edge nodes 8 and 9 swapped). */
  static int[] vtkConnectivity(TetMesh mesh) {
    int[] conn = mesh.copyTets();
    if (mesh.nodesPerTet() == 10) {
      int[] mshOrder = new int[10];
      for (int t = 0; t < mesh.tetCount(); t++) {
        System.arraycopy(conn, 10 * t, mshOrder, 0, 10);
        for (int k = 0; k < 10; k++) {
          conn[10 * t + k] = mshOrder[TET10_TO_VTK[k]];
        }
      }
    }
    return conn;
  }

  /** VTK cell type of the mesh's tetrahedra. */
  static int vtkTetType(TetMesh mesh) {
    return mesh.nodesPerTet() == 4 ? VTK_TETRA : VTK_QUADRATIC_TETRA;
  }

  /** Checks point fields against a mesh: lengths that fit, names that do not repeat. */
  static void checkPointFields(List<Field> fields, int nodes) {
    checkFields("point", fields, nodes, "node", List.of());
  }

  private static List<VtkArray> cellArrays(int[] conn, int cells, int per, int vtkType) {
    int[] offsets = new int[cells];
    int[] types = new int[cells];
    for (int c = 0; c < cells; c++) {
      offsets[c] = (c + 1) * per;
      types[c] = vtkType;
    }
    return List.of(
        VtkArray.integers("connectivity", VtkArray.Type.INT64, 1, conn),
        VtkArray.integers("offsets", VtkArray.Type.INT64, 1, offsets),
        VtkArray.integers("types", VtkArray.Type.UINT8, 1, types));
  }

  private static List<VtkArray> toArrays(List<Field> fields) {
    List<VtkArray> arrays = new ArrayList<>();
    for (Field f : fields) {
      arrays.add(VtkArray.float64(f.name(), f.unit(), f.components(), f.values()));
    }
    return arrays;
  }

  private static void checkFields(
      String where, List<Field> fields, int count, String item, List<String> reserved) {
    Objects.requireNonNull(fields, where + " fields");
    Set<String> names = new HashSet<>(reserved);
    for (Field f : fields) {
      Objects.requireNonNull(f, where + " field");
      if (!names.add(f.name())) {
        throw new IllegalArgumentException(
            where
                + " field '"
                + f.name()
                + "': found the name twice (or reserved), expected unique names");
      }
      long expected = (long) f.components() * count;
      if (f.values().length != expected) {
        throw new IllegalArgumentException(
            where
                + " field '"
                + f.name()
                + "': found "
                + f.values().length
                + " values, expected "
                + expected
                + " ("
                + f.components()
                + " per "
                + item
                + ", "
                + count
                + " "
                + item
                + "s)");
      }
    }
  }
}
