package dev.soakfield.mesh.msh;

import dev.soakfield.mesh.MeshInputException;
import dev.soakfield.mesh.RawMesh;
import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.channels.FileChannel;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.Arrays;
import java.util.Objects;

/**
 * Reads MSH files of versions 2.2 and 4.1, ASCII or binary, into a {@link RawMesh}: nodes, 4- or
 * 10-node tetrahedra and 3- or 6-node triangles with their group tags and physical names. Points
 * and lines are skipped and counted; any other element type is refused.
 *
 * <p>Every problem of the input is a {@link MeshInputException} that names the file, the line (or
 * the byte offset in a binary file), what was found and what was expected. The file is read into
 * memory whole and parsed from its bytes; declared counts are checked against the bytes left before
 * anything is allocated for them.
 */
public final class MshReader {
  /** Largest file this reader takes: one Java array. */
  static final long MAX_BYTES = Integer.MAX_VALUE - 64;

  private static final int CHUNK = 1 << 24;

  private MshReader() {}

  /** Reads the MSH file at {@code file}. */
  public static RawMesh read(Path file) {
    Objects.requireNonNull(file, "file");
    String source = file.toString();
    byte[] bytes;
    try (FileChannel ch = FileChannel.open(file, StandardOpenOption.READ)) {
      long size = ch.size();
      if (size > MAX_BYTES) {
        throw new MeshInputException(
            source, "", "a file of " + size + " bytes", "at most " + MAX_BYTES + " bytes");
      }
      bytes = new byte[(int) size];
      int filled = 0;
      while (filled < bytes.length) {
        int n = ch.read(ByteBuffer.wrap(bytes, filled, Math.min(CHUNK, bytes.length - filled)));
        if (n < 0) {
          break;
        }
        filled += n;
      }
      if (filled < bytes.length) {
        bytes = Arrays.copyOf(bytes, filled);
      }
    } catch (IOException e) {
      throw new MeshInputException(source, "", "a read error (" + e + ")", "a readable file");
    }
    return read(bytes, source);
  }

  /** Reads an MSH file from {@code in} (to its end); {@code source} names it in messages. */
  public static RawMesh read(InputStream in, String source) {
    Objects.requireNonNull(in, "in");
    Objects.requireNonNull(source, "source");
    byte[] buf = new byte[1 << 16];
    int length = 0;
    try {
      for (int n = in.read(buf, 0, buf.length);
          n >= 0;
          n = in.read(buf, length, buf.length - length)) {
        length += n;
        if (length == buf.length) {
          if (buf.length >= MAX_BYTES) {
            throw new MeshInputException(
                source, "", "more than " + MAX_BYTES + " bytes", "at most " + MAX_BYTES + " bytes");
          }
          buf = Arrays.copyOf(buf, (int) Math.min(MAX_BYTES, 2L * buf.length));
        }
      }
    } catch (IOException e) {
      throw new MeshInputException(source, "", "a read error (" + e + ")", "a readable stream");
    }
    return parse(buf, length, source);
  }

  /** Reads an MSH file held in {@code bytes}; {@code source} names it in messages. */
  public static RawMesh read(byte[] bytes, String source) {
    Objects.requireNonNull(bytes, "bytes");
    Objects.requireNonNull(source, "source");
    return parse(bytes, bytes.length, source);
  }

  private static RawMesh parse(byte[] bytes, int length, String source) {
    MshCursor c = new MshCursor(bytes, length, source);
    RawMesh raw = new RawMesh();
    raw.source = source;
    int version = readFormat(c);
    if (version == 2) {
      new Msh2Parser(c, raw).parse();
    } else {
      new Msh4Parser(c, raw).parse();
    }
    return raw;
  }

  /** Reads $MeshFormat; returns 2 or 4 and switches the cursor to binary where the file is. */
  private static int readFormat(MshCursor c) {
    c.skipSpace();
    int at = c.pos;
    if (at >= c.end) {
      throw c.error(at, "an empty file", "an MSH file starting with $MeshFormat");
    }
    String first = c.buf[at] == '$' ? c.nextSectionName() : null;
    if (!"MeshFormat".equals(first)) {
      throw c.error(at, c.tokenAt(at), "$MeshFormat at the start of an MSH file");
    }
    int versionAt = c.startOfToken(c.pos);
    String version = c.nextToken();
    int major;
    if (version.equals("2.2")) {
      major = 2;
    } else if (version.equals("4.1")) {
      major = 4;
    } else {
      throw c.error(
          versionAt,
          version.isEmpty() ? "no version" : "version " + c.tokenAt(versionAt).replace("'", ""),
          "2.2 or 4.1");
    }
    int typeAt = c.startOfToken(c.pos);
    int fileType = c.nextInt("file type");
    if (fileType != 0 && fileType != 1) {
      throw c.error(typeAt, "file type " + fileType, "0 (ASCII) or 1 (binary)");
    }
    int sizeAt = c.startOfToken(c.pos);
    int dataSize = c.nextInt("data size");
    c.endOfLine("the format line");
    if (fileType == 1) {
      boolean sizeOk = major == 2 ? dataSize == 8 : dataSize == 4 || dataSize == 8;
      if (!sizeOk) {
        throw c.error(
            sizeAt,
            "data size " + dataSize,
            major == 2 ? "8 (the size of a double)" : "4 or 8 (the size of size_t)");
      }
      c.binary(ByteOrder.LITTLE_ENDIAN, dataSize);
      int markAt = c.pos;
      c.need(4, "the int 1 that tells the byte order");
      ByteBuffer v = ByteBuffer.wrap(c.buf, markAt, 4);
      if (v.order(ByteOrder.LITTLE_ENDIAN).getInt(markAt) == 1) {
        c.binary(ByteOrder.LITTLE_ENDIAN, dataSize);
      } else if (v.order(ByteOrder.BIG_ENDIAN).getInt(markAt) == 1) {
        c.binary(ByteOrder.BIG_ENDIAN, dataSize);
      } else {
        throw c.error(
            markAt,
            String.format(
                "the bytes %02x %02x %02x %02x",
                c.buf[markAt], c.buf[markAt + 1], c.buf[markAt + 2], c.buf[markAt + 3]),
            "the int 1 in little- or big-endian byte order");
      }
      c.pos = markAt + 4;
    }
    c.expectEnd("MeshFormat");
    return major;
  }
}
