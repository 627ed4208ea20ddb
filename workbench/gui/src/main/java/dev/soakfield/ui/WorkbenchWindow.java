package dev.soakfield.ui;

import static org.lwjgl.glfw.GLFW.*;
import static org.lwjgl.nuklear.Nuklear.*;

import dev.soakfield.app.Study;
import dev.soakfield.mesh.MeshInputException;
import dev.soakfield.render.GlSurface;
import java.nio.file.Path;
import java.util.Optional;
import org.lwjgl.system.MemoryStack;
import org.lwjgl.util.tinyfd.TinyFileDialogs;

/** The window's life: open it, pass GLFW's events to the workbench, draw frames until closed. */
final class WorkbenchWindow {
  private WorkbenchWindow() {}

  /** Opens the window on the study (or asks for one) and runs until it is closed. */
  static void run(Optional<Study> maybe) {
    Study study = maybe.orElseGet(WorkbenchWindow::askForStudy);
    GlSurface window = GlSurface.window(1400, 860, "Soakfield - " + study.source().getFileName());
    try (Workbench wb = new Workbench(window, study)) {
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

  private static Study askForStudy() {
    String chosen =
        TinyFileDialogs.tinyfd_openFileDialog(
            "Open a mesh, case or fields.pvd", "", null, null, false);
    if (chosen == null) {
      throw new MeshInputException("file dialog", "", "nothing chosen", "a mesh, case or result");
    }
    Path p = Path.of(chosen);
    return Study.open(p.getFileName().toString().equals("fields.pvd") ? p.getParent() : p);
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
            wb.mouseButton(button, action == GLFW_PRESS, cx.get(0), cy.get(0));
          }
        });
    glfwSetScrollCallback(w, (win, dx, dy) -> wb.scroll(dy));
    glfwSetCharCallback(w, (win, cp) -> nk_input_unicode(ctx, cp));
    glfwSetKeyCallback(
        w,
        (win, key, sc, action, mods) -> {
          boolean press = action != GLFW_RELEASE;
          switch (key) {
            case GLFW_KEY_BACKSPACE -> nk_input_key(ctx, NK_KEY_BACKSPACE, press);
            case GLFW_KEY_DELETE -> nk_input_key(ctx, NK_KEY_DEL, press);
            case GLFW_KEY_ENTER -> nk_input_key(ctx, NK_KEY_ENTER, press);
            case GLFW_KEY_LEFT -> nk_input_key(ctx, NK_KEY_LEFT, press);
            case GLFW_KEY_RIGHT -> nk_input_key(ctx, NK_KEY_RIGHT, press);
            case GLFW_KEY_SPACE -> {
              if (press && !nk_item_is_any_active(ctx)) {
                wb.model().playback().toggle();
              }
            }
            default -> {
              // other keys go to text fields as characters
            }
          }
        });
  }
}
