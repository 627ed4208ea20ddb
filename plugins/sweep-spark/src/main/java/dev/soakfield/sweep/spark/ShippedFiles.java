package dev.soakfield.sweep.spark;

import java.io.IOException;
import java.io.Serializable;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import org.apache.spark.SparkContext;
import org.apache.spark.SparkFiles;

/**
 * The files every executor needs, shipped once per Spark application ({@code
 * SparkContext.addFile}): the mesh and the jars of the plugin folders. Plugin jars travel under
 * names that keep their folder apart ({@code 0-law.jar}, {@code 1-law.jar}), and each folder gets
 * its own folder again on the executor, so laws load there as they do on this machine.
 *
 * @param mesh the mesh file's name among the shipped files
 * @param plugins per plugin folder, the shipped names of its jars
 */
record ShippedFiles(String mesh, List<List<String>> plugins) implements Serializable {
  private static final long serialVersionUID = 1L;

  ShippedFiles {
    List<List<String>> copy = new ArrayList<>();
    plugins.forEach(p -> copy.add(List.copyOf(p)));
    plugins = List.copyOf(copy);
  }

  /** Ships {@code mesh} and the plugin folders' jars through {@code staging} (a folder of ours). */
  static ShippedFiles ship(SparkContext sc, Path mesh, List<Path> pluginFolders, Path staging)
      throws IOException {
    Files.createDirectories(staging);
    Path meshName = mesh.getFileName();
    String name = "mesh-" + (meshName == null ? "mesh.msh" : meshName.toString());
    Path meshCopy = staging.resolve(name);
    Files.copy(mesh, meshCopy, StandardCopyOption.REPLACE_EXISTING);
    sc.addFile(meshCopy.toString());
    List<List<String>> plugins = new ArrayList<>();
    for (int i = 0; i < pluginFolders.size(); i++) {
      List<String> jars = new ArrayList<>();
      if (Files.isDirectory(pluginFolders.get(i))) {
        try (DirectoryStream<Path> s = Files.newDirectoryStream(pluginFolders.get(i), "*.jar")) {
          for (Path jar : s) {
            String shipped = i + "-" + jar.getFileName();
            Path copy = staging.resolve(shipped);
            Files.copy(jar, copy, StandardCopyOption.REPLACE_EXISTING);
            sc.addFile(copy.toString());
            jars.add(shipped);
          }
        }
      }
      plugins.add(jars);
    }
    return new ShippedFiles(name, plugins);
  }

  /** The mesh on this executor. */
  Path meshHere() {
    return Path.of(SparkFiles.get(mesh));
  }

  /** The plugin folders rebuilt on this executor under {@code root}, one per original folder. */
  List<Path> pluginFoldersHere(Path root) throws IOException {
    List<Path> folders = new ArrayList<>();
    for (int i = 0; i < plugins.size(); i++) {
      Path folder = Files.createDirectories(root.resolve("plugins-" + i));
      for (String shipped : plugins.get(i)) {
        Files.copy(
            Path.of(SparkFiles.get(shipped)),
            folder.resolve(shipped.substring(shipped.indexOf('-') + 1)),
            StandardCopyOption.REPLACE_EXISTING);
      }
      folders.add(folder);
    }
    return folders;
  }
}
