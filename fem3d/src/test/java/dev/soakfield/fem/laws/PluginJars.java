package dev.soakfield.fem.laws;

import dev.soakfield.law.api.SourceLawProvider;
import java.io.IOException;
import java.io.OutputStream;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.jar.JarEntry;
import java.util.jar.JarOutputStream;
import java.util.stream.Stream;
import javax.tools.JavaCompiler;
import javax.tools.ToolProvider;

/**
 * Builds plugin jars for tests: compiles Java sources against fem3d's classes with the JDK's
 * compiler and packs them with a service file, so that the classes exist only in the jar (not on
 * the test class path, where the parent class loader would find them first).
 */
final class PluginJars {
  private PluginJars() {}

  /**
   * A jar at {@code jar} with the classes of {@code sources} (binary name to source text) and, when
   * {@code serviceFile} is not empty, that text as the provider-configuration file.
   */
  static Path build(Path jar, Map<String, String> sources, String serviceFile) throws IOException {
    Path work = Files.createTempDirectory(jar.getParent(), "src");
    Path classes = Files.createDirectories(work.resolve("classes"));
    List<String> args = new ArrayList<>(List.of("-d", classes.toString(), "-classpath", fem3d()));
    for (Map.Entry<String, String> s : sources.entrySet()) {
      Path file = work.resolve(s.getKey().replace('.', '/') + ".java");
      Files.createDirectories(file.getParent());
      Files.writeString(file, s.getValue());
      args.add(file.toString());
    }
    JavaCompiler javac = ToolProvider.getSystemJavaCompiler();
    if (!sources.isEmpty() && javac.run(null, null, null, args.toArray(String[]::new)) != 0) {
      throw new IllegalStateException("test plugin sources do not compile");
    }
    try (OutputStream out = Files.newOutputStream(jar);
        JarOutputStream jos = new JarOutputStream(out);
        Stream<Path> files = Files.walk(classes)) {
      for (Path f : files.filter(Files::isRegularFile).sorted().toList()) {
        jos.putNextEntry(new JarEntry(classes.relativize(f).toString().replace('\\', '/')));
        jos.write(Files.readAllBytes(f));
        jos.closeEntry();
      }
      if (!serviceFile.isEmpty()) {
        jos.putNextEntry(new JarEntry(ServiceFile.NAME));
        jos.write(serviceFile.getBytes(StandardCharsets.UTF_8));
        jos.closeEntry();
      }
    }
    return jar;
  }

  /** A provider of a stateless law π = rate·c with one parameter "rate" (1/s). */
  static String provider(String pkg, String className, String id, String constructorBody) {
    return """
        package %s;
        import dev.soakfield.law.api.*;
        import java.util.List;
        public final class %s implements SourceLawProvider {
          public %s() { %s }
          @Override public String id() { return "%s"; }
          @Override public String description() { return "A test law, pi = rate*c."; }
          @Override public List<LawParameter> parameters() {
            return List.of(LawParameter.required("rate", "1/s", "rate constant", -1e3, 1e3));
          }
          @Override public SourceLaw create(LawParameters v) {
            double k = v.get("rate");
            return new SourceLaw() {
              @Override public List<String> stateNames() { return List.of(); }
              @Override public void initialState(double c, double t, double[] s) {}
              @Override public void rate(LawPoint at, StateView s, RateSink out) {
                out.set(k * at.concentration(), k);
              }
              @Override public void advance(LawPoint at, StateView s, double[] end) {}
            };
          }
        }
        """
        .formatted(pkg, className, className, constructorBody, id);
  }

  private static String fem3d() {
    try {
      return Path.of(
              SourceLawProvider.class.getProtectionDomain().getCodeSource().getLocation().toURI())
          .toString();
    } catch (URISyntaxException e) {
      throw new IllegalStateException(e);
    }
  }
}
