package dev.soakfield.fem.model;

import dev.soakfield.fem.assembly.PointLocator;
import dev.soakfield.fem.casefile.CaseInputException;
import dev.soakfield.fem.casefile.CaseSpec;
import dev.soakfield.fem.casefile.ProbeSpec;
import dev.soakfield.fem.casefile.SourcePlace;
import dev.soakfield.mesh.TetMesh;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.TreeSet;

/**
 * Which side of a joint each probe reads. Where parts meet, c jumps with the solubility, so a probe
 * there must name its part; one that does not is refused, naming the parts that meet.
 */
public final class ProbeSides {
  private ProbeSides() {}

  /**
   * Checks every probe against the mesh's parts.
   *
   * @throws CaseInputException listing each probe that lies where parts meet and names none, or
   *     names a part it does not touch
   */
  public static void check(CaseSpec spec, TetMesh mesh, PointLocator locator) {
    List<CaseInputException.Problem> problems = new ArrayList<>();
    for (ProbeSpec p : spec.probes()) {
      TreeSet<String> parts = new TreeSet<>();
      for (int t : locator.tetsAt(p.x(), p.y(), p.z())) {
        parts.add(mesh.volumeGroups().get(mesh.tetGroup(t)).name());
      }
      String path = "probes." + p.name();
      SourcePlace at = spec.placeOf(path);
      if (p.part().isPresent() && !parts.isEmpty() && !parts.contains(p.part().get())) {
        problems.add(
            new CaseInputException.Problem(
                at.line(),
                at.column(),
                path + ".part",
                "found '"
                    + p.part().get()
                    + "', expected a part at the point: "
                    + String.join(", ", parts)));
      } else if (p.part().isEmpty() && parts.size() > 1) {
        problems.add(
            new CaseInputException.Problem(
                at.line(),
                at.column(),
                path,
                "found a point where parts "
                    + String.join(" and ", parts)
                    + " meet (c jumps there), expected {\"at\": [x, y, z], \"part\": NAME}"
                    + " naming the side to read"));
      }
    }
    if (!problems.isEmpty()) {
      throw new CaseInputException(String.valueOf(spec.caseFile().getFileName()), problems);
    }
  }

  /** The probe's place: in its named part when it names one. */
  public static Optional<PointLocator.Probe> locate(
      ProbeSpec p, TetMesh mesh, PointLocator locator) {
    if (p.part().isEmpty()) {
      return locator.locate(p.x(), p.y(), p.z());
    }
    int g = mesh.volumeGroupIndex(p.part().get());
    return locator.locate(p.x(), p.y(), p.z(), t -> mesh.tetGroup(t) == g);
  }
}
