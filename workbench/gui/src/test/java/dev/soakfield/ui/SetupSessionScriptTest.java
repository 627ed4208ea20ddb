package dev.soakfield.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.app.OrbitCamera;
import dev.soakfield.app.setup.KindColours;
import dev.soakfield.app.setup.RecentFiles;
import dev.soakfield.app.setup.RunJob;
import dev.soakfield.app.setup.SetupSession;
import dev.soakfield.cli.SoakfieldCli;
import dev.soakfield.fem.casefile.CaseReader;
import dev.soakfield.fem.casefile.CaseSpec;
import dev.soakfield.fem.laws.SourceLawCatalog;
import dev.soakfield.fem.physics.FaceKind;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import dev.soakfield.render.GlAvailable;
import dev.soakfield.render.GlSurface;
import dev.soakfield.render.OffscreenPicture;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.lwjgl.glfw.GLFW;
import org.lwjgl.nuklear.Nuklear;
import picocli.CommandLine;

/**
 * A whole set-up done in the window by a script, as a user would with mouse and keys, under Xvfb
 * (or OSMesa): open a bare mesh, pick face groups in the view, give one a kind and a value, give
 * the part a material, run with Ctrl+R, move the time slider, save with Ctrl+S; then the command
 * line's run of the saved case must give the same series, value for value.
 */
class SetupSessionScriptTest {
  private static final Path SHOTS = Path.of("target", "screenshots");

  @TempDir Path dir;

  /** One frame of input, as the window's loop gives it: events between begin and end. */
  private static void events(Workbench wb, Runnable events) {
    Nuklear.nk_input_begin(wb.context());
    events.run();
    Nuklear.nk_input_end(wb.context());
    wb.frame();
  }

  private static void click(Workbench wb, double x, double y, boolean shift) {
    events(wb, () -> wb.mouseMove(x, y));
    events(wb, () -> wb.mouseButton(GLFW.GLFW_MOUSE_BUTTON_LEFT, true, x, y, shift));
    events(wb, () -> wb.mouseButton(GLFW.GLFW_MOUSE_BUTTON_LEFT, false, x, y, shift));
    events(wb, () -> {}); // the frame after: what the click changed is drawn
  }

  /** Clicks the middle of a named button or field, where the last frame drew it. */
  private static void press(Workbench wb, String name) {
    float[] r = wb.widget(name).orElseThrow(() -> new AssertionError("no widget " + name));
    click(wb, r[0] + r[2] / 2, r[1] + r[3] / 2, false);
  }

  private static void key(Workbench wb, int nkKey) {
    events(wb, () -> Nuklear.nk_input_key(wb.context(), nkKey, true));
    events(wb, () -> Nuklear.nk_input_key(wb.context(), nkKey, false));
  }

  /** Clicks a field, deletes what it holds, types the text and presses Enter. */
  private static void type(Workbench wb, String field, String text) {
    press(wb, field);
    key(wb, Nuklear.NK_KEY_TEXT_END);
    for (int i = 0; i < 30; i++) {
      key(wb, Nuklear.NK_KEY_BACKSPACE);
    }
    for (int i = 0; i < text.length(); i++) { // Nuklear takes a few characters a frame
      String c = text.substring(i, i + 1);
      events(wb, () -> wb.type(c));
    }
    key(wb, Nuklear.NK_KEY_ENTER);
  }

  private static void shot(Workbench wb, String name) throws Exception {
    wb.frame();
    OffscreenPicture.writePng(wb.read(), SHOTS.resolve(name + ".png"));
  }

  private static int rgbAt(BufferedImage img, double x, double y) {
    return img.getRGB((int) x, (int) y) & 0xffffff;
  }

