package dev.soakfield.fem.results;

import dev.soakfield.mesh.AtomicFiles;
import java.io.ByteArrayOutputStream;
import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * The state a run ended with (or reached at a checkpoint), in a small binary file of our own: the
 * time, the potential at every node, and the source laws' states. A later run starts from it
 * ({@code "initial": {"from": ...}}). Written atomically.
 *
 * <p>Layout (big-endian): magic "SOAKSTAT", version int, time double, node count int, φ doubles,
 * law count int, then per law its length int and doubles.
 */
public final class StateFile {
  /** The file's name inside a result folder. */
  public static final String NAME = "final-state.bin";

  private static final long MAGIC = 0x534F414B53544154L; // "SOAKSTAT"
  private static final int VERSION = 1;

  /** What the file holds. */
  @SuppressWarnings("ArrayRecordComponent") // read once and handed over
  public record State(double time, double[] phi, double[][] lawStates) {}

  private StateFile() {}

  public static void write(Path file, State state) throws IOException {
    ByteArrayOutputStream bytes = new ByteArrayOutputStream(16 + 8 * state.phi().length);
    try (DataOutputStream out = new DataOutputStream(bytes)) {
      out.writeLong(MAGIC);
      out.writeInt(VERSION);
      out.writeDouble(state.time());
      out.writeInt(state.phi().length);
      for (double v : state.phi()) {
        out.writeDouble(v);
      }
      out.writeInt(state.lawStates().length);
      for (double[] s : state.lawStates()) {
        out.writeInt(s.length);
        for (double v : s) {
          out.writeDouble(v);
        }
      }
    }
    byte[] data = bytes.toByteArray();
    AtomicFiles.write(file, tmp -> Files.write(tmp, data));
  }

  /**
   * Reads a state file.
   *
   * @throws IOException when the file is missing, truncated or not a state file (the message names
   *     the file and what was wrong)
   */
  public static State read(Path file) throws IOException {
    try (InputStream raw = Files.newInputStream(file);
        DataInputStream in = new DataInputStream(new java.io.BufferedInputStream(raw))) {
      if (in.readLong() != MAGIC) {
        throw new IOException(file + ": not a Soakfield state file");
      }
      int version = in.readInt();
      if (version != VERSION) {
        throw new IOException(file + ": state file version " + version + ", expected " + VERSION);
      }
      double time = in.readDouble();
      double[] phi = doubles(in, file);
      int laws = in.readInt();
      if (laws < 0 || laws > 10_000) {
        throw new IOException(file + ": damaged state file (law count " + laws + ")");
      }
      double[][] states = new double[laws][];
      for (int k = 0; k < laws; k++) {
        states[k] = doubles(in, file);
      }
      return new State(time, phi, states);
    } catch (java.io.EOFException e) {
      throw new IOException(file + ": the state file ends early (damaged or cut off)", e);
    }
  }

  private static double[] doubles(DataInputStream in, Path file) throws IOException {
    int n = in.readInt();
    if (n < 0 || n > 1_000_000_000) {
      throw new IOException(file + ": damaged state file (length " + n + ")");
    }
    double[] a = new double[n];
    for (int i = 0; i < n; i++) {
      a[i] = in.readDouble();
    }
    return a;
  }
}
