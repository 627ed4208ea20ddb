package dev.soakfield.ui;

import static org.lwjgl.glfw.GLFW.*;
import static org.lwjgl.nuklear.Nuklear.*;
import static org.lwjgl.opengl.GL33C.*;

import dev.soakfield.app.Annotations;
import dev.soakfield.app.FaceGroupPalette;
import dev.soakfield.app.FieldKind;
import dev.soakfield.app.OrbitCamera;
import dev.soakfield.app.PickIndex;
import dev.soakfield.app.Probe;
import dev.soakfield.app.Resample;
import dev.soakfield.app.ResultSet;
import dev.soakfield.app.Scene;
import dev.soakfield.app.SeriesTable;
import dev.soakfield.app.Study;
import dev.soakfield.app.ViewSettings;
import dev.soakfield.mesh.MeshInputException;
import dev.soakfield.render.GlSurface;
import dev.soakfield.render.OffscreenPicture;
import dev.soakfield.render.SceneRenderer;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.FloatBuffer;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.lwjgl.nuklear.NkColor;
import org.lwjgl.nuklear.NkRect;
import org.lwjgl.system.MemoryStack;
import org.lwjgl.util.tinyfd.TinyFileDialogs;

/**
 * The workbench window: the 3D view in the middle, the "Show" panel on the left (colouring, parts,
 * face groups, section, isosurface, colour limits, pictures), the "Time" strip below the view and
 * the "Uptake" panel on the right (amount per part against time, the probe's curve, what is under
 * the cursor). Left drag turns the part, right drag moves it, the wheel zooms, a click places a
 * probe and names the face group. The panels are a layout over {@link ViewSettings}; the view is
 * drawn by {@link SceneRenderer}.
 */
public final class Workbench implements AutoCloseable {
  static final int LEFT = 270;
  static final int RIGHT = 330;
  static final int BOTTOM = 92;
  private static final int CLICK_SLOP = 3;

  private final GlSurface surface;
  private final NuklearBackend ui;
  private final SceneRenderer renderer;
  private final OrbitCamera camera = new OrbitCamera();
  private final Study study;
  private final ViewSettings settings = new ViewSettings();
  private final Scene scene;
  private final List<String> messages = new ArrayList<>();
  private String hover = "";
  private Optional<String> picked = Optional.empty();
  private Optional<Probe> probe = Optional.empty();
  private Optional<double[]> probeCurve = Optional.empty();
  private double mouseX;
  private double mouseY;
  private double pressX;
  private double pressY;
  private int dragButton = -1;
  private boolean dragged;
  private boolean overPanels;
  private boolean playing;
  private float framesPerSecond = 2;
  private double lastStep;
  private boolean sectionOn;
  private int sectionAxis = 2;
  private double[] sectionNormal = {0, 0, 1};
  private float sectionPos;
  private boolean isoOn;
  private float isoLevel;
  private int viewWidth = 1;
  private int viewHeight = 1;

  /** A workbench drawing into {@code surface} (a window, or an off-screen one for tests). */
  public Workbench(GlSurface surface, Study study) {
    this.surface = surface;
    this.study = study;
    surface.bind();
    ui = new NuklearBackend();
    renderer = new SceneRenderer();
    if (study.results().isEmpty()) {
      settings.field(Optional.empty());
    } else {
      settings.frame(study.results().get().frameCount() - 1);
    }
    scene = new Scene(study, settings);
    double[] b = study.geometry().bounds();
    sectionPos = (float) ((b[sectionAxis] + b[3 + sectionAxis]) / 2);
    isoLevel = (float) ((scene.low() + scene.high()) / 2);
    layoutView();
    camera.fit(b);
  }

  /** Opens the window on the study (or asks for one) and runs until it is closed. */
  public static void run(Optional<Study> maybe) {
    Study study = maybe.orElseGet(Workbench::askForStudy);
    GlSurface window = GlSurface.window(1400, 860, "Soakfield - " + study.source().getFileName());
    try (Workbench wb = new Workbench(window, study)) {
      wb.attach();
      while (!glfwWindowShouldClose(window.window())) {
        nk_input_begin(wb.ui.ctx);
        glfwPollEvents();
        nk_input_end(wb.ui.ctx);
        wb.frame();
        window.swap();
      }
    } finally {
      window.close();
    }
  }

