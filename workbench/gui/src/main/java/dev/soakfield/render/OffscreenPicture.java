package dev.soakfield.render;

import dev.soakfield.app.OrbitCamera;
import dev.soakfield.app.PngFile;
import dev.soakfield.app.Scene;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;

/** Renders scenes to pictures with no window: the engine of {@code soakfield render}. */
public final class OffscreenPicture implements AutoCloseable {
  private final GlSurface surface;
  private final SceneRenderer renderer;

  /** A hidden context of the given size (X11 when a display answers, else OSMesa). */
  public OffscreenPicture(int width, int height) {
    surface = GlSurface.offscreen(width, height);
    surface.bind();
    renderer = new SceneRenderer();
  }

  public int width() {
    return surface.width();
  }

  public int height() {
    return surface.height();
  }

  public SceneRenderer renderer() {
    return renderer;
  }

  /** Draws the scene and reads it back. */
  public BufferedImage render(Scene scene, OrbitCamera camera) {
    surface.bind();
    camera.viewport(surface.width(), surface.height());
    renderer.draw(scene, camera);
    org.lwjgl.opengl.GL33C.glFinish();
    return surface.read();
  }

  /** Writes a picture as PNG, replacing the file only when the new one is complete. */
  public static void writePng(BufferedImage img, Path file) throws IOException {
    PngFile.write(img, file);
  }

  @Override
  public void close() {
    surface.bind();
    renderer.close();
    surface.close();
  }
}
