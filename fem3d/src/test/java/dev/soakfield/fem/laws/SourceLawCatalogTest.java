package dev.soakfield.fem.laws;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.law.api.SourceLawProvider;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SourceLawCatalogTest {
  @TempDir Path dir;

  private Path folder(String name) throws Exception {
    return Files.createDirectories(dir.resolve(name));
  }

  private Path goodJar(Path folder, String jarName, String pkg, String id) throws Exception {
    return PluginJars.build(
        folder.resolve(jarName),
        Map.of(pkg + ".TestProvider", PluginJars.provider(pkg, "TestProvider", id, "")),
        "# a comment\n" + pkg + ".TestProvider  # trailing comment\n\n");
  }

  @Test
  void findsAJarsProviderAndRecordsTheJarAsItsOrigin() throws Exception {
    Path plugins = folder("plugins");
    Path jar = goodJar(plugins, "linear.jar", "org.example.one", "linear-test");
    Path lib = PluginJars.build(plugins.resolve("lib.jar"), Map.of(), "");
    SourceLawCatalog catalog = SourceLawCatalog.load(List.of(plugins));
    LawEntry e = catalog.find("linear-test").orElseThrow();
    assertEquals(LawOrigin.jar(jar), e.origin());
    assertEquals(jar.toAbsolutePath().normalize().toString(), e.origin().describe());
    assertEquals("org.example.one.TestProvider", e.provider().getClass().getName());
    assertEquals(List.of(lib), catalog.jarsWithoutLaws());
    assertEquals(List.of(plugins.toAbsolutePath().normalize()), catalog.folders());
    // each folder gets its own loader, whose parent is fem3d's
    ClassLoader loader = e.provider().getClass().getClassLoader();
    assertEquals(SourceLawProvider.class.getClassLoader(), loader.getParent());
  }

  @Test
  void theSameIdInTwoFoldersNamesBothOrigins() throws Exception {
    Path a = goodJar(folder("a"), "first.jar", "org.example.a", "twin");
    Path b = goodJar(folder("b"), "second.jar", "org.example.b", "twin");
    PluginLoadException ex =
        assertThrows(
            PluginLoadException.class,
            () -> SourceLawCatalog.load(List.of(dir.resolve("a"), dir.resolve("b"))));
    assertTrue(ex.getMessage().contains("'twin'"), ex.getMessage());
    assertTrue(ex.getMessage().contains(a.toAbsolutePath().toString()), ex.getMessage());
    assertTrue(ex.getMessage().contains(b.toAbsolutePath().toString()), ex.getMessage());
  }

  @Test
  void aServiceFileNamingAMissingClassNamesTheJarAndTheClass() throws Exception {
    Path plugins = folder("p");
    Path jar =
        PluginJars.build(
            plugins.resolve("broken.jar"),
            Map.of("org.example.c.Real", PluginJars.provider("org.example.c", "Real", "real", "")),
            "org.example.c.Real\norg.example.c.Missing\n");
    PluginLoadException ex =
        assertThrows(PluginLoadException.class, () -> SourceLawCatalog.load(List.of(plugins)));
    assertTrue(ex.getMessage().contains(jar.toString()), ex.getMessage());
    assertTrue(ex.getMessage().contains("org.example.c.Missing"), ex.getMessage());
    assertTrue(ex.getMessage().contains("not found in the jar"), ex.getMessage());
  }

  @Test
  void aServiceFileWithAnIllegalLineNamesTheLine() throws Exception {
    Path plugins = folder("p");
    PluginJars.build(plugins.resolve("typo.jar"), Map.of(), "\norg.example.Not A Class\n");
    PluginLoadException ex =
        assertThrows(PluginLoadException.class, () -> SourceLawCatalog.load(List.of(plugins)));
    assertTrue(ex.getMessage().contains("typo.jar"), ex.getMessage());
    assertTrue(ex.getMessage().contains("line 2"), ex.getMessage());
    assertTrue(ex.getMessage().contains("'org.example.Not A Class'"), ex.getMessage());
  }

  @Test
  void aProviderWhoseConstructorThrowsNamesTheJarAndTheClass() throws Exception {
    Path plugins = folder("p");
    PluginJars.build(
        plugins.resolve("throws.jar"),
        Map.of(
            "org.example.d.Bad",
            PluginJars.provider(
                "org.example.d", "Bad", "bad", "throw new IllegalStateException(\"no licence\");")),
        "org.example.d.Bad\n");
    PluginLoadException ex =
        assertThrows(PluginLoadException.class, () -> SourceLawCatalog.load(List.of(plugins)));
    assertTrue(ex.getMessage().contains("throws.jar"), ex.getMessage());
    assertTrue(ex.getMessage().contains("org.example.d.Bad"), ex.getMessage());
    assertTrue(ex.getMessage().contains("no licence"), ex.getMessage());
  }

  @Test
  void aClassThatIsNoProviderIsAnError() throws Exception {
    Path plugins = folder("p");
    PluginJars.build(
        plugins.resolve("other.jar"),
        Map.of("org.example.e.Plain", "package org.example.e; public class Plain {}"),
        "org.example.e.Plain\n");
    PluginLoadException ex =
        assertThrows(PluginLoadException.class, () -> SourceLawCatalog.load(List.of(plugins)));
    assertTrue(ex.getMessage().contains("does not implement"), ex.getMessage());
    assertTrue(ex.getMessage().contains("other.jar"), ex.getMessage());
  }

  @Test
  void anIllegalIdNamesTheProvider() throws Exception {
    Path plugins = folder("p");
    PluginJars.build(
        plugins.resolve("id.jar"),
        Map.of("org.example.f.P", PluginJars.provider("org.example.f", "P", "Big Law", "")),
        "org.example.f.P\n");
    PluginLoadException ex =
        assertThrows(PluginLoadException.class, () -> SourceLawCatalog.load(List.of(plugins)));
    assertTrue(ex.getMessage().contains("'Big Law'"), ex.getMessage());
    assertTrue(ex.getMessage().contains("org.example.f.P in "), ex.getMessage());
  }

  @Test
  void aMissingFolderIsAnError() {
    Path missing = dir.resolve("nowhere");
    PluginLoadException ex =
        assertThrows(PluginLoadException.class, () -> SourceLawCatalog.load(List.of(missing)));
    assertTrue(ex.getMessage().contains(missing.toString()), ex.getMessage());
    assertTrue(ex.getMessage().contains("not found"), ex.getMessage());
  }

  @Test
  void anUnknownIdGetsTheClosestKnownOne() throws Exception {
    Path plugins = folder("p");
    goodJar(plugins, "l.jar", "org.example.g", "linear-test");
    SourceLawCatalog catalog = SourceLawCatalog.load(List.of(plugins));
    assertTrue(catalog.find("linear-tset").isEmpty());
    String m = catalog.unknownLawMessage("linear-tset");
    assertTrue(m.contains("'linear-test' (did you mean it?)"), m);
  }
}
