package dev.soakfield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.soakfield.fem.results.Series;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A hydrogen relief bake of a charged plate with a reversible trap and an irreversible one (a
 * kinetic trap that releases nothing): the bake time found for the diffusible amount (lattice plus
 * reversibly trapped) meets the level, and a bake 5 % shorter does not; the total amount, which
 * keeps what the irreversible trap holds, cannot fall below that.
 */
class ReliefBakeTest {
  @TempDir Path dir;

  private static final String MATERIAL =
      """
      "materials": { "body": { "diffusivity": 1e-9, "source": [
        { "law": "trap-equilibrium", "name": "dislocations", "trap-density": 2,
          "lattice-density": 5.1e6, "binding-energy": "30 kJ/mol" },
        { "law": "trap-kinetic", "name": "carbides", "reversible": false, "trap-density": 0.5,
          "capture-rate": 1, "release-rate": 0 } ] } },
      "faces": { "xmin": { "kind": "concentration", "value": 0 },
                 "xmax": { "kind": "concentration", "value": 0 } },
      "initial": 1.0,
      """;

  @BeforeEach
  void plate() throws IOException {
    MshWriter.write(
        dir.resolve("plate.msh"), StructuredMesher.box(2e-3, 1e-4, 1e-4, 20, 1, 1, 1), false);
  }

  private Path kase(String name, String rest) throws IOException {
    return Files.writeString(
        dir.resolve(name), "{ \"mesh\": \"plate.msh\", " + MATERIAL + rest + " }");
  }

  private JsonNode bake(String target) throws IOException {
    Path part = kase("charged.json", "\"temperature\": \"20 degC\", \"time\": { \"end\": 1 }");
    CliRun r =
        CliRun.of(
            "bake", part.toString(), "--temperature", "200 degC", "--target", target, "--json");
    assertEquals(0, r.exitCode(), r.err());
    return new ObjectMapper().readTree(r.out());
  }

  /** The diffusible and total amounts at the end of a bake of {@code seconds} at 200 °C. */
  private Series bakeFor(String name, double seconds) throws IOException {
    Path c =
        kase(
            name + ".json",
            String.format(
                Locale.ROOT,
                "\"temperature\": 473.15, \"time\": { \"end\": %.17g, \"tolerance\": 1e-4 }",
                seconds));
    CliRun r = CliRun.of("run", c.toString(), "--out", dir.resolve(name).toString(), "--quiet");
    assertEquals(0, r.exitCode(), r.err());
    return Series.read(dir.resolve(name).resolve("series.csv"));
  }

  @Test
  void theBakeForTheDiffusibleAmountMeetsItsLevelAndOneFivePercentShorterDoesNot()
      throws IOException {
    Series start = bakeFor("start", 1);
    double diffusible0 = start.require("diffusible_amount")[0];
    double irreversible0 = start.require("trapped:body:carbides")[0];
    assertTrue(irreversible0 > 0 && diffusible0 > 0);
    double level = 0.1 * diffusible0;
    JsonNode j = bake("diffusible<" + level);
    assertTrue(j.get("met").asBoolean(), j.toString());
    double t = j.get("bake_time").asDouble();
    assertTrue(t > 0);
    Series full = bakeFor("full", t);
    assertTrue(full.last("diffusible_amount") < level, "the bake found meets the level");
    Series shorter = bakeFor("shorter", 0.95 * t);
    assertFalse(
        shorter.last("diffusible_amount") < level, "a bake 5 % shorter leaves too much behind");
    // diffusible = lattice + reversibly trapped, the irreversible trap left out
    assertEquals(
        full.last("lattice_amount") + full.last("trapped:body:dislocations"),
        full.last("diffusible_amount"),
        1e-12 * full.last("amount"));
    // the total keeps the irreversible trap's hydrogen: a level below it is never met
    assertTrue(full.last("amount") > full.last("trapped:body:carbides"));
    JsonNode total = bake("total<" + 0.5 * full.last("trapped:body:carbides"));
    assertFalse(total.get("met").asBoolean(), total.toString());
  }
}
