package dev.soakfield.fem.results;

import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.vtk.PvdEntry;
import dev.soakfield.mesh.vtk.PvdWriter;
import dev.soakfield.mesh.vtk.VtuEncoding;
import dev.soakfield.mesh.vtk.VtuFrameWriter;
import dev.soakfield.mesh.vtk.VtuWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The field frames of a run: one VTU file per output time under {@code fields/} (nodal fields given
 * by the caller, the part index per tetrahedron added here as {@code group}), listed in {@code
 * fields.pvd} when the run finishes. The mesh is encoded for the first frame only and copied into
 * the others ({@link VtuFrameWriter}).
 */
public final class FrameWriter {
  /** Cell data: the volume group index of each tetrahedron. */
  public static final String GROUP = "group";

  private final Path folder;
  private final VtuFrameWriter vtu;
  private final List<PvdEntry> frames = new ArrayList<>();

  /** Frames with Float32 fields, uncompressed. */
  public FrameWriter(Path folder, TetMesh mesh) throws IOException {
    this(folder, mesh, VtuEncoding.DEFAULT);
  }

  public FrameWriter(Path folder, TetMesh mesh, VtuEncoding encoding) throws IOException {
    this.folder = folder;
    this.vtu = new VtuFrameWriter(mesh, GROUP, encoding);
    Files.createDirectories(folder.resolve("fields"));
  }

  /** Writes the frame at time t with these nodal fields. */
  public void write(double t, List<VtuWriter.Field> pointFields) throws IOException {
    write(t, pointFields, List.of());
  }

  /** Writes the frame at time t with these nodal fields and fields per tetrahedron. */
  public void write(double t, List<VtuWriter.Field> pointFields, List<VtuWriter.Field> cellFields)
      throws IOException {
    String name = String.format(Locale.ROOT, "fields/c_%04d.vtu", frames.size());
    vtu.write(folder.resolve(name), pointFields, cellFields);
    frames.add(new PvdEntry(t, name));
  }

  /** The time of the last frame written; NaN before the first. */
  public double lastTime() {
    return frames.isEmpty() ? Double.NaN : frames.get(frames.size() - 1).time();
  }

  /** Lists the frames in fields.pvd. */
  public void finish() throws IOException {
    PvdWriter.write(folder.resolve(ResultFiles.FIELDS), frames);
  }

  public void snapshot(StateBundle b) {
    double[] frameTimes = new double[frames.size()];
    StringBuilder names = new StringBuilder();
    for (int i = 0; i < frameTimes.length; i++) {
      frameTimes[i] = frames.get(i).time();
      names.append(i > 0 ? "\n" : "").append(frames.get(i).relativeFile());
    }
    b.put("rec.frames", frameTimes).putText("rec.frame.files", names.toString());
  }

  public void restore(StateBundle b) {
    double[] times = b.get("rec.frames");
    String[] files = b.text("rec.frame.files").split("\n", -1);
    frames.clear();
    for (int i = 0; i < times.length; i++) {
      frames.add(new PvdEntry(times[i], files[i]));
    }
  }
}
