package dev.soakfield.ui;

import static org.lwjgl.nuklear.Nuklear.*;

import dev.soakfield.app.Annotations;
import dev.soakfield.app.RoundTicks;
import java.util.List;
import org.lwjgl.nuklear.NkColor;
import org.lwjgl.nuklear.NkCommandBuffer;
import org.lwjgl.nuklear.NkContext;
import org.lwjgl.nuklear.NkRect;
import org.lwjgl.system.MemoryStack;

/**
 * A line plot drawn on the panel's canvas with real axes: round-number ticks with their values, the
 * axis titles with units, and one curve per series in its colour.
 */
final class AxesPlot {
  private static final int LEFT = 58;
  private static final int BOTTOM = 30;
  private static final int TOP = 6;
  private static final int RIGHT = 10;

  private AxesPlot() {}

  /**
   * Draws the curves y(x) in a widget of the given height.
   *
   * @param x abscissae, increasing, in the axis unit
   * @param curves ordinates, each as long as {@code x}
   * @param colours 0xRRGGBB per curve
   */
  static void draw(
      NkContext ctx,
      int height,
      double[] x,
      List<double[]> curves,
      int[] colours,
      String xTitle,
      String yTitle) {
    nk_layout_row_dynamic(ctx, height, 1);
    try (MemoryStack stack = MemoryStack.stackPush()) {
      NkRect r = NkRect.malloc(stack);
      if (nk_widget(r, ctx) == NK_WIDGET_INVALID || x.length < 2) {
        return;
      }
      NkCommandBuffer canvas = nk_window_get_canvas(ctx);
      float x0 = r.x() + LEFT;
      float x1 = r.x() + r.w() - RIGHT;
      float y0 = r.y() + r.h() - BOTTOM;
      float y1 = r.y() + TOP;
      double lo = 0;
      double hi = 0;
      for (double[] c : curves) {
        for (double v : c) {
          lo = Math.min(lo, v);
          hi = Math.max(hi, v);
        }
      }
      if (!(hi > lo)) {
        hi = lo + 1;
      }
      double xlo = x[0];
      double xhi = x[x.length - 1] > xlo ? x[x.length - 1] : xlo + 1;
      NkColor ink = colour(stack, 0xd8d8d8);
      NkColor grid = colour(stack, 0x4a4a4a);
      nk_fill_rect(
          canvas,
          nk_rect(x0, y1, x1 - x0, y0 - y1, NkRect.malloc(stack)),
          0,
          colour(stack, 0x2b2b2b));
      for (double t : RoundTicks.within(xlo, xhi, 4)) {
        float px = (float) (x0 + (t - xlo) / (xhi - xlo) * (x1 - x0));
        nk_stroke_line(canvas, px, y1, px, y0 + 4, 1, grid);
        text(ctx, canvas, stack, Annotations.number(t), px - 20, y0 + 5, 40, ink);
      }
      for (double v : RoundTicks.within(lo, hi, 3)) {
        float py = (float) (y0 - (v - lo) / (hi - lo) * (y0 - y1));
        nk_stroke_line(canvas, x0 - 4, py, x1, py, 1, grid);
        text(ctx, canvas, stack, Annotations.number(v), r.x(), py - 8, LEFT - 6, ink);
      }
      nk_stroke_line(canvas, x0, y0, x1, y0, 1.5f, ink);
      nk_stroke_line(canvas, x0, y0, x0, y1, 1.5f, ink);
      for (int c = 0; c < curves.size(); c++) {
        double[] y = curves.get(c);
        NkColor col = colour(stack, colours[c % colours.length]);
        for (int i = 1; i < x.length; i++) {
          nk_stroke_line(
              canvas,
              (float) (x0 + (x[i - 1] - xlo) / (xhi - xlo) * (x1 - x0)),
              (float) (y0 - (y[i - 1] - lo) / (hi - lo) * (y0 - y1)),
              (float) (x0 + (x[i] - xlo) / (xhi - xlo) * (x1 - x0)),
              (float) (y0 - (y[i] - lo) / (hi - lo) * (y0 - y1)),
              2,
              col);
        }
      }
      text(ctx, canvas, stack, xTitle, x0, y0 + 15, x1 - x0, ink);
      text(ctx, canvas, stack, yTitle, x0 + 4, y1, x1 - x0 - 8, ink);
    }
  }

  private static void text(
      NkContext ctx,
      NkCommandBuffer canvas,
      MemoryStack stack,
      String s,
      float x,
      float y,
      float w,
      NkColor ink) {
    nk_draw_text(
        canvas,
        nk_rect(x, y, w, 16, NkRect.malloc(stack)),
        s,
        ctx.style().font(),
        colour(stack, 0x2b2b2b),
        ink);
  }

  static NkColor colour(MemoryStack stack, int rgb) {
    return NkColor.malloc(stack).set((byte) (rgb >> 16), (byte) (rgb >> 8), (byte) rgb, (byte) 255);
  }
}
