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
}