  private static Study askForStudy() {
    String chosen =
        TinyFileDialogs.tinyfd_openFileDialog(
            "Open a mesh, case or fields.pvd", "", null, null, false);
    if (chosen == null) {
      throw new MeshInputException("file dialog", "", "nothing chosen", "a mesh, case or result");
    }
    Path p = Path.of(chosen);
    return Study.open(p.getFileName().toString().equals("fields.pvd") ? p.getParent() : p);
  }

  private void attach() {
    long w = surface.window();
    glfwSetCursorPosCallback(w, (win, x, y) -> mouseMove(x, y));
    glfwSetMouseButtonCallback(
        w,
        (win, button, action, mods) -> {
          try (MemoryStack stack = MemoryStack.stackPush()) {
            var cx = stack.mallocDouble(1);
            var cy = stack.mallocDouble(1);
            glfwGetCursorPos(win, cx, cy);
            mouseButton(button, action == GLFW_PRESS, cx.get(0), cy.get(0));
          }
        });
    glfwSetScrollCallback(w, (win, dx, dy) -> scroll(dy));
    glfwSetCharCallback(w, (win, cp) -> nk_input_unicode(ui.ctx, cp));
    glfwSetKeyCallback(
        w,
        (win, key, sc, action, mods) -> {
          boolean press = action != GLFW_RELEASE;
          switch (key) {
            case GLFW_KEY_BACKSPACE -> nk_input_key(ui.ctx, NK_KEY_BACKSPACE, press);
            case GLFW_KEY_DELETE -> nk_input_key(ui.ctx, NK_KEY_DEL, press);
            case GLFW_KEY_ENTER -> nk_input_key(ui.ctx, NK_KEY_ENTER, press);
            case GLFW_KEY_LEFT -> nk_input_key(ui.ctx, NK_KEY_LEFT, press);
            case GLFW_KEY_RIGHT -> nk_input_key(ui.ctx, NK_KEY_RIGHT, press);
            case GLFW_KEY_SPACE -> {
              if (press && !nk_item_is_any_active(ui.ctx)) {
                playing = !playing;
              }
            }
            default -> {
              // other keys go to text fields as characters
            }
          }
        });
  }

  /** The pointer moved to (x, y) window pixels. */
  public void mouseMove(double x, double y) {
    nk_input_motion(ui.ctx, (int) x, (int) y);
    double dx = x - mouseX;
    double dy = y - mouseY;
    mouseX = x;
    mouseY = y;
    if (dragButton >= 0) {
      if (Math.abs(x - pressX) + Math.abs(y - pressY) > CLICK_SLOP) {
        dragged = true;
      }
      if (dragged && dragButton == GLFW_MOUSE_BUTTON_LEFT) {
        camera.orbit(-0.4 * dx, 0.4 * dy);
      } else if (dragged) {
        camera.pan(dx, dy);
      }
    }
  }

  /** A mouse button went down or up at (x, y). */
  public void mouseButton(int button, boolean pressed, double x, double y) {
    int nkButton =
        button == GLFW_MOUSE_BUTTON_RIGHT
            ? NK_BUTTON_RIGHT
            : button == GLFW_MOUSE_BUTTON_MIDDLE ? NK_BUTTON_MIDDLE : NK_BUTTON_LEFT;
    nk_input_button(ui.ctx, nkButton, (int) x, (int) y, pressed);
    mouseX = x;
    mouseY = y;
    if (pressed) {
      if (!overPanels && inView(x, y)) {
        dragButton = button;
        dragged = false;
        pressX = x;
        pressY = y;
      }
    } else if (dragButton == button) {
      if (!dragged && button == GLFW_MOUSE_BUTTON_LEFT) {
        click(x, y);
      }
      dragButton = -1;
    }
  }

