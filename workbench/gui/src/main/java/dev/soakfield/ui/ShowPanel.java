package dev.soakfield.ui;

import static org.lwjgl.nuklear.Nuklear.*;

import dev.soakfield.app.FieldKind;
import dev.soakfield.app.OrbitCamera;
import dev.soakfield.app.Study;
import dev.soakfield.app.ViewSettings;
import dev.soakfield.app.WorkbenchModel;
import java.util.List;
import java.util.Optional;
import org.lwjgl.nuklear.NkContext;
import org.lwjgl.system.MemoryStack;

/**
 * The "Show" panel on the left: colouring, camera, parts, face groups, then the section, isosurface
 * and colour-limit controls, the picture buttons and the notes.
 */
final class ShowPanel {
  private static final OrbitCamera.View[] AXES = {
    OrbitCamera.View.XMIN, OrbitCamera.View.XMAX, OrbitCamera.View.YMIN,
    OrbitCamera.View.YMAX, OrbitCamera.View.ZMIN, OrbitCamera.View.ZMAX
  };
  private static final String[] AXIS_NAMES = {"-x", "+x", "-y", "+y", "-z", "+z"};

  private final NkContext ctx;
  private final WorkbenchModel model;
  private final SectionPanel section;
  private final IsoPanel iso;
  private final ColourLimitsPanel limits;
  private final PictureExport pictures;

  ShowPanel(NkContext ctx, WorkbenchModel model, PictureExport pictures) {
    this.ctx = ctx;
    this.model = model;
    this.pictures = pictures;
    section = new SectionPanel(ctx, model);
    iso = new IsoPanel(ctx, model);
    limits = new ColourLimitsPanel(ctx, model);
  }

  void draw(MemoryStack stack) {
    Study study = model.study();
    ViewSettings settings = model.settings();
    colouring(study, settings);
    camera(study);
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
      faceGroups(stack, study);
    }
    section.draw(stack);
    if (settings.field().isPresent() && study.results().isPresent()) {
      iso.draw(stack);
      limits.draw(stack);
    }
    nk_layout_row_dynamic(ctx, 24, 1);
    if (nk_button_label(ctx, "save picture...")) {
      pictures.savePicture();
    }
    if (study.results().isPresent() && nk_button_label(ctx, "save frames...")) {
      pictures.saveFrames();
    }
    for (String m : model.notes().all()) {
      nk_label_wrap(ctx, m);
    }
  }

  private void colouring(Study study, ViewSettings settings) {
    nk_layout_row_dynamic(ctx, 20, 1);
    nk_label(ctx, "Colour by", NK_TEXT_LEFT);
    Optional<FieldKind> current = settings.field();
    if (nk_option_label(ctx, "face groups", current.isEmpty()) && current.isPresent()) {
      settings.field(Optional.empty());
    }
    if (study.results().isPresent()) {
      for (FieldKind k : FieldKind.of(study.results().get())) {
        boolean on = current.isPresent() && current.get().equals(k);
        if (nk_option_label(ctx, k.words, on) && !on) {
          settings.field(Optional.of(k));
          model.probe().fieldChanged(study, k);
        }
      }
    }
    boolean edges = nk_check_label(ctx, "mesh edges", settings.edges());
    if (edges != settings.edges()) {
      settings.edges(edges);
    }
  }

  private void camera(Study study) {
    OrbitCamera camera = model.camera();
    nk_layout_row_dynamic(ctx, 24, 2);
    if (nk_button_label(ctx, "fit")) {
      camera.fit(study.geometry().bounds());
    }
    if (nk_button_label(ctx, "iso")) {
      camera.look(OrbitCamera.View.ISO);
    }
    nk_layout_row_dynamic(ctx, 24, 6);
    for (int i = 0; i < AXES.length; i++) {
      if (nk_button_label(ctx, AXIS_NAMES[i])) {
        camera.look(AXES[i]);
      }
    }
  }

  private void faceGroups(MemoryStack stack, Study study) {
    int[] byKind = model.settings().groupColours();
    nk_label(
        ctx, byKind.length > 0 ? "Face groups, by kind (see Faces)" : "Face groups", NK_TEXT_LEFT);
    List<String> groups = study.geometry().faceGroupNames();
    for (int g = 0; g < groups.size(); g++) {
      nk_layout_row_begin(ctx, NK_STATIC, 18, 2);
      nk_layout_row_push(ctx, 18);
      nk_button_color(
          ctx, g < byKind.length ? AxesPlot.colour(stack, byKind[g]) : NkCharts.colour(stack, g));
      nk_layout_row_push(ctx, ViewLayout.LEFT - 60);
      nk_label(ctx, groups.get(g), NK_TEXT_LEFT);
      nk_layout_row_end(ctx);
    }
  }
}
