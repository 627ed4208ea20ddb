package dev.soakfield.mesh.vtk;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Base64;
import java.util.HashMap;
import java.util.Map;
import java.util.regex.Pattern;
import javax.xml.parsers.DocumentBuilder;
import javax.xml.parsers.DocumentBuilderFactory;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;
import org.xml.sax.ErrorHandler;
import org.xml.sax.SAXException;
import org.xml.sax.SAXParseException;

/**
 * Reads back a .vtu file by the published rules of the VTK XML format (formats.md): DataArrays in
 * ascii, binary (base64 of a UInt64 byte count, then base64 of the data) or appended (offsets from
 * the character after '_'; base64 characters or raw bytes).
 */
final class VtuTestReader {
  /** A decoded DataArray: its VTK type, component count and values (integers stored exactly). */
  @SuppressWarnings("ArrayRecordComponent") // test data holder
  record Array(String type, int components, double[] values) {}

  private static final Pattern BLANKS = Pattern.compile("\\s+");

  final Element piece;
  final Map<String, Array> arrays = new HashMap<>();
  final String byteOrder;
  final String headerType;
  final boolean zlib;

  private VtuTestReader(Document doc, byte[] rawAppended) throws Exception {
    Element root = doc.getDocumentElement();
    assertEquals("VTKFile", root.getTagName());
    assertEquals("UnstructuredGrid", root.getAttribute("type"));
    assertEquals("1.0", root.getAttribute("version"));
    byteOrder = root.getAttribute("byte_order");
    headerType = root.getAttribute("header_type");
    zlib = root.getAttribute("compressor").equals("vtkZLibDataCompressor");
    piece = (Element) root.getElementsByTagName("Piece").item(0);
    String appended = null;
    NodeList app = root.getElementsByTagName("AppendedData");
    if (app.getLength() == 1) {
      Element a = (Element) app.item(0);
      assertEquals("base64", a.getAttribute("encoding"));
      String text = a.getTextContent();
      appended = text.substring(text.indexOf('_') + 1);
    }
    NodeList list = root.getElementsByTagName("DataArray");
    for (int i = 0; i < list.getLength(); i++) {
      Element e = (Element) list.item(i);
      String section = ((Element) e.getParentNode()).getTagName();
      String type = e.getAttribute("type");
      int components = Integer.parseInt(e.getAttribute("NumberOfComponents"));
      byte[] bytes;
      String format = e.getAttribute("format");
      double[] values;
      if (format.equals("ascii")) {
        String[] tokens = BLANKS.split(e.getTextContent().trim(), -1);
        values = new double[tokens.length];
        for (int k = 0; k < tokens.length; k++) {
          values[k] =
              type.equals("Float64") ? Double.parseDouble(tokens[k]) : Long.parseLong(tokens[k]);
        }
      } else {
        if (zlib) {
          assertEquals("appended", format);
          bytes = decodeZlibBlob(appended, Integer.parseInt(e.getAttribute("offset")));
        } else if (format.equals("binary")) {
          bytes = decodeBase64Blob(e.getTextContent().trim(), 0);
        } else {
          assertEquals("appended", format);
          int offset = Integer.parseInt(e.getAttribute("offset"));
          bytes =
              rawAppended != null
                  ? rawBlob(rawAppended, offset)
                  : decodeBase64Blob(appended, offset);
        }
        values = decode(type, bytes);
      }
      arrays.put(section + "/" + e.getAttribute("Name"), new Array(type, components, values));
    }
  }

  /** Header: 8 bytes = 12 base64 characters (with padding); then the data run. */
  private static byte[] decodeBase64Blob(String text, int offset) {
    byte[] header = Base64.getDecoder().decode(text.substring(offset, offset + 12));
    long count = ByteBuffer.wrap(header).order(ByteOrder.LITTLE_ENDIAN).getLong();
    int chars = (int) (4 * ((count + 2) / 3));
    byte[] data = Base64.getDecoder().decode(text.substring(offset + 12, offset + 12 + chars));
    assertEquals(count, data.length, "byte count header");
    return data;
  }