  /** The wheel turned by {@code dy} notches. */
  public void scroll(double dy) {
    try (MemoryStack stack = MemoryStack.stackPush()) {
      nk_input_scroll(ui.ctx, org.lwjgl.nuklear.NkVec2.malloc(stack).set(0, (float) dy));
    }
    if (!overPanels && inView(mouseX, mouseY)) {
      camera.zoom(Math.pow(1.15, dy));
    }
  }

  private boolean inView(double x, double y) {
    return x >= LEFT && x < LEFT + viewWidth && y >= 0 && y < viewHeight;
  }

  /** A click on the view: names the face group under it and places a probe there. */
  private void click(double x, double y) {
    double vx = x - LEFT;
    double[] ray = camera.ray(vx, y);
    Optional<PickIndex.Hit> hit = scene.pick(camera, vx, y);
    if (hit.isEmpty()) {
      picked = Optional.empty();
      probe = Optional.empty();
      probeCurve = Optional.empty();
      return;
    }
    picked = Optional.of(scene.describe(hit.get()));
    Probe p = Probe.at(scene, ray, hit.get());
    probe = Optional.of(p);
    probeCurve = settings.field().flatMap(f -> p.curve(study, f));
  }

  /** What the last click named (face group and part), if it hit the part. */
  public Optional<String> picked() {
    return picked;
  }

  /** The field at the last probe through the frames, when there are results. */
  public Optional<double[]> probeCurve() {
    return probeCurve;
  }

  public OrbitCamera camera() {
    return camera;
  }

  public ViewSettings settings() {
    return settings;
  }

  /** Window x of the view's left edge. */
  public static int viewLeft() {
    return LEFT;
  }

  private void layoutView() {
    surface.bind();
    viewWidth = Math.max(64, surface.width() - LEFT - RIGHT);
    viewHeight = Math.max(64, surface.height() - BOTTOM);
    camera.viewport(viewWidth, viewHeight);
  }

  /** Lays out the panels, applies them, draws the view and the panels (not swapped). */
  public void frame() {
    layoutView();
    overPanels = nk_window_is_any_hovered(ui.ctx) || nk_item_is_any_active(ui.ctx);
    if (dragButton < 0 && inView(mouseX, mouseY) && !overPanels) {
      Optional<PickIndex.Hit> h = scene.pick(camera, mouseX - LEFT, mouseY);
      hover = h.map(scene::describe).orElse("");
    }
    advanceTime();
    panels();
    scene.update();
    glDisable(GL_SCISSOR_TEST);
    glClearColor(0.93f, 0.93f, 0.92f, 1f);
    glClear(GL_COLOR_BUFFER_BIT | GL_DEPTH_BUFFER_BIT);
    renderer.draw(scene, camera, LEFT, BOTTOM, dragButton >= 0 && dragged);
    ui.render(surface.width(), surface.height());
  }

  private void advanceTime() {
    Optional<ResultSet> r = study.results();
    if (!playing || r.isEmpty()) {
      return;
    }
    double now = glfwGetTime();
    if (now - lastStep >= 1 / framesPerSecond) {
      lastStep = now;
      settings.frame((settings.frame() + 1) % r.get().frameCount());
    }
  }

  private void panels() {
    int w = surface.width();
    int h = surface.height();
    try (MemoryStack stack = MemoryStack.stackPush()) {
      NkRect rect = NkRect.malloc(stack);
      int flags = NK_WINDOW_BORDER | NK_WINDOW_TITLE;
      if (nk_begin(ui.ctx, "Show", nk_rect(0, 0, LEFT, h, rect), flags)) {
        showPanel(stack);
      }
      nk_end(ui.ctx);
      if (nk_begin(
          ui.ctx,
          "Time",
          nk_rect(LEFT, h - BOTTOM, w - LEFT - RIGHT, BOTTOM, rect),
          flags | NK_WINDOW_NO_SCROLLBAR)) {
        timePanel(stack);
      }
      nk_end(ui.ctx);
      if (nk_begin(ui.ctx, "Uptake", nk_rect(w - RIGHT, 0, RIGHT, h, rect), flags)) {
        uptakePanel(stack);
      }
      nk_end(ui.ctx);
    }
  }

