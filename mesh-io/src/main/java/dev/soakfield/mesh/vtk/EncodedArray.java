package dev.soakfield.mesh.vtk;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.util.Base64;

/**
 * One DataArray as it stands in base64 appended data: its length in characters is known before it
 * is written, so offsets can be given in the XML ahead of the data. Uncompressed, the byte count
 * and the bytes are two base64 runs streamed from the values; compressed, the zlib header and the
 * blocks are two runs made at once (they are needed for their length anyway).
 */
final class EncodedArray {
  private static final int HEADER_BYTES = 8;

  final VtkArray array;
  private final long length;
  private final byte[] ready; // the compressed form's base64 text; null when streamed

  private EncodedArray(VtkArray array, long length, byte[] ready) {
    this.array = array;
    this.length = length;
    this.ready = ready;
  }

  static EncodedArray of(VtkArray array, boolean zlib) {
    if (!zlib) {
      return new EncodedArray(
          array, base64Length(HEADER_BYTES) + base64Length(array.byteCount()), null);
    }
    ZlibBlocks.Compressed c = ZlibBlocks.compress(array.toBytes());
    Base64.Encoder enc = Base64.getEncoder();
    byte[] head = enc.encode(c.header());
    byte[] data = enc.encode(c.blocks());
    byte[] both = new byte[head.length + data.length];
    System.arraycopy(head, 0, both, 0, head.length);
    System.arraycopy(data, 0, both, head.length, data.length);
    return new EncodedArray(array, both.length, both);
  }

  /** Characters this array takes in the appended data. */
  long length() {
    return length;
  }

  void writeTo(OutputStream out) throws IOException {
    if (ready != null) {
      out.write(ready);
      return;
    }
    try (OutputStream b64 = Base64.getEncoder().wrap(new KeepOpenStream(out))) {
      b64.write(
          ByteBuffer.allocate(HEADER_BYTES)
              .order(ByteOrder.LITTLE_ENDIAN)
              .putLong(array.byteCount())
              .array());
    }
    try (OutputStream b64 = Base64.getEncoder().wrap(new KeepOpenStream(out))) {
      array.writeBytes(b64);
    }
  }

  static long base64Length(long bytes) {
    return 4 * ((bytes + 2) / 3);
  }
}
