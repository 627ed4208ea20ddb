package dev.soakfield.fem.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Reading sweep files and expanding them into cases. */
class SweepPlanTest {
  @TempDir Path dir;

  @BeforeEach
  void baseCase() throws IOException {
    SheetSweep.writeCase(dir, 4, "{ \"end\": 100, \"step\": 10 }");
  }

  private SweepPlan plan(String body) throws IOException {
    return SweepPlan.of(SweepFile.read(SheetSweep.writeSweep(dir, body)));
  }

  private String refused(String body) {
    return assertThrows(SweepInputException.class, () -> plan(body)).getMessage();
  }

  @Test
  void listsAndRangesFormAFullFactorialCrossedWithTheSamples() throws IOException {
    SweepPlan p =
        plan(
            """
            { "base": "sheet.json",   // relative to the sweep file
              "vary": { "materials.body.diffusivity": { "values": [1e-12, 2e-12, 4e-12] },
                        "faces.xmin.value": { "range": [0.5, 1.0], "count": 3 },
                        "materials.body.solubility":
                          { "distribution": "normal", "mean": 1e-4, "sd": 1e-5 } },
              "samples": 4, "seed": 7, "sampling": "latin-hypercube",
              "collect": { "times": [50, "1 min"] } }
            """);
    assertEquals(3 * 3 * 4, p.cases().size());
    assertEquals(
        List.of("materials.body.diffusivity", "faces.xmin.value", "materials.body.solubility"),
        p.keys());
    assertEquals(List.of(50.0, 60.0), p.sweep().collectTimes());
    // the last listed key changes fastest, the samples fastest of all
    assertEquals(List.of("1.0E-12", "0.5"), p.cases().get(0).values().subList(0, 2));
    assertEquals(List.of("1.0E-12", "0.75"), p.cases().get(4).values().subList(0, 2));
    assertEquals(List.of("2.0E-12", "0.5"), p.cases().get(12).values().subList(0, 2));
    assertEquals("1.0", p.cases().get(8).values().get(1));
    // every factorial combination gets the same draws (crossed, not drawn afresh)
    for (int c = 0; c < 9; c++) {
      for (int s = 0; s < 4; s++) {
        assertEquals(p.cases().get(s).values().get(2), p.cases().get(4 * c + s).values().get(2));
      }
    }
    assertEquals("0001", p.cases().get(0).id());
    assertEquals("0036", p.cases().get(35).id());
  }

  @Test
  void logSpacedRangesMultiplyByAConstantFactor() throws IOException {
    SweepPlan p =
        plan(
            """
            { "base": "sheet.json", "vary": { "materials.body.diffusivity":
                { "range": [1e-12, 1e-10], "count": 3, "spacing": "log" } } }
            """);
    assertEquals(1e-12, Double.parseDouble(p.cases().get(0).values().get(0)), 1e-27);
    assertEquals(1e-11, Double.parseDouble(p.cases().get(1).values().get(0)), 1e-26);
    assertEquals("1.0E-10", p.cases().get(2).values().get(0));
  }

  @Test
  void anUnknownKeyPathIsRefusedNamingTheSweepFileTheKeyAndTheClosestKey() {
    String m =
        refused(
            "{ \"base\": \"sheet.json\", \"vary\": { \"materials.body.difusivity\":"
                + " { \"values\": [1] } } }");
    assertTrue(m.contains("sweep.json"), m);
    assertTrue(m.contains("vary.materials.body.difusivity"), m);
    assertTrue(m.contains("did you mean 'diffusivity'"), m);
    assertTrue(m.contains("sheet.json"), m);
    String part =
        refused(
            "{ \"base\": \"sheet.json\", \"vary\": { \"materials.lid.diffusivity\":"
                + " { \"values\": [1] } } }");
    assertTrue(part.contains("found no key 'lid' at 'materials'"), part);
    String inside =
        refused("{ \"base\": \"sheet.json\", \"vary\": { \"time.end.x\": { \"values\": [1] } } }");
    assertTrue(inside.contains("single value at 'time.end'"), inside);
    String index =
        refused(
            "{ \"base\": \"sheet.json\", \"vary\": { \"probes.centre.5\": { \"values\": [1] } } }");
    assertTrue(index.contains("expected an index 0 to 2"), index);
  }

  /** Control of the key-path check: keys the base has, list items included, are accepted. */
  @Test
  void keysTheBaseCaseHasAreAccepted() throws IOException {
    SweepPlan p =
        plan(
            "{ \"base\": \"sheet.json\", \"vary\": { \"probes.centre.0\": { \"values\": [1e-4] },"
                + " \"time.end\": { \"values\": [\"2 min\"] } } }");
    assertEquals(List.of("1.0E-4", "\"2 min\""), p.cases().get(0).values());
  }

