package dev.soakfield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.laws.GuardedLaw;
import dev.soakfield.fem.laws.LawBinding;
import dev.soakfield.fem.laws.LawEntry;
import dev.soakfield.fem.laws.LawOrigin;
import dev.soakfield.fem.laws.SourceLawCatalog;
import dev.soakfield.fem.spi.LawPoint;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The example plugin project (plugins/example-law) built as its author would, dropped into a
 * plugins folder, found by the catalog and listed by {@code soakfield plugins}.
 */
class ExamplePluginTest {
  @TempDir Path dir;

  record Point(double concentration, double temperature, double time, double dt)
      implements LawPoint {}

  private Path exampleJar(Path plugins) throws Exception {
    Path project = Path.of("").toAbsolutePath().getParent().resolve("plugins/example-law");
    assertTrue(Files.isDirectory(project), "example project at " + project);
    return PluginJarBuilder.build(
        project.resolve("src/main/java"),
        project.resolve("src/main/resources"),
        plugins.resolve("saturating-consumption-1.0.0.jar"));
  }

  @Test
  void theExamplePluginIsFoundWithItsJarAsOriginAndWorks() throws Exception {
    Path plugins = Files.createDirectories(dir.resolve("plugins"));
    Path jar = exampleJar(plugins);
    SourceLawCatalog catalog = SourceLawCatalog.load(List.of(plugins));
    LawEntry entry = catalog.find("saturating-consumption").orElseThrow();
    assertEquals(LawOrigin.jar(jar), entry.origin());
    for (String builtIn : List.of("consumption", "trap-kinetic", "trap-equilibrium")) {
      assertEquals(LawOrigin.classPath(), catalog.find(builtIn).orElseThrow().origin(), builtIn);
    }
    LawBinding.Result bound =
        LawBinding.bind(entry.provider(), Map.of("max-rate", 2e-3, "half-saturation", "0.5"));
    GuardedLaw law = GuardedLaw.create(entry, bound.parameters().orElseThrow(), "gasket");
    double[] got = new double[2];
    law.rate(
        new Point(0.5, 300, 60, 60),
        k -> 0,
        (r, d) -> {
          got[0] = r;
          got[1] = d;
        });
    // Michaelis & Menten (1913): at c = K the rate is half its maximum, and dπ/dc = −v·K/(K + c)²
    assertEquals(-1e-3, got[0], 1e-15);
    assertEquals(-2e-3 * 0.5 / 1.0, got[1], 1e-15);
  }

  @Test
  void soakfieldPluginsListsTheExampleWithItsJarAndParameters() throws Exception {
    Path plugins = Files.createDirectories(dir.resolve("plugins"));
    Path jar = exampleJar(plugins);
    CliRun r = CliRun.of("plugins", "--plugins", plugins.toString());
    assertEquals(ExitCodes.OK, r.exitCode(), r.err());
    assertTrue(r.out().contains("saturating-consumption: Consumption that saturates"), r.out());
    assertTrue(r.out().contains("from " + jar.toAbsolutePath().normalize()), r.out());
    assertTrue(r.out().contains("max-rate"), r.out());
    assertTrue(r.out().contains("amount/(m^3*s)"), r.out());
  }
}
