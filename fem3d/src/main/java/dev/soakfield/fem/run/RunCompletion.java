package dev.soakfield.fem.run;

import dev.soakfield.fem.results.RunManifest;
import dev.soakfield.mesh.TetMesh;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

/**
 * What is made of a run's results before its folder says finished: the report and its pictures. It
 * gets the folder (all result files in place, the manifest still saying running), the manifest the
 * folder is about to get, and the mesh the run worked on, so that it need not read back and check a
 * mesh of millions of elements the run has in memory; it returns the files it wrote.
 */
@FunctionalInterface
public interface RunCompletion {
  RunCompletion NONE = (folder, finished, mesh) -> List.of();

  List<String> complete(Path folder, RunManifest finished, TetMesh mesh) throws IOException;
}
