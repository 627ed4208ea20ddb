package dev.soakfield.fem.laws;

import dev.soakfield.fem.casefile.NameSuggestion;
import dev.soakfield.law.api.LawParameter;
import dev.soakfield.law.api.SourceLawProvider;
import java.io.IOException;
import java.lang.reflect.Modifier;
import java.net.MalformedURLException;
import java.net.URL;
import java.net.URLClassLoader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.ServiceConfigurationError;
import java.util.ServiceLoader;
import java.util.Set;
import java.util.TreeMap;
import java.util.regex.Pattern;
import java.util.stream.Stream;

/**
 * Every source law the application can use: the providers on its class path (the built-in laws),
 * found by {@link ServiceLoader}, and those in the jars of each plugins folder the user names, each
 * folder through a class loader of its own whose parent is fem3d's. Loading is all or nothing: a
 * missing folder, a broken service file, a provider that fails to load or a duplicate id is a
 * {@link PluginLoadException} naming the jar and the class; nothing is skipped.
 *
 * <p>Plugins are code with full trust. Only folders given here are searched; a case file never
 * names code.
 */
public final class SourceLawCatalog {
  private static final Pattern ID = Pattern.compile("[a-z0-9]+(-[a-z0-9]+)*");

  private final Map<String, LawEntry> byId;
  private final Map<String, FaceLawEntry> faceById;
  private final List<Path> folders;
  private final List<Path> jarsWithoutLaws;

  private SourceLawCatalog(
      Map<String, LawEntry> byId,
      Map<String, FaceLawEntry> faceById,
      List<Path> folders,
      List<Path> jarsWithoutLaws) {
    this.byId = byId;
    this.faceById = faceById;
    this.folders = folders;
    this.jarsWithoutLaws = jarsWithoutLaws;
  }

  /**
   * The class path's laws and those of the jars in {@code folders} (each folder's {@code *.jar}
   * files, not its sub-folders). The class loaders stay open for the life of the application.
   *
   * @throws PluginLoadException when a folder, jar or provider cannot be loaded, or two providers
   *     share an id
   */
  public static SourceLawCatalog load(List<Path> folders) {
    Map<String, LawEntry> byId = new TreeMap<>();
    Map<String, FaceLawEntry> faceById = new TreeMap<>();
    ClassLoader parent = SourceLawCatalog.class.getClassLoader();
    loadClassPath(parent, byId);
    FaceLaws.load(parent, null, LawOrigin.classPath(), faceById);
    List<Path> libraries = new ArrayList<>();
    List<Path> normalized = new ArrayList<>();
    for (Path folder : folders) {
      Path f = folder.toAbsolutePath().normalize();
      if (!normalized.contains(f)) {
        normalized.add(f);
        loadFolder(f, parent, byId, libraries, faceById);
      }
    }
    return new SourceLawCatalog(
        java.util.Collections.unmodifiableMap(byId),
        java.util.Collections.unmodifiableMap(faceById),
        List.copyOf(normalized),
        List.copyOf(libraries));
  }

  /** The built-in laws only. */
  public static SourceLawCatalog classPathOnly() {
    return load(List.of());
  }

  /** Every law, ordered by id. */
  public List<LawEntry> entries() {
    return List.copyOf(byId.values());
  }

  /** Every law id, ordered. */
  public Set<String> ids() {
    return byId.keySet();
  }

  /** Every face law, ordered by id. */
  public List<FaceLawEntry> faceEntries() {
    return List.copyOf(faceById.values());
  }

  /** The face law with {@code id}. */
  public Optional<FaceLawEntry> findFace(String id) {
    return Optional.ofNullable(faceById.get(id));
  }

  /** The message for a case that names an unknown face law, with the known ones. */
  public String unknownFaceLawMessage(String id) {
    StringBuilder sb = new StringBuilder("found face law '").append(id).append("', expected ");
    Optional<String> near = NameSuggestion.likely(id, faceById.keySet());
    near.ifPresent(
        n -> sb.append("'").append(n).append("' (did you mean it?); the known face laws are "));
    if (near.isEmpty()) {
      sb.append("one of ");
    }
    return sb.append(faceById.isEmpty() ? "(none)" : String.join(", ", faceById.keySet()))
        .toString();
  }

  /** The law with {@code id}. */
  public Optional<LawEntry> find(String id) {
    return Optional.ofNullable(byId.get(id));
  }