  private void showPanel(MemoryStack stack) {
    var ctx = ui.ctx;
    nk_layout_row_dynamic(ctx, 20, 1);
    nk_label(ctx, "Colour by", NK_TEXT_LEFT);
    Optional<FieldKind> current = settings.field();
    if (nk_option_label(ctx, "face groups", current.isEmpty()) && current.isPresent()) {
      settings.field(Optional.empty());
    }
    if (study.results().isPresent()) {
      for (FieldKind k : FieldKind.values()) {
        boolean on = current.isPresent() && current.get() == k;
        if (nk_option_label(ctx, k.words, on) && !on) {
          settings.field(Optional.of(k));
          probeCurve = probe.flatMap(p -> p.curve(study, k));
        }
      }
    }
    boolean edges = nk_check_label(ctx, "mesh edges", settings.edges());
    if (edges != settings.edges()) {
      settings.edges(edges);
    }
    nk_layout_row_dynamic(ctx, 24, 2);
    if (nk_button_label(ctx, "fit")) {
      camera.fit(study.geometry().bounds());
    }
    if (nk_button_label(ctx, "iso")) {
      camera.look(OrbitCamera.View.ISO);
    }
    nk_layout_row_dynamic(ctx, 24, 6);
    OrbitCamera.View[] axes = {
      OrbitCamera.View.XMIN, OrbitCamera.View.XMAX, OrbitCamera.View.YMIN,
      OrbitCamera.View.YMAX, OrbitCamera.View.ZMIN, OrbitCamera.View.ZMAX
    };
    String[] names = {"-x", "+x", "-y", "+y", "-z", "+z"};
    for (int i = 0; i < axes.length; i++) {
      if (nk_button_label(ctx, names[i])) {
        camera.look(axes[i]);
      }
    }
    nk_layout_row_dynamic(ctx, 20, 1);
    nk_label(ctx, "Parts", NK_TEXT_LEFT);
    List<String> parts = study.geometry().partNames();
    for (int p = 0; p < parts.size(); p++) {
      boolean shown = !settings.partHidden(p);
      boolean now = nk_check_label(ctx, parts.get(p), shown);
      if (now != shown) {
        settings.hidePart(p, !now);
      }
    }
    if (settings.field().isEmpty()) {
      nk_label(ctx, "Face groups", NK_TEXT_LEFT);
      List<String> groups = study.geometry().faceGroupNames();
      for (int g = 0; g < groups.size(); g++) {
        nk_layout_row_begin(ctx, NK_STATIC, 18, 2);
        nk_layout_row_push(ctx, 18);
        int rgb = FaceGroupPalette.colourOf(g);
        nk_button_color(
            ctx,
            NkColor.malloc(stack)
                .set((byte) (rgb >> 16), (byte) (rgb >> 8), (byte) rgb, (byte) 255));
        nk_layout_row_push(ctx, LEFT - 60);
        nk_label(ctx, groups.get(g), NK_TEXT_LEFT);
        nk_layout_row_end(ctx);
      }
    }
    sectionControls(stack);
    if (settings.field().isPresent() && study.results().isPresent()) {
      isoControls(stack);
      limitControls(stack);
    }
    nk_layout_row_dynamic(ctx, 24, 1);
    if (nk_button_label(ctx, "save picture...")) {
      savePicture();
    }
    if (study.results().isPresent() && nk_button_label(ctx, "save frames...")) {
      saveFrames();
    }
    for (String m : messages) {
      nk_label_wrap(ctx, m);
    }
  }

