package dev.soakfield.mesh;

import java.util.Objects;

/** The result of reading a mesh file: the mesh, ready for analysis, and what the import found. */
public record MeshImport(TetMesh mesh, MeshReport report) {
  public MeshImport {
    Objects.requireNonNull(mesh, "mesh");
    Objects.requireNonNull(report, "report");
  }
}
