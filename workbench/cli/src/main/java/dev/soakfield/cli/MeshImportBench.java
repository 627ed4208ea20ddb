package dev.soakfield.cli;

import dev.soakfield.mesh.MeshImport;
import dev.soakfield.mesh.RawMesh;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshReader;
import dev.soakfield.mesh.msh.MshWriter;
import dev.soakfield.mesh.topo.AssemblyOptions;
import dev.soakfield.mesh.topo.MeshAssembler;
import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * Import speed of MSH 4.1 files (ASCII and binary) as a ratio to a plain line-count scan of the
 * same file in the same run: the scan is the floor any reader must pay to look at every byte.
 */
@Command(
    name = "mesh-import",
    mixinStandardHelpOptions = true,
    description = {
      "Writes a box mesh as MSH 4.1 ASCII and binary, then times reading (parse) and importing"
          + " (parse, topology, checks) each file against two line-count scans of the same file:"
          + " counting newline bytes, and reading lines with a BufferedReader. Median of the"
          + " repeats, after a warm-up."
    })
final class MeshImportBench implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Option(
      names = "--cells",
      defaultValue = "55",
      description = "Cells per axis of the box; 6 tetrahedra each (55: 998,250 tets).")
  int cells;

  @Option(names = "--repeat", defaultValue = "5", description = "Timed repeats per measurement.")
  int repeat;

  @Option(
      names = "--dir",
      paramLabel = "DIR",
      description = "Folder for the generated files (default: a temporary folder, removed after).")
  Path dir;

  @Override
  public Integer call() throws IOException {
    if (cells < 1 || repeat < 1) {
      throw new UserInputException("--cells and --repeat: expected positive whole numbers");
    }
    PrintWriter out = spec.commandLine().getOut();
    boolean temporary = dir == null;
    Path work = temporary ? Files.createTempDirectory("soakfield-bench") : dir;
    Files.createDirectories(work);
    try {
      TetMesh mesh = StructuredMesher.box(1, 1, 1, cells, cells, cells, 1);
      out.printf(
          Locale.ROOT,
          "mesh: %d tetrahedra, %d nodes; %d repeats, median times%n",
          mesh.tetCount(),
          mesh.nodeCount(),
          repeat);
      out.printf(
          Locale.ROOT,
          "%-7s %8s %9s %9s %8s %10s %10s %10s %12s%n",
          "format",
          "size MB",
          "bytes ms",
          "lines ms",
          "read ms",
          "import ms",
          "read/bytes",
          "read/lines",
          "import/lines");
      for (boolean binary : new boolean[] {false, true}) {
        Path file = work.resolve(binary ? "bench-binary.msh" : "bench-ascii.msh");
        MshWriter.write(file, mesh, binary);
        measure(out, binary ? "binary" : "ascii", file);
      }
      out.flush();
      return ExitCodes.OK;
    } finally {
      if (temporary) {
        BenchSupport.deleteTree(work);
      }
    }
  }

  private void measure(PrintWriter out, String label, Path file) throws IOException {
    long lines = countLines(file); // warm-up: page cache and JIT
    MshReader.read(file);
    MeshImport warm = MeshAssembler.assemble(MshReader.read(file), AssemblyOptions.defaults());
    if (warm.mesh().tetCount() == 0 || lines == 0) {
      throw new IllegalStateException("benchmark file read back empty: " + file);
    }
    readLines(file);
    double[] scan = new double[repeat];
    double[] lineScan = new double[repeat];
    double[] read = new double[repeat];
    double[] full = new double[repeat];
    for (int i = 0; i < repeat; i++) {
      long tb = System.nanoTime();
      countLines(file);
      long t0 = System.nanoTime();
      readLines(file);
      long t1 = System.nanoTime();
      RawMesh raw = MshReader.read(file);
      long t2 = System.nanoTime();
      MeshAssembler.assemble(MshReader.read(file), AssemblyOptions.defaults());
      long t3 = System.nanoTime();
      if (raw.tetCount() != warm.mesh().tetCount()) {
        throw new IllegalStateException("tet count changed between reads of " + file);
      }
      scan[i] = (t0 - tb) / 1e6;
      lineScan[i] = (t1 - t0) / 1e6;
      read[i] = (t2 - t1) / 1e6;
      full[i] = (t3 - t2) / 1e6;
    }
    double s = BenchSupport.median(scan);
    double l = BenchSupport.median(lineScan);
    double r = BenchSupport.median(read);
    double f = BenchSupport.median(full);
    out.printf(
        Locale.ROOT,
        "%-7s %8.1f %9.1f %9.1f %8.1f %10.1f %10.2f %10.2f %12.2f%n",
        label,
        Files.size(file) / 1e6,
        s,
        l,
        r,
        f,
        r / s,
        r / l,
        f / l);
  }

  /** The reference: read every byte once and count the newlines, as {@code wc -l} does. */
  static long countLines(Path file) throws IOException {
    long n = 0;
    byte[] buf = new byte[1 << 20];
    try (InputStream in = Files.newInputStream(file)) {
      int k;
      while ((k = in.read(buf)) > 0) {
        for (int i = 0; i < k; i++) {
          if (buf[i] == '\n') {
            n++;
          }
        }
      }
    }
    return n;
  }

  /** The other reference: the plain way to count lines in Java, one String per line. */
  static long readLines(Path file) throws IOException {
    long n = 0;
    try (java.io.BufferedReader in =
        Files.newBufferedReader(file, java.nio.charset.StandardCharsets.ISO_8859_1)) {
      while (in.readLine() != null) {
        n++;
      }
    }
    return n;
  }
}