  private void sectionControls(MemoryStack stack) {
    var ctx = ui.ctx;
    nk_layout_row_dynamic(ctx, 20, 1);
    boolean on = nk_check_label(ctx, "section plane", sectionOn);
    nk_layout_row_dynamic(ctx, 20, 4);
    int axis = sectionAxis;
    String[] labels = {"x", "y", "z", "view"};
    for (int a = 0; a < 4; a++) {
      if (nk_option_label(ctx, labels[a], axis == a)) {
        axis = a;
      }
    }
    if (axis == 3 && sectionAxis != 3) {
      // across the line of sight: the plane faces the viewer as the view is now
      var e = camera.towardsEye();
      sectionNormal = new double[] {e.x, e.y, e.z};
    }
    double[] n =
        axis == 3
            ? sectionNormal
            : new double[] {axis == 0 ? 1 : 0, axis == 1 ? 1 : 0, axis == 2 ? 1 : 0};
    double[] range = extent(n);
    if (axis != sectionAxis) {
      sectionPos = (float) ((range[0] + range[1]) / 2);
    }
    nk_layout_row_dynamic(ctx, 20, 1);
    FloatBuffer pos = stack.floats(sectionPos);
    float lo = (float) range[0];
    float hi = (float) range[1];
    nk_slider_float(ctx, lo, pos, hi, (hi - lo) / 200);
    nk_label(
        ctx,
        (axis == 3 ? "depth" : labels[axis]) + " = " + Annotations.length(pos.get(0)),
        NK_TEXT_LEFT);
    if (on != sectionOn
        || axis != sectionAxis
        || pos.get(0) != sectionPos
        || on != settings.section().isPresent()) {
      sectionOn = on;
      sectionAxis = axis;
      sectionPos = pos.get(0);
      settings.section(
          on
              ? Optional.of(new ViewSettings.Plane(n[0], n[1], n[2], sectionPos))
              : Optional.empty());
    }
  }

  /** Smallest and largest n·x over the corners of the part's bounding box. */
  private double[] extent(double[] n) {
    double[] b = study.geometry().bounds();
    double lo = Double.POSITIVE_INFINITY;
    double hi = Double.NEGATIVE_INFINITY;
    for (int k = 0; k < 8; k++) {
      double d =
          n[0] * b[(k & 1) * 3]
              + n[1] * b[1 + ((k >> 1) & 1) * 3]
              + n[2] * b[2 + ((k >> 2) & 1) * 3];
      lo = Math.min(lo, d);
      hi = Math.max(hi, d);
    }
    return new double[] {lo, hi};
  }

  private void isoControls(MemoryStack stack) {
    var ctx = ui.ctx;
    nk_layout_row_dynamic(ctx, 20, 1);
    boolean on = nk_check_label(ctx, "isosurface", isoOn);
    FloatBuffer level = stack.floats(isoLevel);
    float lo = (float) scene.low();
    float hi = (float) scene.high();
    nk_slider_float(ctx, lo, level, hi, (hi - lo) / 200);
    nk_label(ctx, "level " + Annotations.number(level.get(0)), NK_TEXT_LEFT);
    FloatBuffer alpha = stack.floats(settings.isoOpacity());
    nk_label(ctx, "opacity", NK_TEXT_LEFT);
    nk_slider_float(ctx, 0.05f, alpha, 1f, 0.05f);
    if (alpha.get(0) != settings.isoOpacity()) {
      settings.isoOpacity(alpha.get(0));
    }
    if (on != isoOn || level.get(0) != isoLevel) {
      isoOn = on;
      isoLevel = level.get(0);
      settings.isoLevels(on ? List.of((double) isoLevel) : List.of());
    }
  }

  private void limitControls(MemoryStack stack) {
    var ctx = ui.ctx;
    nk_layout_row_dynamic(ctx, 20, 1);
    boolean auto = nk_check_label(ctx, "automatic colour limits", settings.autoRange());
    if (auto && !settings.autoRange()) {
      settings.automaticRange();
    }
    double lo = scene.low();
    double hi = scene.high();
    double span = Math.max(1e-30, hi - lo);
    FloatBuffer a = stack.floats((float) lo);
    FloatBuffer b = stack.floats((float) hi);
    nk_property_float(
        ctx,
        "low",
        (float) (lo - 10 * span),
        a,
        (float) (hi + 10 * span),
        (float) span / 50,
        (float) span / 200);
    nk_property_float(
        ctx,
        "high",
        (float) (lo - 10 * span),
        b,
        (float) (hi + 10 * span),
        (float) span / 50,
        (float) span / 200);
    boolean edited = a.get(0) != (float) lo || b.get(0) != (float) hi;
    if ((!auto || edited) && b.get(0) > a.get(0)) {
      if (edited || settings.autoRange()) {
        settings.range(a.get(0), b.get(0));
      }
    }
  }

