package dev.soakfield.fem.laws;

import dev.soakfield.law.api.SourceLawProvider;
import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.jar.JarEntry;
import java.util.jar.JarFile;

/**
 * Reads a plugin jar's provider-configuration file ({@code META-INF/services/...SourceLawProvider})
 * with the syntax {@link java.util.ServiceLoader} documents: UTF-8, one binary class name a line,
 * '#' starts a comment, blanks ignored. Read here (and not only by ServiceLoader) so that an error
 * names the jar and the line.
 */
final class ServiceFile {
  static final String NAME = "META-INF/services/" + SourceLawProvider.class.getName();

  private ServiceFile() {}

  /** The provider class names the jar declares, in file order; empty when it has no such file. */
  static List<String> providerNames(Path jar) {
    try (JarFile file = new JarFile(jar.toFile())) {
      JarEntry entry = file.getJarEntry(NAME);
      if (entry == null) {
        return List.of();
      }
      List<String> names = new ArrayList<>();
      try (BufferedReader in =
          new BufferedReader(
              new InputStreamReader(file.getInputStream(entry), StandardCharsets.UTF_8))) {
        int lineNumber = 0;
        for (String line = in.readLine(); line != null; line = in.readLine()) {
          lineNumber++;
          int hash = line.indexOf('#');
          String name = (hash >= 0 ? line.substring(0, hash) : line).strip();
          if (name.isEmpty()) {
            continue;
          }
          if (!isBinaryClassName(name)) {
            throw new PluginLoadException(
                "plugin jar "
                    + jar
                    + ", "
                    + NAME
                    + " line "
                    + lineNumber
                    + ": found '"
                    + name
                    + "', expected a fully qualified class name such as org.example.MyLawProvider");
          }
          if (!names.contains(name)) {
            names.add(name);
          }
        }
      }
      return List.copyOf(names);
    } catch (IOException e) {
      throw new PluginLoadException(
          "plugin jar " + jar + ": cannot be read as a jar (" + e.getMessage() + ")", e);
    }
  }

  static boolean isBinaryClassName(String name) {
    for (String part : name.split("\\.", -1)) {
      if (part.isEmpty() || !Character.isJavaIdentifierStart(part.codePointAt(0))) {
        return false;
      }
      if (!part.codePoints().allMatch(Character::isJavaIdentifierPart)) {
        return false;
      }
    }
    return true;
  }
}
