package dev.soakfield.cli;

import dev.soakfield.mesh.AtomicFiles;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.msh.MshWriter;
import dev.soakfield.mesh.vtk.VtuFormat;
import dev.soakfield.mesh.vtk.VtuWriter;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import picocli.CommandLine.Option;

/** Options every mesh-making command shares: where to write, element order, encoding. */
final class MeshOutput {
  @Option(
      names = "--out",
      required = true,
      paramLabel = "FILE",
      description = "Mesh file to write: .msh (MSH 4.1) or .vtu (VTK XML, for viewing).")
  Path out;

  @Option(
      names = "--quadratic",
      description = "10-node tetrahedra (mid-edge nodes) instead of 4-node ones.")
  boolean quadratic;

  @Option(
      names = "--binary",
      description = "Binary MSH instead of ASCII (smaller, faster to read).")
  boolean binary;

  int order() {
    return quadratic ? 2 : 1;
  }

  /** Writes {@code mesh} atomically in the format the file name asks for, and says so. */
  void write(TetMesh mesh, PrintWriter out) throws IOException {
    String name = this.out.getFileName().toString().toLowerCase(Locale.ROOT);
    if (name.endsWith(".msh")) {
      AtomicFiles.write(this.out, f -> MshWriter.write(f, mesh, binary));
    } else if (name.endsWith(".vtu")) {
      AtomicFiles.write(
          this.out, f -> VtuWriter.write(f, mesh, List.of(), List.of(), VtuFormat.APPENDED_BASE64));
    } else {
      throw new UserInputException(
          "--out: found '" + this.out + "', expected a file name ending in .msh or .vtu");
    }
    out.printf(
        Locale.ROOT,
        "wrote %s: %d nodes, %d %d-node tetrahedra, %d volume group(s), %d face group(s)%n",
        this.out,
        mesh.nodeCount(),
        mesh.tetCount(),
        mesh.nodesPerTet(),
        mesh.volumeGroups().size(),
        mesh.faceGroups().size());
    out.flush();
  }
}
