package dev.soakfield.fem.casefile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.soakfield.fem.model.LawResolver;
import dev.soakfield.fem.model.ModelBuilder;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * A bounded fuzzing run over case files, beside the MSH one: seeded mutations of valid cases
 * (values of other types and sizes, deleted and misspelt keys, moved subtrees, cut text, deep
 * nesting) are read, checked against a mesh and bound into a model. Each must give a model or a
 * located CaseInputException; any other exception is a defect (a stack trace a user would see).
 */
class CaseFileFuzzTest {
  private static final ObjectMapper JSON = new ObjectMapper();
  private static final JsonNodeFactory F = JsonNodeFactory.instance;

  private static final List<String> CORPUS =
      List.of(
          """
          { "mesh": "box.msh", "species": "hydrogen", "units": { "concentration": "wppm" },
            "law": "sieverts",
            "exposure": [ { "duration": "2 h", "temperature": "25 degC", "pressure": "10 MPa" },
                          { "duration": "1 h", "temperature": ["25 degC", "200 degC"],
                            "pressure": 0 } ],
            "materials": { "body": { "diffusivity": { "D0": "1e-7 m^2/s", "Q": "7 kJ/mol" },
                                     "solubility": { "S0": 1e-3, "dH": "27 kJ/mol" },
                                     "density": "7850 kg/m^3" } },
            "faces": { "zmax": { "kind": "ambient" }, "zmin": { "kind": "sealed" },
                       "xmin": { "kind": "exchange", "coefficient": 1e-6, "value": "ambient" } },
            "probes": { "core": [5e-4, 5e-4, 5e-4], "top": { "at": [5e-4, 5e-4, 1e-3] } },
            "thresholds": [ { "name": "t", "level": 0.1, "where": "mean:body", "when": "rises" } ],
            "time": { "tolerance": 1e-3, "capacity": "lumped", "max_steps": 1000 } }
          """,
          """
          { "mesh": "box.msh", "elements": "quadratic", "temperature": "85 degC",
            "materials": { "body": { "diffusivity": { "principal": [1e-12, 2e-12, 3e-12],
                                                      "axes": [[1,0,0],[0,1,0],[0,0,1]] },
                                     "source": { "kind": "first-order", "rate": -1e-6 } } },
            "faces": { "xmin": { "kind": "concentration", "value": [[0, 0], [3600, 1]] },
                       "xmax": { "kind": "flux", "value": 1e-9 } },
            "initial": { "body": 0.5 },
            "threshold": 0.7,
            "time": { "end": "2 h", "step": 60, "outputs": [600, 3600, 7200],
                      "scheme": "crank-nicolson", "stop": { "group": "body", "above": 0.9 },
                      "balance_limit": 1e-6 } }
          """);

  @Test
  void mutatedCasesGiveAModelOrALocatedRefusal() throws Exception {
    TetMesh mesh = StructuredMesher.box(1e-3, 1e-3, 1e-3, 2, 2, 2, 1);
    SplittableRandom random = new SplittableRandom(Long.getLong("fuzz.seed", 20261205L));
    List<String> failures = new ArrayList<>();
    int accepted = 0;
    int refused = 0;
    for (int i = 0; i < Integer.getInteger("fuzz.runs", 4000); i++) {
      String base = CORPUS.get(random.nextInt(CORPUS.size()));
      String text = mutate(base, random);
      try {
        CaseSpec spec = CaseReader.readText(text, Path.of("fuzz.json"), "fuzz.json");
        CaseChecks.againstMesh(spec, mesh);
        ModelBuilder.build(spec, mesh, new ArrayList<>(), LawResolver.none());
        accepted++;
      } catch (CaseInputException e) {
        assertTrue(e.getMessage().startsWith("fuzz.json"), e.getMessage());
        refused++;
      } catch (RuntimeException | StackOverflowError e) {
        if (failures.size() < 5) {
          failures.add(e + "\n" + text);
        }
      }
    }
    assertEquals(List.of(), failures);
    // both outcomes occur: some mutations keep a case valid, most break it
    assertTrue(accepted > 50 && refused > 1000, accepted + " accepted, " + refused + " refused");
  }

