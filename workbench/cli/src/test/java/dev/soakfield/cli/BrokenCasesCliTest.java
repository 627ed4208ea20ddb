package dev.soakfield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;

/** The broken-cases corpus of fem3d through the command line: exit 2, a message, no trace. */
class BrokenCasesCliTest {
  static final Path CORPUS =
      Path.of("..", "..", "fem3d", "src", "test", "resources", "broken-cases")
          .toAbsolutePath()
          .normalize();

  @TestFactory
  Stream<DynamicTest> checkAndRunRejectEachWithoutAStackTrace() throws IOException {
    List<Path> cases;
    try (Stream<Path> s = Files.list(CORPUS)) {
      cases = s.filter(p -> p.toString().endsWith(".json")).sorted().toList();
    }
    assertTrue(cases.size() >= 30);
    return cases.stream()
        .map(
            c ->
                DynamicTest.dynamicTest(
                    c.getFileName().toString(),
                    () -> {
                      String name = c.getFileName().toString();
                      String expect =
                          Files.readAllLines(c.resolveSibling(name.replace(".json", ".expect")))
                              .get(0);
                      CliRun r = CliRun.of("check", c.toString());
                      if (expect.equals("warning")) {
                        assertEquals(0, r.exitCode(), r.err());
                        assertTrue(r.out().contains("warning: "), r.out());
                        return;
                      }
                      assertEquals(ExitCodes.BAD_INPUT, r.exitCode(), r.err());
                      assertTrue(r.err().startsWith("soakfield: "), r.err());
                      assertFalse(r.err().contains("Exception"), r.err());
                      assertFalse(r.err().contains("\tat "), r.err());
                      assertEquals("", r.out());
                    }));
  }
}
