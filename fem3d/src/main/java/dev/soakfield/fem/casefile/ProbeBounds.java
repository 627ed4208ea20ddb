package dev.soakfield.fem.casefile;

import dev.soakfield.mesh.TetMesh;
import java.util.ArrayList;
import java.util.List;

/** Warns of probes outside the mesh's bounding box, where no element can hold them. */
final class ProbeBounds {
  private ProbeBounds() {}

  static List<String> outside(CaseSpec spec, TetMesh mesh) {
    List<String> warnings = new ArrayList<>();
    if (spec.probes().isEmpty() || mesh.nodeCount() == 0) {
      return warnings;
    }
    double[] lo = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY};
    double[] hi = {Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY};
    int n = mesh.nodeCount();
    for (int i = 0; i < n; i++) {
      for (int a = 0; a < 3; a++) {
        double c = mesh.coord(i, a);
        lo[a] = Math.min(lo[a], c);
        hi[a] = Math.max(hi[a], c);
      }
    }
    for (ProbeSpec p : spec.probes()) {
      double[] xyz = {p.x(), p.y(), p.z()};
      for (int a = 0; a < 3; a++) {
        // a relative slack so that probes placed exactly on a face are not flagged by rounding
        double slack = 1e-9 * Math.max(1.0, hi[a] - lo[a]);
        if (xyz[a] < lo[a] - slack || xyz[a] > hi[a] + slack) {
          warnings.add(
              "probe '"
                  + p.name()
                  + "' at ("
                  + p.x()
                  + ", "
                  + p.y()
                  + ", "
                  + p.z()
                  + ") lies outside the mesh's bounding box: it will record nothing");
          break;
        }
      }
    }
    return warnings;
  }
}
