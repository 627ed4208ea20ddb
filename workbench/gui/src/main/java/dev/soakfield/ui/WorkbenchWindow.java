package dev.soakfield.ui;

import static org.lwjgl.glfw.GLFW.*;
import static org.lwjgl.nuklear.Nuklear.*;

import dev.soakfield.app.setup.SetupSession;
import dev.soakfield.render.GlSurface;
import java.nio.file.Path;
import org.lwjgl.glfw.GLFWDropCallback;
import org.lwjgl.system.MemoryStack;

/** The window's life: open it, pass GLFW's events to the workbench, draw frames until closed. */
final class WorkbenchWindow {
  private WorkbenchWindow() {}

  /** Opens the window on the session and runs until it is closed. */
  static void run(SetupSession session) {
    GlSurface window =
        GlSurface.window(1400, 860, "Soakfield - " + session.study().source().getFileName());
    try (Workbench wb = new Workbench(window, session)) {
      attach(window.window(), wb);
      while (!glfwWindowShouldClose(window.window())) {
        nk_input_begin(wb.context());
        glfwPollEvents();
        nk_input_end(wb.context());
        wb.frame();
        window.swap();
      }
    } finally {
      window.close();
    }
  }

  private static void attach(long w, Workbench wb) {
    var ctx = wb.context();
    glfwSetCursorPosCallback(w, (win, x, y) -> wb.mouseMove(x, y));
    glfwSetMouseButtonCallback(
        w,
        (win, button, action, mods) -> {
          try (MemoryStack stack = MemoryStack.stackPush()) {
            var cx = stack.mallocDouble(1);
            var cy = stack.mallocDouble(1);
            glfwGetCursorPos(win, cx, cy);
            wb.mouseButton(
                button, action == GLFW_PRESS, cx.get(0), cy.get(0), (mods & GLFW_MOD_SHIFT) != 0);
          }
        });
    glfwSetScrollCallback(w, (win, dx, dy) -> wb.scroll(dy));
    glfwSetCharCallback(w, (win, cp) -> nk_input_unicode(ctx, cp));
    glfwSetDropCallback(
        w,
        (win, count, names) -> {
          if (count > 0) {
            wb.actions().open(Path.of(GLFWDropCallback.getName(names, 0)));
          }
        });
    glfwSetKeyCallback(
        w,
        (win, key, sc, action, mods) -> {
          boolean press = action != GLFW_RELEASE;
          if (action == GLFW_PRESS && wb.key(key, mods)) {
            return;
          }
          switch (key) {
            case GLFW_KEY_BACKSPACE -> nk_input_key(ctx, NK_KEY_BACKSPACE, press);
            case GLFW_KEY_DELETE -> nk_input_key(ctx, NK_KEY_DEL, press);
            case GLFW_KEY_ENTER, GLFW_KEY_KP_ENTER -> nk_input_key(ctx, NK_KEY_ENTER, press);
            case GLFW_KEY_LEFT -> nk_input_key(ctx, NK_KEY_LEFT, press);
            case GLFW_KEY_RIGHT -> nk_input_key(ctx, NK_KEY_RIGHT, press);
            case GLFW_KEY_TAB -> nk_input_key(ctx, NK_KEY_TAB, press);
            default -> {
              // other keys reach text fields as characters
            }
          }
        });
  }
}
