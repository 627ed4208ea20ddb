package dev.soakfield.fem.run;

import dev.soakfield.fem.post.PermeationFigures;
import dev.soakfield.fem.results.Series;
import dev.soakfield.mesh.FaceGroupKind;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.topo.MeshGeometry;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;

/**
 * summary.json's {@code permeation}: for every exterior face group through which something flowed,
 * its {@link PermeationFigures} from the series' inflow columns and the group's area.
 */
final class PermeationSummary {
  private PermeationSummary() {}

  static Map<String, Object> of(Series series, TetMesh mesh, double share) {
    Map<String, Object> out = new LinkedHashMap<>();
    if (!series.has("time") || series.rows() < 2) {
      return out;
    }
    double[] time = series.require("time");
    double[] areas = MeshGeometry.groupAreas(mesh);
    for (int g = 0; g < mesh.faceGroups().size(); g++) {
      var group = mesh.faceGroups().get(g);
      String name = group.name();
      if (group.kind() != FaceGroupKind.EXTERIOR
          || !series.has("inflow:" + name)
          || !(areas[g] > 0)) {
        continue;
      }
      Optional<PermeationFigures> f =
          PermeationFigures.of(
              time,
              series.require("inflow_rate:" + name),
              series.require("inflow:" + name),
              areas[g],
              share);
      f.ifPresent(p -> out.put(name, p.toMap()));
    }
    return out;
  }
}
