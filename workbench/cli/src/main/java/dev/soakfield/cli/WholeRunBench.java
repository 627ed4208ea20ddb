package dev.soakfield.cli;

import dev.soakfield.app.PictureWorker;
import dev.soakfield.fem.results.Series;
import dev.soakfield.fem.run.RunOptions;
import dev.soakfield.fem.run.RunPipeline;
import dev.soakfield.fem.run.RunProgress;
import dev.soakfield.fem.run.RunSummary;
import dev.soakfield.fem.run.RunTimes;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import dev.soakfield.report.FieldPictures;
import dev.soakfield.report.ReportWriter;
import java.io.IOException;
import java.io.PrintWriter;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicLong;
import java.util.concurrent.atomic.AtomicReference;

/**
 * A whole {@code soakfield run} of a flux-fed box, timed by phase: a 10 mm box of n³ cells (six
 * linear tetrahedra each) written as an MSH 4.1 ASCII file, D = 1e-9 m²/s, a constant flux into
 * xmin and the other faces sealed, fixed backward-Euler steps of dt·D/h² = ratio, fields written at
 * half time and at the end, then the report with its pictures. The physical limit of the run is its
 * linear solves: every other phase is printed with its share and the whole as a multiple of the
 * solves. The amount must equal flux × area × time (nothing else enters or leaves).
 */
final class WholeRunBench {
  private static final double SIZE = 0.01; // m
  private static final double D = 1e-9; // m²/s
  private static final double FLUX = 1e-6; // kg/(m²·s)

  private WholeRunBench() {}

  static void run(PrintWriter out, int n, int steps, double ratio, int order) throws IOException {
    double jvmStart = ManagementFactory.getRuntimeMXBean().getUptime() * 1e-3;
    Path dir = Files.createTempDirectory("soakfield-bench-run");
    try {
      double h = SIZE / n;
      double dt = ratio * h * h / D;
      double end = steps * dt;
      long t0 = System.nanoTime();
      TetMesh mesh = StructuredMesher.box(SIZE, SIZE, SIZE, n, n, n, order);
      Path meshFile = dir.resolve("box.msh");
      MshWriter.write(meshFile, mesh, false);
      double generate = (System.nanoTime() - t0) * 1e-9;
      Path caseFile =
          Files.writeString(
              dir.resolve("box.json"),
              String.format(
                  Locale.ROOT,
                  """
                  { "mesh": "box.msh", "units": { "concentration": "kg/m^3" },
                    "materials": { "body": { "diffusivity": %s } },
                    "faces": { "xmin": { "kind": "flux", "value": %s } },
                    "time": { "end": %s, "step": %s, "outputs": [%s, %s] } }
                  """,
                  D,
                  FLUX,
                  end,
                  dt,
                  Math.max(1, steps / 2) * dt, // on a step: an output between steps would split one
                  end));
      // as a run of the command line: the renderer sets itself up while the case is read and run
      Optional<PictureWorker> pictures = FieldPictures.start();
      long t1 = System.nanoTime();
      RunPipeline.Prepared prepared = RunPipeline.prepare(caseFile);
      double read = (System.nanoTime() - t1) * 1e-9;
      AtomicReference<RunTimes> times = new AtomicReference<>();
      AtomicLong live = new AtomicLong();
      RunProgress progress =
          new RunProgress() {
            @Override
            public void step(double time, double endTime, int done, int rejected) {
              if (done == Math.max(1, steps / 2)) {
                live.accumulateAndGet(liveHeap(), Math::max); // every matrix is in use here
              }
            }

            @Override
            public void timed(RunTimes t) {
              times.set(t);
            }
          };
      RunOptions options =
          RunOptions.defaults()
              .withForce(true)
              .withCompletion(
                  (folder, finished, runMesh) -> {
                    live.accumulateAndGet(liveHeap(), Math::max); // the run's data, still held
                    pictures.ifPresent(w -> FieldPictures.draw(folder, runMesh, w));
                    return ReportWriter.writeFiles(folder, finished);
                  });
      long t2 = System.nanoTime();
      RunSummary summary;
      try {
        summary = RunPipeline.run(prepared, dir.resolve("out"), progress, options);
      } finally {
        pictures.ifPresent(PictureWorker::close);
      }
      double run = (System.nanoTime() - t2) * 1e-9;
      RunTimes t = times.get();
      double amount = Series.read(dir.resolve("out/series.csv")).last("amount");
      double expected = FLUX * SIZE * SIZE * end;
      print(out, mesh, summary.steps(), ratio, meshFile, jvmStart, generate, read, run, t);
      out.printf(
          Locale.ROOT,
          "amount %.9e kg against flux x area x time %.9e kg: relative difference %.1e; balance"
              + " error %.1e%n",
          amount,
          expected,
          Math.abs(amount - expected) / expected,
          summary.balanceRelative());
      out.printf(
          Locale.ROOT,
          "live heap %.0f MB, %.0f bytes per tetrahedron (after a full collection, halfway through"
              + " the steps and before the report); heap in use at its peak, garbage included,"
              + " %.0f MB%n",
          live.get() / 1e6,
          live.get() / (double) mesh.tetCount(),
          peakHeap() / 1e6);
      out.flush();
    } finally {
      BenchSupport.deleteTree(dir);
    }
  }

