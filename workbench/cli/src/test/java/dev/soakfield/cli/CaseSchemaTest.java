package dev.soakfield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.networknt.schema.Error;
import com.networknt.schema.InputFormat;
import com.networknt.schema.Schema;
import com.networknt.schema.SchemaRegistry;
import com.networknt.schema.SpecificationVersion;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * docs/case.schema.json checked with a general-purpose JSON Schema validator (networknt, draft
 * 2020-12): every sample case validates, the keys being added validate, and typical mistakes do
 * not.
 */
class CaseSchemaTest {
  /** Tests run in the module folder; the schema and samples are in the repository. */
  static final Path ROOT = Path.of("../..").toAbsolutePath().normalize();

  static Schema schema;

  @BeforeAll
  static void load() throws IOException {
    String text = Files.readString(ROOT.resolve("docs/case.schema.json"));
    schema =
        SchemaRegistry.withDefaultDialect(SpecificationVersion.DRAFT_2020_12)
            .getSchema(text, InputFormat.JSON);
  }

  /** Case files may hold comments (as the case reader allows): parse them away, as it does. */
  static String withoutComments(String caseText) throws IOException {
    ObjectMapper mapper = new ObjectMapper();
    mapper.enable(JsonParser.Feature.ALLOW_COMMENTS);
    return mapper.writeValueAsString(mapper.readTree(caseText));
  }

  static List<Error> errors(String caseText) throws IOException {
    return schema.validate(withoutComments(caseText), InputFormat.JSON);
  }

  @Test
  void everySampleCaseValidates() throws IOException {
    List<Path> cases;
    try (Stream<Path> s = Files.list(ROOT.resolve("sample-meshes/src/main/resources/samples"))) {
      cases = s.filter(p -> p.toString().endsWith(".case.json")).sorted().toList();
    }
    assertFalse(cases.isEmpty());
    for (Path c : cases) {
      List<Error> e = errors(Files.readString(c));
      assertTrue(e.isEmpty(), c + ": " + e);
    }
  }

  @Test
  void theKeysBeingAddedValidate() throws IOException {
    String c =
        """
        { "$schema": "../docs/case.schema.json",
          "mesh": "part.msh", "law": "sieverts", "temperature": "85 degC",
          "exposure": [ { "duration": "168 h", "temperature": ["25 degC", "85 degC"],
                          "humidity": 0.85, "pressure": "10 MPa" },
                        { "repeat": 3, "segments": [ { "duration": "2 h" } ] } ],
          "materials": {
            "steel": { "diffusivity": { "D0": "7.2e-8 m^2/s", "Q": "5.7 kJ/mol" },
                       "solubility": { "S0": 0.05, "dH": "27 kJ/mol" }, "density": "7850 kg/m^3",
                       "source": [ { "law": "trap-release", "density": 1e-3 },
                                   { "kind": "first-order", "rate": -1e-6 } ] },
            "seal": { "diffusivity": "2.5e-12 m^2/s", "source": { "law": "none" } } },
          "faces": { "outer": { "kind": "ambient" },
                     "inner": { "kind": "exchange", "value": "ambient", "coefficient": 1e-7 } },
          "initial": { "from": "../bake/results" },
          "time": { "end": "7 d", "outputs": ["1 d", "7 d"], "max_step": "1 h",
                    "stop": { "probe": "core", "above": 0.5 } },
          "probes": { "core": [0.01, "5 mm", 0] } }
        """;
    List<Error> e = errors(c);
    assertTrue(e.isEmpty(), e.toString());
  }

  @Test
  void typicalMistakesAreCaught() throws IOException {
    String good =
        """
        { "mesh": "m.msh", "materials": { "body": { "diffusivity": 1e-12 } },
          "faces": { "top": { "kind": "concentration", "value": 1 } },
          "time": { "end": 100 } }
        """;
    assertEquals(List.of(), errors(good));
    for (String[] bad :
        new String[][] {
          {"\"diffusivity\": 1e-12", "\"diffusivty\": 1e-12"},
          {"\"diffusivity\": 1e-12", "\"diffusivity\": -1e-12"},
          {"\"diffusivity\": 1e-12", "\"diffusivity\": \"fast\""},
          {"\"end\": 100", "\"end\": 0"},
          {"\"end\": 100", "\"end\": 100, \"step\": 1, \"tolerance\": 1e-3"},
          {"\"kind\": \"concentration\", \"value\": 1", "\"kind\": \"concentration\""},
          {"\"kind\": \"concentration\"", "\"kind\": \"dirichlet\""},
          {"\"mesh\": \"m.msh\",", ""},
        }) {
      String c = good.replace(bad[0], bad[1]);
      assertFalse(c.equals(good), bad[1]);
      assertFalse(errors(c).isEmpty(), "accepted: " + c);
    }
  }
}
