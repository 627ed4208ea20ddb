package dev.soakfield.mesh.vtk;

import dev.soakfield.mesh.MeshInputException;
import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import javax.xml.stream.XMLInputFactory;
import javax.xml.stream.XMLStreamConstants;
import javax.xml.stream.XMLStreamException;
import javax.xml.stream.XMLStreamReader;

/**
 * Reads back a VTK XML UnstructuredGrid (.vtu) of one piece, as {@link VtuWriter} writes it:
 * DataArrays in ascii, binary (base64 in the element) or appended base64 form, UInt32 or UInt64
 * headers, little endian, uncompressed or zlib-compressed ({@code vtkZLibDataCompressor}). Appended
 * raw data is not XML and is refused with a clear message, as are other compressors.
 *
 * <p>The layout follows the VTK file-format description ("VTK File Formats", VTK User's Guide, XML
 * section): a binary blob is a byte-count header followed by the data, each base64-encoded as its
 * own run; an appended offset counts characters after the '_' marker.
 */
public final class VtuReader {
  private VtuReader() {}

  private static final String ZLIB = "vtkZLibDataCompressor";

  /** One DataArray as declared, and its text until decoded. */
  static final class Declared {
    String section;
    String name;
    String type;
    int components;
    String format;
    long offset;
    int line;
    final StringBuilder text = new StringBuilder();
  }

  /** What the XML part of a file declares: sizes, encoding and its DataArrays. */
  private static final class Header {
    String headerType = "UInt32";
    String compressor = "";
    int points = -1;
    int cells = -1;
    final List<Declared> arrays = new ArrayList<>();
    boolean appended;
  }

  /**
   * Sizes and point fields of a .vtu file, read from its XML part alone (its data is not decoded).
   *
   * @param points the Piece's NumberOfPoints
   * @param cells the Piece's NumberOfCells
   * @param pointFields the names of its PointData arrays, in file order
   * @param cellFields the names of its CellData arrays, in file order
   */
  public record Outline(int points, int cells, List<String> pointFields, List<String> cellFields) {}

  /**
   * Reads the file.
   *
   * @throws MeshInputException when the file is missing, not a .vtu of this kind, or its arrays do
   *     not fit its declared sizes; the message names the file, the array and the line
   */
  public static VtuGrid read(Path file) {
    try (Opened o = open(file)) {
      return assemble(o);
    }
  }

  /**
   * The sizes and point field names of a file, without decoding its data.
   *
   * @throws MeshInputException as {@link #read}
   */
  public static Outline outline(Path file) {
    try (Opened o = open(file)) {
      return new Outline(
          o.header.points, o.header.cells, names(o, "PointData"), names(o, "CellData"));
    }
  }

  /**
   * One point field of a file. Only that array is decoded: a result frame holds its mesh too, which
   * is many times larger than one field.
   *
   * @throws MeshInputException as {@link #read}, and when the file has no such point field
   */
  public static double[] pointField(Path file, String name) {
    return oneField(file, "PointData", name, "a point field '" + name + "'");
  }

  /**
   * One cell field of a file (one value per cell for a scalar), decoded alone as {@link
   * #pointField}.
   *
   * @throws MeshInputException as {@link #read}, and when the file has no such cell field
   */
  public static double[] cellField(Path file, String name) {
    return oneField(file, "CellData", name, "a cell field '" + name + "'");
  }

  private static double[] oneField(Path file, String section, String name, String expected) {
    try (Opened o = open(file)) {
      long entries = section.equals("PointData") ? o.header.points : o.header.cells;
      for (Declared d : o.header.arrays) {
        if (d.section.equals(section) && d.name.equals(name)) {
          return doubles(o.source, d, bytes(o, d), d.components * entries);
        }
      }
      throw new MeshInputException(o.source, section, "the fields " + names(o, section), expected);
    }
  }

  private static List<String> names(Opened o, String section) {
    return o.header.arrays.stream()
        .filter(d -> d.section.equals(section))
        .map(d -> d.name)
        .toList();
  }

  /** A file whose XML part is read; its appended data, if any, is read from the file on demand. */
  private static final class Opened implements AutoCloseable {
    final String source;
    final Header header;
    final ChannelText appended;
    final Blobs blobs;

    Opened(String source, Header header, ChannelText appended) {
      this.source = source;
      this.header = header;
      this.appended = appended;
      int headerBytes = header.headerType.equals("UInt64") ? 8 : 4;
      this.blobs = new Blobs(source, headerBytes, !header.compressor.isEmpty());
    }

