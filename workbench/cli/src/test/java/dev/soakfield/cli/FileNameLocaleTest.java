package dev.soakfield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A file name the system cannot hold is the user's to change (exit 2, what to do), not an internal
 * error or picocli's conversion trace. Under the POSIX locale the JVM decodes arguments and file
 * names as ASCII (the JDK's sun.jnu.encoding follows LC_ALL/LANG; common practice on Linux).
 */
class FileNameLocaleTest {
  @TempDir Path dir;

  @Test
  void aNameNoFileSystemCanHoldIsRefusedWithTheWayOut() {
    // a NUL byte is not allowed in a Unix file name under any locale
    CliRun r = CliRun.of("check", "case\u0000.json");
    assertEquals(ExitCodes.BAD_INPUT, r.exitCode(), r.err());
    assertTrue(r.err().contains("cannot be a file name"), r.err());
    assertTrue(r.err().contains("LC_ALL=C.UTF-8"), r.err());
    assertFalse(r.err().contains("Exception"), r.err());
  }

  @Test
  void aNameInsideACaseFileIsRefusedTheSameWay() throws IOException {
    Path c =
        Files.writeString(
            dir.resolve("case.json"),
            "{ \"mesh\": \"part\\u0000.msh\", \"materials\": {}, \"time\": { \"end\": 1 } }");
    CliRun r = CliRun.of("check", c.toString());
    assertEquals(ExitCodes.BAD_INPUT, r.exitCode(), r.err());
    assertFalse(r.err().contains("internal error"), r.err());
    assertTrue(r.err().contains("mesh: found"), r.err());
    assertTrue(r.err().contains("expected a valid file path"), r.err());
  }

  @Test
  void underThePosixLocaleAnAccentedNameGetsTheLocaleExplanation() throws Exception {
    // the parent must hand the accent over intact, which needs its own UTF-8 file-name encoding
    assumeTrue(
        "UTF-8".equalsIgnoreCase(System.getProperty("sun.jnu.encoding")),
        "this JVM does not encode arguments in UTF-8");
    ProcessBuilder pb =
        new ProcessBuilder(
            List.of(
                Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp",
                System.getProperty("java.class.path"),
                SoakfieldCli.class.getName(),
                "check",
                dir.resolve("pöd.case.json").toString()));
    pb.environment().put("LC_ALL", "C");
    pb.environment().put("LANG", "C");
    pb.redirectErrorStream(true);
    Process p = pb.start();
    String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
    assertTrue(p.waitFor(60, TimeUnit.SECONDS));
    assertEquals(ExitCodes.BAD_INPUT, p.exitValue(), out);
    assertTrue(out.contains("cannot be a file name under this system's locale"), out);
    assertTrue(out.contains("not characters of that encoding"), out);
    assertFalse(out.contains("InvalidPathException"), out);
  }
}
