package dev.soakfield.fem.results;

import com.fasterxml.jackson.databind.JsonNode;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.MidEdgeNodes;
import dev.soakfield.mesh.load.MeshLoader;
import dev.soakfield.mesh.topo.AssemblyOptions;
import dev.soakfield.mesh.topo.PartRemoval;
import java.nio.file.Path;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;

/**
 * The mesh a run worked on, from the folder's {@code mesh.msh} — a byte-for-byte copy of the user's
 * file — and what summary.json says the run did to it: the parts it took out ({@code
 * mesh.removed_parts}, impermeable parts) and the order it ran at ({@code mesh.order}, 2 when it
 * added mid-edge nodes). Folders written before the copy was exact hold the run's mesh itself; both
 * steps then change nothing (the parts are gone already, the order is already 2).
 */
public final class MeshAsRun {
  /** summary.json key under {@code mesh}: the volume groups the run took out. */
  public static final String REMOVED_PARTS = "removed_parts";

  private MeshAsRun() {}

  /**
   * Reads {@code meshFile} and redoes the run's changes to it.
   *
   * @throws dev.soakfield.mesh.MeshInputException when the mesh file cannot be read
   */
  public static TetMesh read(Path meshFile, Optional<JsonNode> summary) {
    TetMesh mesh = MeshLoader.load(meshFile, AssemblyOptions.defaults()).mesh();
    JsonNode m = summary.map(s -> s.path("mesh")).orElse(null);
    if (m == null || m.isMissingNode()) {
      return mesh;
    }
    Set<String> removed = new TreeSet<>();
    m.path(REMOVED_PARTS).forEach(n -> removed.add(n.asText()));
    if (!removed.isEmpty()) {
      mesh = PartRemoval.without(mesh, removed);
    }
    if (m.path("order").asInt(mesh.order()) == 2 && mesh.order() == 1) {
      mesh = MidEdgeNodes.promote(mesh);
    }
    return mesh;
  }

  /** The mesh of the run in {@code folder}: its mesh.msh with what its summary.json says. */
  public static TetMesh inFolder(Path folder) {
    return read(
        folder.resolve(ResultFiles.MESH_COPY),
        StoredRun.readSummary(folder.resolve(ResultFiles.SUMMARY)));
  }
}
