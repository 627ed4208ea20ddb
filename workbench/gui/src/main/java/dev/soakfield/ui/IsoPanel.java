package dev.soakfield.ui;

import static org.lwjgl.nuklear.Nuklear.*;

import dev.soakfield.app.Annotations;
import dev.soakfield.app.IsoControl;
import dev.soakfield.app.ViewSettings;
import dev.soakfield.app.WorkbenchModel;
import java.nio.FloatBuffer;
import org.lwjgl.nuklear.NkContext;
import org.lwjgl.system.MemoryStack;

/** The isosurface controls: on/off, its level within the colour limits, and its opacity. */
final class IsoPanel {
  private final NkContext ctx;
  private final WorkbenchModel model;

  IsoPanel(NkContext ctx, WorkbenchModel model) {
    this.ctx = ctx;
    this.model = model;
  }

  void draw(MemoryStack stack) {
    IsoControl iso = model.iso();
    ViewSettings settings = model.settings();
    nk_layout_row_dynamic(ctx, 20, 1);
    boolean on = nk_check_label(ctx, "isosurface", iso.on());
    FloatBuffer level = stack.floats(iso.level());
    float lo = (float) model.scene().low();
    float hi = (float) model.scene().high();
    nk_slider_float(ctx, lo, level, hi, (hi - lo) / 200);
    nk_label(ctx, "level " + Annotations.number(level.get(0)), NK_TEXT_LEFT);
    FloatBuffer alpha = stack.floats(settings.isoOpacity());
    nk_label(ctx, "opacity", NK_TEXT_LEFT);
    nk_slider_float(ctx, 0.05f, alpha, 1f, 0.05f);
    if (alpha.get(0) != settings.isoOpacity()) {
      settings.isoOpacity(alpha.get(0));
    }
    iso.apply(on, level.get(0), settings);
  }
}