  /**
   * The message for a case that names an unknown law: the closest id when it is a likely typo, the
   * known ids, and where plugins come from.
   */
  public String unknownLawMessage(String id) {
    StringBuilder sb = new StringBuilder("found law '").append(id).append("', expected ");
    Optional<String> near = NameSuggestion.likely(id, byId.keySet());
    if (near.isPresent()) {
      sb.append("'").append(near.get()).append("' (did you mean it?); the known laws are ");
    } else {
      sb.append("one of ");
    }
    sb.append(String.join(", ", byId.keySet()));
    return sb.append(" (laws of plugins are found only in the folders given with --plugins and in ")
        .append(PluginFolders.defaultFolder())
        .append(")")
        .toString();
  }

  /**
   * The resolver the run pipeline uses for a case's {@code "source": {"law": ...}}: unknown ids and
   * parameters that do not fit are {@link dev.soakfield.fem.casefile.CaseInputException}s at the
   * source's place.
   */
  public dev.soakfield.fem.model.LawResolver resolver() {
    return new CatalogLawResolver(this);
  }

  /** The plugins folders searched, absolute, in the order given. */
  public List<Path> folders() {
    return folders;
  }

  /**
   * Jars in the plugins folders that declare no provider: libraries that plugins use, or jars put
   * there by mistake; listings show them so that they are not overlooked.
   */
  public List<Path> jarsWithoutLaws() {
    return jarsWithoutLaws;
  }

  private static void loadClassPath(ClassLoader loader, Map<String, LawEntry> byId) {
    Iterator<SourceLawProvider> it = ServiceLoader.load(SourceLawProvider.class, loader).iterator();
    while (true) {
      SourceLawProvider p;
      try {
        if (!it.hasNext()) {
          return;
        }
        p = it.next();
      } catch (ServiceConfigurationError e) {
        throw new PluginLoadException(
            "a source-law provider on the application's class path cannot be loaded: "
                + e.getMessage(),
            e);
      }
      add(new LawEntry(p, LawOrigin.classPath()), byId);
    }
  }

  private static void loadFolder(
      Path folder,
      ClassLoader parent,
      Map<String, LawEntry> byId,
      List<Path> libraries,
      Map<String, FaceLawEntry> faceById) {
    if (!Files.isDirectory(folder)) {
      throw new PluginLoadException(
          "plugins folder "
              + folder
              + ": "
              + (Files.exists(folder) ? "is a file" : "not found")
              + ", expected a folder holding plugin jars");
    }
    List<Path> jars = jarsIn(folder);
    if (jars.isEmpty()) {
      return;
    }
    URLClassLoader loader =
        new URLClassLoader(
            "soakfield-plugins " + folder, urls(jars), parent); // open for the life of the laws
    FaceLaws.load(loader, loader, LawOrigin.jar(folder), faceById);
    Map<String, Path> declaredBy = new LinkedHashMap<>();
    for (Path jar : jars) {
      List<String> names = ServiceFile.providerNames(jar);
      if (names.isEmpty()) {
        libraries.add(jar);
      }
      for (String name : names) {
        Path earlier = declaredBy.putIfAbsent(name, jar);
        if (earlier != null) {
          throw new PluginLoadException(
              "plugins folder "
                  + folder
                  + ": provider class "
                  + name
                  + " is declared by both "
                  + earlier.getFileName()
                  + " and "
                  + jar.getFileName()
                  + ", expected each provider in one jar only");
        }
        checkLoadable(name, jar, loader);
      }
    }
    Set<String> created = new HashSet<>();
    Iterator<ServiceLoader.Provider<SourceLawProvider>> it =
        ServiceLoader.load(SourceLawProvider.class, loader).stream().iterator();
    while (true) {
      ServiceLoader.Provider<SourceLawProvider> p;
      try {
        if (!it.hasNext()) {
          break;
        }
        p = it.next();
      } catch (ServiceConfigurationError e) {
        throw new PluginLoadException(
            "plugins folder " + folder + ": a provider cannot be loaded: " + e.getMessage(), e);
      }
      String name = p.type().getName();
      Path jar = declaredBy.get(name);
      if (jar == null) {
        continue; // declared on the class path, loaded there already
      }
      SourceLawProvider provider;
      try {
        provider = p.get();
      } catch (ServiceConfigurationError | RuntimeException | LinkageError e) {
        Throwable cause = e.getCause() != null ? e.getCause() : e;
        throw new PluginLoadException(
            "plugin jar " + jar + ", class " + name + ": cannot be created (" + cause + ")", e);
      }
      created.add(name);
      add(new LawEntry(provider, LawOrigin.jar(jar)), byId);
    }
    for (Map.Entry<String, Path> d : declaredBy.entrySet()) {
      if (!created.contains(d.getKey())) {
        throw new PluginLoadException(
            "plugin jar "
                + d.getValue()
                + ", class "
                + d.getKey()
                + ": declared in its service file but not found by java.util.ServiceLoader");
      }
    }
  }

