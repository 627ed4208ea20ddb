package dev.soakfield.app;

import java.io.IOException;
import java.nio.file.Path;

/**
 * One picture of a study as {@code soakfield render} and the run report draw it: the whole part
 * seen from a side, filling a picture of the given size, written as PNG.
 */
public final class ViewPicture {
  private ViewPicture() {}

  /** Draws {@code study} with {@code settings} from {@code view} and returns the scene drawn. */
  public static Scene write(
      PictureMaker maker,
      Study study,
      ViewSettings settings,
      OrbitCamera.View view,
      int width,
      int height,
      String unit,
      Path png)
      throws IOException {
    OrbitCamera camera = new OrbitCamera();
    camera.look(view);
    camera.viewport(width, height);
    camera.fit(study.geometry().bounds());
    Scene scene = new Scene(study, settings);
    PngFile.write(maker.draw(scene, camera, width, height, unit), png);
    return scene;
  }
}