  private void timePanel(MemoryStack stack) {
    var ctx = ui.ctx;
    Optional<ResultSet> r = study.results();
    if (r.isEmpty()) {
      nk_layout_row_dynamic(ctx, 20, 1);
      nk_label(ctx, "no results: open a result folder to see fields over time", NK_TEXT_LEFT);
      return;
    }
    int frames = r.get().frameCount();
    nk_layout_row_dynamic(ctx, 22, 1);
    var f = stack.ints(settings.frame());
    nk_slider_int(ctx, 0, f, frames - 1, 1);
    if (f.get(0) != settings.frame()) {
      settings.frame(f.get(0));
    }
    nk_layout_row_dynamic(ctx, 22, 4);
    if (nk_button_label(ctx, playing ? "pause" : "play")) {
      playing = !playing;
    }
    FloatBuffer speed = stack.floats(framesPerSecond);
    nk_property_float(ctx, "frames/s", 0.25f, speed, 30f, 0.25f, 0.05f);
    framesPerSecond = speed.get(0);
    nk_label(
        ctx,
        String.format(
            Locale.ROOT,
            "t = %s  (%d of %d)",
            Annotations.time(r.get().time(settings.frame())),
            settings.frame() + 1,
            frames),
        NK_TEXT_LEFT);
  }

