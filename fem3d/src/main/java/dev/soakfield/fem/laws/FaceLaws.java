package dev.soakfield.fem.laws;

import dev.soakfield.law.api.FaceLawProvider;
import java.util.Iterator;
import java.util.Map;
import java.util.ServiceConfigurationError;
import java.util.ServiceLoader;

/** Loads the face-law providers a class loader offers into the catalog's map by id. */
final class FaceLaws {
  private FaceLaws() {}

  /**
   * @param onlyFrom when not null, only providers whose class this loader defined (a plugins
   *     folder's; the class path's were loaded already)
   * @throws PluginLoadException when a provider cannot be loaded or an id is taken
   */
  static void load(
      ClassLoader loader, ClassLoader onlyFrom, LawOrigin origin, Map<String, FaceLawEntry> into) {
    Iterator<ServiceLoader.Provider<FaceLawProvider>> it =
        ServiceLoader.load(FaceLawProvider.class, loader).stream().iterator();
    while (true) {
      FaceLawProvider p;
      try {
        if (!it.hasNext()) {
          return;
        }
        ServiceLoader.Provider<FaceLawProvider> next = it.next();
        if (onlyFrom != null && next.type().getClassLoader() != onlyFrom) {
          continue;
        }
        p = next.get();
      } catch (ServiceConfigurationError | LinkageError e) {
        throw new PluginLoadException(
            origin.describe() + ": a face-law provider cannot be loaded: " + e.getMessage(), e);
      }
      FaceLawEntry entry = new FaceLawEntry(p, origin);
      FaceLawEntry earlier = into.putIfAbsent(p.id(), entry);
      if (earlier != null) {
        throw new PluginLoadException(
            "face law id '"
                + p.id()
                + "' is declared by both "
                + earlier.describe()
                + " and "
                + entry.describe()
                + ", expected each id once");
      }
    }
  }
}
