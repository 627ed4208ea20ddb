package dev.soakfield.ui;

import static org.lwjgl.glfw.GLFW.glfwGetTime;
import static org.lwjgl.nuklear.Nuklear.*;
import static org.lwjgl.opengl.GL33C.*;

import dev.soakfield.app.OrbitCamera;
import dev.soakfield.app.Study;
import dev.soakfield.app.ViewSettings;
import dev.soakfield.app.WorkbenchModel;
import dev.soakfield.fem.results.StoredRun;
import dev.soakfield.render.GlSurface;
import dev.soakfield.render.SceneRenderer;
import java.awt.image.BufferedImage;
import java.util.Optional;
import org.lwjgl.nuklear.NkContext;
import org.lwjgl.nuklear.NkRect;
import org.lwjgl.system.MemoryStack;

/**
 * The workbench window's contents: the 3D view in the middle, the {@link ShowPanel} on the left,
 * the {@link TimePanel} below the view and the {@link UptakePanel} on the right, over a {@link
 * WorkbenchModel} that holds all state without GL. {@link ViewGestures} take the mouse; the view is
 * drawn by {@link SceneRenderer}; {@link WorkbenchWindow} runs the window around it.
 */
public final class Workbench implements AutoCloseable {
  private final GlSurface surface;
  private final NuklearBackend ui;
  private final SceneRenderer renderer;
  private final WorkbenchModel model;
  private final ViewLayout layout = new ViewLayout();
  private final ViewGestures gestures;
  private final PictureExport pictures;
  private final ShowPanel show;
  private final TimePanel time;
  private final UptakePanel uptake;

  /** A workbench drawing into {@code surface} (a window, or an off-screen one for tests). */
  public Workbench(GlSurface surface, Study study) {
    this.surface = surface;
    surface.bind();
    ui = new NuklearBackend();
    renderer = new SceneRenderer();
    model = new WorkbenchModel(study);
    layout.update(surface, model.camera());
    model.camera().fit(study.geometry().bounds());
    gestures = new ViewGestures(ui.ctx, model, layout);
    pictures = new PictureExport(surface, model, layout);
    show = new ShowPanel(ui.ctx, model, pictures);
    time = new TimePanel(ui.ctx, model);
    uptake = new UptakePanel(ui.ctx, model);
  }

  NkContext context() {
    return ui.ctx;
  }

  WorkbenchModel model() {
    return model;
  }

  /** The pointer moved to (x, y) window pixels. */
  public void mouseMove(double x, double y) {
    gestures.mouseMove(x, y);
  }

  /** A mouse button went down or up at (x, y). */
  public void mouseButton(int button, boolean pressed, double x, double y) {
    gestures.mouseButton(button, pressed, x, y);
  }

  /** The wheel turned by {@code dy} notches. */
  public void scroll(double dy) {
    gestures.scroll(dy);
  }

  /** What the last click named (face group and part), if it hit the part. */
  public Optional<String> picked() {
    return model.probe().picked();
  }

  /** The field at the last probe through the frames, when there are results. */
  public Optional<double[]> probeCurve() {
    return model.probe().curve();
  }

  public OrbitCamera camera() {
    return model.camera();
  }

  public ViewSettings settings() {
    return model.settings();
  }

  /** Window x of the view's left edge. */
  public static int viewLeft() {
    return ViewLayout.LEFT;
  }

  /** Lays out the panels, applies them, draws the view and the panels (not swapped). */
  public void frame() {
    layout.update(surface, model.camera());
    gestures.beginFrame();
    Optional<StoredRun> r = model.study().results();
    if (r.isPresent() && model.playback().playing()) {
      model.playback().advance(glfwGetTime(), model.settings(), r.get().frameCount());
    }
    panels();
    model.scene().update();
    glDisable(GL_SCISSOR_TEST);
    glClearColor(0.93f, 0.93f, 0.92f, 1f);
    glClear(GL_COLOR_BUFFER_BIT | GL_DEPTH_BUFFER_BIT);
    renderer.draw(
        model.scene(), model.camera(), ViewLayout.LEFT, ViewLayout.BOTTOM, gestures.dragging());
    ui.render(surface.width(), surface.height());
  }

  private void panels() {
    int w = surface.width();
    int h = surface.height();
    int left = ViewLayout.LEFT;
    int right = ViewLayout.RIGHT;
    int bottom = ViewLayout.BOTTOM;
    try (MemoryStack stack = MemoryStack.stackPush()) {
      NkRect rect = NkRect.malloc(stack);
      int flags = NK_WINDOW_BORDER | NK_WINDOW_TITLE;
      if (nk_begin(ui.ctx, "Show", nk_rect(0, 0, left, h, rect), flags)) {
        show.draw(stack);
      }
      nk_end(ui.ctx);
      if (nk_begin(
          ui.ctx,
          "Time",
          nk_rect(left, h - bottom, w - left - right, bottom, rect),
          flags | NK_WINDOW_NO_SCROLLBAR)) {
        time.draw(stack);
      }
      nk_end(ui.ctx);
      if (nk_begin(ui.ctx, "Uptake", nk_rect(w - right, 0, right, h, rect), flags)) {
        uptake.draw(stack);
      }
      nk_end(ui.ctx);
    }
  }

  /** The view alone, as shown now, for a saved picture. */
  public BufferedImage pictureOfView() {
    return pictures.pictureOfView();
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
