package dev.soakfield.fem.model;

import dev.soakfield.fem.casefile.CaseSpec;
import dev.soakfield.fem.casefile.MaterialSpec;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.topo.PartRemoval;
import java.util.Set;
import java.util.TreeSet;

/**
 * Parts marked {@code "impermeable": true} take no part in a run: they are taken out of the mesh
 * before anything is checked against it or built on it, so what they shared with the other parts
 * becomes exterior faces (sealed unless the case says otherwise).
 */
public final class ImpermeableParts {
  private ImpermeableParts() {}

  /** The mesh the run works on: without the case's impermeable parts. */
  public static TetMesh removedFrom(CaseSpec spec, TetMesh mesh) {
    Set<String> parts = names(spec);
    return parts.isEmpty() ? mesh : PartRemoval.without(mesh, parts);
  }

  /** The volume groups of the case's impermeable parts, in name order. */
  public static Set<String> names(CaseSpec spec) {
    Set<String> parts = new TreeSet<>();
    for (MaterialSpec m : spec.materials().values()) {
      if (m.impermeable()) {
        parts.add(m.volumeGroup());
      }
    }
    return parts;
  }
}
