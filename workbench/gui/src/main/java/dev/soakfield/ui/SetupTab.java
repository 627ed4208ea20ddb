package dev.soakfield.ui;

import static org.lwjgl.nuklear.Nuklear.*;

import dev.soakfield.app.setup.CaseDraft;
import dev.soakfield.app.setup.SetupSession;
import java.util.function.Supplier;

/** A tab of the case panel that edits the open case; without one it says what to open. */
abstract class SetupTab {
  protected final Widgets w;
  protected final Supplier<SetupSession> session;

  SetupTab(Widgets w, Supplier<SetupSession> session) {
    this.w = w;
    this.session = session;
  }

  final void draw() {
    SetupSession s = session.get();
    if (s.draft().isEmpty()) {
      nk_layout_row_dynamic(w.ctx(), 20, 1);
      nk_label(w.ctx(), "no case open: open a mesh or a case (Ctrl+O)", NK_TEXT_LEFT);
      return;
    }
    draw(s, s.draft().get());
  }

  /** The tab's contents for the open case. */
  abstract void draw(SetupSession s, CaseDraft d);
}
