package dev.soakfield.mesh.msh;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;

/**
 * A buffered byte sink for MSH text and little-endian binary values; writes integers as digits
 * without making strings.
 */
final class MshOutput {
  private final OutputStream out;
  private final byte[] buf = new byte[1 << 16];
  private int len;

  MshOutput(OutputStream out) {
    this.out = out;
  }

  private void room(int n) throws IOException {
    if (len + n > buf.length) {
      flushBuffer();
    }
  }

  private void flushBuffer() throws IOException {
    out.write(buf, 0, len);
    len = 0;
  }

  void flush() throws IOException {
    flushBuffer();
    out.flush();
  }

  MshOutput text(String s) throws IOException {
    byte[] b = s.getBytes(StandardCharsets.UTF_8);
    if (b.length > buf.length) {
      flushBuffer();
      out.write(b);
      return this;
    }
    room(b.length);
    System.arraycopy(b, 0, buf, len, b.length);
    len += b.length;
    return this;
  }

  MshOutput ch(char c) throws IOException {
    room(1);
    buf[len++] = (byte) c;
    return this;
  }

  MshOutput num(long v) throws IOException {
    room(20);
    if (v < 0) {
      if (v == Long.MIN_VALUE) {
        return text(Long.toString(v));
      }
      buf[len++] = '-';
      v = -v;
    }
    int start = len;
    do {
      buf[len++] = (byte) ('0' + (int) (v % 10));
      v /= 10;
    } while (v != 0);
    for (int i = start, j = len - 1; i < j; i++, j--) {
      byte t = buf[i];
      buf[i] = buf[j];
      buf[j] = t;
    }
    return this;
  }

  /** A double in its shortest form that reads back to the same bits ({@link Double#toString}). */
  MshOutput num(double v) throws IOException {
    return text(Double.toString(v));
  }

  MshOutput int32(int v) throws IOException {
    room(4);
    buf[len++] = (byte) v;
    buf[len++] = (byte) (v >>> 8);
    buf[len++] = (byte) (v >>> 16);
    buf[len++] = (byte) (v >>> 24);
    return this;
  }

  MshOutput int64(long v) throws IOException {
    room(8);
    for (int k = 0; k < 64; k += 8) {
      buf[len++] = (byte) (v >>> k);
    }
    return this;
  }

  MshOutput float64(double v) throws IOException {
    return int64(Double.doubleToRawLongBits(v));
  }
}