  @Test
  void aBareMeshIsSetUpRunAndSavedInTheWindowAndTheCommandLineAgrees() throws Exception {
    GlAvailable.orSkip();
    Path mesh = dir.resolve("pod.msh");
    // a 10 × 10 × 4 mm box: face groups xmin … zmax, volume group body (StructuredMesher)
    MshWriter.write(mesh, StructuredMesher.box(0.01, 0.01, 0.004, 4, 4, 2, 1), false);
    SetupSession session = SetupSession.open(mesh, SourceLawCatalog.classPathOnly());
    GlSurface surface = GlSurface.offscreen(1400, 860);
    try (Workbench wb = new Workbench(surface, session)) {
      wb.actions().use(FileDialogs.DESKTOP, new RecentFiles(dir.resolve("recent.txt")));
      wb.camera().look(OrbitCamera.View.ISO);
      wb.frame();
      shot(wb, "faces-tab-new-mesh");
      // a new case: every exterior group has no entry and shows the no-entry colour in the view
      double[] top = wb.camera().toPixel(0.005, 0.005, 0.004);
      double[] side = wb.camera().toPixel(0.005, 0.0, 0.002); // ymin, seen from the iso view
      double tx = Workbench.viewLeft() + top[0];
      double sx = Workbench.viewLeft() + side[0];
      assertTrue(isShadeOf(rgbAt(wb.read(), tx, top[1]), KindColours.NO_ENTRY));

      // pick the top face group, then add the ymin side with Shift: both selected, list in step
      click(wb, tx, top[1], false);
      click(wb, sx, side[1], true);
      assertEquals(List.of("zmax", "ymin"), session.selection().groups());
      assertTrue(isShadeOf(rgbAt(wb.read(), tx, top[1]), KindColours.SELECTED));
      // a plain click on the top alone selects just it again
      click(wb, tx, top[1], false);
      assertEquals(List.of("zmax"), session.selection().groups());
      // the list is in step, and a check box that is on looks on: lit mark in the box's middle
      BufferedImage list = wb.read();
      assertEquals(
          NuklearBackend.TOGGLE_ON, boxMiddle(list, wb.widget("group zmax").orElseThrow()));
      assertEquals(
          NuklearBackend.TOGGLE_OFF, boxMiddle(list, wb.widget("group xmin").orElseThrow()));

      // make it a concentration face holding 2.5; ymin keeps no entry (sealed by default)
      press(wb, "concentration");
      type(wb, "value", "2.5");
      assertEquals(
          "concentration",
          session.draft().get().tree().path("faces").path("zmax").path("kind").asText());
      assertEquals(
          2.5, session.draft().get().tree().path("faces").path("zmax").path("value").asDouble());
      assertFalse(session.draft().get().tree().path("faces").has("ymin"));
      click(wb, Workbench.viewLeft() + 5, 5, false); // clear the selection to see kinds
      assertTrue(isShadeOf(rgbAt(wb.read(), tx, top[1]), KindColours.of(FaceKind.CONCENTRATION)));
      assertTrue(isShadeOf(rgbAt(wb.read(), sx, side[1]), KindColours.NO_ENTRY));

      // Run is off until the part has a material, and says why
      assertTrue(session.whyNoRun().orElseThrow().contains("materials"));
      assertTrue(wb.widget("why no run").isPresent());
      press(wb, "tab Parts");
      shot(wb, "parts-tab-no-material");
      press(wb, "give body a material");
      assertTrue(session.draft().get().tree().path("materials").has("body"));
      type(wb, "diffusivity", "2e-10");
      shot(wb, "parts-tab");
      press(wb, "tab Time");
      type(wb, "time.end", "2 h");
      type(wb, "time.outputs", "30 min, 1 h, 2 h");
      shot(wb, "time-tab");
      press(wb, "tab Exposure");
      press(wb, "add segment");
      press(wb, "add segment");
      type(wb, "exposure[1] temperature", "20 degC -> 60 degC");
      assertEquals(
          "[\"20 degC\",\"60 degC\"]",
          session.draft().get().tree().path("exposure").path(1).path("temperature").toString());
      shot(wb, "exposure-tab");
      press(wb, "tab Probes");
      double[] centre = wb.camera().toPixel(0.005, 0.005, 0.004);
      click(wb, Workbench.viewLeft() + centre[0], centre[1], false);
      assertEquals(
          List.of("probe-1"),
          new dev.soakfield.app.setup.ProbeEdits(session.draft().get()).names());
      shot(wb, "probes-tab");
      assertTrue(session.whyNoRun().isEmpty(), session.whyNoRun().toString());

      // Ctrl+R: saves the case beside the mesh and runs into pod-results
      assertTrue(wb.key(GLFW.GLFW_KEY_R, GLFW.GLFW_MOD_CONTROL));
      RunJob job = session.job().orElseThrow();
      for (int i = 0; i < 600 && job.status() == RunJob.Status.RUNNING; i++) {
        wb.frame(); // the window stays responsive while the worker runs
        Thread.sleep(20);
      }
      job.join();
      assertEquals(RunJob.Status.FINISHED, job.status(), job.message());
      wb.frame();
      shot(wb, "uptake-tab-after-run");
      assertEquals(dir.resolve("pod-results"), job.folder());
      assertTrue(wb.model().study().results().isPresent());
      int frames = wb.model().study().results().get().frameCount();
      assertEquals(4, frames); // t = 0 and the three outputs
      assertEquals(frames - 1, wb.settings().frame());

      // move the time slider to its start: the view shows the first frame (c = 0 inside)
      BufferedImage last = wb.read();
      press(wb, "tab Uptake");
      float[] slider = wb.widget("time slider").orElseThrow();
      double sy = slider[1] + slider[3] / 2;
      double right = slider[0] + slider[2] - 6; // the slider's knob, at the last frame
      events(wb, () -> wb.mouseMove(right, sy));
      events(wb, () -> wb.mouseButton(GLFW.GLFW_MOUSE_BUTTON_LEFT, true, right, sy, false));
      for (double x = right; x > slider[0]; x -= 40) {
        double at = x;
        events(wb, () -> wb.mouseMove(at, sy));
      }
      events(wb, () -> wb.mouseMove(slider[0] + 1, sy));
      events(
          wb, () -> wb.mouseButton(GLFW.GLFW_MOUSE_BUTTON_LEFT, false, slider[0] + 1, sy, false));
      assertEquals(0, wb.settings().frame());
      // mid-height on the ymin side: c = 0 at the start, well above it after 2 h
      assertNotEquals(rgbAt(last, sx, side[1]), rgbAt(wb.read(), sx, side[1]));
      shot(wb, "time-slider-at-start");

      // Ctrl+S saves; the saved file is the case that ran
      assertTrue(wb.key(GLFW.GLFW_KEY_S, GLFW.GLFW_MOD_CONTROL));
      Path saved = dir.resolve("pod.case.json");
      assertFalse(session.draft().get().unsaved());
      CaseSpec spec = CaseReader.read(saved);
      assertEquals(mesh.toAbsolutePath(), spec.mesh());
      wb.toggleHelp();
      shot(wb, "keys-help");
    } finally {
      surface.close();
    }
    // the command line runs the saved case unchanged and gets the same series, value for value
    Path cliOut = dir.resolve("cli-run");
    int exit =
        new CommandLine(new SoakfieldCli())
            .execute(
                "run",
                dir.resolve("pod.case.json").toString(),
                "--out",
                cliOut.toString(),
                "--quiet");
    assertEquals(0, exit);
    List<String> window = Files.readAllLines(dir.resolve("pod-results/series.csv"));
    List<String> cli = Files.readAllLines(cliOut.resolve("series.csv"));
    assertEquals(window, cli);
    assertTrue(window.size() > 2);
  }

