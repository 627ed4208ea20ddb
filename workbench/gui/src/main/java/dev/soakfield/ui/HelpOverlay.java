package dev.soakfield.ui;

import static org.lwjgl.nuklear.Nuklear.*;

import org.lwjgl.nuklear.NkContext;
import org.lwjgl.nuklear.NkRect;
import org.lwjgl.system.MemoryStack;

/** The keys and mouse, over the view (F1 or the Keys button shows and hides it; Esc hides it). */
final class HelpOverlay {
  /** Key, then what it does; the README's table says the same. */
  static final String[][] KEYS = {
    {"Ctrl+O", "open a mesh, a case or a result folder"},
    {"Ctrl+S", "save the case"},
    {"Ctrl+Shift+S", "save the case as another file"},
    {"Ctrl+R", "run the open case (saves it first)"},
    {"Esc", "cancel a running run (or close this help)"},
    {"Ctrl+Z", "undo"},
    {"Ctrl+Y, Ctrl+Shift+Z", "redo"},
    {"F", "fit the view to the part"},
    {"Space", "play or pause the time slider"},
    {"F1", "show or hide this help"},
    {"left drag / right drag / wheel", "turn / move / zoom the view"},
    {"click, Shift+click", "select a face group, add one (Faces); place a probe (Probes)"},
  };

  private HelpOverlay() {}

  static void draw(NkContext ctx, int width, int height) {
    try (MemoryStack stack = MemoryStack.stackPush()) {
      NkRect r = NkRect.malloc(stack);
      int w = 700;
      int h = 24 * KEYS.length + 60;
      if (nk_begin(
          ctx,
          "Keys and mouse",
          nk_rect((width - w) / 2f, (height - h) / 3f, w, h, r),
          NK_WINDOW_BORDER | NK_WINDOW_TITLE | NK_WINDOW_NO_SCROLLBAR)) {
        for (String[] k : KEYS) {
          nk_layout_row_begin(ctx, NK_DYNAMIC, 20, 2);
          nk_layout_row_push(ctx, 0.32f);
          nk_label(ctx, k[0], NK_TEXT_LEFT);
          nk_layout_row_push(ctx, 0.68f);
          nk_label(ctx, k[1], NK_TEXT_LEFT);
          nk_layout_row_end(ctx);
        }
      }
      nk_end(ctx);
    }
  }
}
