package dev.soakfield.mesh.vtk;

import dev.soakfield.mesh.TetMesh;
import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.FileTime;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * Writes the frames of one mesh as .vtu files (appended base64 data, valid XML) and encodes the
 * mesh only once. A .vtu file must hold its own points and cells (the format has no reference to
 * another file's geometry), so every frame carries them; but they are the same bytes each time:
 * they stand last in the appended data, and from the second frame on they are copied, by the
 * operating system, from the first frame this writer wrote, rather than encoded again.
 *
 * <p>Layout: point fields (Float32, or Float64 by {@link VtuEncoding}), the cell data of the volume
 * group index (Int32), points (Float64: coordinates keep their digits, and they are written once),
 * connectivity and offsets (Int32) and types (UInt8); optionally zlib-compressed.
 */
public final class VtuFrameWriter {
  private final TetMesh mesh;
  private final String groupField;
  private final VtuEncoding encoding;
  private MeshCopy source; // where the encoded mesh already stands; null until the first frame

  /** Where the encoded mesh part of an earlier frame lies, and how that file looked after it. */
  @SuppressWarnings("ArrayRecordComponent") // private, never compared or handed out
  private record MeshCopy(
      Path file, long start, long[] lengths, long fileSize, FileTime modified) {}

  /**
   * A writer for frames of {@code mesh}.
   *
   * @param groupField the name of the cell data giving each tetrahedron's volume group index
   */
  public VtuFrameWriter(TetMesh mesh, String groupField, VtuEncoding encoding) {
    this.mesh = Objects.requireNonNull(mesh, "mesh");
    this.encoding = Objects.requireNonNull(encoding, "encoding");
    this.groupField = Objects.requireNonNull(groupField, "groupField");
    if (groupField.isBlank() || !Xml.isPlainText(groupField)) {
      throw new IllegalArgumentException("group field name: found '" + groupField + "'");
    }
  }

  /**
   * Writes one frame with these point fields (one value or three per node).
   *
   * @throws IllegalArgumentException when a field's length does not fit the mesh or names repeat
   */
  public void write(Path file, List<VtuWriter.Field> pointFields) throws IOException {
    write(file, pointFields, List.of());
  }

  /**
   * Writes one frame with these point fields and cell fields (one value or three per tetrahedron,
   * written before the volume group index in the cell data).
   *
   * @throws IllegalArgumentException when a field's length does not fit the mesh or names repeat
   */
  public void write(Path file, List<VtuWriter.Field> pointFields, List<VtuWriter.Field> cellFields)
      throws IOException {
    VtuWriter.checkPointFields(pointFields, mesh.nodeCount());
    checkCellFields(cellFields);
    List<EncodedArray> fields = encoded(pointFields);
    List<EncodedArray> cells = encoded(cellFields);
    MeshCopy from = usableSource(file);
    List<EncodedArray> meshArrays = from == null ? meshArrays() : null;
    long[] meshLengths = from == null ? lengths(meshArrays) : from.lengths();
    long offset = 0;
    StringBuilder xml = new StringBuilder(2048);
    xml.append("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n")
        .append("<VTKFile type=\"UnstructuredGrid\" version=\"1.0\" byte_order=\"LittleEndian\"")
        .append(" header_type=\"UInt64\"")
        .append(encoding.zlib() ? " compressor=\"vtkZLibDataCompressor\"" : "")
        .append(">\n  <UnstructuredGrid>\n")
        .append("    <Piece NumberOfPoints=\"")
        .append(mesh.nodeCount())
        .append("\" NumberOfCells=\"")
        .append(mesh.tetCount())
        .append("\">\n      <PointData>\n");
    for (EncodedArray f : fields) {
      tag(xml, f.array, offset);
      offset += f.length();
    }
    String[] sections = {"CellData", "Points", "Cells"};
    int[] arraysIn = {1, 1, 3};
    VtkArray[] described = meshDescriptions();
    xml.append("      </PointData>\n");
    int m = 0;
    for (int s = 0; s < sections.length; s++) {
      xml.append("      <").append(sections[s]).append(">\n");
      if (s == 0) {
        for (EncodedArray c : cells) {
          tag(xml, c.array, offset);
          offset += c.length();
        }
      }
      for (int k = 0; k < arraysIn[s]; k++, m++) {
        tag(xml, described[m], offset);
        offset += meshLengths[m];
      }
      xml.append("      </").append(sections[s]).append(">\n");
    }
    xml.append("    </Piece>\n  </UnstructuredGrid>\n  <AppendedData encoding=\"base64\">\n    _");
    long start;
    try (FileChannel channel =
        FileChannel.open(
            file,
            StandardOpenOption.CREATE,
            StandardOpenOption.TRUNCATE_EXISTING,
            StandardOpenOption.WRITE)) {
      OutputStream out = new BufferedOutputStream(Channels.newOutputStream(channel), 1 << 16);
      out.write(xml.toString().getBytes(StandardCharsets.UTF_8));
      for (EncodedArray f : fields) {
        f.writeTo(out);
      }
      for (EncodedArray c : cells) {
        c.writeTo(out);
      }
      out.flush();
      start = channel.position();
      if (from != null) {
        copyRange(from, channel);
      } else {
        for (EncodedArray a : meshArrays) {
          a.writeTo(out);
        }
        out.flush();
      }
      out.write("\n  </AppendedData>\n</VTKFile>\n".getBytes(StandardCharsets.US_ASCII));
      out.flush();
    }
    if (from == null) {
      source =
          new MeshCopy(
              file.toAbsolutePath().normalize(),
              start,
              meshLengths,
              Files.size(file),
              Files.getLastModifiedTime(file));
    }
  }

  private List<EncodedArray> encoded(List<VtuWriter.Field> given) {
    List<EncodedArray> out = new ArrayList<>();
    for (VtuWriter.Field f : given) {
      VtkArray.Type type = encoding.doubleFields() ? VtkArray.Type.FLOAT64 : VtkArray.Type.FLOAT32;
      out.add(
          EncodedArray.of(
              VtkArray.floats(f.name(), f.unit(), type, f.components(), f.values()),
              encoding.zlib()));
    }
    return out;
  }

  private void checkCellFields(List<VtuWriter.Field> cellFields) {
    java.util.Set<String> names = new java.util.HashSet<>();
    names.add(groupField);
    for (VtuWriter.Field f : cellFields) {
      if (f.values().length != (long) f.components() * mesh.tetCount()) {
        throw new IllegalArgumentException(
            "cell field '"
                + f.name()
                + "': found "
                + f.values().length
                + " values, expected "
                + (long) f.components() * mesh.tetCount());
      }
      if (!names.add(f.name())) {
        throw new IllegalArgumentException("cell field '" + f.name() + "' named twice");
      }
    }
  }

  /** The earlier frame to copy the mesh from, or null when there is none or it changed since. */
  private MeshCopy usableSource(Path target) throws IOException {
    MeshCopy s = source;
    if (s == null
        || s.file().equals(target.toAbsolutePath().normalize())
        || !Files.isRegularFile(s.file())
        || Files.size(s.file()) != s.fileSize()
        || !Files.getLastModifiedTime(s.file()).equals(s.modified())) {
      return null;
    }
    return s;
  }

  private static void copyRange(MeshCopy from, FileChannel to) throws IOException {
    long length = 0;
    for (long l : from.lengths()) {
      length += l;
    }
    try (FileChannel in = FileChannel.open(from.file(), StandardOpenOption.READ)) {
      long done = 0;
      while (done < length) {
        long n = in.transferTo(from.start() + done, length - done, to);
        if (n <= 0) {
          throw new IOException(from.file() + ": ended before its mesh data, copying a frame");
        }
        done += n;
      }
    }
  }

  /** The mesh's arrays, values left out: what the XML needs to describe them. */
  private VtkArray[] meshDescriptions() {
    int[] none = new int[0];
    return new VtkArray[] {
      VtkArray.integers(groupField, VtkArray.Type.INT32, 1, none),
      VtkArray.float64("Points", 3, new double[0]),
      VtkArray.integers("connectivity", VtkArray.Type.INT32, 1, none),
      VtkArray.integers("offsets", VtkArray.Type.INT32, 1, none),
      VtkArray.integers("types", VtkArray.Type.UINT8, 1, none)
    };
  }

  /** The mesh's arrays with their values, encoded (compressed now when asked for). */
  private List<EncodedArray> meshArrays() {
    int tets = mesh.tetCount();
    int per = mesh.nodesPerTet();
    int[] offsets = new int[tets];
    int[] types = new int[tets];
    int type = VtuWriter.vtkTetType(mesh);
    for (int c = 0; c < tets; c++) {
      offsets[c] = (c + 1) * per;
      types[c] = type;
    }
    List<EncodedArray> out = new ArrayList<>();
    boolean z = encoding.zlib();
    out.add(
        EncodedArray.of(
            VtkArray.integers(groupField, VtkArray.Type.INT32, 1, mesh.copyTetGroups()), z));
    out.add(EncodedArray.of(VtkArray.float64("Points", 3, mesh.copyCoordinates()), z));
    out.add(
        EncodedArray.of(
            VtkArray.integers(
                "connectivity", VtkArray.Type.INT32, 1, VtuWriter.vtkConnectivity(mesh)),
            z));
    out.add(EncodedArray.of(VtkArray.integers("offsets", VtkArray.Type.INT32, 1, offsets), z));
    out.add(EncodedArray.of(VtkArray.integers("types", VtkArray.Type.UINT8, 1, types), z));
    return out;
  }

  private static long[] lengths(List<EncodedArray> arrays) {
    long[] l = new long[arrays.size()];
    for (int i = 0; i < l.length; i++) {
      l[i] = arrays.get(i).length();
    }
    return l;
  }

  private static void tag(StringBuilder xml, VtkArray a, long offset) {
    xml.append("        <DataArray type=\"")
        .append(a.type.vtkName)
        .append("\" Name=\"")
        .append(Xml.escape(a.name))
        .append("\" NumberOfComponents=\"")
        .append(a.components)
        .append('"');
    if (!a.unit.isEmpty()) {
      // not a VTK attribute: VTK's readers ignore it, people and scripts reading the file see it
      xml.append(" units=\"").append(Xml.escape(a.unit)).append('"');
    }
    xml.append(" format=\"appended\" offset=\"").append(offset).append("\"/>\n");
  }
}