  /** The colour in the middle of a check box, drawn square at the left of its row. */
  private static int boxMiddle(BufferedImage img, float[] row) {
    double side = Math.min(row[3], 16);
    return rgbAt(img, row[0] + 2 + side / 2, row[1] + row[3] / 2);
  }

  /** Whether a shaded pixel is the colour times a light factor in [0.5, 1] (flat shading). */
  private static boolean isShadeOf(int got, int colour) {
    double k = -1;
    for (int shift = 16; shift >= 0; shift -= 8) {
      double c = (colour >> shift) & 0xff;
      double g = (got >> shift) & 0xff;
      if (c < 40) {
        continue;
      }
      double f = g / c;
      if (k < 0) {
        k = f;
      } else if (Math.abs(f - k) > 0.08) {
        return false;
      }
    }
    return k >= 0.5 && k <= 1.02;
  }

  @Test
  void aFaceLawIsChosenFromTheCatalogAndItsParametersTypedInTheFacesTab() throws Exception {
    GlAvailable.orSkip();
    Path mesh = dir.resolve("plate.msh");
    MshWriter.write(mesh, StructuredMesher.box(0.01, 0.01, 0.002, 2, 2, 1, 1), false);
    SetupSession session = SetupSession.open(mesh, SourceLawCatalog.classPathOnly());
    GlSurface surface = GlSurface.offscreen(1400, 860);
    try (Workbench wb = new Workbench(surface, session)) {
      session.selection().click("zmin");
      wb.frame();
      press(wb, "law");
      assertTrue(wb.widget("face law cathodic-charging").isPresent(), "the catalog's face laws");
      press(wb, "face law cathodic-charging");
      type(wb, "face law current-density", "5");
      var zmin = session.draft().get().tree().path("faces").path("zmin");
      assertEquals("law", zmin.path("kind").asText());
      assertEquals("cathodic-charging", zmin.path("law").asText());
      assertEquals(5.0, zmin.path("current-density").asDouble());
      assertEquals(1.0, zmin.path("efficiency").asDouble()); // the optional default
      shot(wb, "faces-tab-face-law");
    }
  }

