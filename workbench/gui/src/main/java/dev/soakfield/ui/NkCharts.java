package dev.soakfield.ui;

import static org.lwjgl.nuklear.Nuklear.NK_CHART_LINES;
import static org.lwjgl.nuklear.Nuklear.nk_chart_add_slot_colored;
import static org.lwjgl.nuklear.Nuklear.nk_chart_begin_colored;
import static org.lwjgl.nuklear.Nuklear.nk_chart_end;
import static org.lwjgl.nuklear.Nuklear.nk_chart_push_slot;

import dev.soakfield.app.FaceGroupPalette;
import java.util.List;
import org.lwjgl.nuklear.NkColor;
import org.lwjgl.nuklear.NkContext;
import org.lwjgl.system.MemoryStack;

/** Line charts and palette colours in Nuklear, for the panels. */
final class NkCharts {
  private NkCharts() {}

  /** The face-group palette's colour {@code i}, opaque. */
  static NkColor colour(MemoryStack stack, int i) {
    int rgb = FaceGroupPalette.colourOf(i);
    return NkColor.malloc(stack).set((byte) (rgb >> 16), (byte) (rgb >> 8), (byte) rgb, (byte) 255);
  }

  /** Curves of equal length between {@code lo} and {@code hi}, curve i in palette colour i. */
  static void lines(NkContext ctx, MemoryStack stack, List<double[]> curves, double lo, double hi) {
    if (curves.isEmpty()) {
      return;
    }
    int n = curves.get(0).length;
    NkColor c0 = colour(stack, 0);
    if (nk_chart_begin_colored(ctx, NK_CHART_LINES, c0, c0, n, (float) lo, (float) hi)) {
      for (int i = 1; i < curves.size(); i++) {
        NkColor c = colour(stack, i);
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
}
