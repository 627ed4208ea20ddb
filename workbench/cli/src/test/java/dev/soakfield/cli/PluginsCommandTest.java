package dev.soakfield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class PluginsCommandTest {
  @TempDir Path dir;

  @Test
  void listsTheBuiltInLawsWithTheirParameters() {
    CliRun r = CliRun.of("plugins");
    assertEquals(ExitCodes.OK, r.exitCode(), r.err());
    for (String id : new String[] {"consumption", "trap-kinetic", "trap-equilibrium"}) {
      assertTrue(r.out().contains(id + ": "), r.out());
    }
    assertTrue(r.out().contains("from class path"), r.out());
    assertTrue(r.out().matches("(?s).*binding-energy +J/mol +required +0 to 500000 .*"), r.out());
    assertTrue(r.out().matches("(?s).*activation-energy +J/mol +0 +0 to 1e\\+06 .*"), r.out());
    assertTrue(r.out().contains("caution: plugins are code"), r.out());
  }

  @Test
  void aBrokenJarIsBadInputNamingTheJarAndTheClass() throws Exception {
    Path plugins = Files.createDirectories(dir.resolve("plugins"));
    PluginJarBuilder.serviceFileOnly(plugins.resolve("broken.jar"), "org.example.Gone\n");
    CliRun r = CliRun.of("plugins", "--plugins", plugins.toString());
    assertEquals(ExitCodes.BAD_INPUT, r.exitCode(), r.out());
    assertTrue(r.err().contains("broken.jar"), r.err());
    assertTrue(r.err().contains("org.example.Gone"), r.err());
    assertFalse(r.err().contains("at dev.soakfield"), r.err());
  }

  @Test
  void aMissingFolderIsBadInputForPluginsAndForRun() {
    Path missing = dir.resolve("no-such-folder");
    CliRun r = CliRun.of("plugins", "--plugins", missing.toString());
    assertEquals(ExitCodes.BAD_INPUT, r.exitCode(), r.out());
    assertTrue(r.err().contains(missing.toString()), r.err());
    CliRun run =
        CliRun.of(
            "run",
            dir.resolve("case.json").toString(),
            "--out",
            dir.resolve("out").toString(),
            "--plugins",
            missing.toString());
    assertEquals(ExitCodes.BAD_INPUT, run.exitCode(), run.out());
    assertTrue(run.err().contains("plugins folder " + missing), run.err());
  }
}
