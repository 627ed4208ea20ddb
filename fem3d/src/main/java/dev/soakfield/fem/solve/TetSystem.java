package dev.soakfield.fem.solve;

import dev.soakfield.fem.assembly.CsrMatrix;
import dev.soakfield.fem.assembly.FeSpace;
import dev.soakfield.fem.assembly.SystemAssembler;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import java.util.Arrays;

/**
 * The step matrix a run solves, for benchmarks and tests: M + dt·K of tetrahedra on the unit box of
 * cells³ cells (six tetrahedra each), D = S = 1, consistent capacity, no face held, dt = ratio·h².
 */
final class TetSystem {
  private TetSystem() {}

  static CsrMatrix build(int cells, double ratio) {
    return build(cells, ratio, 1);
  }

  /** As above with linear (1) or quadratic (2) tetrahedra. */
  static CsrMatrix build(int cells, double ratio, int order) {
    TetMesh mesh = StructuredMesher.box(1, 1, 1, cells, cells, cells, order);
    SystemAssembler asm = new SystemAssembler(FeSpace.of(mesh));
    int tets = mesh.tetCount();
    double[] ones = new double[tets];
    Arrays.fill(ones, 1.0);
    double[] tensor = new double[6 * tets];
    for (int t = 0; t < tets; t++) {
      tensor[6 * t] = 1;
      tensor[6 * t + 1] = 1;
      tensor[6 * t + 2] = 1;
    }
    double h = 1.0 / cells;
    CsrMatrix a = asm.newMatrix();
    asm.addCapacity(a, ones, false, 1.0);
    asm.addStiffness(a, tensor, ratio * h * h);
    return a;
  }
}
