package dev.soakfield.ui;

import dev.soakfield.app.OrbitCamera;
import dev.soakfield.render.GlSurface;

/**
 * Where the 3D view sits in the window: between the Show and Uptake panels, above the Time strip.
 */
final class ViewLayout {
  static final int LEFT = 270;
  static final int RIGHT = 400;
  static final int BOTTOM = 118;

  private int width = 1;
  private int height = 1;

  /** Fits the view to the window's size now and tells the camera. */
  void update(GlSurface surface, OrbitCamera camera) {
    surface.bind();
    width = Math.max(64, surface.width() - LEFT - RIGHT);
    height = Math.max(64, surface.height() - BOTTOM);
    camera.viewport(width, height);
  }

  int width() {
    return width;
  }

  int height() {
    return height;
  }

  /** Whether window pixel (x, y) is on the view. */
  boolean contains(double x, double y) {
    return x >= LEFT && x < LEFT + width && y >= 0 && y < height;
  }
}
