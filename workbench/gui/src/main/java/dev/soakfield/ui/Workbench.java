package dev.soakfield.ui;

import static org.lwjgl.glfw.GLFW.glfwGetTime;
import static org.lwjgl.nuklear.Nuklear.*;
import static org.lwjgl.opengl.GL33C.*;

import dev.soakfield.app.FieldKind;
import dev.soakfield.app.OrbitCamera;
import dev.soakfield.app.Study;
import dev.soakfield.app.ViewSettings;
import dev.soakfield.app.WorkbenchModel;
import dev.soakfield.app.setup.KindColours;
import dev.soakfield.app.setup.SetupSession;
import dev.soakfield.fem.laws.SourceLawCatalog;
import dev.soakfield.fem.results.StoredRun;
import dev.soakfield.mesh.FaceGroup;
import dev.soakfield.mesh.FaceGroupKind;
import dev.soakfield.render.GlSurface;
import dev.soakfield.render.SceneRenderer;
import java.awt.image.BufferedImage;
import java.util.List;
import java.util.Optional;
import org.lwjgl.nuklear.NkContext;
import org.lwjgl.nuklear.NkRect;
import org.lwjgl.system.MemoryStack;

/**
 * The workbench window's contents: the 3D view in the middle, the {@link ShowPanel} on the left,
 * the {@link TimePanel} and the status line below the view, and on the right the case panel ({@link
 * CasePanel}: set-up tabs, run, uptake) over a {@link SetupSession}, with no GL in the state.
 * {@link ViewGestures} take the mouse, {@link Shortcuts} the keys; {@link WorkbenchWindow} runs the
 * window around it.
 */
public final class Workbench implements AutoCloseable {
  private final GlSurface surface;
  private final NuklearBackend ui;
  private final SceneRenderer renderer;
  private final Widgets widgets;
  private final ViewLayout layout = new ViewLayout();
  private final WorkbenchActions actions;
  private final CasePanel casePanel;
  private final Shortcuts shortcuts;
  private SetupSession session;
  private WorkbenchModel model;
  private ViewGestures gestures;
  private PictureExport pictures;
  private ShowPanel show;
  private TimePanel time;
  private UptakePanel uptake;
  private boolean help;

  /** A workbench on results or a mesh alone (nothing to set up). */
  public Workbench(GlSurface surface, Study study) {
    this(surface, SetupSession.viewOnly(study, SourceLawCatalog.classPathOnly()));
  }

  /** A workbench drawing into {@code surface} (a window, or an off-screen one for tests). */
  public Workbench(GlSurface surface, SetupSession session) {
    this.surface = surface;
    surface.bind();
    ui = new NuklearBackend();
    renderer = new SceneRenderer();
    widgets = new Widgets(ui.ctx);
    this.session = session;
    actions = new WorkbenchActions(this);
    casePanel = new CasePanel(widgets, this);
    shortcuts = new Shortcuts(this);
    attach(session.study(), true);
  }

  /** Builds the view model and the panels on it for a study (new results, a changed mesh). */
  private void attach(Study study, boolean fit) {
    Optional<OrbitCamera> keep = Optional.ofNullable(model).map(WorkbenchModel::camera);
    model = new WorkbenchModel(study);
    renderer.unit(study.results().map(r -> r.units().concentration()).orElse("amount/m^3"));
    layout.update(surface, model.camera());
    if (fit || keep.isEmpty()) {
      model.camera().fit(study.geometry().bounds());
    } else {
      model.camera().copyFrom(keep.get());
    }
    gestures = new ViewGestures(ui.ctx, model, layout);
    gestures.onClick(this::clickOnView);
    pictures = new PictureExport(surface, model, layout);
    show = new ShowPanel(ui.ctx, model, pictures);
    time = new TimePanel(widgets, model);
    uptake = new UptakePanel(ui.ctx, model);
  }

  /** Switches to another session (a file opened in the window). */
  void open(SetupSession next) {
    session = next;
    attach(next.study(), true);
    casePanel.tab(next.study().results().isPresent() ? CasePanel.Tab.UPTAKE : CasePanel.Tab.FACES);
  }

  private void clickOnView(double x, double y, boolean adding) {
    switch (casePanel.mode()) {
      case PICK_FACES -> {
        Optional<String> g =
            model.scene().pick(model.camera(), x, y).flatMap(h -> faceGroupOf(h.triangle()));
        if (adding && g.isPresent()) {
          session.selection().toggle(g.get());
        } else if (!adding) {
          session.selection().click(g.orElse(null));
        }
        model.probe().click(model.scene(), model.camera(), x, y);
      }
      case PLACE_PROBES -> actions.placeProbe(model.scene(), model.camera(), x, y);
      case LOOK -> model.probe().click(model.scene(), model.camera(), x, y);
    }
  }

