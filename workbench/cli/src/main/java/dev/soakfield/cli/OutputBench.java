package dev.soakfield.cli;

import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import dev.soakfield.mesh.vtk.VtuEncoding;
import dev.soakfield.mesh.vtk.VtuFormat;
import dev.soakfield.mesh.vtk.VtuFrameWriter;
import dev.soakfield.mesh.vtk.VtuWriter;
import java.io.IOException;
import java.io.OutputStream;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.stream.Stream;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * What a run writes after its solve — field frames and the mesh copy — timed against a plain
 * sequential write of the same number of bytes in the same run: that write is the floor any output
 * must pay to get its bytes to the file system.
 */
@Command(
    name = "output",
    mixinStandardHelpOptions = true,
    description = {
      "Writes the output of a run on a box mesh — the frames (fields c, phi, first_exceed) and"
          + " mesh.msh — the way earlier versions did (Float64, mesh encoded for every frame, mesh"
          + " written anew) and the ways they do now (Float32 or Float64 fields, with and without"
          + " zlib, the mesh encoded once, mesh.msh a file copy), and times each against writing"
          + " the same number of bytes plainly. Median of the repeats, after a warm-up."
    })
final class OutputBench implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Option(
      names = "--cells",
      defaultValue = "64",
      description = "Cells per axis of the box; 6 tetrahedra each (64: 1,572,864 tets).")
  int cells;

  @Option(names = "--frames", defaultValue = "2", description = "Frames per output.")
  int frames;

  @Option(names = "--repeat", defaultValue = "3", description = "Timed repeats per measurement.")
  int repeat;

  @Option(
      names = "--dir",
      paramLabel = "DIR",
      description = "Folder for the files (default: a temporary folder, removed after).")
  Path dir;

  /** One way of writing the output into a folder. */
  @FunctionalInterface
  private interface Output {
    void write(Path folder) throws IOException;
  }

  private record Variant(String name, Output output) {}

  @Override
  public Integer call() throws IOException {
    if (cells < 1 || frames < 1 || repeat < 1) {
      throw new UserInputException(
          "--cells, --frames and --repeat: found "
              + cells
              + ", "
              + frames
              + ", "
              + repeat
              + "; expected positive whole numbers");
    }
    PrintWriter out = spec.commandLine().getOut();
    boolean temporary = dir == null;
    Path work = temporary ? Files.createTempDirectory("soakfield-bench") : dir;
    Files.createDirectories(work);
    try {
      TetMesh mesh = StructuredMesher.box(1, 1, 1, cells, cells, cells, 1);
      Path userMesh = work.resolve("user.msh");
      MshWriter.write(userMesh, mesh, true);
      List<VtuWriter.Field> fields = fields(mesh);
      out.printf(
          Locale.ROOT,
          "mesh: %d tetrahedra, %d nodes; %d frames of 3 fields and mesh.msh; %d repeats,"
              + " median times%n",
          mesh.tetCount(),
          mesh.nodeCount(),
          frames,
          repeat);
      out.printf(
          Locale.ROOT,
          "%-20s %9s %9s %9s %9s %11s %11s%n",
          "output",
          "size MB",
          "ms",
          "MB/s",
          "plain ms",
          "ms/plain",
          "ms/before");
      double before = Double.NaN;
      for (Variant v : variants(mesh, userMesh, fields)) {
        double ms = measure(out, v, work, before);
        if (Double.isNaN(before)) {
          before = ms;
        }
      }
      out.flush();
      return ExitCodes.OK;
    } finally {
      if (temporary) {
        BenchSupport.deleteTree(work);
      }
    }
  }

  private List<Variant> variants(TetMesh mesh, Path userMesh, List<VtuWriter.Field> fields) {
    List<Variant> v = new ArrayList<>();
    v.add(new Variant("before (Float64)", folder -> before(folder, mesh, fields)));
    v.add(new Variant("Float32", folder -> now(folder, mesh, userMesh, fields, false, false)));
    v.add(new Variant("Float64", folder -> now(folder, mesh, userMesh, fields, true, false)));
    v.add(
        new Variant(
            "Float32 --compress", folder -> now(folder, mesh, userMesh, fields, false, true)));
    return v;
  }

  /** As FrameWriter and RunPipeline wrote before: every frame whole, mesh.msh written anew. */
  private void before(Path folder, TetMesh mesh, List<VtuWriter.Field> fields) throws IOException {
    double[] group = new double[mesh.tetCount()];
    for (int e = 0; e < group.length; e++) {
      group[e] = mesh.tetGroup(e);
    }
    for (int f = 0; f < frames; f++) {
      VtuWriter.write(
          folder.resolve(frameName(f)),
          mesh,
          fields,
          List.of(new VtuWriter.Field("group", 1, group)),
          VtuFormat.APPENDED_BASE64,
          false);
    }
    MshWriter.write(folder.resolve("mesh.msh"), mesh, true);
  }

  private void now(
      Path folder,
      TetMesh mesh,
      Path userMesh,
      List<VtuWriter.Field> fields,
      boolean doubles,
      boolean zlib)
      throws IOException {
    VtuFrameWriter w = new VtuFrameWriter(mesh, "group", new VtuEncoding(doubles, zlib));
    for (int f = 0; f < frames; f++) {
      w.write(folder.resolve(frameName(f)), fields);
    }
    Files.copy(userMesh, folder.resolve("mesh.msh"), StandardCopyOption.REPLACE_EXISTING);
  }

  private static String frameName(int f) {
    return String.format(Locale.ROOT, "c_%04d.vtu", f);
  }

  /** Times the variant and the plain write of its byte count; returns the variant's median ms. */
  private double measure(PrintWriter out, Variant v, Path work, double beforeMs)
      throws IOException {
    Path folder = work.resolve("out");
    Path plain = work.resolve("plain.bin");
    fresh(folder);
    v.output().write(folder); // warm-up: JIT, page cache, file system allocation
    long bytes = folderBytes(folder);
    plainWrite(plain, bytes);
    double[] t = new double[repeat];
    double[] p = new double[repeat];
    for (int i = 0; i < repeat; i++) {
      fresh(folder);
      Files.deleteIfExists(plain);
      long t0 = System.nanoTime();
      v.output().write(folder);
      long t1 = System.nanoTime();
      plainWrite(plain, bytes);
      long t2 = System.nanoTime();
      t[i] = (t1 - t0) / 1e6;
      p[i] = (t2 - t1) / 1e6;
    }
    double ms = BenchSupport.median(t);
    double pm = BenchSupport.median(p);
    out.printf(
        Locale.ROOT,
        "%-20s %9.1f %9.1f %9.1f %9.1f %11.2f %11s%n",
        v.name(),
        bytes / 1e6,
        ms,
        bytes / 1e3 / ms,
        pm,
        ms / pm,
        Double.isNaN(beforeMs) ? "1.00" : String.format(Locale.ROOT, "%.2f", ms / beforeMs));
    out.flush();
    return ms;
  }

  /** The reference: the same number of bytes, written in 1 MiB pieces to one new file. */
  static void plainWrite(Path file, long bytes) throws IOException {
    byte[] block = new byte[1 << 20];
    Arrays.fill(block, (byte) 'A');
    try (OutputStream o = Files.newOutputStream(file)) {
      long left = bytes;
      while (left > 0) {
        int n = (int) Math.min(block.length, left);
        o.write(block, 0, n);
        left -= n;
      }
    }
  }

  private static List<VtuWriter.Field> fields(TetMesh mesh) {
    int n = mesh.nodeCount();
    double[] c = new double[n];
    double[] phi = new double[n];
    double[] first = new double[n];
    for (int i = 0; i < n; i++) {
      double x = mesh.coord(i, 0);
      double z = mesh.coord(i, 2);
      c[i] = Math.exp(-x * 3) * (1 + z / 7);
      phi[i] = c[i] / 1.7;
      first[i] = x < 0.5 ? 3600 * x : -1;
    }
    return List.of(
        new VtuWriter.Field("c", 1, c),
        new VtuWriter.Field("phi", 1, phi),
        new VtuWriter.Field("first_exceed", 1, first, "s"));
  }

  private static void fresh(Path folder) throws IOException {
    if (Files.exists(folder)) {
      BenchSupport.deleteTree(folder);
    }
    Files.createDirectories(folder);
  }

  private static long folderBytes(Path folder) throws IOException {
    long sum = 0;
    try (Stream<Path> s = Files.list(folder)) {
      for (Path p : s.toList()) {
        sum += Files.size(p);
      }
    }
    return sum;
  }
}
