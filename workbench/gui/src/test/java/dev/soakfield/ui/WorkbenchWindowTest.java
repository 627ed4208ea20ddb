package dev.soakfield.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.app.FaceGroupPalette;
import dev.soakfield.app.OrbitCamera;
import dev.soakfield.app.SoakedBox;
import dev.soakfield.app.Study;
import dev.soakfield.render.GlAvailable;
import dev.soakfield.render.GlSurface;
import dev.soakfield.render.OffscreenPicture;
import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.lwjgl.glfw.GLFW;

/**
 * The workbench drawn into an off-screen window (OSMesa without a display, hidden X11 window with
 * one), driven by injected mouse events as a user would.
 */
class WorkbenchWindowTest {
  @TempDir Path dir;

  private static void click(Workbench wb, double x, double y) {
    wb.mouseMove(x, y);
    wb.frame();
    wb.mouseButton(GLFW.GLFW_MOUSE_BUTTON_LEFT, true, x, y);
    wb.mouseButton(GLFW.GLFW_MOUSE_BUTTON_LEFT, false, x, y);
    wb.frame();
  }

  @Test
  void clickOnTheTopNamesItsFaceGroupAndTheViewShowsItsColour() throws Exception {
    GlAvailable.orSkip();
    SoakedBox.make(dir);
    Study study = Study.open(dir.resolve("box.msh"));
    GlSurface surface = GlSurface.offscreen(1200, 760);
    try (Workbench wb = new Workbench(surface, study)) {
      wb.camera().look(OrbitCamera.View.ISO);
      wb.frame();
      // the centre of the top face (zmax at z = 4 mm), projected by the view's camera
      double[] px = wb.camera().toPixel(0.005, 0.005, 0.004);
      double x = Workbench.viewLeft() + px[0];
      double y = px[1];
      click(wb, x, y);
      assertEquals(Optional.of("face group zmax, part body"), wb.picked());
      BufferedImage img = wb.read();
      OffscreenPicture.writePng(img, Path.of("target", "workbench.png"));
      // the shaded top: palette colour times 0.55 + 0.45 |n.l| with n = z, l at 30° elevation
      int zmax = study.geometry().faceGroupNames().indexOf("zmax");
      int rgb = FaceGroupPalette.colourOf(zmax);
      double k = 0.55 + 0.45 * Math.sin(Math.toRadians(30));
      int got = img.getRGB((int) x, (int) y);
      for (int shift = 16; shift >= 0; shift -= 8) {
        double want = ((rgb >> shift) & 0xff) * k;
        assertEquals(want, (got >> shift) & 0xff, 3.0, "channel at shift " + shift);
      }
      // a click beside the part names nothing
      click(wb, Workbench.viewLeft() + 5, 5);
      assertTrue(wb.picked().isEmpty());
    } finally {
      surface.close();
    }
  }

  @Test
  void probeOnTheHeldFaceFollowsItsConcentration() throws Exception {
    GlAvailable.orSkip();
    Study study = Study.open(SoakedBox.make(dir));
    GlSurface surface = GlSurface.offscreen(1200, 760);
    try (Workbench wb = new Workbench(surface, study)) {
      wb.camera().look(OrbitCamera.View.XMIN);
      wb.frame();
      double[] px = wb.camera().toPixel(0, 0.0043, 0.0017);
      click(wb, Workbench.viewLeft() + px[0], px[1]);
      assertEquals(Optional.of("face group xmin, part body"), wb.picked());
      double[] curve = wb.probeCurve().orElseThrow();
      assertEquals(3, curve.length); // frames at 0, 600 s and 3600 s
      // the case holds xmin at c = 1 (a Dirichlet value: exact at its nodes)
      assertEquals(1.0, curve[2], 1e-9);
      assertEquals(1.0, curve[1], 1e-9);
      wb.camera().look(OrbitCamera.View.ISO);
      wb.frame();
      OffscreenPicture.writePng(wb.read(), Path.of("target", "workbench-results.png"));
    } finally {
      surface.close();
    }
  }
}
