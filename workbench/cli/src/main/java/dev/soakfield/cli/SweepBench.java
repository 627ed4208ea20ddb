package dev.soakfield.cli;

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
      "Runs a Monte Carlo sweep of a small plane sheet (a box of 40 cells across, D log-normal)"
          + " one case after another, then with the local engine (a worker per core), then with"
          + " the Spark engine in local mode when it is on the class path (through ./soakfield"
          + " bench sweep --engine spark); prints cases per minute and the ratios. The first pass"
          + " of each engine is a warm-up."
    })
final class SweepBench implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Option(names = "--cases", defaultValue = "64", description = "Cases per pass.")
  int cases;

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
    PrintWriter out = spec.commandLine().getOut();
    int cores = Runtime.getRuntime().availableProcessors();
    Path dir = Files.createTempDirectory("soakfield-sweep-bench");
    try {
      Path sweep = writeFiles(dir);
      SweepPlan plan = SweepPlan.of(SweepFile.read(sweep));
      SweepEngine local = SweepEngines.named("local");
      double one = perMinute(plan, local, dir, 1, Optional.empty());
      double pool = perMinute(plan, local, dir, 0, Optional.empty());
      out.printf(
          Locale.ROOT,
          "%d cases of a %d-tetrahedron sheet, %d cores%n"
              + "  one after another (local engine, 1 worker) %8.1f cases/min%n"
              + "  local engine, %d workers                   %8.1f cases/min  %.2fx (aim: close to"
              + " %d)%n",
          cases,
          40 * 6,
          cores,
          one,
          cores,
          pool,
          pool / one,
          cores);
      if (engine.equals("spark")) {
        SweepEngine spark = SweepEngines.named("spark");
        double s = perMinute(plan, spark, dir, 0, Optional.of("local[" + cores + "]"));
        out.printf(
            Locale.ROOT,
            "  Spark local[%d]                            %8.1f cases/min  %.2fx the local engine"
                + " (%.1f ms more per case)%n",
            cores,
            s,
            s / pool,
            (60_000.0 / s - 60_000.0 / pool) * cores);
      }
      out.flush();
    } finally {
      BenchSupport.deleteTree(dir);
    }
    return ExitCodes.OK;
  }

  /** Warm-up pass, then a timed pass into a fresh folder. */
  private double perMinute(
      SweepPlan plan, SweepEngine engine, Path dir, int workers, Optional<String> master)
      throws IOException {
    double seconds = 0;
    for (int pass = 0; pass < 2; pass++) {
      Path out = dir.resolve(engine.name() + "-" + workers + "-" + pass);
      EngineSettings settings =
          new EngineSettings(out, plan.mesh(), List.of(), workers, master, line -> {});
      long start = System.nanoTime();
      SweepRun.run(plan, engine, settings, false, false);
      seconds = (System.nanoTime() - start) * 1e-9;
    }
    return cases / seconds * 60;
  }

  private Path writeFiles(Path dir) throws IOException {
    MshWriter.write(
        dir.resolve("sheet.msh"), StructuredMesher.box(1e-3, 1e-5, 1e-5, 40, 1, 1, 1), false);
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
