package dev.soakfield.ui;

import static org.lwjgl.glfw.GLFW.*;

/** The keyboard contract (also in the README and the help overlay). */
final class Shortcuts {
  private final Workbench wb;

  Shortcuts(Workbench wb) {
    this.wb = wb;
  }

  /** A key press with its modifier bits; returns whether it was a shortcut. */
  boolean press(int key, int mods) {
    boolean ctrl = (mods & GLFW_MOD_CONTROL) != 0;
    boolean shift = (mods & GLFW_MOD_SHIFT) != 0;
    WorkbenchActions a = wb.actions();
    var draft = wb.session().draft();
    if (ctrl) {
      switch (key) {
        case GLFW_KEY_O -> a.openWithDialog();
        case GLFW_KEY_S -> {
          if (shift) {
            a.saveAsWithDialog();
          } else {
            a.save();
          }
        }
        case GLFW_KEY_R -> a.run();
        case GLFW_KEY_Z ->
            draft.ifPresent(
                d -> {
                  if (shift) {
                    d.redo();
                  } else {
                    d.undo();
                  }
                });
        case GLFW_KEY_Y -> draft.ifPresent(d -> d.redo());
        default -> {
          return false;
        }
      }
      return true;
    }
    if (key == GLFW_KEY_ESCAPE) {
      if (wb.helpShown()) {
        wb.toggleHelp();
      } else if (a.confirming()) {
        a.dismissConfirmation();
      } else {
        a.cancelRun();
      }
      return true;
    }
    if (key == GLFW_KEY_F1) {
      wb.toggleHelp();
      return true;
    }
    if (wb.widgets().typing()) {
      return false; // letters and Space belong to the field being edited
    }
    if (key == GLFW_KEY_F) {
      wb.model().camera().fit(wb.model().study().geometry().bounds());
      return true;
    }
    if (key == GLFW_KEY_SPACE) {
      wb.model().playback().toggle();
      return true;
    }
    return false;
  }
}
