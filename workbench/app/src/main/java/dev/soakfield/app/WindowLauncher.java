package dev.soakfield.app;

import dev.soakfield.app.setup.SetupSession;
import java.util.Optional;

/**
 * Opens the workbench window. The gui module provides it (found by {@link GraphicsServices}); the
 * headless command line has none, so it never loads a windowing library.
 */
public interface WindowLauncher {
  /** Why no window can be shown here (no display, say), or empty when one can. */
  Optional<String> whyNoWindow();

  /** Opens the window on {@code session} and returns when it is closed. */
  void open(SetupSession session);
}
