package dev.soakfield.ui;

import static org.lwjgl.nuklear.Nuklear.*;

import dev.soakfield.app.ViewSettings;
import dev.soakfield.app.WorkbenchModel;
import java.nio.FloatBuffer;
import org.lwjgl.nuklear.NkContext;
import org.lwjgl.system.MemoryStack;

/** The colour limits: automatic (the field's range in the frame) or a low and high typed in. */
final class ColourLimitsPanel {
  private final NkContext ctx;
  private final WorkbenchModel model;

  ColourLimitsPanel(NkContext ctx, WorkbenchModel model) {
    this.ctx = ctx;
    this.model = model;
  }

  void draw(MemoryStack stack) {
    ViewSettings settings = model.settings();
    nk_layout_row_dynamic(ctx, 20, 1);
    boolean auto = nk_check_label(ctx, "automatic colour limits", settings.autoRange());
    if (auto && !settings.autoRange()) {
      settings.automaticRange();
    }
    double lo = model.scene().low();
    double hi = model.scene().high();
    double span = Math.max(1e-30, hi - lo);
    FloatBuffer a = stack.floats((float) lo);
    FloatBuffer b = stack.floats((float) hi);
    property("low", a, lo, hi, span);
    property("high", b, lo, hi, span);
    boolean edited = a.get(0) != (float) lo || b.get(0) != (float) hi;
    if ((!auto || edited) && b.get(0) > a.get(0)) {
      if (edited || settings.autoRange()) {
        settings.range(a.get(0), b.get(0));
      }
    }
  }

  private void property(String name, FloatBuffer value, double lo, double hi, double span) {
    nk_property_float(
        ctx,
        name,
        (float) (lo - 10 * span),
        value,
        (float) (hi + 10 * span),
        (float) span / 50,
        (float) span / 200);
  }
}
