package dev.soakfield.cli;

import dev.soakfield.mesh.AtomicFiles;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.function.Consumer;

/** The bundled demo scenario of our own: a moulded sensor pod around a die, and its variants. */
final class DemoFiles {
  static final String[] FILES = {
    "sensor-pod.msh",
    "sensor-pod.case.json",
    "sensor-pod-humid.case.json",
    "sensor-pod-bake.case.json",
    // a sweep of the humid soak: two soak temperatures, solubility scattered from lot to lot
    "sensor-pod-sweep.json",
    // the steel scenario of hydrogen work (demonstration data): pipe permeation, plate TDS
    "steel-pipe-h2.msh",
    "steel-pipe-h2.case.json",
    "steel-plate.msh",
    "steel-plate-charge.case.json",
    "steel-plate-tds.case.json"
  };

  /** The demo case itself (the others are variants beside it). */
  static final String CASE = FILES[1];

  private DemoFiles() {}

  /**
   * Copies the demo files into {@code folder}; with {@code keepEdited}, a file already there is
   * left as it is (the user may have edited it).
   */
  static Path copyInto(Path folder, boolean keepEdited) throws IOException {
    return copyInto(folder, keepEdited, said -> {});
  }

  /**
   * As above; without {@code keepEdited} a file the user changed is first moved aside to {@code
   * NAME.edited} (or {@code NAME.edited-2}, ...), said through {@code said}, so that the demo runs
   * as shipped and nothing the user wrote is lost.
   */
  static Path copyInto(Path folder, boolean keepEdited, Consumer<String> said) throws IOException {
    Files.createDirectories(folder);
    for (String name : FILES) {
      Path to = folder.resolve(name);
      if (keepEdited && Files.exists(to)) {
        continue;
      }
      byte[] shipped;
      try (InputStream in = DemoFiles.class.getResourceAsStream("/samples/" + name)) {
        if (in == null) {
          throw new IllegalStateException("the demo file " + name + " is missing from the jar");
        }
        shipped = in.readAllBytes();
      }
      if (Files.isRegularFile(to) && !Arrays.equals(Files.readAllBytes(to), shipped)) {
        Path aside = folder.resolve(name + ".edited");
        for (int k = 2; Files.exists(aside); k++) {
          aside = folder.resolve(name + ".edited-" + k);
        }
        Files.move(to, aside);
        said.accept("kept your edited " + to + " as " + aside.getFileName());
      }
      AtomicFiles.write(to, f -> Files.write(f, shipped));
    }
    return folder.resolve(CASE);
  }

  /** Where the window's own copy of the demo lives: under the user's home, never in a checkout. */
  static Path windowCopy() {
    return Path.of(System.getProperty("user.home"), "soakfield", "demo");
  }
}
