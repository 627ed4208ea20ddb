package dev.soakfield.app;

import java.awt.image.BufferedImage;

/**
 * Draws a scene to a picture with no window (off screen, or with software OpenGL where there is no
 * display). The gui module provides it (found by {@link GraphicsServices}).
 */
public interface PictureMaker {
  /**
   * The scene as {@code camera} sees it, {@code width} by {@code height} pixels, with the colour
   * bar labelled in {@code unit}.
   */
  BufferedImage draw(Scene scene, OrbitCamera camera, int width, int height, String unit);

  /**
   * A maker for several pictures in a row on this thread that sets up once (for OpenGL: one hidden
   * context, its shaders compiled once) instead of for each picture; close it when done. By default
   * it draws each picture as {@link #draw} does.
   */
  default Batch batch() {
    PictureMaker each = this;
    return new Batch() {
      @Override
      public BufferedImage draw(
          Scene scene, OrbitCamera camera, int width, int height, String unit) {
        return each.draw(scene, camera, width, height, unit);
      }

      @Override
      public void close() {}
    };
  }

  /** Pictures drawn with one set-up; used by one thread, closed when done. */
  interface Batch extends PictureMaker, AutoCloseable {
    /** Sets up for pictures of this size now, so that the first picture need not wait for it. */
    default void prepare(int width, int height) {}

    @Override
    void close();
  }
}
