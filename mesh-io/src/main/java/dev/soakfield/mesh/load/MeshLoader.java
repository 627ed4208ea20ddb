package dev.soakfield.mesh.load;

import dev.soakfield.mesh.MeshImport;
import dev.soakfield.mesh.MeshInputException;
import dev.soakfield.mesh.RawMesh;
import dev.soakfield.mesh.msh.MshReader;
import dev.soakfield.mesh.topo.AssemblyOptions;
import dev.soakfield.mesh.topo.MeshAssembler;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

/** Reads a mesh file of any supported format and makes it ready for analysis. */
public final class MeshLoader {
  private MeshLoader() {}

  /**
   * Reads {@code file} (MSH 2.2 or 4.1, ASCII or binary) and builds its topology and checks.
   *
   * @throws MeshInputException when the file is missing, unreadable or not a usable mesh
   */
  public static MeshImport load(Path file, AssemblyOptions options) {
    if (!Files.isRegularFile(file)) {
      throw new MeshInputException(
          file.toString(),
          "",
          Files.exists(file) ? "a folder or special file" : "no such file",
          "a mesh file (.msh)");
    }
    String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
    if (!name.endsWith(".msh")) {
      throw new MeshInputException(
          file.toString(), "", "the extension of '" + name + "'", "a .msh file (MSH 2.2 or 4.1)");
    }
    RawMesh raw = MshReader.read(file);
    return MeshAssembler.assemble(raw, options);
  }
}
