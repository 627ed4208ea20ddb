package dev.soakfield.ui;

import static org.lwjgl.nuklear.Nuklear.*;

import dev.soakfield.app.Annotations;
import dev.soakfield.app.Playback;
import dev.soakfield.app.ViewSettings;
import dev.soakfield.app.WorkbenchModel;
import dev.soakfield.fem.results.StoredRun;
import java.nio.FloatBuffer;
import java.util.Locale;
import java.util.Optional;
import org.lwjgl.nuklear.NkContext;
import org.lwjgl.system.MemoryStack;

/** The "Time" strip below the view: the frame slider, play/pause and its speed, the time shown. */
final class TimePanel {
  private final NkContext ctx;
  private final Widgets widgets;
  private final WorkbenchModel model;

  TimePanel(Widgets widgets, WorkbenchModel model) {
    this.ctx = widgets.ctx();
    this.widgets = widgets;
    this.model = model;
  }

  void draw(MemoryStack stack) {
    Optional<StoredRun> r = model.study().results();
    if (r.isEmpty()) {
      nk_layout_row_dynamic(ctx, 20, 1);
      nk_label(ctx, "no results yet: run the case (Ctrl+R) to see fields over time", NK_TEXT_LEFT);
      return;
    }
    ViewSettings settings = model.settings();
    Playback playback = model.playback();
    int frames = r.get().frameCount();
    nk_layout_row_dynamic(ctx, 22, 1);
    var f = stack.ints(settings.frame());
    widgets.place("time slider");
    nk_slider_int(ctx, 0, f, frames - 1, 1);
    if (f.get(0) != settings.frame()) {
      settings.frame(f.get(0));
    }
    nk_layout_row_dynamic(ctx, 22, 4);
    if (nk_button_label(ctx, playback.playing() ? "pause" : "play")) {
      playback.toggle();
    }
    FloatBuffer speed = stack.floats(playback.framesPerSecond());
    nk_property_float(ctx, "frames/s", 0.25f, speed, 30f, 0.25f, 0.05f);
    playback.framesPerSecond(speed.get(0));
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
}