  @Test
  void aHandWrittenCaseOpensShowsItsValuesAndAsksBeforeItsCommentsGo() throws Exception {
    GlAvailable.orSkip();
    MshWriter.write(
        dir.resolve("pod.msh"), StructuredMesher.box(0.01, 0.01, 0.004, 2, 2, 1, 1), false);
    Path hand =
        Files.writeString(
            dir.resolve("hand.json"),
            """
            // written by hand
            { "mesh": "pod.msh",
              "materials": { "body": { "diffusivity": { "D0": 4e-6, "Q": "40 kJ/mol" } } },
              "faces": { "zmax": { "kind": "exchange", "coefficient": 1e-7,
                                   "value": [[0, 0], [3600, 1]] } },
              "time": { "end": "1 h" } }
            """);
    SetupSession session = SetupSession.open(hand, SourceLawCatalog.classPathOnly());
    GlSurface surface = GlSurface.offscreen(1400, 860);
    Path saveAs = dir.resolve("copy.case.json");
    FileDialogs answers =
        new FileDialogs() {
          @Override
          public Optional<Path> open() {
            return Optional.of(dir.resolve("pod.msh"));
          }

          @Override
          public Optional<Path> saveAs(Path suggested) {
            return Optional.of(saveAs);
          }
        };
    try (Workbench wb = new Workbench(surface, session)) {
      wb.actions().use(answers, new RecentFiles(dir.resolve("recent.txt")));
      wb.frame();
      // the exchange face's table shows in its rows; its kind colours the top in the list
      click(wb, Workbench.viewLeft() + 5, 5, false);
      press(wb, "group zmax");
      assertTrue(wb.widget("value t1").isPresent());
      assertTrue(wb.widget("coefficient").isPresent());
      shot(wb, "faces-tab-time-table");
      press(wb, "value add row");
      assertEquals(3, session.draft().get().tree().path("faces").path("zmax").path("value").size());
      // Ctrl+Z takes the row back, Ctrl+Y makes it again, Ctrl+Shift+Z too after another undo
      wb.key(GLFW.GLFW_KEY_Z, GLFW.GLFW_MOD_CONTROL);
      assertEquals(2, session.draft().get().tree().path("faces").path("zmax").path("value").size());
      wb.key(GLFW.GLFW_KEY_Y, GLFW.GLFW_MOD_CONTROL);
      assertEquals(3, session.draft().get().tree().path("faces").path("zmax").path("value").size());
      wb.key(GLFW.GLFW_KEY_Z, GLFW.GLFW_MOD_CONTROL);
      wb.key(GLFW.GLFW_KEY_Z, GLFW.GLFW_MOD_CONTROL | GLFW.GLFW_MOD_SHIFT);
      assertEquals(3, session.draft().get().tree().path("faces").path("zmax").path("value").size());
      // the Arrhenius diffusivity shows its pre-factor and energy
      press(wb, "tab Parts");
      assertTrue(wb.widget("diffusivityD0").isPresent());
      press(wb, "mark body impermeable");
      assertTrue(
          session
              .draft()
              .get()
              .tree()
              .path("materials")
              .path("body")
              .path("impermeable")
              .asBoolean());
      shot(wb, "parts-tab-impermeable");
      // two undos: the part's material and the table row are as the file had them
      wb.key(GLFW.GLFW_KEY_Z, GLFW.GLFW_MOD_CONTROL);
      wb.key(GLFW.GLFW_KEY_Z, GLFW.GLFW_MOD_CONTROL);
      assertEquals(2, session.draft().get().tree().path("faces").path("zmax").path("value").size());
      // Ctrl+S on a file with comments asks first; No leaves the file as it was
      String before = Files.readString(hand);
      wb.key(GLFW.GLFW_KEY_S, GLFW.GLFW_MOD_CONTROL);
      wb.frame();
      shot(wb, "save-asks-about-comments");
      press(wb, "confirm no");
      assertEquals(before, Files.readString(hand));
      wb.key(GLFW.GLFW_KEY_S, GLFW.GLFW_MOD_CONTROL);
      wb.frame();
      press(wb, "confirm yes");
      assertTrue(!Files.readString(hand).contains("//"));
      // the saved case means what the hand-written one meant
      Path original = Files.writeString(dir.resolve("original.json"), before);
      assertEquals(CaseReader.read(original).faces(), CaseReader.read(hand).faces());
      assertEquals(CaseReader.read(original).materials(), CaseReader.read(hand).materials());
      assertEquals(CaseReader.read(original).time(), CaseReader.read(hand).time());
      // Ctrl+Shift+S saves a copy where the dialog says; Ctrl+O opens what it says
      wb.key(GLFW.GLFW_KEY_S, GLFW.GLFW_MOD_CONTROL | GLFW.GLFW_MOD_SHIFT);
      assertTrue(Files.isRegularFile(saveAs));
      wb.key(GLFW.GLFW_KEY_O, GLFW.GLFW_MOD_CONTROL);
      wb.frame();
      assertEquals(dir.resolve("pod.case.json"), wb.session().draft().get().caseFile());
      // F1 shows the keys, Esc hides them; F fits the view
      assertTrue(wb.key(GLFW.GLFW_KEY_F1, 0));
      assertTrue(wb.helpShown());
      assertTrue(wb.key(GLFW.GLFW_KEY_ESCAPE, 0));
      assertFalse(wb.helpShown());
      assertTrue(wb.key(GLFW.GLFW_KEY_F, 0));
      // the recent list has what was opened and saved, newest first
      press(wb, "Recent");
      shot(wb, "recent-files");
      assertEquals(
          dir.resolve("pod.msh").toAbsolutePath(),
          new RecentFiles(dir.resolve("recent.txt")).list().get(0));
    } finally {
      surface.close();
    }
  }

  @Test
  void theKeysTableNamesEveryShortcutOfTheContract() {
    String all = java.util.Arrays.deepToString(HelpOverlay.KEYS);
    for (String k :
        List.of(
            "Ctrl+O",
            "Ctrl+S",
            "Ctrl+Shift+S",
            "Ctrl+R",
            "Esc",
            "Ctrl+Z",
            "Ctrl+Y",
            "Ctrl+Shift+Z",
            "F1",
            "Space")) {
      assertTrue(all.contains(k), k);
    }
    assertTrue(StatusLine.mouse(CasePanel.Mode.PICK_FACES).contains("Shift+click"));
  }
}
