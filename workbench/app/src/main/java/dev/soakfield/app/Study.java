package dev.soakfield.app;

import dev.soakfield.fem.casefile.CaseReader;
import dev.soakfield.fem.casefile.CaseSpec;
import dev.soakfield.fem.results.StoredRun;
import dev.soakfield.mesh.MeshInputException;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.load.MeshLoader;
import dev.soakfield.mesh.topo.AssemblyOptions;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Optional;

/** What the workbench has open: a mesh, and the results of a run on it when there are any. */
public final class Study {
  private final Path source;
  private final TetMesh mesh;
  private final PartGeometry geometry;
  private final Optional<StoredRun> results;

  private Study(Path source, TetMesh mesh, Optional<StoredRun> results) {
    this.source = source;
    this.mesh = mesh;
    this.geometry = PartGeometry.of(mesh);
    this.results = results;
  }

  /** A study of a mesh made in memory (for tests and benchmarks). */
  public static Study ofMesh(Path name, TetMesh mesh) {
    return new Study(name, mesh, Optional.empty());
  }

  /** A study of a run's results whose mesh is already in memory (see {@link StoredRun#open}). */
  public static Study ofRun(StoredRun results) {
    return new Study(results.folder(), results.mesh(), Optional.of(results));
  }

  /**
   * Opens a mesh (.msh), a case (.json: its mesh) or a result folder.
   *
   * @throws MeshInputException for a path that is none of these, or a file that cannot be used
   */
  public static Study open(Path path) {
    if (Files.isDirectory(path)) {
      if (!StoredRun.isResultFolder(path)) {
        throw new MeshInputException(
            path.toString(),
            "",
            "a folder without fields.pvd",
            "a result folder written by 'soakfield run'");
      }
      StoredRun r = StoredRun.open(path);
      return new Study(path, r.mesh(), Optional.of(r));
    }
    String name = path.getFileName().toString().toLowerCase(Locale.ROOT);
    if (name.endsWith(".json")) {
      CaseSpec spec = CaseReader.read(path);
      return new Study(
          path, MeshLoader.load(spec.mesh(), AssemblyOptions.defaults()).mesh(), Optional.empty());
    }
    if (name.endsWith(".msh")) {
      return new Study(
          path, MeshLoader.load(path, AssemblyOptions.defaults()).mesh(), Optional.empty());
    }
    throw new MeshInputException(
        path.toString(),
        "",
        Files.exists(path) ? "a file of unknown kind" : "no such file or folder",
        "a mesh (.msh), a case (.json) or a result folder");
  }

  public Path source() {
    return source;
  }

  public TetMesh mesh() {
    return mesh;
  }

  public PartGeometry geometry() {
    return geometry;
  }

  public Optional<StoredRun> results() {
    return results;
  }
}
