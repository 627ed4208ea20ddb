package dev.soakfield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CheckCommandTest {
  @TempDir Path dir;

  @Test
  void aGoodCasePrintsWhatWillRun() throws Exception {
    Path c = Samples.copyTo(dir);
    CliRun r = CliRun.of("check", c.toString());
    assertEquals(0, r.exitCode(), r.err());
    String o = r.out();
    assertTrue(o.contains("no problems found"), o);
    // the sample mesh's own counts (read from the file; 8x8x3 hex cells split in 6 tetrahedra
    // plus the die block give 6912 tetrahedra)
    assertTrue(o.contains("1521 nodes, 6912 tetrahedra; elements linear (4-node)"), o);
    assertTrue(o.contains("zmax") && o.contains("concentration 2.000 kg/m^3"), o);
    assertTrue(o.contains("exchange with environment 1.000 kg/m^3, coefficient 1.000e-08 m/s"), o);
    assertTrue(o.contains("units: concentrations in kg/m^3, amounts in kg, species water"), o);
    // the demo says every exterior group's kind: nothing is sealed only by default
    assertTrue(!o.contains("unassigned exterior groups"), o);
    assertTrue(o.matches("(?s).*xmax\\s+exterior\\s+sealed.*"), o);
    assertTrue(o.contains("die-surface") && o.contains("interface"), o);
    assertTrue(o.contains("time: 0 to 7.00 d (6.048e+05 s), backward-euler"), o);
    assertTrue(o.contains("outputs: fields at 24.0 h, 3.00 d, 7.00 d"), o);
    assertTrue(o.contains("memory: about"), o);
    assertTrue(o.contains("time: roughly"), o);
    assertTrue(!o.contains("warning: face group 'xmax'"), o);
  }

  @Test
  void misspeltKeysAndGroupsAreAllListedWithCloseMatches() throws Exception {
    Samples.copyTo(dir);
    Path c =
        Files.writeString(
            dir.resolve("bad.json"),
            """
            { "mesh": "sensor-pod.msh",
              "materials": { "body": { "diffusivty": 5e-12 },
                             "die": { "diffusivity": 1e-14 } },
              "faces": { "zmx": { "kind": "concentration", "value": 2.0 } },
              "time": { "end": 100, "outptus": [50] } }
            """);
    CliRun r = CliRun.of("check", c.toString());
    assertEquals(ExitCodes.BAD_INPUT, r.exitCode(), r.err());
    String e = r.err();
    assertTrue(e.contains("line 2") && e.contains("did you mean 'diffusivity'?"), e);
    assertTrue(e.contains("line 5") && e.contains("did you mean 'outputs'?"), e);
    assertFalse(e.contains("Exception") || e.contains("\tat "), e);
    // group names are checked once the case binds: fix the keys and the face group is caught
    Files.writeString(
        c, Files.readString(c).replace("diffusivty", "diffusivity").replace("outptus", "outputs"));
    r = CliRun.of("check", c.toString());
    assertEquals(ExitCodes.BAD_INPUT, r.exitCode(), r.err());
    assertTrue(r.err().contains("line 4") && r.err().contains("did you mean 'zmax'?"), r.err());
  }

  @Test
  void aSchemaKeyIsAccepted() throws Exception {
    Samples.copyTo(dir);
    Path c = dir.resolve(Samples.CASE);
    Files.writeString(
        c,
        Files.readString(c).replaceFirst("\\{", "{ \"\\$schema\": \"../docs/case.schema.json\","));
    CliRun r = CliRun.of("check", c.toString());
    assertEquals(0, r.exitCode(), r.err());
  }

  private Path cube(String source, String initial) throws Exception {
    return Samples.sealedCube(dir, source, initial);
  }

  @Test
  void checkBindsSourceLawsAndRestartFoldersAsRunDoes() throws Exception {
    Path good = cube("{ \"law\": \"consumption\", \"rate-constant\": 1e-4 }", "1.0");
    CliRun ok = CliRun.of("check", good.toString());
    assertEquals(ExitCodes.OK, ok.exitCode(), ok.err());
    assertTrue(ok.out().contains("source laws consumption (rate-constant = 1.0E-4)"), ok.out());

    Path typo = cube("{ \"law\": \"consumption\", \"rate-constnt\": 1e-4 }", "1.0");
    CliRun t = CliRun.of("check", typo.toString());
    assertEquals(ExitCodes.BAD_INPUT, t.exitCode(), t.out());
    assertTrue(t.err().contains("rate-constnt"), t.err());
    assertTrue(t.err().contains("line 3"), t.err());
    assertFalse(t.err().contains("Exception"), t.err());

    Path restart = cube("{ \"kind\": \"none\" }", "{ \"from\": \"no-such-run\" }");
    CliRun r = CliRun.of("check", restart.toString());
    assertEquals(ExitCodes.BAD_INPUT, r.exitCode(), r.out());
    assertTrue(r.err().contains("initial.from"), r.err());
  }
}
