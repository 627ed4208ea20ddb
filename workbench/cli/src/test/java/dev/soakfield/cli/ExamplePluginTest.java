package dev.soakfield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.soakfield.fem.laws.GuardedLaw;
import dev.soakfield.fem.laws.LawBinding;
import dev.soakfield.fem.laws.LawEntry;
import dev.soakfield.fem.laws.LawOrigin;
import dev.soakfield.fem.laws.SourceLawCatalog;
import dev.soakfield.law.api.LawPoint;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The example plugin project (plugins/example-law) built as its author would, dropped into a
 * plugins folder, found by the catalog, listed by {@code soakfield plugins} and used by a case.
 */
class ExamplePluginTest {
  @TempDir Path dir;

  record Point(double concentration, double temperature, double time, double dt)
      implements LawPoint {}

  private Path exampleJar(Path plugins) throws Exception {
    Path project = Path.of("../..").toAbsolutePath().normalize().resolve("plugins/example-law");
    assertTrue(Files.isDirectory(project), "example project at " + project);
    return PluginJarBuilder.build(
        project.resolve("src/main/java"),
        project.resolve("src/main/resources"),
        plugins.resolve("saturating-consumption-1.0.0.jar"));
  }

  @Test
  void theExampleProjectDependsOnTheLawApiAloneOutsideItsTests() throws Exception {
    Path pom = Path.of("../../plugins/example-law/pom.xml").toAbsolutePath().normalize();
    var doc =
        javax.xml.parsers.DocumentBuilderFactory.newInstance()
            .newDocumentBuilder()
            .parse(pom.toFile());
    var deps = doc.getElementsByTagName("dependency");
    List<String> shipped = new java.util.ArrayList<>();
    for (int i = 0; i < deps.getLength(); i++) {
      var d = (org.w3c.dom.Element) deps.item(i);
      String scope = text(d, "scope");
      if (!"test".equals(scope)) {
        shipped.add(text(d, "groupId") + ":" + text(d, "artifactId") + ":" + scope);
      }
    }
    assertEquals(List.of("dev.soakfield:law-api:provided"), shipped);
  }

  private static String text(org.w3c.dom.Element e, String tag) {
    var nodes = e.getElementsByTagName(tag);
    return nodes.getLength() == 0 ? "" : nodes.item(0).getTextContent().trim();
  }

  /** Negative control: a law that reaches past the law API into the solver does not compile. */
  @Test
  void aLawThatImportsTheSolverDoesNotCompileAgainstTheLawApi() throws Exception {
    Path src = Files.createDirectories(dir.resolve("src/org/example/bad"));
    Files.writeString(
        src.resolve("ReachingLaw.java"),
        """
        package org.example.bad;

        final class ReachingLaw {
          static double parse(String text) {
            return dev.soakfield.fem.units.SiValue.parse(text, "1/s");
          }
        }
        """);
    Path plugins = Files.createDirectories(dir.resolve("bad-plugins"));
    IllegalStateException e =
        org.junit.jupiter.api.Assertions.assertThrows(
            IllegalStateException.class,
            () ->
                PluginJarBuilder.build(
                    dir.resolve("src"), dir.resolve("none"), plugins.resolve("bad.jar")));
    assertTrue(
        e.getMessage().contains("package dev.soakfield.fem.units does not exist"), e.getMessage());
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

  private Path sealedCube(String source) throws Exception {
    return Samples.sealedCube(dir, source, "2.0");
  }

  @Test
  void aCaseRunsWithTheExampleLawFromItsPluginsFolder() throws Exception {
    Path plugins = Files.createDirectories(dir.resolve("plugins"));
    exampleJar(plugins);
    Path c =
        sealedCube(
            """
            { "law": "saturating-consumption", "max-rate": 2e-3, "half-saturation": "0.5" }""");
    Path out = dir.resolve("out");
    CliRun r =
        CliRun.of("run", c.toString(), "--out", out.toString(), "--plugins", plugins.toString());
    assertEquals(ExitCodes.OK, r.exitCode(), r.err());
    JsonNode summary = new ObjectMapper().readTree(out.resolve("summary.json").toFile());
    double volume = 1e-9;
    double cEnd = summary.get("balance").get("amount_end").asDouble() / volume;
    // sealed faces and a uniform start keep c uniform: the integrated Michaelis–Menten equation
    // K·ln(c0/c) + (c0 − c) = v·t holds; backward Euler with 200 steps is within 0.5 %
    double vt = 0.5 * Math.log(2.0 / cEnd) + (2.0 - cEnd);
    assertEquals(2e-3 * 1000, vt, 5e-3 * 2e-3 * 1000);
    assertTrue(
        Math.abs(summary.get("balance").get("relative").asDouble()) < 1e-8, summary.toString());
  }

  @Test
  void aCaseNamingAnUnknownLawOrParameterIsBadInputWithTheClosestName() throws Exception {
    Path c = sealedCube("{ \"law\": \"trap-equilibrum\", \"trap-density\": 1 }");
    CliRun r = CliRun.of("run", c.toString(), "--out", dir.resolve("out").toString());
    assertEquals(ExitCodes.BAD_INPUT, r.exitCode(), r.err());
    assertTrue(r.err().contains("'trap-equilibrium' (did you mean it?)"), r.err());
    assertTrue(r.err().contains("line 3"), r.err());
    Path typo =
        sealedCube(
            """
            { "law": "consumption", "rate-constnt": 1e-4 }""");
    CliRun t = CliRun.of("run", typo.toString(), "--out", dir.resolve("out").toString());
    assertEquals(ExitCodes.BAD_INPUT, t.exitCode(), t.err());
    assertTrue(t.err().contains("rate-constnt"), t.err());
    assertTrue(t.err().contains("'rate-constant' (did you mean it?)"), t.err());
    assertTrue(t.err().contains("rate-constant: found nothing"), t.err());
    assertFalse(Files.exists(dir.resolve("out")));
  }
}
