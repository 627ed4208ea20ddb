package dev.soakfield.fem.model;

import dev.soakfield.fem.casefile.CaseSpec;
import dev.soakfield.fem.casefile.FaceSpec;
import dev.soakfield.fem.physics.FaceKind;
import dev.soakfield.fem.units.DurationText;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.topo.MeshGeometry;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Whether the mesh resolves the start of uptake next to faces whose concentration is set: the first
 * element layer there fills at once, so when it is deeper than the diffusion length √(D·t) at the
 * first output, the early uptake is mostly that layer. The share is estimated in one dimension with
 * lumped capacity: the face node holds h/2 of the layer against the √t law's 2·√(D·t/π) (Crank
 * 1975, eq. 4.22), so share = h·√π / (4·√(D·t)).
 */
final class NearSurfaceCheck {
  /** The factor over the √t law from which the warning is given: 1/5 of the uptake from mesh. */
  static final double MATTERS = 1.25;

  private NearSurfaceCheck() {}

  /**
   * @param owner the tetrahedron of each face
   * @param tetD each tetrahedron's mean diffusivity at the start temperature, m²/s
   */
  static List<String> warnings(CaseSpec spec, TetMesh mesh, int[] owner, double[] tetD) {
    List<String> out = new ArrayList<>();
    double[] outputs = spec.time().outputTimes();
    double first = outputs.length > 0 ? outputs[0] : spec.time().end();
    for (FaceSpec f : spec.faces().values()) {
      if (f.kind() != FaceKind.CONCENTRATION && f.kind() != FaceKind.AMBIENT) {
        continue;
      }
      int g = mesh.faceGroupIndex(f.faceGroup());
      double depth = 0;
      double d = 0;
      int n = 0;
      for (int face = 0; face < mesh.faceCount(); face++) {
        if (mesh.faceGroup(face) != g) {
          continue;
        }
        depth += 3 * MeshGeometry.tetVolume(mesh, owner[face]) / MeshGeometry.faceArea(mesh, face);
        d += tetD[owner[face]];
        n++;
      }
      if (n == 0 || !(d > 0)) {
        continue;
      }
      depth /= n;
      double length = Math.sqrt(d / n * first);
      double factor = depth * Math.sqrt(Math.PI) / (4 * length);
      // a fifth or more of the early uptake from the mesh is worth a word (common practice for a
      // warning threshold; smaller shares are within what a coarse first output shows anyway)
      if (factor >= MATTERS) {
        out.add(
            String.format(
                Locale.ROOT,
                "face group '%s': the elements next to it are %.3g m deep, more than the"
                    + " diffusion length √(D·t) = %.3g m at the first output (%s); their first"
                    + " layer fills at once, so the uptake shown by then is about %.1f× the √t"
                    + " law's (a one-dimensional estimate; about %.0f %% of it from the mesh)."
                    + " Refine the mesh towards this face or take a later first output.",
                f.faceGroup(),
                depth,
                length,
                DurationText.of(first),
                factor,
                100 * (1 - 1 / factor)));
      }
    }
    return out;
  }
}