  private void uptakePanel(MemoryStack stack) {
    var ctx = ui.ctx;
    nk_layout_row_dynamic(ctx, 20, 1);
    nk_label(ctx, hover.isEmpty() ? "(point at the part)" : hover, NK_TEXT_LEFT);
    picked.ifPresent(p -> nk_label(ctx, "clicked: " + p, NK_TEXT_LEFT));
    Optional<SeriesTable> series = study.results().flatMap(ResultSet::series);
    if (series.isPresent() && series.get().rowCount() > 1 && series.get().has("time")) {
      SeriesTable s = series.get();
      double[] t = s.column("time");
      nk_label(ctx, "Amount per part against time", NK_TEXT_LEFT);
      nk_label(ctx, "0 .. " + Annotations.time(t[t.length - 1]), NK_TEXT_LEFT);
      List<String> parts = s.suffixes("amount:");
      List<double[]> curves = new ArrayList<>();
      double max = 0;
      for (String p : parts) {
        double[] y = Resample.even(t, s.column("amount:" + p), 60);
        curves.add(y);
        for (double v : y) {
          max = Math.max(max, v);
        }
      }
      nk_layout_row_dynamic(ctx, 150, 1);
      chart(stack, curves, 0, max > 0 ? max : 1);
      nk_layout_row_dynamic(ctx, 18, 1);
      for (int i = 0; i < parts.size(); i++) {
        int rgb = FaceGroupPalette.colourOf(i);
        nk_label_colored(
            ctx,
            parts.get(i) + "  (max " + Annotations.number(max(curves.get(i))) + ")",
            NK_TEXT_LEFT,
            NkColor.malloc(stack)
                .set((byte) (rgb >> 16), (byte) (rgb >> 8), (byte) rgb, (byte) 255));
      }
    }
    if (probe.isPresent()) {
      double[] p = probe.get().point();
      nk_layout_row_dynamic(ctx, 20, 1);
      nk_label(ctx, "Probe", NK_TEXT_LEFT);
      nk_label(
          ctx,
          String.format(
              Locale.ROOT,
              "at %s, %s, %s",
              Annotations.length(p[0]),
              Annotations.length(p[1]),
              Annotations.length(p[2])),
          NK_TEXT_LEFT);
      if (probeCurve.isPresent()) {
        double[] v = probeCurve.get();
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double x : v) {
          lo = Math.min(lo, x);
          hi = Math.max(hi, x);
        }
        nk_label(
            ctx,
            "range "
                + Annotations.number(lo)
                + " .. "
                + Annotations.number(hi)
                + " over the frames",
            NK_TEXT_LEFT);
        nk_layout_row_dynamic(ctx, 120, 1);
        chart(stack, List.of(v), Math.min(0, lo), hi > lo ? hi : lo + 1);
      }
    }
  }

  private static double max(double[] v) {
    double m = Double.NEGATIVE_INFINITY;
    for (double x : v) {
      m = Math.max(m, x);
    }
    return m;
  }

  private void chart(MemoryStack stack, List<double[]> curves, double lo, double hi) {
    var ctx = ui.ctx;
    if (curves.isEmpty()) {
      return;
    }
    int n = curves.get(0).length;
    int rgb0 = FaceGroupPalette.colourOf(0);
    NkColor c0 =
        NkColor.malloc(stack).set((byte) (rgb0 >> 16), (byte) (rgb0 >> 8), (byte) rgb0, (byte) 255);
    if (nk_chart_begin_colored(ctx, NK_CHART_LINES, c0, c0, n, (float) lo, (float) hi)) {
      for (int i = 1; i < curves.size(); i++) {
        int rgb = FaceGroupPalette.colourOf(i);
        NkColor c =
            NkColor.malloc(stack)
                .set((byte) (rgb >> 16), (byte) (rgb >> 8), (byte) rgb, (byte) 255);
        nk_chart_add_slot_colored(ctx, NK_CHART_LINES, c, c, n, (float) lo, (float) hi);
      }
      for (int k = 0; k < n; k++) {
        for (int i = 0; i < curves.size(); i++) {
          nk_chart_push_slot(ctx, (float) curves.get(i)[k], i);
        }
      }
      nk_chart_end(ctx);
    }
  }

  /** The view alone, as shown now, for a saved picture. */
  public BufferedImage pictureOfView() {
    try (OffscreenPicture pic = new OffscreenPicture(viewWidth, viewHeight)) {
      BufferedImage img = pic.render(scene, camera);
      surface.bind();
      return img;
    }
  }

  private void savePicture() {
    String f =
        TinyFileDialogs.tinyfd_saveFileDialog("Save picture", "view.png", null, "PNG picture");
    if (f == null) {
      return;
    }
    try {
      OffscreenPicture.writePng(pictureOfView(), Path.of(f));
      note("saved " + f);
    } catch (IOException | RuntimeException e) {
      note("could not save " + f + ": " + e.getMessage());
    }
  }

  private void saveFrames() {
    String dir = TinyFileDialogs.tinyfd_selectFolderDialog("Folder for the frames", "");
    if (dir == null) {
      return;
    }
    int keep = settings.frame();
    try (OffscreenPicture pic = new OffscreenPicture(viewWidth, viewHeight)) {
      int frames = study.results().orElseThrow().frameCount();
      for (int i = 0; i < frames; i++) {
        settings.frame(i);
        scene.update();
        Path file = Path.of(dir, String.format(Locale.ROOT, "frame_%04d.png", i));
        OffscreenPicture.writePng(pic.render(scene, camera), file);
      }
      note("saved " + frames + " frames in " + dir);
    } catch (IOException | RuntimeException e) {
      note("could not save the frames: " + e.getMessage());
    } finally {
      settings.frame(keep);
      surface.bind();
    }
  }

  private void note(String m) {
    messages.add(0, m);
    while (messages.size() > 3) {
      messages.remove(messages.size() - 1);
    }
  }

  /** The whole window as drawn by the last {@link #frame()} (read before swapping). */
  public BufferedImage read() {
    return surface.read();
  }

  @Override
  public void close() {
    surface.bind();
    renderer.close();
    ui.close();
  }
}
