package dev.soakfield.app;

import java.util.Optional;
import java.util.ServiceLoader;

/**
 * Finds the window and the renderer on the class path. They sit in the gui module, which the
 * application jar carries and the headless jar leaves out; callers say {@link #NO_WINDOW} when one
 * is missing.
 */
public final class GraphicsServices {
  /** What a command that needs the window or the renderer says in the headless build. */
  public static final String NO_WINDOW = "this build has no window; use soakfield.jar";

  private GraphicsServices() {}

  public static Optional<WindowLauncher> window() {
    return first(WindowLauncher.class);
  }

  public static Optional<PictureMaker> pictures() {
    return first(PictureMaker.class);
  }

  public static Optional<ViewBenchmark> viewBenchmark() {
    return first(ViewBenchmark.class);
  }

  private static <T> Optional<T> first(Class<T> type) {
    return ServiceLoader.load(type, GraphicsServices.class.getClassLoader()).findFirst();
  }
}