  /**
   * A zlib-compressed array (VTK File Formats, XML section): a base64 run of the UInt64 header
   * [#blocks][block size][last partial block size, 0 if none][compressed size of each block], then
   * a base64 run of the blocks, each a zlib stream (RFC 1950) of its own.
   */
  private static byte[] decodeZlibBlob(String text, int offset) throws Exception {
    ByteBuffer first =
        ByteBuffer.wrap(Base64.getDecoder().decode(text.substring(offset, offset + 32)))
            .order(ByteOrder.LITTLE_ENDIAN);
    int blocks = (int) first.getLong();
    int blockSize = (int) first.getLong();
    int last = (int) first.getLong();
    int headerChars = (int) (4 * ((8L * (3 + blocks) + 2) / 3));
    ByteBuffer header =
        ByteBuffer.wrap(Base64.getDecoder().decode(text.substring(offset, offset + headerChars)))
            .order(ByteOrder.LITTLE_ENDIAN);
    header.position(24);
    int[] sizes = new int[blocks];
    int total = 0;
    for (int b = 0; b < blocks; b++) {
      sizes[b] = (int) header.getLong();
      total += sizes[b];
    }
    int dataChars = (int) (4 * ((total + 2L) / 3));
    byte[] packed =
        Base64.getDecoder()
            .decode(text.substring(offset + headerChars, offset + headerChars + dataChars));
    java.io.ByteArrayOutputStream out = new java.io.ByteArrayOutputStream();
    int at = 0;
    for (int b = 0; b < blocks; b++) {
      java.util.zip.Inflater inf = new java.util.zip.Inflater();
      inf.setInput(packed, at, sizes[b]);
      byte[] block = new byte[blockSize];
      int n = inf.inflate(block);
      assertTrue(inf.finished(), "block " + b + " is one whole zlib stream");
      inf.end();
      int expected = b == blocks - 1 && last != 0 ? last : blockSize;
      assertEquals(expected, n, "inflated size of block " + b);
      out.write(block, 0, n);
      at += sizes[b];
    }
    return out.toByteArray();
  }

  private static byte[] rawBlob(byte[] data, int offset) {
    long count = ByteBuffer.wrap(data, offset, 8).order(ByteOrder.LITTLE_ENDIAN).getLong();
    byte[] out = new byte[(int) count];
    System.arraycopy(data, offset + 8, out, 0, (int) count);
    return out;
  }

  private static double[] decode(String type, byte[] bytes) {
    ByteBuffer b = ByteBuffer.wrap(bytes).order(ByteOrder.LITTLE_ENDIAN);
    int size =
        switch (type) {
          case "Float64", "Int64" -> 8;
          case "Int32", "Float32" -> 4;
          case "UInt8" -> 1;
          default -> throw new AssertionError("unexpected type " + type);
        };
    assertEquals(0, bytes.length % size);
    double[] v = new double[bytes.length / size];
    for (int i = 0; i < v.length; i++) {
      v[i] =
          switch (type) {
            case "Float64" -> b.getDouble();
            case "Int64" -> b.getLong();
            case "Int32" -> b.getInt();
            case "Float32" -> b.getFloat();
            default -> b.get() & 0xff;
          };
    }
    return v;
  }

  static Document parseXml(byte[] bytes) throws Exception {
    DocumentBuilder builder = DocumentBuilderFactory.newInstance().newDocumentBuilder();
    // Throw instead of printing to stderr; the default handler prints every fatal error.
    builder.setErrorHandler(
        new ErrorHandler() {
          @Override
          public void warning(SAXParseException e) throws SAXException {
            throw e;
          }

          @Override
          public void error(SAXParseException e) throws SAXException {
            throw e;
          }

          @Override
          public void fatalError(SAXParseException e) throws SAXException {
            throw e;
          }
        });
    return builder.parse(new ByteArrayInputStream(bytes));
  }

  /** Reads an ascii, binary or appended base64 file: it must be well-formed XML. */
  static VtuTestReader read(Path file) throws Exception {
    return new VtuTestReader(parseXml(Files.readAllBytes(file)), null);
  }

  /**
   * Reads an appended raw file: the XML part before the AppendedData element is parsed (closed by
   * hand), the bytes after '_' are read by offset.
   */
  static VtuTestReader readRaw(Path file) throws Exception {
    byte[] all = Files.readAllBytes(file);
    String marker = "<AppendedData encoding=\"raw\">";
    int at = indexOf(all, marker.getBytes(StandardCharsets.US_ASCII));
    assertTrue(at > 0, "raw AppendedData element");
    int underscore = at + marker.length();
    while (all[underscore] != '_') {
      assertTrue(Character.isWhitespace(all[underscore]), "only blanks before '_'");
      underscore++;
    }
    byte[] head = new byte[at];
    System.arraycopy(all, 0, head, 0, at);
    String xml = new String(head, StandardCharsets.UTF_8) + "</VTKFile>";
    byte[] data = new byte[all.length - underscore - 1];
    System.arraycopy(all, underscore + 1, data, 0, data.length);
    return new VtuTestReader(parseXml(xml.getBytes(StandardCharsets.UTF_8)), data);
  }

  private static int indexOf(byte[] hay, byte[] needle) {
    outer:
    for (int i = 0; i + needle.length <= hay.length; i++) {
      for (int j = 0; j < needle.length; j++) {
        if (hay[i + j] != needle[j]) {
          continue outer;
        }
      }
      return i;
    }
    return -1;
  }

  Array get(String key) {
    Array a = arrays.get(key);
    assertTrue(a != null, "array " + key);
    return a;
  }

  int points() {
    return Integer.parseInt(piece.getAttribute("NumberOfPoints"));
  }

  int cells() {
    return Integer.parseInt(piece.getAttribute("NumberOfCells"));
  }
}
