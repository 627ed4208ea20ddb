package dev.soakfield.cli;

import dev.soakfield.law.api.SourceLawProvider;
import java.io.IOException;
import java.io.OutputStream;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.jar.JarEntry;
import java.util.jar.JarOutputStream;
import java.util.stream.Stream;
import javax.tools.JavaCompiler;
import javax.tools.ToolProvider;

/**
 * Builds a plugin jar the way a plugin author's build does: compiles a source tree against the law
 * API alone with the JDK's compiler and packs the classes with a resource tree (the service file).
 */
final class PluginJarBuilder {
  private PluginJarBuilder() {}

  /** Compiles every .java under {@code sources} and jars the classes and {@code resources}. */
  static Path build(Path sources, Path resources, Path jar) throws IOException {
    Path classes = Files.createTempDirectory(jar.getParent().getParent(), "classes");
    List<String> args =
        new ArrayList<>(List.of("--release", "17", "-d", classes.toString(), "-cp", lawApi()));
    try (Stream<Path> files = Files.walk(sources)) {
      files
          .filter(f -> f.toString().endsWith(".java"))
          .sorted()
          .forEach(f -> args.add(f.toString()));
    }
    JavaCompiler javac = ToolProvider.getSystemJavaCompiler();
    java.io.ByteArrayOutputStream messages = new java.io.ByteArrayOutputStream();
    if (javac.run(null, null, messages, args.toArray(String[]::new)) != 0) {
      throw new IllegalStateException(
          "plugin sources under "
              + sources
              + " do not compile:\n"
              + messages.toString(StandardCharsets.UTF_8));
    }
    try (OutputStream out = Files.newOutputStream(jar);
        JarOutputStream jos = new JarOutputStream(out)) {
      add(jos, classes);
      if (Files.isDirectory(resources)) {
        add(jos, resources);
      }
    }
    return jar;
  }

  /** A jar holding only a service file with {@code serviceFile} as its text. */
  static Path serviceFileOnly(Path jar, String serviceFile) throws IOException {
    try (OutputStream out = Files.newOutputStream(jar);
        JarOutputStream jos = new JarOutputStream(out)) {
      jos.putNextEntry(new JarEntry("META-INF/services/" + SourceLawProvider.class.getName()));
      jos.write(serviceFile.getBytes(StandardCharsets.UTF_8));
      jos.closeEntry();
    }
    return jar;
  }

  private static void add(JarOutputStream jos, Path root) throws IOException {
    try (Stream<Path> files = Files.walk(root)) {
      for (Path f : files.filter(Files::isRegularFile).sorted().toList()) {
        jos.putNextEntry(new JarEntry(root.relativize(f).toString().replace('\\', '/')));
        jos.write(Files.readAllBytes(f));
        jos.closeEntry();
      }
    }
  }

  /** Where the law API's classes are: its jar or its target/classes (nothing of the solver). */
  private static String lawApi() {
    try {
      return Path.of(
              SourceLawProvider.class.getProtectionDomain().getCodeSource().getLocation().toURI())
          .toString();
    } catch (URISyntaxException e) {
      throw new IllegalStateException(e);
    }
  }
}
