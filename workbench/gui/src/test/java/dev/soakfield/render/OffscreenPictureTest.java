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
import dev.soakfield.mesh.TetMesh;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Pictures drawn off screen, checked pixel by pixel against the field they show: the stored frame
 * interpolated at the point a pixel looks at ({@link FieldAtPoint}), through the colour ramp and
 * the picture's colour limits. A face seen square on is drawn unshaded, so its pixels are ramp
 * colours; the ramp has 256 entries and the texture is read between them, so ±3 entries are
 * allowed.
 */
class OffscreenPictureTest {
  private static final int W = 480;
  private static final int H = 360;
  private static final int ENTRIES = 3;
  private static final double[] X = {1, 0, 0};
  private static final double[] Z = {0, 0, 1};
  @TempDir static Path dir;
  private static Study study;

  @BeforeAll
  static void run() throws Exception {
    GlAvailable.orSkip();
    study = Study.open(SoakedBox.make(dir));
  }

  private static OrbitCamera camera(OrbitCamera.View view) {
    OrbitCamera cam = new OrbitCamera();
    cam.viewport(W, H);
    cam.look(view);
    cam.fit(study.geometry().bounds());
    return cam;
  }

  private static BufferedImage picture(Scene scene, OrbitCamera cam) {
    try (OffscreenPicture pic = new OffscreenPicture(W, H)) {
      return pic.render(scene, cam);
    }
  }

  /** c of frame 1 (600 s) at a point. */
  private static double cAt(double x, double y, double z) {
    TetMesh mesh = study.mesh();
    double[] c = study.results().orElseThrow().field(1, "c");
    return FieldAtPoint.value(mesh, c, x, y, z);
  }

  /**
   * Asserts the pixel showing (x, y, z), a point of the plane n·p = offset facing the camera, has
   * the ramp entry of the field at the point its centre shows.
   */
  private static void assertShows(
      BufferedImage img,
      OrbitCamera cam,
      Scene scene,
      double[] n,
      double offset,
      double x,
      double y,
      double z) {
    double[] px = cam.toPixel(x, y, z);
    int i = (int) px[0];
    int j = (int) px[1];
    int shown = FieldAtPoint.entryOf(img.getRGB(i, j), 1.0);
    double[] p = FieldAtPoint.seenAt(cam, i, j, n, offset);
    double c = cAt(p[0], p[1], p[2]);
    int expected = FieldAtPoint.rampEntry(c, scene.low(), scene.high());
    assertEquals(
        expected,
        shown,
        ENTRIES,
        "pixel at ("
            + x
            + ", "
            + y
            + ", "
            + z
            + "), c = "
            + c
            + " in "
            + scene.low()
            + ".."
            + scene.high());
  }

  @Test
  void heldAndSealedFacesShowTheirConcentrationsThroughTheRamp() throws Exception {
    ViewSettings s = new ViewSettings();
    s.field(Optional.of(FieldKind.CONCENTRATION));
    s.frame(1);
    Scene scene = new Scene(study, s);
    OrbitCamera front = camera(OrbitCamera.View.XMIN);
    BufferedImage exposed = picture(scene, front);
    OffscreenPicture.writePng(exposed, Path.of("target", "view-xmin.png"));
    // the automatic limits are the frame's extremes: 1 on the held face, the far face's least
    double[] c = study.results().orElseThrow().field(1, "c");
    double lo = Double.POSITIVE_INFINITY;
    double hi = Double.NEGATIVE_INFINITY;
    for (double v : c) {
      lo = Math.min(lo, v);
      hi = Math.max(hi, v);
    }
    assertEquals(lo, scene.low(), 1e-12);
    assertEquals(hi, scene.high(), 1e-12);
    for (double[] p : new double[][] {{0.002, 0.001}, {0.005, 0.002}, {0.008, 0.003}}) {
      assertShows(exposed, front, scene, X, 0, 0, p[0], p[1]);
    }
    OrbitCamera back = camera(OrbitCamera.View.XMAX);
    BufferedImage sealed = picture(scene, back);
    for (double[] p : new double[][] {{0.002, 0.001}, {0.005, 0.002}, {0.008, 0.003}}) {
      assertShows(sealed, back, scene, X, 0.01, 0.01, p[0], p[1]);
    }
    // negative control: the far face's pixels are far from the held face's colour, so a picture
    // showing the wrong field (or none) would fail the checks above
    double[] far = back.toPixel(0.01, 0.005, 0.002);
    int farEntry = FieldAtPoint.entryOf(sealed.getRGB((int) far[0], (int) far[1]), 1.0);
    assertTrue(farEntry < ColourMap.SIZE - 1 - 20 * ENTRIES, "far face at entry " + farEntry);
    // the top face, seen from above, runs through the whole ramp from the held edge
    OrbitCamera top = camera(OrbitCamera.View.ZMAX);
    BufferedImage above = picture(scene, top);
    for (double x : new double[] {0.0003, 0.001, 0.002, 0.003, 0.005, 0.0095}) {
      assertShows(above, top, scene, Z, 0.004, x, 0.005, 0.004);
    }
  }

  @Test
  void colourBarRunsFromTheHighEndAtTheTopToTheLowEndAtTheBottom() {
    ViewSettings s = new ViewSettings();
    s.frame(1);
    Scene scene = new Scene(study, s);
    BufferedImage img = picture(scene, camera(OrbitCamera.View.ISO));
    int[] bar = Overlay.barBox(W, H);
    int x = (bar[0] + bar[2]) / 2;
    // the bar's height maps linearly onto the limits: the fraction f from the top shows the
    // value high − f·(high − low), whose ramp entry is (1 − f)·255
    for (double f : new double[] {0.02, 0.25, 0.5, 0.75, 0.98}) {
      int y = (int) Math.round(bar[1] + f * (bar[3] - bar[1]));
      double fraction = (y - bar[1]) / (double) (bar[3] - bar[1]);
      int expected = FieldAtPoint.rampEntry(1 - fraction, 0, 1);
      int shown = FieldAtPoint.entryOf(img.getRGB(x, y), 1.0);
      assertEquals(expected, shown, ENTRIES, "bar at " + f + " of its height");
    }
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
    Scene withIso = new Scene(study, s);
    // every corner of the isosurface of c = 0.5 carries 0.5 (marching tetrahedra on the linear
    // field: the field interpolated at each corner, independently of the extraction)
    Scene.Mesh iso = withIso.isoMeshes().get(0);
    assertTrue(iso.triangleCount() > 0);
    for (int i = 0; i < iso.positions.length; i += 3) {
      double c = cAt(iso.positions[i], iso.positions[i + 1], iso.positions[i + 2]);
      assertEquals(0.5, c, 1e-5, "isosurface corner " + i / 3); // corners are stored as floats
    }
    // the section z = 2 mm, seen from above, shows c inside the box along x
    s.isoLevels(List.of());
    Scene scene = new Scene(study, s);
    OrbitCamera cam = camera(OrbitCamera.View.ZMAX);
    BufferedImage img = picture(scene, cam);
    OffscreenPicture.writePng(img, Path.of("target", "view-section.png"));
    for (double x : new double[] {0.0003, 0.001, 0.0015, 0.0025, 0.004, 0.0097}) {
      assertShows(img, cam, scene, Z, 0.002, x, 0.005, 0.002);
    }
    assertTrue(Files.size(Path.of("target", "view-section.png")) > 1000);
    assertEquals(W, img.getWidth());
  }
}
