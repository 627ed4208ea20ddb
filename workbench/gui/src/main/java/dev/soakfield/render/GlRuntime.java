package dev.soakfield.render;

import static org.lwjgl.glfw.GLFW.*;

import java.io.PrintStream;
import java.util.Optional;
import org.lwjgl.glfw.GLFWErrorCallback;
import org.lwjgl.opengl.GL;
import org.lwjgl.system.Configuration;

/**
 * The process's one GLFW start and its OpenGL function table. GLFW starts on X11 when a display
 * answers (windows, and hidden windows for pictures); otherwise on GLFW's null platform with Mesa's
 * OSMesa contexts, which render with no display at all. The X11 platform is pinned, since the
 * bundled GLFW would also try Wayland. OpenGL functions are looked up through GLFW (explicit init),
 * which is what the OSMesa path needs and works on X11 as well.
 */
public final class GlRuntime {
  /** How GLFW runs in this process. */
  public enum Platform {
    X11,
    OSMESA
  }

  private static Platform platform;
  private static String x11Failure = "";
  private static boolean functionsLoaded;

  private GlRuntime() {}

  /**
   * Starts GLFW on X11 if a display answers, else on the null platform with OSMesa.
   *
   * @throws IllegalStateException when neither works, with both reasons
   */
  public static synchronized Platform start() {
    if (platform != null) {
      return platform;
    }
    Configuration.OPENGL_EXPLICIT_INIT.set(true);
    StringBuilder errors = new StringBuilder();
    GLFWErrorCallback.create(
            (code, desc) -> errors.append(GLFWErrorCallback.getDescription(desc)).append("; "))
        .set();
    glfwInitHint(GLFW_PLATFORM, GLFW_PLATFORM_X11);
    if (glfwInit()) {
      platform = Platform.X11;
      return platform;
    }
    x11Failure = errors.length() == 0 ? "no X display" : errors.toString();
    errors.setLength(0);
    glfwInitHint(GLFW_PLATFORM, GLFW_PLATFORM_NULL);
    if (glfwInit()) {
      platform = Platform.OSMESA;
      return platform;
    }
    throw new IllegalStateException(
        "no way to render: X11 failed ("
            + x11Failure
            + "), the null platform failed ("
            + errors
            + ")");
  }

  /** Whether a window can be shown: GLFW started on X11. */
  public static synchronized Optional<String> whyNoWindow() {
    start();
    return platform == Platform.X11 ? Optional.empty() : Optional.of(x11Failure);
  }

  /** Sets the window hints for an OpenGL 3.3 core context on the running platform. */
  static void contextHints(boolean visible) {
    glfwDefaultWindowHints();
    glfwWindowHint(GLFW_CONTEXT_VERSION_MAJOR, 3);
    glfwWindowHint(GLFW_CONTEXT_VERSION_MINOR, 3);
    glfwWindowHint(GLFW_OPENGL_PROFILE, GLFW_OPENGL_CORE_PROFILE);
    glfwWindowHint(GLFW_VISIBLE, visible ? GLFW_TRUE : GLFW_FALSE);
    if (platform == Platform.OSMESA) {
      // OSMesa refuses forward-compatible contexts
      glfwWindowHint(GLFW_CONTEXT_CREATION_API, GLFW_OSMESA_CONTEXT_API);
    } else {
      glfwWindowHint(GLFW_OPENGL_FORWARD_COMPAT, GLFW_TRUE);
    }
  }

  /** Loads the GL function table once, with a context current. */
  static synchronized void loadFunctions() {
    if (!functionsLoaded) {
      GL.create(org.lwjgl.glfw.GLFW::glfwGetProcAddress);
      functionsLoaded = true;
    }
    GL.createCapabilities();
  }

  /** Prints why rendering runs the way it does (for test logs). */
  public static void describe(PrintStream out) {
    out.println(
        "soakfield render: GLFW on "
            + start()
            + (x11Failure.isEmpty() ? "" : " (X11: " + x11Failure + ")"));
  }
}
