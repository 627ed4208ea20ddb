package dev.soakfield.ui;

import dev.soakfield.app.WindowLauncher;
import dev.soakfield.app.setup.SetupSession;
import dev.soakfield.render.GlRuntime;
import java.util.Optional;

/** The window service of the application jar: GLFW on X11 and the Nuklear workbench. */
public final class WorkbenchLauncher implements WindowLauncher {
  @Override
  public Optional<String> whyNoWindow() {
    return GlRuntime.whyNoWindow();
  }

  @Override
  public void open(SetupSession session) {
    WorkbenchWindow.run(session);
  }
}
