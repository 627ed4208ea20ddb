package dev.soakfield.fem.laws;

/**
 * A plugins folder, a plugin jar or a provider that cannot be loaded: a missing folder, a broken
 * service file, a provider class that does not load, a duplicate law id. The message names the
 * folder or jar and the class, what was found and what was expected; callers show it without a
 * stack trace.
 */
public final class PluginLoadException extends RuntimeException {
  private static final long serialVersionUID = 1L;

  public PluginLoadException(String message) {
    super(message);
  }

  public PluginLoadException(String message, Throwable cause) {
    super(message, cause);
  }
}
