package dev.soakfield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import dev.soakfield.app.OrbitCamera;
import dev.soakfield.app.SoakedBox;
import dev.soakfield.fem.results.StoredRun;
import dev.soakfield.render.FieldAtPoint;
import dev.soakfield.render.GlAvailable;
import dev.soakfield.render.GlRuntime;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class RenderCommandTest {
  @TempDir Path dir;

  /** The colour limits the command printed: "colour limits LOW .. HIGH". */
  private static double[] limits(String out) {
    Matcher m = Pattern.compile("colour limits (\\S+) \\.\\. (\\S+)").matcher(out);
    assertTrue(m.find(), out);
    return new double[] {Double.parseDouble(m.group(1)), Double.parseDouble(m.group(2))};
  }

  /** The picture's camera, as the command sets it up for the box of {@link SoakedBox}. */
  private static OrbitCamera camera(OrbitCamera.View view, int w, int h) {
    OrbitCamera cam = new OrbitCamera();
    cam.look(view);
    cam.viewport(w, h);
    cam.fit(new double[] {0, 0, 0, 0.01, 0.01, 0.004});
    return cam;
  }

  @Test
  void rendersAResultFolderToAPngThatShowsTheFieldOnTheCut() throws Exception {
    GlAvailable.orSkip();
    Path results = SoakedBox.make(dir);
    Path pic = dir.resolve("pic.png");
    CliRun r =
        CliRun.of(
            "render",
            results.toString(),
            "--time",
            "10min",
            "--field",
            "c",
            "--view",
            "zmax",
            "--section",
            "z:2mm",
            "--iso",
            "0.5",
            "--size",
            "320x240",
            "--out",
            pic.toString());
    assertEquals(0, r.exitCode(), r.err());
    // --time 10min picks the frame at 600 s, the nearest of 0, 600 and 3600 s
    assertTrue(r.out().contains("frame 2 of 3, t = 600.0 s"), r.out());
    BufferedImage img = ImageIO.read(pic.toFile());
    assertEquals(320, img.getWidth());
    assertEquals(240, img.getHeight());
    // seen from above, the cut z = 2 mm faces the viewer square on (unshaded): each pixel on it
    // shows the stored c there through the ramp and the printed limits (±3 of 256 entries). The
    // isosurface c = 0.5 (near x = 1.2 mm) is seen edge on; points away from it are sampled.
    double[] lim = limits(r.out());
    StoredRun run = StoredRun.open(results);
    double[] c = run.field(1, "c");
    OrbitCamera cam = camera(OrbitCamera.View.ZMAX, 320, 240);
    // (the colour bar and its backing cover x > 6 mm at this size)
    for (double x : new double[] {0.0003, 0.0006, 0.002, 0.003, 0.004, 0.005}) {
      double[] px = cam.toPixel(x, 0.005, 0.002);
      double[] seen =
          FieldAtPoint.seenAt(cam, (int) px[0], (int) px[1], new double[] {0, 0, 1}, 0.002);
      double expected = FieldAtPoint.value(run.mesh(), c, seen[0], seen[1], seen[2]);
      int shown = FieldAtPoint.entryOf(img.getRGB((int) px[0], (int) px[1]), 1.0);
      assertEquals(
          FieldAtPoint.rampEntry(expected, lim[0], lim[1]),
          shown,
          3,
          "x = " + x + ", c = " + expected);
    }
  }

  @Test
  void aSectionFromTheDefaultViewTakesAwayTheHalfNearTheViewerSoTheCutShows() throws Exception {
    GlAvailable.orSkip();
    Path results = SoakedBox.make(dir);
    Path pic = dir.resolve("cut.png");
    CliRun r =
        CliRun.of(
            "render",
            results.toString(),
            "--section",
            "y:5mm",
            "--size",
            "400x300",
            "--out",
            pic.toString());
    assertEquals(0, r.exitCode(), r.err());
    BufferedImage img = ImageIO.read(pic.toFile());
    // the default (iso) view looks from -y: the half y < 5 mm must go, showing the cut at y = 5 mm
    OrbitCamera cam = camera(OrbitCamera.View.ISO, 400, 300);
    double[] skin = cam.toPixel(0.0075, 0.0, 0.001); // the ymin skin, now taken away
    int background = dev.soakfield.render.SceneRenderer.BACKGROUND;
    assertEquals(background, img.getRGB((int) skin[0], (int) skin[1]) & 0xffffff);
    // on the cut, the stored c of the last frame through the ramp, darkened by the renderer's
    // shading of a face at an angle: k = 0.55 + 0.45·|n·l|, n the cut's normal (0, 1, 0), l the
    // direction towards the eye (SceneRenderer's surface shader)
    double k = 0.55 + 0.45 * Math.abs(cam.towardsEye().y);
    double[] lim = limits(r.out());
    StoredRun run = StoredRun.open(results);
    double[] c = run.field(run.frameCount() - 1, "c");
    for (double x : new double[] {0.0015, 0.0025, 0.005, 0.0075}) {
      double[] px = cam.toPixel(x, 0.005, 0.002);
      double[] seen =
          FieldAtPoint.seenAt(cam, (int) px[0], (int) px[1], new double[] {0, 1, 0}, 0.005);
      double expected = FieldAtPoint.value(run.mesh(), c, seen[0], seen[1], seen[2]);
      int rgb = img.getRGB((int) px[0], (int) px[1]) & 0xffffff;
      assertTrue(rgb != background, "x = " + x);
      assertEquals(
          FieldAtPoint.rampEntry(expected, lim[0], lim[1]),
          FieldAtPoint.entryOf(rgb, k),
          4,
          "x = " + x + ", c = " + expected + ", shading " + k);
    }
  }

  @Test
  void badOptionsAreNamedAndNothingIsWritten() throws Exception {
    GlAvailable.orSkip();
    Path results = SoakedBox.make(dir);
    Path pic = dir.resolve("never.png");
    CliRun view =
        CliRun.of("render", results.toString(), "--view", "front", "--out", pic.toString());
    assertEquals(2, view.exitCode());
    assertTrue(view.err().contains("--view: view: found 'front', expected iso, xmin"), view.err());
    CliRun nan = CliRun.of("render", results.toString(), "--iso", "NaN", "--out", pic.toString());
    assertEquals(2, nan.exitCode());
    assertTrue(nan.err().contains("--iso: found NaN, expected finite levels"), nan.err());
    assertTrue(!nan.err().contains("\tat "), nan.err());
    CliRun section =
        CliRun.of("render", results.toString(), "--section", "w:1", "--out", pic.toString());
    assertEquals(2, section.exitCode());
    assertTrue(section.err().contains("--section"), section.err());
    CliRun field =
        CliRun.of("render", results.toString(), "--field", "rh", "--out", pic.toString());
    assertEquals(2, field.exitCode());
    assertTrue(
        field
            .err()
            .contains(
                "found 'rh', expected c, phi, first_exceed, error_indicator or trapped:<part>:<name>"),
        field.err());
    CliRun folder = CliRun.of("render", dir.toString(), "--out", pic.toString());
    assertEquals(2, folder.exitCode());
    assertTrue(folder.err().contains("a folder without fields.pvd"), folder.err());
    assertFalse(Files.exists(pic));
  }

  @Test
  void guiWithoutADisplaySaysHowToWorkHeadless() {
    GlAvailable.orSkip();
    if (GlRuntime.whyNoWindow().isEmpty()) {
      System.err.println("gui headless message not checked: a display answers here");
    }
    assumeTrue(GlRuntime.whyNoWindow().isPresent(), "a display answers here");
    CliRun r = CliRun.of("gui", dir.toString());
    assertEquals(2, r.exitCode());
    assertTrue(r.err().contains("no display"), r.err());
    assertTrue(r.err().contains("soakfield render RESULTS_DIR"), r.err());
  }
}
