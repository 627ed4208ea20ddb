package dev.soakfield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import dev.soakfield.app.SoakedBox;
import dev.soakfield.render.GlAvailable;
import dev.soakfield.render.GlRuntime;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class RenderCommandTest {
  @TempDir Path dir;

  @Test
  void rendersAResultFolderToAPngOfTheAskedSize() throws Exception {
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
            "xmin",
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
    dev.soakfield.app.OrbitCamera cam = new dev.soakfield.app.OrbitCamera();
    cam.look(dev.soakfield.app.OrbitCamera.View.ISO);
    cam.viewport(400, 300);
    cam.fit(new double[] {0, 0, 0, 0.01, 0.01, 0.004});
    double[] skin = cam.toPixel(0.0075, 0.0, 0.001); // the ymin skin, now taken away
    double[] cut = cam.toPixel(0.0075, 0.005, 0.002); // the middle of the cut
    int background = dev.soakfield.render.SceneRenderer.BACKGROUND;
    assertEquals(background, img.getRGB((int) skin[0], (int) skin[1]) & 0xffffff);
    // on the cut, the field's colour at x = 7.5 mm: c rises towards the held xmin face, so the
    // cut there is darker than at x = 2.5 mm on the ramp (ColourMap: dark at low values)
    double[] nearHeld = cam.toPixel(0.0025, 0.005, 0.002);
    int far = img.getRGB((int) cut[0], (int) cut[1]) & 0xffffff;
    int near = img.getRGB((int) nearHeld[0], (int) nearHeld[1]) & 0xffffff;
    assertTrue(far != background && near != background);
    assertTrue(
        luma(far) < luma(near), Integer.toHexString(far) + " vs " + Integer.toHexString(near));
  }

  private static double luma(int rgb) {
    return 0.3 * ((rgb >> 16) & 0xff) + 0.59 * ((rgb >> 8) & 0xff) + 0.11 * (rgb & 0xff);
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
    assertTrue(field.err().contains("found 'rh', expected c, phi or first_exceed"), field.err());
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
