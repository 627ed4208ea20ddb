package dev.soakfield.fem.results;

import dev.soakfield.mesh.AtomicFiles;
import java.io.ByteArrayOutputStream;
import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.EOFException;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.zip.CRC32;

/**
 * Named arrays of numbers and named texts in one small binary file of our own, written atomically
 * and durably (forced to the disk before and after the rename): the container of checkpoints.
 * Layout (big-endian): magic "SOAKBNDL", version, the count of arrays, each as name (UTF) + length
 * + doubles, then the count of texts, each as name + text, then a CRC-32 of everything before it,
 * so that a flipped bit is found instead of resumed from.
 */
public final class StateBundle {
  private static final long MAGIC = 0x534F414B424E444CL; // "SOAKBNDL"
  private static final int VERSION = 2;

  private final Map<String, double[]> arrays = new LinkedHashMap<>();
  private final Map<String, String> texts = new LinkedHashMap<>();

  public StateBundle put(String name, double... values) {
    arrays.put(name, values.clone());
    return this;
  }

  public StateBundle putText(String name, String value) {
    texts.put(name, value);
    return this;
  }

  public boolean has(String name) {
    return arrays.containsKey(name);
  }

  /**
   * The array stored under a name.
   *
   * @throws IllegalStateException when the bundle lacks it (a damaged or foreign checkpoint)
   */
  public double[] get(String name) {
    double[] v = arrays.get(name);
    if (v == null) {
      throw new IllegalStateException("checkpoint lacks '" + name + "'");
    }
    return v.clone();
  }

  public double scalar(String name) {
    return get(name)[0];
  }

  public String text(String name) {
    String v = texts.get(name);
    if (v == null) {
      throw new IllegalStateException("checkpoint lacks '" + name + "'");
    }
    return v;
  }

  public void write(Path file) throws IOException {
    ByteArrayOutputStream bytes = new ByteArrayOutputStream();
    try (DataOutputStream out = new DataOutputStream(bytes)) {
      out.writeLong(MAGIC);
      out.writeInt(VERSION);
      out.writeInt(arrays.size());
      for (Map.Entry<String, double[]> e : arrays.entrySet()) {
        out.writeUTF(e.getKey());
        out.writeInt(e.getValue().length);
        for (double v : e.getValue()) {
          out.writeDouble(v);
        }
      }
      out.writeInt(texts.size());
      for (Map.Entry<String, String> e : texts.entrySet()) {
        out.writeUTF(e.getKey());
        out.writeUTF(e.getValue());
      }
    }
    byte[] payload = bytes.toByteArray();
    CRC32 crc = new CRC32();
    crc.update(payload);
    byte[] data = java.util.Arrays.copyOf(payload, payload.length + Long.BYTES);
    java.nio.ByteBuffer.wrap(data, payload.length, Long.BYTES).putLong(crc.getValue());
    AtomicFiles.writeDurably(file, tmp -> Files.write(tmp, data));
  }

  /**
   * Reads a bundle.
   *
   * @throws IOException naming the file when it is missing, cut off or not a bundle
   */
  public static StateBundle read(Path file) throws IOException {
    StateBundle b = new StateBundle();
    byte[] all = Files.readAllBytes(file);
    if (all.length < 2 * Long.BYTES) {
      throw new IOException(file + ": damaged checkpoint (" + all.length + " bytes)");
    }
    int payload = all.length - Long.BYTES;
    CRC32 crc = new CRC32();
    crc.update(all, 0, payload);
    long stored = java.nio.ByteBuffer.wrap(all, payload, Long.BYTES).getLong();
    try (DataInputStream in =
        new DataInputStream(new java.io.ByteArrayInputStream(all, 0, payload))) {
      if (in.readLong() != MAGIC || in.readInt() != VERSION) {
        throw new IOException(file + ": not a Soakfield checkpoint of this version");
      }
      if (stored != crc.getValue()) {
        throw new IOException(file + ": damaged checkpoint (its checksum does not match)");
      }
      int n = in.readInt();
      for (int k = 0; k < n; k++) {
        String name = in.readUTF();
        int len = in.readInt();
        if (len < 0 || len > 1_000_000_000) {
          throw new IOException(file + ": damaged checkpoint (length " + len + ")");
        }
        double[] v = new double[len];
        for (int i = 0; i < len; i++) {
          v[i] = in.readDouble();
        }
        b.arrays.put(name, v);
      }
      int m = in.readInt();
      for (int k = 0; k < m; k++) {
        b.texts.put(in.readUTF(), in.readUTF());
      }
    } catch (EOFException e) {
      throw new IOException(file + ": the checkpoint ends early (damaged or cut off)", e);
    }
    return b;
  }
}