  /** What the fuzzing found, kept as plain checks: each gave an IllegalArgumentException before. */
  @Test
  void whatTheFuzzingFoundIsRefusedWhereItStands() {
    TetMesh mesh = StructuredMesher.box(1e-3, 1e-3, 1e-3, 2, 2, 2, 1);
    String tinyStep = CORPUS.get(0).replace("\"duration\": \"1 h\"", "\"duration\": 4.9e-324");
    CaseInputException d =
        org.junit.jupiter.api.Assertions.assertThrows(
            CaseInputException.class,
            () -> CaseReader.readText(tinyStep, Path.of("fuzz.json"), "fuzz.json"));
    assertTrue(d.getMessage().contains("exposure[1].duration"), d.getMessage());
    String tinyDensity = CORPUS.get(0).replace("\"7850 kg/m^3\"", "4.9e-324");
    CaseSpec spec = CaseReader.readText(tinyDensity, Path.of("fuzz.json"), "fuzz.json");
    CaseInputException r =
        org.junit.jupiter.api.Assertions.assertThrows(
            CaseInputException.class,
            () -> ModelBuilder.build(spec, mesh, new ArrayList<>(), LawResolver.none()));
    assertTrue(r.getMessage().contains("materials.body.density"), r.getMessage());
  }

  /** The corpus cases themselves bind: the fuzzing starts from valid input. */
  @Test
  void theCorpusIsValid() {
    TetMesh mesh = StructuredMesher.box(1e-3, 1e-3, 1e-3, 2, 2, 2, 1);
    for (String c : CORPUS) {
      CaseSpec spec = CaseReader.readText(c, Path.of("fuzz.json"), "fuzz.json");
      CaseChecks.againstMesh(spec, mesh);
      ModelBuilder.build(spec, mesh, new ArrayList<>(), LawResolver.none());
    }
  }

  static String mutate(String base, SplittableRandom random) throws Exception {
    int op = random.nextInt(10);
    if (op == 0) { // cut the text short
      return base.substring(0, random.nextInt(base.length()));
    }
    if (op == 1) { // nesting deeper than any case needs
      int depth = 50 + random.nextInt(3000);
      return "{\"mesh\": \"box.msh\", \"materials\": "
          + "[".repeat(depth)
          + "]".repeat(depth)
          + "}";
    }
    JsonNode root = JSON.readTree(base);
    int edits = 1 + random.nextInt(3);
    for (int e = 0; e < edits; e++) {
      List<JsonNode> containers = new ArrayList<>();
      collect(root, containers);
      JsonNode c = containers.get(random.nextInt(containers.size()));
      if (c instanceof ObjectNode o && o.size() > 0) {
        List<String> keys = new ArrayList<>();
        o.fieldNames().forEachRemaining(keys::add);
        String key = keys.get(random.nextInt(keys.size()));
        switch (random.nextInt(4)) {
          case 0 -> o.remove(key);
          case 1 -> o.set(key + (random.nextBoolean() ? "s" : "_"), o.remove(key));
          case 2 -> o.set(key, randomValue(random, containers));
          default -> o.set(keys.get(random.nextInt(keys.size())), o.get(key).deepCopy());
        }
      } else if (c instanceof ArrayNode a && a.size() > 0) {
        int k = random.nextInt(a.size());
        if (random.nextBoolean()) {
          a.set(k, randomValue(random, containers));
        } else {
          a.remove(k);
        }
      }
    }
    return JSON.writeValueAsString(root);
  }

  private static void collect(JsonNode n, List<JsonNode> out) {
    if (n.isContainerNode()) {
      out.add(n);
      for (Iterator<JsonNode> it = n.elements(); it.hasNext(); ) {
        collect(it.next(), out);
      }
    }
  }

  private static JsonNode randomValue(SplittableRandom random, List<JsonNode> containers) {
    return switch (random.nextInt(16)) {
      case 0 -> F.nullNode();
      case 1 -> F.booleanNode(random.nextBoolean());
      case 2 -> F.textNode("");
      case 3 -> F.textNode("-1 h");
      case 4 -> F.textNode("1e400 m");
      case 5 -> F.numberNode(0);
      case 6 -> F.numberNode(-1);
      case 7 -> F.numberNode(1e308);
      case 8 -> F.numberNode(-1e308);
      case 9 -> F.numberNode(4.9e-324);
      case 10 -> F.textNode("NaN");
      case 11 -> F.arrayNode().add(1).add("x").add(F.objectNode());
      case 12 -> F.numberNode(random.nextDouble() * 2e3 - 1e3);
      case 13 -> F.textNode("body");
      case 14 -> containers.get(random.nextInt(containers.size())).deepCopy();
      default -> F.textNode("85 degC");
    };
  }
}
