package dev.soakfield.fem.assembly;

import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import java.util.Arrays;
import java.util.Locale;

/**
 * Assembly speed on a box of about one million tetrahedra, linear and quadratic, one thread and all
 * cores. Reports, never asserts. Run: java -cp test-classes:classes:deps
 * dev.soakfield.fem.assembly.AssemblyBench [cells per side, default 55].
 */
public final class AssemblyBench {
  private static final int WARM = 3;
  private static final int RUNS = 5;

  private AssemblyBench() {}

  public static void main(String[] args) {
    int n = args.length > 0 ? Integer.parseInt(args[0]) : 55;
    int cores = Runtime.getRuntime().availableProcessors();
    for (int order = 1; order <= 2; order++) {
      TetMesh mesh = StructuredMesher.box(1, 1, 1, n, n, n, order);
      FeSpace space = FeSpace.of(mesh);
      System.out.printf(
          Locale.ROOT, "order %d: %d tets, %d nodes%n", order, mesh.tetCount(), mesh.nodeCount());
      for (int threads : new int[] {1, cores}) {
        long t0 = System.nanoTime();
        SystemAssembler a =
            new SystemAssembler(space, threads, ParallelRanges.MIN_RANGE, TetColouring.BLOCK);
        double setup = (System.nanoTime() - t0) * 1e-9;
        CsrMatrix m = a.newMatrix();
        double[] tensor = TestMeshes.uniformTensor(mesh, 1, 1, 1, 0, 0, 0);
        double[] coef = TestMeshes.filled(mesh.tetCount(), 1);
        double stiff = median(() -> a.addStiffness(m, tensor, 1.0), m);
        double mass = median(() -> a.addCapacity(m, coef, false, 1.0), m);
        double lumped = median(() -> a.addCapacity(m, coef, true, 1.0), m);
        System.out.printf(
            Locale.ROOT,
            "  %d thread(s): setup %.2f s (%d colours, %d nonzeros); stiffness %.3f s = %.2f M"
                + " tets/s; consistent capacity %.3f s = %.2f M tets/s; lumped %.3f s%n",
            threads,
            setup,
            a.colourCount(),
            m.nonZeros(),
            stiff,
            mesh.tetCount() / stiff * 1e-6,
            mass,
            mesh.tetCount() / mass * 1e-6,
            lumped);
      }
    }
  }

  private static double median(Runnable work, CsrMatrix m) {
    double[] times = new double[RUNS];
    for (int r = 0; r < WARM + RUNS; r++) {
      m.setZero();
      long t0 = System.nanoTime();
      work.run();
      if (r >= WARM) {
        times[r - WARM] = (System.nanoTime() - t0) * 1e-9;
      }
    }
    Arrays.sort(times);
    return times[RUNS / 2];
  }
}
