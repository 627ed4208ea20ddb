package dev.soakfield.app.setup;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.casefile.CaseInputException;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The material library file: the shipped examples, a user's own entries, and bad entries. */
class MaterialLibraryTest {
  @TempDir Path dir;

  @Test
  void theShippedEntriesReadAsCaseMaterialsAndSayTheyAreExamples() {
    List<MaterialLibrary.Entry> examples = MaterialLibrary.examples();
    assertEquals(4, examples.size());
    for (MaterialLibrary.Entry e : examples) {
      assertTrue(e.note().startsWith("EXAMPLE"), e.name());
      assertTrue(e.material().has("diffusivity") && e.material().has("solubility"), e.name());
    }
  }

  @Test
  void aUsersEntryIsKeptAndReadBackAndGoesIntoACase() throws IOException {
    Path file = dir.resolve("lib").resolve("materials.json");
    assertTrue(MaterialLibrary.read(file).isEmpty());
    var material = CaseText.parse("{\"diffusivity\": 3.1e-12, \"solubility\": 0.8}", file, "m");
    MaterialLibrary.keep(
        file, new MaterialLibrary.Entry("lot 42", "measured", "lab report 7", material));
    MaterialLibrary.keep(
        file, new MaterialLibrary.Entry("lot 43", "measured", "lab report 8", material));
    List<MaterialLibrary.Entry> back = MaterialLibrary.read(file);
    assertEquals(
        List.of("lot 42", "lot 43"), back.stream().map(MaterialLibrary.Entry::name).toList());
    assertEquals(3.1e-12, back.get(0).material().path("diffusivity").asDouble());
    assertEquals("lab report 7", back.get(0).source());
  }

  @Test
  void aWrongKeyInAnEntryIsNamedWithTheFileAndItsPath() throws IOException {
    Path file =
        Files.writeString(
            dir.resolve("bad.json"),
            """
            { "soakfield-material-library": 1,
              "materials": { "lot 1": { "material": { "diffusivty": 1e-12, "solubility": 1 } } } }
            """);
    CaseInputException e = assertThrows(CaseInputException.class, () -> MaterialLibrary.read(file));
    assertTrue(e.getMessage().startsWith(file.toString()), e.getMessage());
    assertTrue(e.getMessage().contains("materials.lot 1.material"), e.getMessage());
    assertTrue(e.getMessage().contains("diffusivity"), e.getMessage());
    Path notOne = Files.writeString(dir.resolve("other.json"), "{ \"materials\": {} }");
    CaseInputException v =
        assertThrows(CaseInputException.class, () -> MaterialLibrary.read(notOne));
    assertTrue(v.getMessage().contains("material library"), v.getMessage());
    Path broken =
        Files.writeString(dir.resolve("broken.json"), "{ \"soakfield-material-library\": 1,");
    assertTrue(
        assertThrows(CaseInputException.class, () -> MaterialLibrary.read(broken))
            .getMessage()
            .contains("malformed JSON"));
  }
}
