package dev.soakfield.mesh.vtk;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Base64;
import java.util.List;

/**
 * Writes one VTK XML UnstructuredGrid piece (version 1.0, little endian, UInt64 headers) from
 * prepared arrays, in any {@link VtuFormat}.
 *
 * <p>Binary blobs carry a UInt64 byte count in front. In base64 the count and the data are encoded
 * as two separate base64 runs, as VTK's reader expects (A. Kloeckner, "What they don't tell you
 * about VTK XML binary formats"); appended offsets count bytes (raw) or base64 characters from the
 * character after the '_' marker.
 */
final class VtuDocument {
  private static final int HEADER_BYTES = 8;

  private final int pointCount;
  private final int cellCount;
  private final List<VtkArray> pointData;
  private final List<VtkArray> cellData;
  private final VtkArray points;
  private final List<VtkArray> cells;

  VtuDocument(
      int pointCount,
      int cellCount,
      List<VtkArray> pointData,
      List<VtkArray> cellData,
      VtkArray points,
      List<VtkArray> cells) {
    this.pointCount = pointCount;
    this.cellCount = cellCount;
    this.pointData = pointData;
    this.cellData = cellData;
    this.points = points;
    this.cells = cells;
  }

  void write(Path file, VtuFormat format) throws IOException {
    try (OutputStream out = new BufferedOutputStream(Files.newOutputStream(file), 1 << 16)) {
      write(out, format);
    }
  }

  private void write(OutputStream out, VtuFormat format) throws IOException {
    List<VtkArray> order = new ArrayList<>(pointData);
    order.addAll(cellData);
    order.add(points);
    order.addAll(cells);
    long[] offsets = new long[order.size()];
    long offset = 0;
    for (int i = 0; i < order.size(); i++) {
      offsets[i] = offset;
      offset += encodedSize(order.get(i).byteCount(), format);
    }
    text(out, "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n");
    text(
        out,
        "<VTKFile type=\"UnstructuredGrid\" version=\"1.0\" byte_order=\"LittleEndian\""
            + " header_type=\"UInt64\">\n");
    text(out, "  <UnstructuredGrid>\n");
    text(
        out,
        "    <Piece NumberOfPoints=\"" + pointCount + "\" NumberOfCells=\"" + cellCount + "\">\n");
    int a = 0;
    text(out, "      <PointData>\n");
    for (VtkArray array : pointData) {
      dataArray(out, array, format, offsets[a++]);
    }
    text(out, "      </PointData>\n      <CellData>\n");
    for (VtkArray array : cellData) {
      dataArray(out, array, format, offsets[a++]);
    }
    text(out, "      </CellData>\n      <Points>\n");
    dataArray(out, points, format, offsets[a++]);
    text(out, "      </Points>\n      <Cells>\n");
    for (VtkArray array : cells) {
      dataArray(out, array, format, offsets[a++]);
    }
    text(out, "      </Cells>\n    </Piece>\n  </UnstructuredGrid>\n");
    if (format == VtuFormat.APPENDED_BASE64 || format == VtuFormat.APPENDED_RAW) {
      boolean raw = format == VtuFormat.APPENDED_RAW;
      text(out, "  <AppendedData encoding=\"" + (raw ? "raw" : "base64") + "\">\n    _");
      for (VtkArray array : order) {
        if (raw) {
          out.write(header(array.byteCount()));
          array.writeBytes(out);
        } else {
          base64Blob(out, array);
        }
      }
      text(out, "\n  </AppendedData>\n");
    }
    text(out, "</VTKFile>\n");
  }

  private static long encodedSize(long bytes, VtuFormat format) {
    return format == VtuFormat.APPENDED_RAW
        ? HEADER_BYTES + bytes
        : base64Length(HEADER_BYTES) + base64Length(bytes);
  }

  private static long base64Length(long bytes) {
    return 4 * ((bytes + 2) / 3);
  }

  private static void dataArray(OutputStream out, VtkArray array, VtuFormat format, long offset)
      throws IOException {
    StringBuilder tag = new StringBuilder("        <DataArray type=\"");
    tag.append(array.type.vtkName).append("\" Name=\"").append(Xml.escape(array.name)).append('"');
    tag.append(" NumberOfComponents=\"").append(array.components).append('"');
    if (!array.unit.isEmpty()) {
      // not a VTK attribute: VTK's readers ignore it, people and scripts reading the file see it
      tag.append(" units=\"").append(Xml.escape(array.unit)).append('"');
    }
    switch (format) {
      case ASCII -> tag.append(" format=\"ascii\">\n");
      case BINARY -> tag.append(" format=\"binary\">\n          ");
      case APPENDED_BASE64, APPENDED_RAW ->
          tag.append(" format=\"appended\" offset=\"").append(offset).append("\"/>\n");
    }
    text(out, tag.toString());
    if (format == VtuFormat.ASCII) {
      array.writeAscii(out);
      text(out, "        </DataArray>\n");
    } else if (format == VtuFormat.BINARY) {
      base64Blob(out, array);
      text(out, "\n        </DataArray>\n");
    }
  }

  /** Byte count header and data as two base64 runs. */
  private static void base64Blob(OutputStream out, VtkArray array) throws IOException {
    try (OutputStream b64 = Base64.getEncoder().wrap(new KeepOpenStream(out))) {
      b64.write(header(array.byteCount()));
    }
    try (OutputStream b64 = Base64.getEncoder().wrap(new KeepOpenStream(out))) {
      array.writeBytes(b64);
    }
  }

  private static byte[] header(long byteCount) {
    return ByteBuffer.allocate(HEADER_BYTES)
        .order(ByteOrder.LITTLE_ENDIAN)
        .putLong(byteCount)
        .array();
  }

  private static void text(OutputStream out, String s) throws IOException {
    out.write(s.getBytes(StandardCharsets.UTF_8));
  }
}