  private Optional<String> faceGroupOf(int triangle) {
    int g = model.scene().surface().faceGroup(triangle);
    List<String> names = model.study().geometry().faceGroupNames();
    return g >= 0 && g < names.size() ? Optional.of(names.get(g)) : Optional.empty();
  }

  NkContext context() {
    return ui.ctx;
  }

  WorkbenchModel model() {
    return model;
  }

  SetupSession session() {
    return session;
  }

  WorkbenchActions actions() {
    return actions;
  }

  CasePanel casePanel() {
    return casePanel;
  }

  Widgets widgets() {
    return widgets;
  }

  void toggleHelp() {
    help = !help;
  }

  boolean helpShown() {
    return help;
  }

  /** The pointer moved to (x, y) window pixels. */
  public void mouseMove(double x, double y) {
    gestures.mouseMove(x, y);
  }

  /** A mouse button went down or up at (x, y). */
  public void mouseButton(int button, boolean pressed, double x, double y) {
    mouseButton(button, pressed, x, y, false);
  }

  /** A mouse button went down or up at (x, y), with Shift held or not. */
  public void mouseButton(int button, boolean pressed, double x, double y, boolean shift) {
    gestures.shift(shift);
    gestures.mouseButton(button, pressed, x, y);
  }

  /** The wheel turned by {@code dy} notches. */
  public void scroll(double dy) {
    gestures.scroll(dy);
  }

  /** A key went down (GLFW key code and modifier bits); returns whether it was a shortcut. */
  public boolean key(int key, int mods) {
    return shortcuts.press(key, mods);
  }

  /** Typed characters, as the window's character callback gives them. */
  public void type(String text) {
    text.codePoints().forEach(cp -> nk_input_unicode(ui.ctx, cp));
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

  /** Where a named button or field was last drawn (x, y, width, height), for scripted use. */
  public Optional<float[]> widget(String name) {
    return widgets.where(name);
  }

  /** Lays out the panels, applies them, draws the view and the panels (not swapped). */
  public void frame() {
    actions.poll();
    if (session.meshChanged()) {
      attach(session.study(), false);
    }
    layout.update(surface, model.camera());
    gestures.beginFrame();
    Optional<StoredRun> r = model.study().results();
    if (r.isPresent() && model.playback().playing()) {
      model.playback().advance(glfwGetTime(), model.settings(), r.get().frameCount());
    }
    panels();
    colourByKind();
    model.scene().update();
    glDisable(GL_SCISSOR_TEST);
    glClearColor(0.93f, 0.93f, 0.92f, 1f);
    glClear(GL_COLOR_BUFFER_BIT | GL_DEPTH_BUFFER_BIT);
    renderer.draw(
        model.scene(), model.camera(), ViewLayout.LEFT, ViewLayout.BOTTOM, gestures.dragging());
    ui.render(surface.width(), surface.height());
  }

  /** While faces are set up and no field is shown, the view colours face groups by kind. */
  private void colourByKind() {
    boolean byKind =
        session.draft().isPresent()
            && model.settings().field().isEmpty()
            && model.study().mesh() == session.draft().get().mesh();
    if (!byKind) {
      model.settings().groupColours(new int[0]);
      return;
    }
    List<FaceGroup> groups = session.draft().get().mesh().faceGroups();
    boolean[] interfaces = new boolean[groups.size()];
    for (int i = 0; i < interfaces.length; i++) {
      interfaces[i] = groups.get(i).kind() == FaceGroupKind.INTERFACE;
    }
    model
        .settings()
        .groupColours(
            KindColours.forGroups(
                model.study().geometry().faceGroupNames(),
                interfaces,
                new dev.soakfield.app.setup.FaceEdits(session.draft().get()),
                session.selection()));
  }

  /** Shows a field (after a run: concentration at the last output). */
  void showField(FieldKind f) {
    model.settings().field(Optional.of(f));
  }

  /** The results of the run just finished replace the view's study. */
  void showResults(java.nio.file.Path folder) {
    session.showResults(folder);
    attach(session.study(), false);
    casePanel.tab(CasePanel.Tab.UPTAKE);
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
        StatusLine.draw(ui.ctx, widgets, this);
      }
      nk_end(ui.ctx);
      if (nk_begin_titled(
          ui.ctx, "Case", casePanel.title(), nk_rect(w - right, 0, right, h, rect), flags)) {
        casePanel.draw(stack, uptake);
      }
      nk_end(ui.ctx);
      if (help) {
        HelpOverlay.draw(ui.ctx, w, h);
      }
      actions.drawConfirmation(stack, w, h);
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
    actions.close();
    surface.bind();
    widgets.close();
    renderer.close();
    ui.close();
  }
}
