package dev.soakfield.fem.results;

import dev.soakfield.mesh.AtomicFiles;
import java.io.BufferedInputStream;
import java.io.ByteArrayOutputStream;
import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.EOFException;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Named arrays of numbers and named texts in one small binary file of our own, written atomically:
 * the container of checkpoints. Layout (big-endian): magic "SOAKBNDL", version, the count of
 * arrays, each as name (UTF) + length + doubles, then the count of texts, each as name + text.
 */
public final class StateBundle {
  private static final long MAGIC = 0x534F414B424E444CL; // "SOAKBNDL"
  private static final int VERSION = 1;

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
    byte[] data = bytes.toByteArray();
    AtomicFiles.write(file, tmp -> Files.write(tmp, data));
  }

  /**
   * Reads a bundle.
   *
   * @throws IOException naming the file when it is missing, cut off or not a bundle
   */
  public static StateBundle read(Path file) throws IOException {
    StateBundle b = new StateBundle();
    try (InputStream raw = Files.newInputStream(file);
        DataInputStream in = new DataInputStream(new BufferedInputStream(raw))) {
      if (in.readLong() != MAGIC || in.readInt() != VERSION) {
        throw new IOException(file + ": not a Soakfield checkpoint of this version");
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
