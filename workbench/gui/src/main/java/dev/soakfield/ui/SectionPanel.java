package dev.soakfield.ui;

import static org.lwjgl.nuklear.Nuklear.*;

import dev.soakfield.app.Annotations;
import dev.soakfield.app.SectionControl;
import dev.soakfield.app.WorkbenchModel;
import java.nio.FloatBuffer;
import org.lwjgl.nuklear.NkContext;
import org.lwjgl.system.MemoryStack;

/** The section-plane controls: on/off, across x, y, z or the view, and the plane's position. */
final class SectionPanel {
  private static final String[] LABELS = {"x", "y", "z", "view"};

  private final NkContext ctx;
  private final WorkbenchModel model;

  SectionPanel(NkContext ctx, WorkbenchModel model) {
    this.ctx = ctx;
    this.model = model;
  }

  void draw(MemoryStack stack) {
    SectionControl section = model.section();
    nk_layout_row_dynamic(ctx, 20, 1);
    boolean on = nk_check_label(ctx, "section plane", section.on());
    nk_layout_row_dynamic(ctx, 20, 4);
    int axis = section.axis();
    for (int a = 0; a < LABELS.length; a++) {
      if (nk_option_label(ctx, LABELS[a], axis == a)) {
        axis = a;
      }
    }
    double[] n = section.normal(axis, model.camera());
    double[] range = section.extent(n);
    nk_layout_row_dynamic(ctx, 20, 1);
    FloatBuffer pos = stack.floats(section.start(axis, range));
    float lo = (float) range[0];
    float hi = (float) range[1];
    nk_slider_float(ctx, lo, pos, hi, (hi - lo) / 200);
    nk_label(
        ctx,
        (axis == SectionControl.VIEW ? "depth" : LABELS[axis])
            + " = "
            + Annotations.length(pos.get(0)),
        NK_TEXT_LEFT);
    section.apply(on, axis, pos.get(0), n, model.settings());
  }
}
