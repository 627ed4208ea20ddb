package dev.soakfield.cli;

import dev.soakfield.fem.sweep.CaseRow;
import dev.soakfield.fem.sweep.EngineSettings;
import dev.soakfield.fem.sweep.SweepEngine;
import dev.soakfield.fem.sweep.SweepEngines;
import dev.soakfield.fem.sweep.SweepFile;
import dev.soakfield.fem.sweep.SweepPlan;
import dev.soakfield.fem.sweep.SweepRun;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * Cases per minute of a sweep: the local engine with one worker (the cases one after another) as
 * the reference, the local engine with a worker per core, and the Spark engine in local mode when
 * it is on the class path, all on the same cases in the same run.
 */
@Command(
    name = "sweep",
    mixinStandardHelpOptions = true,
    description = {
      "Runs a Monte Carlo sweep of a plane sheet (D log-normal) one case after another, then with the local engine (a worker per core), then with"
          + " the Spark engine in local mode when it is on the class path (through ./soakfield"
          + " bench sweep --engine spark); prints cases per minute and the ratios: a warm-up round"
          + " of every engine, then two rounds in turn, the best of each engine counting."
    })
final class SweepBench implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Option(names = "--cases", defaultValue = "64", description = "Cases per pass.")
  int cases;

  @Option(
      names = "--cells",
      defaultValue = "14",
      description = {
        "Cells across a cube of sheet (6 tetrahedra a cell; default 14, some 16,000"
            + " tetrahedra, about 0.1 s a case); 0: a strip of 40 cells (240 tetrahedra),"
            + " which measures the cost per case around the solve."
      })
  int cells;

  @Option(
      names = "--engine",
      defaultValue = "local",
      description = "local, or spark to add the Spark engine in local mode.")
  String engine;

  @Override
  public Integer call() throws Exception {
    if (cases < 2) {
      throw new UserInputException("--cases: found " + cases + ", expected 2 or more");
    }
    if (cells < 0 || cells == 1 || cells > 60) {
      throw new UserInputException(
          "--cells: found " + cells + ", expected 0 (the strip) or 2 to 60");
    }
    PrintWriter out = spec.commandLine().getOut();
    int cores = Runtime.getRuntime().availableProcessors();
    Path dir = Files.createTempDirectory("soakfield-sweep-bench");
    try {
      Path sweep = writeFiles(dir);
      SweepPlan plan = SweepPlan.of(SweepFile.read(sweep));
      SweepEngine local = SweepEngines.named("local");
      List<Pass> passes = new ArrayList<>();
      passes.add(
          new Pass("one after another (local engine, 1 worker)", local, 1, Optional.empty()));
      passes.add(new Pass("local engine, " + cores + " workers", local, 0, Optional.empty()));
      if (engine.equals("spark")) {
        passes.add(
            new Pass(
                "Spark local[" + cores + "]",
                SweepEngines.named("spark"),
                0,
                Optional.of("local[" + cores + "]")));
      }
      // a warm-up round of every engine, then rounds in turn: the JIT and the machine's load
      // favour no engine for running later; each engine's best round counts
      double[] best = new double[passes.size()];
      double[] inCase = new double[passes.size()];
      java.util.Arrays.fill(best, Double.POSITIVE_INFINITY);
      for (int round = 0; round <= ROUNDS; round++) {
        for (int i = 0; i < passes.size(); i++) {
          Timing t = time(plan, passes.get(i), dir.resolve(round + "-" + i));
          if (round > 0 && t.wall() < best[i]) {
            best[i] = t.wall();
            inCase[i] = t.inCases();
          }
        }
      }
      out.printf(
          Locale.ROOT,
          "%d cases of a %d-tetrahedron sheet, %d cores, best of %d rounds after a warm-up%n",
          cases,
          tets(),
          cores,
          ROUNDS);
      for (int i = 0; i < passes.size(); i++) {
        double perMinute = cases / best[i] * 60;
        String ratio =
            i == 0
                ? ""
                : i == 1
                    ? String.format(
                        Locale.ROOT,
                        "  %.2fx one after another (aim: close to %d)",
                        best[0] / best[1],
                        cores)
                    : String.format(
                        Locale.ROOT,
                        "  %.2fx the local engine's rate (%+.1f ms per case and core)",
                        best[1] / best[i],
                        (best[i] - best[1]) / cases * 1000 * cores);
        out.printf(
            Locale.ROOT,
            "  %-44s %8.1f cases/min  %6.1f ms in a case%s%n",
            passes.get(i).label(),
            perMinute,
            inCase[i] / cases * 1000,
            ratio);
      }
      out.flush();
    } finally {
      BenchSupport.deleteTree(dir);
    }
    return ExitCodes.OK;
  }

  private static final int ROUNDS = 2;

  /** One engine set-up to time. */
  private record Pass(String label, SweepEngine engine, int workers, Optional<String> master) {}

  /** Wall-clock seconds of a sweep and the seconds its cases took, summed over the cases. */
  private record Timing(double wall, double inCases) {}

  /** One sweep of every case into a fresh folder; a failed case makes the rates meaningless. */
  private static Timing time(SweepPlan plan, Pass pass, Path out) throws IOException {
    EngineSettings settings =
        new EngineSettings(out, plan.mesh(), List.of(), pass.workers(), pass.master(), line -> {});
    long start = System.nanoTime();
    SweepRun.Outcome outcome = SweepRun.run(plan, pass.engine(), settings, false, false);
    double wall = (System.nanoTime() - start) * 1e-9;
    if (!outcome.failures().isEmpty()) {
      throw new IllegalStateException(
          pass.label()
              + ": case "
              + outcome.failures().get(0).id()
              + " "
              + outcome.failures().get(0).status());
    }
    return new Timing(wall, outcome.table().rows().stream().mapToDouble(CaseRow::seconds).sum());
  }

  private int tets() {
    return cells == 0 ? 40 * 6 : cells * cells * cells * 6;
  }

  private Path writeFiles(Path dir) throws IOException {
    MshWriter.write(
        dir.resolve("sheet.msh"),
        cells == 0
            ? StructuredMesher.box(1e-3, 1e-5, 1e-5, 40, 1, 1, 1)
            : StructuredMesher.box(1e-3, 1e-3, 1e-3, cells, cells, cells, 1),
        false);
    Files.writeString(
        dir.resolve("sheet.json"),
        """
        { "mesh": "sheet.msh", "materials": { "body": { "diffusivity": 1e-10 } },
          "faces": { "xmin": { "kind": "concentration", "value": 1 },
                     "xmax": { "kind": "concentration", "value": 1 } },
          "thresholds": [ { "name": "half", "level": 0.5, "where": "mean:body" } ],
          "time": { "end": 2000, "tolerance": 1e-3 } }
        """);
    return Files.writeString(
        dir.resolve("sweep.json"),
        """
        { "base": "sheet.json", "samples": %d, "seed": 1, "sampling": "latin-hypercube",
          "vary": { "materials.body.diffusivity":
                      { "distribution": "log-normal", "median": 1e-10, "gsd": 1.3 } },
          "collect": { "times": [600] } }
        """
            .formatted(cases));
  }
}