  private static List<Path> jarsIn(Path folder) {
    try (Stream<Path> files = Files.list(folder)) {
      return files
          .filter(f -> f.getFileName().toString().endsWith(".jar") && Files.isRegularFile(f))
          .sorted()
          .toList();
    } catch (IOException e) {
      throw new PluginLoadException(
          "plugins folder " + folder + ": cannot be listed (" + e.getMessage() + ")", e);
    }
  }

  private static URL[] urls(List<Path> jars) {
    URL[] urls = new URL[jars.size()];
    for (int i = 0; i < urls.length; i++) {
      try {
        urls[i] = jars.get(i).toUri().toURL();
      } catch (MalformedURLException e) {
        throw new PluginLoadException("plugin jar " + jars.get(i) + ": no URL for its path", e);
      }
    }
    return urls;
  }

  /** Checks what ServiceLoader would otherwise report without naming the jar. */
  private static void checkLoadable(String name, Path jar, ClassLoader loader) {
    String where = "plugin jar " + jar + ", class " + name + ": ";
    Class<?> type;
    try {
      type = Class.forName(name, false, loader);
    } catch (ClassNotFoundException e) {
      throw new PluginLoadException(
          where + "named in " + ServiceFile.NAME + " but not found in the jar", e);
    } catch (LinkageError e) {
      throw new PluginLoadException(where + "cannot be loaded (" + e + ")", e);
    }
    if (type.getClassLoader() != loader) {
      throw new PluginLoadException(
          where
              + "is a class of the application itself, expected a class of the plugin (a jar"
              + " declares only its own providers)");
    }
    if (!SourceLawProvider.class.isAssignableFrom(type)) {
      throw new PluginLoadException(
          where + "does not implement " + SourceLawProvider.class.getName());
    }
    if (!Modifier.isPublic(type.getModifiers()) || Modifier.isAbstract(type.getModifiers())) {
      throw new PluginLoadException(where + "expected a public, concrete class");
    }
    try {
      if (!Modifier.isPublic(type.getConstructor().getModifiers())) {
        throw new PluginLoadException(where + "expected a public constructor without arguments");
      }
    } catch (NoSuchMethodException e) {
      throw new PluginLoadException(where + "expected a public constructor without arguments", e);
    }
  }

  private static void add(LawEntry entry, Map<String, LawEntry> byId) {
    String id = checkDeclaration(entry);
    LawEntry earlier = byId.putIfAbsent(id, entry);
    if (earlier != null) {
      throw new PluginLoadException(
          "source law id '"
              + id
              + "' is provided twice: by "
              + earlier.describe()
              + " and by "
              + entry.describe()
              + "; expected each id once (remove one of the jars)");
    }
  }

  /** The provider's id, once its id, description and parameters are found sane. */
  private static String checkDeclaration(LawEntry entry) {
    String where = "source-law provider " + entry.describe() + ": ";
    try {
      String id = entry.provider().id();
      if (id == null || !ID.matcher(id).matches()) {
        throw new PluginLoadException(
            where + "found id '" + id + "', expected lower-case letters, digits and '-'");
      }
      String description = entry.provider().description();
      if (description == null || description.isBlank()) {
        throw new PluginLoadException(where + "found no description, expected one sentence");
      }
      List<LawParameter> parameters = entry.provider().parameters();
      if (parameters == null) {
        throw new PluginLoadException(where + "found no parameter list, expected a list");
      }
      Set<String> names = new HashSet<>();
      for (LawParameter p : parameters) {
        if (p == null || !names.add(p.name()) || p.name().equals(LawBinding.LAW_KEY)) {
          throw new PluginLoadException(
              where
                  + "found parameter "
                  + (p == null ? "null" : "'" + p.name() + "'")
                  + ", expected distinct names other than '"
                  + LawBinding.LAW_KEY
                  + "'");
        }
      }
      return id;
    } catch (RuntimeException | LinkageError e) {
      if (e instanceof PluginLoadException ple) {
        throw ple;
      }
      throw new PluginLoadException(where + "fails to declare itself (" + e + ")", e);
    }
  }
}
