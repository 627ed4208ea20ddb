package dev.soakfield.fem.bench;

import dev.soakfield.fem.assembly.FeSpace;
import dev.soakfield.fem.model.DiffusionModel;
import dev.soakfield.fem.model.FaceCondition;
import dev.soakfield.fem.model.FaceGroupMembers;
import dev.soakfield.fem.physics.FaceKind;
import dev.soakfield.fem.physics.TimeFunction;
import dev.soakfield.fem.run.RunPipeline;
import dev.soakfield.fem.time.StepListener;
import dev.soakfield.fem.time.StepOutcome;
import dev.soakfield.fem.time.ThetaStepper;
import dev.soakfield.fem.time.TimeSettings;
import dev.soakfield.fem.time.TransientRun;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import java.io.PrintWriter;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;

/**
 * End-to-end transient run on a unit box of n³ cells (6n³ linear tets), one face held, fixed
 * backward-Euler steps: the whole run against the time spent in linear solves, and the peak heap
 * per tetrahedron. The physical limit of the run is its solves; everything else is overhead.
 */
public final class RunBench {
  private RunBench() {}

  public static void run(PrintWriter out, int n, int steps, double ratio) {
    long t0 = System.nanoTime();
    TetMesh mesh = StructuredMesher.box(1, 1, 1, n, n, n, 1);
    int tets = mesh.tetCount();
    double[] s = new double[tets];
    Arrays.fill(s, 1.0);
    double[] tensor = new double[6 * tets];
    for (int t = 0; t < tets; t++) {
      tensor[6 * t] = 1;
      tensor[6 * t + 1] = 1;
      tensor[6 * t + 2] = 1;
    }
    int g = mesh.faceGroupIndex("xmin");
    int[] faces = FaceGroupMembers.of(mesh, g);
    double[] faceS = new double[faces.length];
    Arrays.fill(faceS, 1.0);
    DiffusionModel model =
        new DiffusionModel(
            FeSpace.of(mesh),
            s,
            tensor,
            new double[tets],
            new double[tets],
            List.of(
                new FaceCondition(
                    g,
                    "xmin",
                    FaceKind.CONCENTRATION,
                    TimeFunction.constant(1),
                    TimeFunction.constant(0),
                    faces,
                    faceS)),
            new double[mesh.nodeCount()]);
    ThetaStepper stepper =
        new ThetaStepper(
            model, false, RunPipeline.SOLVER_TOLERANCE, RunPipeline.SOLVER_MAX_ITERATIONS);
    long t1 = System.nanoTime();
    double h = 1.0 / n;
    double dt = ratio * h * h; // D = 1
    TimeSettings settings =
        new TimeSettings(steps * dt, new double[] {steps * dt}, false, Double.NaN, dt, dt, dt);
    double[] solve = {0};
    long[] iterations = {0};
    TransientRun.run(
        stepper,
        model.initialPhi(),
        settings,
        new StepListener() {
          @Override
          public void accepted(double t, double step, StepOutcome o, boolean output) {
            solve[0] += o.solveSeconds();
            iterations[0] += o.iterations();
          }
        });
    long t2 = System.nanoTime();
    long peak = 0;
    for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
      if (pool.getType() == MemoryType.HEAP) {
        peak += pool.getPeakUsage().getUsed();
      }
    }
    double setup = (t1 - t0) * 1e-9;
    double stepping = (t2 - t1) * 1e-9;
    out.printf(
        Locale.ROOT,
        "mesh: %d tets, %d nodes; %d backward-Euler steps at dt*D/h^2 = %.3g%n",
        tets,
        mesh.nodeCount(),
        steps,
        ratio);
    out.printf(
        Locale.ROOT,
        "mesh and assembly %.2f s; stepping %.2f s, of which linear solves %.2f s (%d iterations)%n",
        setup,
        stepping,
        solve[0],
        iterations[0]);
    out.printf(
        Locale.ROOT,
        "stepping / pure solve time: %.2f; whole run / pure solve time: %.2f%n",
        stepping / solve[0],
        (setup + stepping) / solve[0]);
    out.printf(
        Locale.ROOT, "peak heap %.0f MB, %.0f bytes per tet%n", peak / 1e6, (double) peak / tets);
    out.flush();
  }
}
