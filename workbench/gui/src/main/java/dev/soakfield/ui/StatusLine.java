package dev.soakfield.ui;

import static org.lwjgl.nuklear.Nuklear.*;

/**
 * The line under the time strip: what the mouse does in the current mode, then the last message.
 */
final class StatusLine {
  private StatusLine() {}

  static String mouse(CasePanel.Mode mode) {
    return switch (mode) {
      case PICK_FACES ->
          "Faces: click selects a group, Shift+click adds or drops one; drag turns, wheel zooms";
      case PLACE_PROBES ->
          "Probes: click on the part (or the cut) places a probe; drag turns, wheel zooms";
      case LOOK -> "Look: click on the part shows its value through time; drag turns, wheel zooms";
    };
  }

  static void draw(org.lwjgl.nuklear.NkContext ctx, Widgets w, Workbench wb) {
    nk_layout_row_dynamic(ctx, 18, 1);
    String hover = wb.model().probe().hover();
    w.place("status");
    nk_label(
        ctx, mouse(wb.casePanel().mode()) + (hover.isEmpty() ? "" : "  |  " + hover), NK_TEXT_LEFT);
    String m = wb.actions().message();
    if (!m.isEmpty()) {
      w.label(m, wb.actions().messageIsError() ? 0xff7a7a : 0x8fd18f); // readable on the dark strip
    }
  }
}
