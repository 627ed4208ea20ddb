package dev.soakfield.ui;

import static org.lwjgl.glfw.GLFW.GLFW_MOUSE_BUTTON_LEFT;
import static org.lwjgl.glfw.GLFW.GLFW_MOUSE_BUTTON_MIDDLE;
import static org.lwjgl.glfw.GLFW.GLFW_MOUSE_BUTTON_RIGHT;
import static org.lwjgl.nuklear.Nuklear.NK_BUTTON_LEFT;
import static org.lwjgl.nuklear.Nuklear.NK_BUTTON_MIDDLE;
import static org.lwjgl.nuklear.Nuklear.NK_BUTTON_RIGHT;
import static org.lwjgl.nuklear.Nuklear.nk_input_button;
import static org.lwjgl.nuklear.Nuklear.nk_input_motion;
import static org.lwjgl.nuklear.Nuklear.nk_input_scroll;
import static org.lwjgl.nuklear.Nuklear.nk_item_is_any_active;
import static org.lwjgl.nuklear.Nuklear.nk_window_is_any_hovered;

import dev.soakfield.app.PickIndex;
import dev.soakfield.app.WorkbenchModel;
import java.util.Optional;
import org.lwjgl.nuklear.NkContext;
import org.lwjgl.nuklear.NkVec2;
import org.lwjgl.system.MemoryStack;

/**
 * The mouse on the window: passed to the panels, and on the view left drag turns the part, right
 * drag moves it, the wheel zooms and a click (a press and release that barely moved) picks.
 */
final class ViewGestures {
  private static final int CLICK_SLOP = 3;

  /** What a click on the view does in the current mode. */
  interface ClickAction {
    /** A click at view pixel (x, y); {@code adding} when Shift was held. */
    void click(double x, double y, boolean adding);
  }

  private final NkContext ctx;
  private final WorkbenchModel model;
  private ClickAction onClick;
  private boolean shift;
  private final ViewLayout layout;
  private double mouseX;
  private double mouseY;
  private double pressX;
  private double pressY;
  private int dragButton = -1;
  private boolean dragged;
  private boolean overPanels;

  ViewGestures(NkContext ctx, WorkbenchModel model, ViewLayout layout) {
    this.ctx = ctx;
    this.model = model;
    this.layout = layout;
    this.onClick = (x, y, adding) -> model.probe().click(model.scene(), model.camera(), x, y);
  }

  void onClick(ClickAction action) {
    onClick = action;
  }

  /** Whether Shift is held (told by the window with each button event). */
  void shift(boolean held) {
    shift = held;
  }

  /** Whether the view is being dragged now (the renderer then draws a lighter picture). */
  boolean dragging() {
    return dragButton >= 0 && dragged;
  }

  /** Before the panels are laid out: notes whether they hold the pointer, and what is under it. */
  void beginFrame() {
    overPanels = nk_window_is_any_hovered(ctx) || nk_item_is_any_active(ctx);
    if (dragButton < 0 && layout.contains(mouseX, mouseY) && !overPanels) {
      Optional<PickIndex.Hit> h =
          model.scene().pick(model.camera(), mouseX - ViewLayout.LEFT, mouseY);
      model.probe().hover(h.map(model.scene()::describe).orElse(""));
    }
  }

  void mouseMove(double x, double y) {
    nk_input_motion(ctx, (int) x, (int) y);
    double dx = x - mouseX;
    double dy = y - mouseY;
    mouseX = x;
    mouseY = y;
    if (dragButton >= 0) {
      if (Math.abs(x - pressX) + Math.abs(y - pressY) > CLICK_SLOP) {
        dragged = true;
      }
      if (dragged && dragButton == GLFW_MOUSE_BUTTON_LEFT) {
        model.camera().orbit(-0.4 * dx, 0.4 * dy);
      } else if (dragged) {
        model.camera().pan(dx, dy);
      }
    }
  }

  void mouseButton(int button, boolean pressed, double x, double y) {
    int nkButton =
        button == GLFW_MOUSE_BUTTON_RIGHT
            ? NK_BUTTON_RIGHT
            : button == GLFW_MOUSE_BUTTON_MIDDLE ? NK_BUTTON_MIDDLE : NK_BUTTON_LEFT;
    nk_input_button(ctx, nkButton, (int) x, (int) y, pressed);
    mouseX = x;
    mouseY = y;
    if (pressed) {
      if (!overPanels && layout.contains(x, y)) {
        dragButton = button;
        dragged = false;
        pressX = x;
        pressY = y;
      }
    } else if (dragButton == button) {
      if (!dragged && button == GLFW_MOUSE_BUTTON_LEFT) {
        onClick.click(x - ViewLayout.LEFT, y, shift);
      }
      dragButton = -1;
    }
  }

  void scroll(double dy) {
    try (MemoryStack stack = MemoryStack.stackPush()) {
      nk_input_scroll(ctx, NkVec2.malloc(stack).set(0, (float) dy));
    }
    if (!overPanels && layout.contains(mouseX, mouseY)) {
      model.camera().zoom(Math.pow(1.15, dy));
    }
  }
}