  private static void print(
      PrintWriter out,
      TetMesh mesh,
      int steps,
      double ratio,
      Path meshFile,
      double jvmStart,
      double generate,
      double read,
      double run,
      RunTimes t)
      throws IOException {
    out.printf(
        Locale.ROOT,
        "box: %d %s tetrahedra, %d nodes (%.0f MB MSH 4.1 ASCII); %d backward-Euler steps at"
            + " dt*D/h^2 = %.3g%n",
        mesh.tetCount(),
        mesh.order() == 2 ? "quadratic" : "linear",
        mesh.nodeCount(),
        Files.size(meshFile) / 1e6,
        steps,
        ratio);
    double whole = read + run;
    out.printf(Locale.ROOT, "  JVM start to the command  %7.2f s (not in the whole)%n", jvmStart);
    out.printf(Locale.ROOT, "  writing the test mesh     %7.2f s (not in the whole)%n", generate);
    row(out, "reading case and mesh", read, whole);
    row(out, "model and matrices", t.model(), whole);
    row(out, "linear solves", t.solves(), whole);
    out.printf(
        Locale.ROOT,
        "    %d iterations, %.1f per step, %.2f ms each%n",
        t.iterations(),
        t.iterations() / (double) steps,
        1e3 * t.solves() / Math.max(1, t.iterations()));
    row(out, "per-step rest", t.perStepRest(), whole);
    row(out, "field outputs", t.outputs(), whole);
    row(out, "report and pictures", t.report(), whole);
    double other = run - t.model() - t.stepping() - t.report();
    row(out, "folder and bookkeeping", other, whole);
    out.printf(
        Locale.ROOT, "whole run %.2f s = %.2f x its pure solve time%n", whole, whole / t.solves());
    // per node and step: compares mesh sizes and element orders (flat when work grows with size)
    double perNodeStep = 1e9 / ((double) mesh.nodeCount() * steps);
    out.printf(
        Locale.ROOT,
        "per node and step: whole %.0f ns, solves %.0f ns%n",
        whole * perNodeStep,
        t.solves() * perNodeStep);
  }

  private static void row(PrintWriter out, String what, double seconds, double whole) {
    out.printf(Locale.ROOT, "  %-25s %7.2f s  %5.1f %%%n", what, seconds, 100 * seconds / whole);
  }

  /**
   * The heap the run's live data take: used heap right after a full collection (a benchmark may ask
   * for one; the run itself never does).
   */
  @SuppressWarnings("SystemGc") // the measurement needs the garbage gone
  private static long liveHeap() {
    System.gc();
    return ManagementFactory.getMemoryMXBean().getHeapMemoryUsage().getUsed();
  }

  private static long peakHeap() {
    long peak = 0;
    for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
      if (pool.getType() == MemoryType.HEAP) {
        peak += pool.getPeakUsage().getUsed();
      }
    }
    return peak;
  }
}