    @Override
    public void close() {
      if (appended != null) {
        appended.close();
      }
    }
  }

  private static Opened open(Path file) {
    String source = file.toString();
    if (!Files.isRegularFile(file)) {
      throw new MeshInputException(source, "", "no such file", "a .vtu file");
    }
    XMLInputFactory factory = XMLInputFactory.newFactory();
    factory.setProperty(XMLInputFactory.SUPPORT_DTD, false);
    factory.setProperty(XMLInputFactory.IS_SUPPORTING_EXTERNAL_ENTITIES, false);
    Header header;
    try (InputStream in = Files.newInputStream(file)) {
      XMLStreamReader x = factory.createXMLStreamReader(in);
      try {
        header = parse(source, x);
      } finally {
        x.close();
      }
    } catch (XMLStreamException e) {
      int line = e.getLocation() == null ? -1 : e.getLocation().getLineNumber();
      throw new MeshInputException(
          source, line > 0 ? "line " + line : "", "malformed XML (" + e.getMessage() + ")", "XML");
    } catch (IOException e) {
      throw unreadable(source, e);
    }
    // the appended base64 (most of a large file) is read from the file where an array needs it,
    // not parsed as XML text: StAX would hand all of it over as characters
    return new Opened(source, header, header.appended ? ChannelText.appended(file) : null);
  }

  static MeshInputException unreadable(String source, IOException e) {
    return new MeshInputException(
        source, "", "an unreadable file (" + e.getMessage() + ")", "a readable .vtu file");
  }

  private static Header parse(String source, XMLStreamReader x) throws XMLStreamException {
    Header h = new Header();
    String section = "";
    int pieces = 0;
    Declared open = null;
    while (x.hasNext()) {
      int ev = x.next();
      if (ev == XMLStreamConstants.START_ELEMENT) {
        String el = x.getLocalName();
        int line = x.getLocation().getLineNumber();
        switch (el) {
          case "VTKFile" -> fileAttributes(source, line, x, h);
          case "Piece" -> {
            pieces++;
            if (pieces > 1) {
              throw new MeshInputException(source, "line " + line, "a second Piece", "one Piece");
            }
            h.points = count(source, line, x, "NumberOfPoints");
            h.cells = count(source, line, x, "NumberOfCells");
          }
          case "PointData", "CellData", "Points", "Cells" -> section = el;
          case "DataArray" -> {
            Declared d = new Declared();
            d.section = section;
            d.line = line;
            d.name = attr(x, "Name", section.equals("Points") ? "Points" : "");
            d.type = attr(x, "type", "");
            d.format = attr(x, "format", "ascii");
            d.components = (int) number(source, line, x, "NumberOfComponents", "1");
            if (d.format.equals("appended")) {
              d.offset = number(source, line, x, "offset", "");
            } else if (!d.format.equals("ascii") && !d.format.equals("binary")) {
              throw new MeshInputException(
                  source,
                  where(d),
                  "format '" + d.format + "'",
                  "format 'ascii', 'binary' or 'appended'");
            }
            h.arrays.add(d);
            open = d;
          }
          case "AppendedData" -> {
            String enc = attr(x, "encoding", "");
            if (!enc.equals("base64")) {
              throw new MeshInputException(
                  source,
                  "line " + line,
                  "appended data in encoding '" + enc + "'",
                  "appended base64 (raw appended data is not XML; write the file as base64)");
            }
            h.appended = true;
            return requirePiece(source, h, pieces); // the rest of the file is the data
          }
          default -> {
            // other elements (FieldData, Cells' faces...) are not used here
          }
        }
      } else if (ev == XMLStreamConstants.CHARACTERS || ev == XMLStreamConstants.CDATA) {
        if (open != null) {
          open.text.append(x.getTextCharacters(), x.getTextStart(), x.getTextLength());
        }
      } else if (ev == XMLStreamConstants.END_ELEMENT) {
        String el = x.getLocalName();
        if (el.equals("DataArray")) {
          open = null;
        } else if (el.equals("PointData")
            || el.equals("CellData")
            || el.equals("Points")
            || el.equals("Cells")) {
          section = "";
        }
      }
    }
    return requirePiece(source, h, pieces);
  }