  @Test
  void mistakesInTheSweepFileNameTheFileAndTheKey() {
    String base = "{ \"base\": \"sheet.json\", \"vary\": { \"time.end\": %s }%s }";
    assertTrue(
        refused(base.formatted("{ \"values\": [1] }", ", \"sampels\": 3"))
            .contains("sweep.json: sampels: unknown key"));
    assertTrue(
        refused(base.formatted("{ \"values\": [1] }", ", \"samples\": 3"))
            .contains("samples: found 3 samples but no distribution"));
    assertTrue(
        refused(base.formatted("{ \"distribution\": \"normal\", \"mean\": 1, \"sd\": 0 }", ""))
            .contains("vary.time.end.sd: found 0, expected a number above 0"));
    assertTrue(
        refused(base.formatted("{ \"distribution\": \"normal\", \"mean\": 1, \"sd\": 1 }", ""))
            .contains("samples: found none"));
    assertTrue(
        refused(base.formatted("{ \"distribution\": \"gamma\" }", ", \"samples\": 2"))
            .contains("expected \"normal\", \"log-normal\" or \"uniform\""));
    assertTrue(
        refused(base.formatted("{ \"range\": [1, 2], \"count\": 1 }", "")).contains(".count"));
    assertTrue(refused(base.formatted("{ \"values\": [] }", "")).contains("non-empty list"));
    assertTrue(
        refused(base.formatted("{ \"values\": [1] }", ", \"sampling\": \"sobol\""))
            .contains("\"latin-hypercube\""));
    assertTrue(
        refused(base.formatted("{ \"values\": [1] }", ", \"collect\": { \"times\": [-1] }"))
            .contains("collect.times.0: found -1"));
    assertTrue(
        refused("{ \"base\": \"sheet.json\", \"vary\": { \"mesh\": { \"values\": [\"a.msh\"] } } }")
            .contains("a sweep runs on one mesh"));
    assertTrue(
        refused(
                "{ \"base\": \"sheet.json\", \"vary\": { \"time\": { \"values\": [1] },"
                    + " \"time.end\": { \"values\": [1] } } }")
            .contains("inside vary.time"));
    assertTrue(
        refused("{ \"base\": \"nothere.json\", \"vary\": { \"a\": { \"values\": [1] } } }")
            .contains("sweep.json: base: found"));
    assertTrue(
        refused("{ \"base\": \"sheet.json\", \"vary\": { } }").contains("vary: found an object"));
  }

  @Test
  void aMalformedSweepFileIsPlacedByLineAndColumn() throws IOException {
    Path f = SheetSweep.writeSweep(dir, "{ \"base\": \"sheet.json\",\n  \"vary\": { ] }");
    String m = assertThrows(SweepInputException.class, () -> SweepFile.read(f)).getMessage();
    assertTrue(m.contains("line 2"), m);
  }

  @Test
  void fitValuesBecomeNormalOrLogNormalDistributions() throws IOException {
    Files.writeString(
        dir.resolve("fit.json"),
        """
        { "diffusivity": { "value": 3e-12, "low": 2.9e-12, "high": 3.1e-12 },
          "saturation": { "value": 0.0035, "low": 0.0034, "high": 0.0036,
                          "standardError": 4e-5 },
          "D0": { "value": 1e-6, "low": 5e-7, "high": 2e-6 } }
        """);
    SweepFile s =
        SweepFile.read(
            SheetSweep.writeSweep(
                dir,
                """
                { "base": "sheet.json", "samples": 3,
                  "vary": { "materials.body.diffusivity": { "from-fit": "fit.json" },
                            "materials.body.solubility": { "from-fit": "fit.json",
                                                           "take": "saturation", "scale": 100 },
                            "time.end": { "from-fit": "fit.json", "take": "D0" } } }
                """));
    Distribution d = s.sampled().get(0).distribution();
    assertEquals("normal", d.kind());
    // no standard error given: the 95 % half-width over z(0.975) = 1.959964 (normal table)
    assertEquals(0.1e-12 / 1.959964, d.b(), 1e-18);
    Distribution sat = s.sampled().get(1).distribution();
    assertEquals(0.35, sat.a(), 1e-12);
    assertEquals(4e-3, sat.b(), 1e-12);
    Distribution d0 = s.sampled().get(2).distribution();
    assertEquals("log-normal", d0.kind());
    assertEquals(1e-6, d0.quantile(0.5), 1e-18);
    assertEquals(2e-6, d0.quantile(0.975), 1e-11);
    String missing =
        refused(
            "{ \"base\": \"sheet.json\", \"samples\": 2, \"vary\": { \"materials.body.solubility\":"
                + " { \"from-fit\": \"fit.json\" } } }");
    assertTrue(missing.contains("has no estimate 'solubility'"), missing);
    assertTrue(missing.contains("diffusivity, saturation, D0"), missing);
  }

  @Test
  void theFingerprintFollowsTheCasesAndTheBase() throws IOException {
    String body = "{ \"base\": \"sheet.json\", \"vary\": { \"time.end\": { \"values\": [%s] } } }";
    String a = plan(body.formatted("100")).fingerprint();
    assertEquals(a, plan(body.formatted("100")).fingerprint());
    assertNotEquals(a, plan(body.formatted("200")).fingerprint());
    SheetSweep.writeCase(dir, 4, "{ \"end\": 100, \"step\": 5 }");
    assertNotEquals(a, plan(body.formatted("100")).fingerprint());
  }

  @Test
  void aNormalThatReachesBelowZeroIsWarnedAbout() throws IOException {
    SweepPlan p =
        plan(
            "{ \"base\": \"sheet.json\", \"samples\": 2, \"vary\": { \"materials.body.diffusivity\":"
                + " { \"distribution\": \"normal\", \"mean\": 1e-12, \"sd\": 1e-12 } } }");
    assertEquals(1, p.warnings().size());
    assertTrue(p.warnings().get(0).contains("probability 0.16"), p.warnings().get(0));
  }
}
