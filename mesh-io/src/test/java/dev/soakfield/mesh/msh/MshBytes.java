package dev.soakfield.mesh.msh;

import java.io.ByteArrayOutputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;

/**
 * Test-side writer of MSH bytes exactly as the published format describes them: ASCII lines and
 * binary ints, size_t values and doubles in a chosen byte order. Independent of {@link MshWriter},
 * so files made with it can check the reader without going in a circle.
 */
final class MshBytes {
  private final ByteArrayOutputStream out = new ByteArrayOutputStream();
  private final ByteOrder order;
  private final int sizeT;

  MshBytes(ByteOrder order, int sizeT) {
    this.order = order;
    this.sizeT = sizeT;
  }

  MshBytes line(String text) {
    byte[] b = (text + "\n").getBytes(StandardCharsets.UTF_8);
    out.write(b, 0, b.length);
    return this;
  }

  MshBytes i32(int... values) {
    for (int v : values) {
      byte[] b = new byte[4];
      ByteBuffer.wrap(b).order(order).putInt(v);
      out.write(b, 0, 4);
    }
    return this;
  }

  MshBytes size(long... values) {
    for (long v : values) {
      byte[] b = new byte[sizeT];
      if (sizeT == 8) {
        ByteBuffer.wrap(b).order(order).putLong(v);
      } else {
        ByteBuffer.wrap(b).order(order).putInt((int) v);
      }
      out.write(b, 0, sizeT);
    }
    return this;
  }

  MshBytes f64(double... values) {
    for (double v : values) {
      byte[] b = new byte[8];
      ByteBuffer.wrap(b).order(order).putDouble(v);
      out.write(b, 0, 8);
    }
    return this;
  }

  byte[] bytes() {
    return out.toByteArray();
  }
}
