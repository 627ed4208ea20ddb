package dev.soakfield.app;

import dev.soakfield.mesh.AtomicFiles;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import javax.imageio.ImageIO;

/** Writes pictures as PNG, whole or not at all. */
public final class PngFile {
  private PngFile() {}

  public static void write(BufferedImage img, Path file) throws IOException {
    AtomicFiles.write(
        file,
        tmp -> {
          if (!ImageIO.write(img, "png", tmp.toFile())) {
            throw new IOException("no PNG writer in this Java runtime");
          }
        });
  }
}
