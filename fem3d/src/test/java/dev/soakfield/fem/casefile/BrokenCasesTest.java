package dev.soakfield.fem.casefile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import dev.soakfield.fem.run.RunPipeline;
import dev.soakfield.mesh.MeshInputException;
import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;

/** Every case of the broken-cases corpus gives its own clear error (see its README). */
class BrokenCasesTest {
  static Path corpus() throws URISyntaxException {
    return Path.of(BrokenCasesTest.class.getResource("/broken-cases/box.msh").toURI()).getParent();
  }

  static List<Path> cases() throws IOException, URISyntaxException {
    try (Stream<Path> s = Files.list(corpus())) {
      return s.filter(p -> p.toString().endsWith(".json")).sorted().toList();
    }
  }

  @Test
  void theCorpusHoldsAtLeastThirtyCasesEachWithItsExpectation()
      throws IOException, URISyntaxException {
    List<Path> cases = cases();
    assertTrue(cases.size() >= 30, cases.size() + " cases");
    for (Path c : cases) {
      assertTrue(Files.exists(expectation(c)), "no .expect for " + c.getFileName());
    }
  }

  static Path expectation(Path caseFile) {
    String name = caseFile.getFileName().toString();
    return caseFile.resolveSibling(name.substring(0, name.length() - 5) + ".expect");
  }

  @TestFactory
  Stream<DynamicTest> eachBrokenCaseGivesItsClearError() throws IOException, URISyntaxException {
    return cases().stream()
        .map(c -> DynamicTest.dynamicTest(c.getFileName().toString(), () -> check(c)));
  }

  private static void check(Path caseFile) throws IOException {
    List<String> expect = Files.readAllLines(expectation(caseFile), StandardCharsets.UTF_8);
    String kind = expect.get(0);
    List<String> fragments = expect.subList(1, expect.size());
    String message;
    try {
      RunPipeline.Prepared p = RunPipeline.prepare(caseFile);
      assertEquals("warning", kind, caseFile.getFileName() + " was accepted");
      message = String.join("\n", p.warnings());
    } catch (CaseInputException e) {
      assertEquals("case", kind, e.getMessage());
      message = e.getMessage();
      assertTrue(message.startsWith(caseFile.getFileName().toString()), message);
      assertFalse(e.problems().isEmpty());
      assertTrue(e.problems().get(0).line() > 0, "a line for " + message);
    } catch (MeshInputException e) {
      assertEquals("mesh", kind, e.getMessage());
      message = e.getMessage();
    } catch (RuntimeException e) {
      fail(caseFile.getFileName() + " gave a defect instead of a clear error: " + e, e);
      return;
    }
    for (String f : fragments) {
      assertTrue(message.contains(f), "'" + f + "' not in: " + message);
    }
    assertFalse(message.contains("Exception"), message);
  }
}