  private static void fileAttributes(String source, int line, XMLStreamReader x, Header h) {
    String type = attr(x, "type", "");
    if (!type.equals("UnstructuredGrid")) {
      throw new MeshInputException(
          source, "line " + line, "VTKFile type '" + type + "'", "type 'UnstructuredGrid'");
    }
    String order = attr(x, "byte_order", "LittleEndian");
    if (!order.equals("LittleEndian")) {
      throw new MeshInputException(
          source, "line " + line, "byte_order '" + order + "'", "LittleEndian");
    }
    h.compressor = attr(x, "compressor", "");
    if (!h.compressor.isEmpty() && !h.compressor.equals(ZLIB)) {
      throw new MeshInputException(
          source,
          "line " + line,
          "compressed data (" + h.compressor + ")",
          "uncompressed data or " + ZLIB);
    }
    h.headerType = attr(x, "header_type", "UInt32");
    if (!h.headerType.equals("UInt32") && !h.headerType.equals("UInt64")) {
      throw new MeshInputException(
          source, "line " + line, "header_type '" + h.headerType + "'", "UInt32 or UInt64");
    }
  }

  private static Header requirePiece(String source, Header h, int pieces) {
    if (pieces == 0) {
      throw new MeshInputException(source, "", "no Piece element", "one UnstructuredGrid Piece");
    }
    return h;
  }

  /** The decoded bytes of a binary or appended array; null for an ascii one (parsed from text). */
  private static ByteBuffer bytes(Opened o, Declared d) {
    if (d.format.equals("binary")) {
      return o.blobs.decode(d, d.text, 0);
    }
    if (d.format.equals("appended")) {
      if (o.appended == null) {
        throw new MeshInputException(
            o.source, where(d), "an appended array but no AppendedData", "an AppendedData element");
      }
      return o.blobs.decode(d, o.appended, d.offset);
    }
    return null;
  }

  private static VtuGrid assemble(Opened o) {
    String source = o.source;
    int points = o.header.points;
    int cells = o.header.cells;
    double[] xyz = null;
    int[] conn = null;
    int[] offsets = null;
    int[] types = null;
    Map<String, double[]> pointFields = new LinkedHashMap<>();
    Map<String, double[]> cellFields = new LinkedHashMap<>();
    Map<String, Integer> comps = new HashMap<>();
    for (Declared d : o.header.arrays) {
      ByteBuffer bytes = bytes(o, d);
      switch (d.section) {
        case "Points" -> xyz = doubles(source, d, bytes, 3L * points);
        case "Cells" -> {
          switch (d.name) {
            case "connectivity" -> conn = ints(source, d, bytes, -1);
            case "offsets" -> offsets = ints(source, d, bytes, cells);
            case "types" -> types = ints(source, d, bytes, cells);
            default -> {
              // faces/faceoffsets of polyhedra: not used by tetrahedra
            }
          }
        }
        case "PointData" -> {
          pointFields.put(d.name, doubles(source, d, bytes, (long) d.components * points));
          comps.put(d.name, d.components);
        }
        case "CellData" -> {
          cellFields.put(d.name, doubles(source, d, bytes, (long) d.components * cells));
          comps.put(d.name, d.components);
        }
        default ->
            throw new MeshInputException(
                source, where(d), "a DataArray outside Points, Cells, PointData, CellData", "none");
      }
    }
    if (xyz == null || conn == null || offsets == null || types == null) {
      throw new MeshInputException(
          source,
          "Piece",
          "missing arrays (Points, connectivity, offsets or types)",
          "Points and the Cells arrays connectivity, offsets, types");
    }
    int prev = 0;
    for (int c = 0; c < offsets.length; c++) {
      if (offsets[c] < prev || offsets[c] > conn.length) {
        throw new MeshInputException(
            source,
            "DataArray 'offsets', cell " + c,
            "offset " + offsets[c],
            "increasing offsets up to " + conn.length);
      }
      prev = offsets[c];
    }
    for (int i = 0; i < conn.length; i++) {
      if (conn[i] < 0 || conn[i] >= points) {
        throw new MeshInputException(
            source,
            "DataArray 'connectivity', entry " + i,
            "point index " + conn[i],
            "an index in 0.." + (points - 1));
      }
    }
    return new VtuGrid(xyz, conn, offsets, types, pointFields, cellFields, comps);
  }

  static int skipSpace(CharSequence text, int i) {
    while (i < text.length() && Character.isWhitespace(text.charAt(i))) {
      i++;
    }
    return i;
  }

