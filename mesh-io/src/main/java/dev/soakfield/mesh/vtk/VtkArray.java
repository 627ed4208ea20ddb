package dev.soakfield.mesh.vtk;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.LongBuffer;
import java.nio.charset.StandardCharsets;

/**
 * One VTK DataArray to be written: a name, a VTK scalar type, a component count and the values,
 * held as {@code double[]} (Float64, or Float32 rounded to nearest on output) or {@code int[]}
 * (Int64, Int32, UInt8, widened or narrowed on output). Writes itself as ASCII text or as
 * little-endian bytes.
 */
final class VtkArray {
  enum Type {
    FLOAT64("Float64", 8),
    FLOAT32("Float32", 4),
    INT64("Int64", 8),
    INT32("Int32", 4),
    UINT8("UInt8", 1);

    final String vtkName;
    final int bytes;

    Type(String vtkName, int bytes) {
      this.vtkName = vtkName;
      this.bytes = bytes;
    }
  }

  private static final int VALUES_PER_LINE = 12;
  private static final int CHUNK = 1 << 16;

  final String name;
  final String unit; // "" for none: written as the DataArray's units attribute
  final Type type;
  final int components;
  private final double[] doubles;
  private final int[] ints;

  private VtkArray(String name, Type type, int components, double[] doubles, int[] ints) {
    this(name, "", type, components, doubles, ints);
  }

  private VtkArray(
      String name, String unit, Type type, int components, double[] doubles, int[] ints) {
    this.name = name;
    this.unit = unit;
    this.type = type;
    this.components = components;
    this.doubles = doubles;
    this.ints = ints;
  }

  static VtkArray float64(String name, int components, double[] values) {
    return new VtkArray(name, Type.FLOAT64, components, values, null);
  }

  /** A Float64 array whose DataArray says its unit ({@code units="..."}, which VTK ignores). */
  static VtkArray float64(String name, String unit, int components, double[] values) {
    return new VtkArray(name, unit, Type.FLOAT64, components, values, null);
  }

  /** A floating-point array written as {@code type} (Float64 or Float32). */
  static VtkArray floats(String name, String unit, Type type, int components, double[] values) {
    if (type != Type.FLOAT64 && type != Type.FLOAT32) {
      throw new IllegalArgumentException("not a floating-point type: " + type);
    }
    return new VtkArray(name, unit, type, components, values, null);
  }

  static VtkArray integers(String name, Type type, int components, int[] values) {
    return new VtkArray(name, type, components, null, values);
  }

  int length() {
    return doubles != null ? doubles.length : ints.length;
  }

  long byteCount() {
    return (long) length() * type.bytes;
  }

  void writeAscii(OutputStream out) throws IOException {
    StringBuilder line = new StringBuilder(256);
    int n = length();
    for (int i = 0; i < n; i++) {
      if (i % VALUES_PER_LINE == 0) {
        line.append("          ");
      } else {
        line.append(' ');
      }
      // Double.toString gives the shortest text that reads back to the same double.
      if (doubles != null) {
        line.append(doubles[i]);
      } else {
        line.append(ints[i]);
      }
      if (i % VALUES_PER_LINE == VALUES_PER_LINE - 1 || i == n - 1) {
        line.append('\n');
        out.write(line.toString().getBytes(StandardCharsets.US_ASCII));
        line.setLength(0);
      }
    }
  }

  /** The values as little-endian bytes, without a header. */
  void writeBytes(OutputStream out) throws IOException {
    ByteBuffer buf = ByteBuffer.allocate(CHUNK).order(ByteOrder.LITTLE_ENDIAN);
    int per = CHUNK / type.bytes;
    int n = length();
    for (int from = 0; from < n; from += per) {
      int to = Math.min(n, from + per);
      buf.clear();
      fill(buf, from, to);
      out.write(buf.array(), 0, (to - from) * type.bytes);
    }
  }

  /** The values as little-endian bytes in one array (for compression). */
  byte[] toBytes() {
    long size = byteCount();
    if (size > Integer.MAX_VALUE - 16) {
      throw new IllegalArgumentException("array '" + name + "': " + size + " bytes, over 2 GB");
    }
    ByteBuffer buf = ByteBuffer.allocate((int) size).order(ByteOrder.LITTLE_ENDIAN);
    fill(buf, 0, length());
    return buf.array();
  }

  /** Puts values from..to-1 at the buffer's start, in bulk where the JDK has a bulk copy. */
  private void fill(ByteBuffer buf, int from, int to) {
    switch (type) {
      case FLOAT64 -> buf.asDoubleBuffer().put(doubles, from, to - from);
      case FLOAT32 -> {
        float[] narrowed = new float[to - from]; // one bulk put beats a checked put per value
        for (int i = from; i < to; i++) {
          narrowed[i - from] = (float) doubles[i];
        }
        buf.asFloatBuffer().put(narrowed);
      }
      case INT64 -> {
        LongBuffer l = buf.asLongBuffer();
        for (int i = from; i < to; i++) {
          l.put(ints[i]);
        }
      }
      case INT32 -> buf.asIntBuffer().put(ints, from, to - from);
      case UINT8 -> {
        for (int i = from; i < to; i++) {
          buf.put(i - from, (byte) ints[i]);
        }
      }
    }
  }
}
