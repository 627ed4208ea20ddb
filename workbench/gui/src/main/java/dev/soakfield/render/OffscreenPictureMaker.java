package dev.soakfield.render;

import dev.soakfield.app.OrbitCamera;
import dev.soakfield.app.PictureMaker;
import dev.soakfield.app.Scene;
import java.awt.image.BufferedImage;

/**
 * The picture service of the application jar: one hidden GL context per picture, or one for a whole
 * batch (a context, its shaders and framebuffer cost more than drawing a picture).
 */
public final class OffscreenPictureMaker implements PictureMaker {
  @Override
  public BufferedImage draw(Scene scene, OrbitCamera camera, int width, int height, String unit) {
    try (OffscreenPicture pic = new OffscreenPicture(width, height)) {
      pic.renderer().unit(unit);
      return pic.render(scene, camera);
    }
  }

  @Override
  public Batch batch() {
    return new Batch() {
      private OffscreenPicture pic;

      @Override
      public void prepare(int width, int height) {
        if (pic != null && (pic.width() != width || pic.height() != height)) {
          close();
        }
        if (pic == null) {
          pic = new OffscreenPicture(width, height);
        }
      }

      @Override
      public BufferedImage draw(
          Scene scene, OrbitCamera camera, int width, int height, String unit) {
        prepare(width, height);
        pic.renderer().unit(unit);
        return pic.render(scene, camera);
      }

      @Override
      public void close() {
        if (pic != null) {
          pic.close();
          pic = null;
        }
      }
    };
  }
}
