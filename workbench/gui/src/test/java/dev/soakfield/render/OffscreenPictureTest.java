package dev.soakfield.render;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.app.ColourMap;
import dev.soakfield.app.FieldKind;
import dev.soakfield.app.OrbitCamera;
import dev.soakfield.app.Scene;
import dev.soakfield.app.SoakedBox;
import dev.soakfield.app.Study;
import dev.soakfield.app.ViewSettings;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Pictures drawn off screen, checked by their pixels. */
class OffscreenPictureTest {
  private static final int W = 480;
  private static final int H = 360;
  @TempDir static Path dir;
  private static Study study;

  @BeforeAll
  static void run() throws Exception {
    GlAvailable.orSkip();
    study = Study.open(SoakedBox.make(dir));
  }

  /** Position (0..255) of the pixel's colour in the ramp: the entry nearest in RGB. */
  private static int rampIndex(int rgb) {
    ColourMap map = ColourMap.ramp();
    int best = 0;
    int bestD = Integer.MAX_VALUE;
    for (int i = 0; i < ColourMap.SIZE; i++) {
      int dr = map.channel(i, 0) - ((rgb >> 16) & 0xff);
      int dg = map.channel(i, 1) - ((rgb >> 8) & 0xff);
      int db = map.channel(i, 2) - (rgb & 0xff);
      int d = dr * dr + dg * dg + db * db;
      if (d < bestD) {
        bestD = d;
        best = i;
      }
    }
    return best;
  }

  private static BufferedImage picture(ViewSettings s, OrbitCamera.View view) {
    OrbitCamera cam = new OrbitCamera();
    cam.viewport(W, H);
    cam.look(view);
    cam.fit(study.geometry().bounds());
    try (OffscreenPicture pic = new OffscreenPicture(W, H)) {
      return pic.render(new Scene(study, s), cam);
    }
  }

  @Test
  void exposedSideMapsHotterThanSealedSide() throws Exception {
    ViewSettings s = new ViewSettings();
    s.field(Optional.of(FieldKind.CONCENTRATION));
    s.frame(1);
    BufferedImage exposed = picture(s, OrbitCamera.View.XMIN);
    BufferedImage sealed = picture(s, OrbitCamera.View.XMAX);
    OffscreenPicture.writePng(exposed, Path.of("target", "view-xmin.png"));
    // a face seen square on is drawn unshaded, so its pixels are ramp colours
    int hot = rampIndex(exposed.getRGB(W / 2, H / 2));
    int cold = rampIndex(sealed.getRGB(W / 2, H / 2));
    // xmin is held at c = 1, the top of the automatic range: the ramp's top end
    assertTrue(hot > 240, "exposed face at ramp entry " + hot);
    // after 10 min (sqrt(D t) = 1.2 mm of the 10 mm length) the far face is still near 0
    assertTrue(cold < 60, "sealed face at ramp entry " + cold);
  }

  @Test
  void colourBarRunsFromTheHighEndAtTheTopToTheLowEndAtTheBottom() {
    ViewSettings s = new ViewSettings();
    s.frame(1);
    BufferedImage img = picture(s, OrbitCamera.View.ISO);
    int[] bar = Overlay.barBox(W, H);
    int x = (bar[0] + bar[2]) / 2;
    int top = rampIndex(img.getRGB(x, bar[1] + 2));
    int mid = rampIndex(img.getRGB(x, (bar[1] + bar[3]) / 2));
    int bottom = rampIndex(img.getRGB(x, bar[3] - 2));
    assertTrue(top > 245, "top of the bar at ramp entry " + top);
    assertTrue(Math.abs(mid - 128) < 12, "middle of the bar at ramp entry " + mid);
    assertTrue(bottom < 10, "bottom of the bar at ramp entry " + bottom);
    // labels: dark ink pixels to the right of the bar
    int ink = 0;
    for (int y = bar[1] - 10; y < bar[3] + 10; y++) {
      for (int xx = bar[2] + 8; xx < Math.min(W, bar[2] + 60); xx++) {
        if ((img.getRGB(xx, y) & 0xff) < 80) {
          ink++;
        }
      }
    }
    assertTrue(ink > 50, "tick labels drawn: " + ink + " ink pixels");
  }

  @Test
  void sectionShowsTheFieldInsideAndIsosurfaceSitsAtItsLevel() throws Exception {
    ViewSettings s = new ViewSettings();
    s.frame(1);
    s.section(Optional.of(new ViewSettings.Plane(0, 0, 1, 0.002)));
    s.isoLevels(List.of(0.5));
    Scene scene = new Scene(study, s);
    // the isosurface of c = 0.5 carries 0.5 at every corner (marching tetrahedra)
    assertTrue(scene.isoMeshes().get(0).triangleCount() > 0);
    // the section z = 2 mm spans the whole 10 x 10 mm box: seen from above, the left edge is hot
    // and the right edge cold
    OrbitCamera cam = new OrbitCamera();
    cam.viewport(W, H);
    cam.look(OrbitCamera.View.ZMAX);
    cam.fit(study.geometry().bounds());
    s.isoLevels(List.of());
    BufferedImage img;
    try (OffscreenPicture pic = new OffscreenPicture(W, H)) {
      img = pic.render(new Scene(study, s), cam);
    }
    OffscreenPicture.writePng(img, Path.of("target", "view-section.png"));
    double[] left = cam.toPixel(0.0003, 0.005, 0.002);
    double[] right = cam.toPixel(0.0097, 0.005, 0.002);
    int hot = rampIndex(img.getRGB((int) left[0], (int) left[1]));
    int cold = rampIndex(img.getRGB((int) right[0], (int) right[1]));
    assertTrue(hot > 200 && cold < 60, "section left " + hot + ", right " + cold);
    assertTrue(Files.size(Path.of("target", "view-section.png")) > 1000);
    assertEquals(W, img.getWidth());
  }
}
