package dev.soakfield.render;

import dev.soakfield.app.OrbitCamera;
import dev.soakfield.app.PictureMaker;
import dev.soakfield.app.Scene;
import java.awt.image.BufferedImage;

/** The picture service of the application jar: one hidden GL context per picture. */
public final class OffscreenPictureMaker implements PictureMaker {
  @Override
  public BufferedImage draw(Scene scene, OrbitCamera camera, int width, int height, String unit) {
    try (OffscreenPicture pic = new OffscreenPicture(width, height)) {
      pic.renderer().unit(unit);
      return pic.render(scene, camera);
    }
  }
}