  private static int width(String source, Declared d) {
    return switch (d.type) {
      case "Float64", "Int64", "UInt64" -> 8;
      case "Float32", "Int32", "UInt32" -> 4;
      case "Int16", "UInt16" -> 2;
      case "Int8", "UInt8" -> 1;
      default ->
          throw new MeshInputException(
              source, where(d), "type '" + d.type + "'", "a VTK scalar type (Float64, Int32, ...)");
    };
  }

  private static double[] doubles(String source, Declared d, ByteBuffer bytes, long expected) {
    int w = width(source, d);
    if (bytes == null) {
      String[] tok = tokens(d.text);
      checkCount(source, d, tok.length, expected);
      double[] v = new double[tok.length];
      for (int i = 0; i < tok.length; i++) {
        try {
          v[i] = Double.parseDouble(tok[i]);
        } catch (NumberFormatException e) {
          throw new MeshInputException(
              source, where(d) + ", value " + i, "'" + tok[i] + "'", "a number");
        }
      }
      return v;
    }
    int n = bytes.remaining() / w;
    checkCount(source, d, n, expected);
    double[] v = new double[n];
    for (int i = 0; i < n; i++) {
      v[i] = scalar(d.type, bytes);
    }
    return v;
  }

  private static int[] ints(String source, Declared d, ByteBuffer bytes, long expected) {
    int w = width(source, d);
    if (d.type.startsWith("Float")) {
      throw new MeshInputException(source, where(d), "type '" + d.type + "'", "an integer type");
    }
    if (bytes == null) {
      String[] tok = tokens(d.text);
      checkCount(source, d, tok.length, expected);
      int[] v = new int[tok.length];
      for (int i = 0; i < tok.length; i++) {
        try {
          v[i] = Integer.parseInt(tok[i]);
        } catch (NumberFormatException e) {
          throw new MeshInputException(
              source, where(d) + ", value " + i, "'" + tok[i] + "'", "an integer");
        }
      }
      return v;
    }
    int n = bytes.remaining() / w;
    checkCount(source, d, n, expected);
    int[] v = new int[n];
    for (int i = 0; i < n; i++) {
      double s = scalar(d.type, bytes);
      if (s > Integer.MAX_VALUE || s < Integer.MIN_VALUE) {
        throw new MeshInputException(
            source, where(d) + ", value " + i, String.valueOf(s), "a 32-bit integer");
      }
      v[i] = (int) s;
    }
    return v;
  }

  private static double scalar(String type, ByteBuffer b) {
    return switch (type) {
      case "Float64" -> b.getDouble();
      case "Float32" -> b.getFloat();
      case "Int64", "UInt64" -> b.getLong();
      case "Int32" -> b.getInt();
      case "UInt32" -> Integer.toUnsignedLong(b.getInt());
      case "Int16" -> b.getShort();
      case "UInt16" -> Short.toUnsignedInt(b.getShort());
      case "Int8" -> b.get();
      default -> Byte.toUnsignedInt(b.get());
    };
  }

  private static void checkCount(String source, Declared d, long found, long expected) {
    if (expected >= 0 && found != expected) {
      throw new MeshInputException(
          source, where(d), found + " values", expected + " values (from the Piece's sizes)");
    }
  }

  private static String[] tokens(CharSequence text) {
    String s = text.toString().strip();
    return s.isEmpty() ? new String[0] : s.split("\\s+");
  }

  static String where(Declared d) {
    return String.format(Locale.ROOT, "DataArray '%s' (line %d)", d.name, d.line);
  }

  private static String attr(XMLStreamReader x, String name, String fallback) {
    String v = x.getAttributeValue(null, name);
    return v == null ? fallback : v;
  }

  private static long number(
      String source, int line, XMLStreamReader x, String name, String fallback) {
    String v = attr(x, name, fallback);
    try {
      long n = Long.parseLong(v.strip());
      if (n < 0) {
        throw new NumberFormatException();
      }
      return n;
    } catch (NumberFormatException e) {
      throw new MeshInputException(
          source, "line " + line, name + "='" + v + "'", "a non-negative integer");
    }
  }

  private static int count(String source, int line, XMLStreamReader x, String name) {
    long n = number(source, line, x, name, "");
    if (n > Integer.MAX_VALUE / 10) {
      throw new MeshInputException(source, "line " + line, name + "=" + n, "a smaller count");
    }
    return (int) n;
  }
}
