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
    Scene scene = new Scene(study, settings);
    write(maker, study, scene, view, width, height, unit, png);
    return scene;
  }

  /**
   * Draws a scene already built, brought up to date with its settings first: several pictures of
   * one study (frames, sections) share its boundary surface and pick index, which on a large mesh
   * cost more than drawing.
   */
  public static void write(
      PictureMaker maker,
      Study study,
      Scene scene,
      OrbitCamera.View view,
      int width,
      int height,
      String unit,
      Path png)
      throws IOException {
    scene.update();
    OrbitCamera camera = new OrbitCamera();
    camera.look(view);
    camera.viewport(width, height);
    camera.fit(study.geometry().bounds());
    PngFile.write(maker.draw(scene, camera, width, height, unit), png);
  }
}
