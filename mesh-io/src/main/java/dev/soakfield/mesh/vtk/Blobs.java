package dev.soakfield.mesh.vtk;

import dev.soakfield.mesh.MeshInputException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.util.Base64;
import java.util.zip.DataFormatException;

/**
 * Decodes the base64 binary data of one DataArray (inline or appended) of a .vtu file into its
 * little-endian bytes. Uncompressed, the data is a base64 run of the byte count, then one of the
 * bytes; zlib-compressed, a run of the header {@code [#blocks][block size][last block size or
 * 0][compressed sizes...]}, then one of the compressed blocks (VTK File Formats, XML section; A.
 * Kloeckner, "What they don't tell you about VTK XML binary formats").
 */
final class Blobs {
  private final String source;
  private final int headerBytes;
  private final boolean zlib;

  Blobs(String source, int headerBytes, boolean zlib) {
    this.source = source;
    this.headerBytes = headerBytes;
    this.zlib = zlib;
  }

  ByteBuffer decode(VtuReader.Declared d, CharSequence text, long offset) {
    int start = VtuReader.skipSpace(text, (int) Math.min(offset, text.length()));
    return zlib ? compressed(d, text, start) : plain(d, text, start);
  }

  private ByteBuffer plain(VtuReader.Declared d, CharSequence text, int start) {
    ByteBuffer head = run(d, text, start, headerBytes, "its byte count");
    long n = word(head);
    int from = start + chars(headerBytes);
    requireFits(d, text, from, n, "a byte count of " + n);
    return run(d, text, from, (int) n, "its data");
  }

  private ByteBuffer compressed(VtuReader.Declared d, CharSequence text, int start) {
    ByteBuffer first = run(d, text, start, 3 * headerBytes, "its compression header");
    long blocks = word(first);
    long blockSize = word(first);
    long last = word(first);
    if (blocks > Integer.MAX_VALUE / 16
        || blockSize < 1
        || blockSize > Integer.MAX_VALUE
        || last >= blockSize
        || blocks * blockSize > Integer.MAX_VALUE - 16) {
      throw new MeshInputException(
          source,
          VtuReader.where(d),
          "a compression header of " + blocks + " blocks of " + blockSize + ", last " + last,
          "block counts and sizes that fit one array");
    }
    int headerLength = (int) ((3 + blocks) * headerBytes);
    ByteBuffer header = run(d, text, start, headerLength, "its compression header");
    header.position(3 * headerBytes);
    long[] sizes = new long[(int) blocks];
    long total = 0;
    for (int b = 0; b < blocks; b++) {
      sizes[b] = word(header);
      total += sizes[b];
    }
    int from = start + chars(headerLength);
    requireFits(d, text, from, total, "compressed blocks of " + total + " bytes");
    ByteBuffer data = run(d, text, from, (int) total, "its compressed blocks");
    long size = blocks == 0 ? 0 : (blocks - 1) * blockSize + (last == 0 ? blockSize : last);
    byte[] packed = new byte[(int) total];
    data.get(packed);
    try {
      byte[] out = ZlibBlocks.inflate(packed, sizes, (int) blockSize, (int) size);
      return ByteBuffer.wrap(out).order(ByteOrder.LITTLE_ENDIAN);
    } catch (DataFormatException e) {
      throw new MeshInputException(
          source, VtuReader.where(d), "bad zlib data (" + e.getMessage() + ")", "zlib blocks");
    }
  }

  private void requireFits(VtuReader.Declared d, CharSequence text, int from, long n, String what) {
    if (n > Integer.MAX_VALUE - 16 || from + (long) chars(n) > text.length()) {
      throw new MeshInputException(
          source,
          VtuReader.where(d),
          what + " with " + Math.max(0, text.length() - from) + " characters left",
          "the data the header announces");
    }
  }

  /** Decodes the base64 run at {@code start} that holds {@code bytes} bytes. */
  private ByteBuffer run(
      VtuReader.Declared d, CharSequence text, int start, int bytes, String what) {
    int end = start + chars(bytes);
    if (end > text.length()) {
      throw new MeshInputException(
          source, VtuReader.where(d), "data ending before " + what, "base64 " + what);
    }
    try {
      byte[] all = Base64.getDecoder().decode(text.subSequence(start, end).toString());
      return ByteBuffer.wrap(all, 0, bytes).order(ByteOrder.LITTLE_ENDIAN);
    } catch (IllegalArgumentException e) {
      throw new MeshInputException(
          source,
          VtuReader.where(d),
          "bad base64 in " + what + " (" + e.getMessage() + ")",
          "base64");
    }
  }

  private long word(ByteBuffer b) {
    return headerBytes == 8 ? b.getLong() : Integer.toUnsignedLong(b.getInt());
  }

  private static int chars(long bytes) {
    return (int) (4 * ((bytes + 2) / 3));
  }
}
