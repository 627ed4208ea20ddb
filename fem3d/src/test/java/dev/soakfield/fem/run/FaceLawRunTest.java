package dev.soakfield.fem.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.casefile.CaseInputException;
import dev.soakfield.fem.casefile.SourceSpec;
import dev.soakfield.fem.model.FaceLawUse;
import dev.soakfield.fem.model.LawResolver;
import dev.soakfield.fem.model.LawUse;
import dev.soakfield.fem.results.Series;
import dev.soakfield.fem.time.RunFailedException;
import dev.soakfield.law.api.FaceLaw;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A face law in a whole run: one that gives the linear exchange J = h·(c_env − c) must reproduce
 * the exchange face (itself held against Crank's sheet with surface exchange by soakfield verify)
 * step for step. The two differ only in the face quadrature (a face law's flux is taken at the
 * nodes, the exchange face's with the consistent face mass), which on this sheet's faces, whose
 * nodes hold nearly one concentration, moves the amount by a few parts in a million; a law that
 * fails stops the run naming itself.
 */
class FaceLawRunTest {
  @TempDir Path dir;

  private static final double H = 1e-6; // m/s
  private static final double C_ENV = 2.0;

  @BeforeEach
  void sheet() throws IOException {
    MshWriter.write(
        dir.resolve("sheet.msh"), StructuredMesher.box(1e-3, 1e-4, 1e-4, 20, 1, 1, 1), false);
  }

  private Path kase(String name, String xmin) throws IOException {
    return Files.writeString(
        dir.resolve(name + ".json"),
        """
        { "mesh": "sheet.msh", "materials": { "body": { "diffusivity": 1e-9 } },
          "faces": { "xmin": %s }, "time": { "end": 2000, "step": 10 } }
        """
            .formatted(xmin));
  }

  /** A resolver whose every face law is {@code law}, with no source laws. */
  private static LawResolver faceLaws(FaceLaw law) {
    return new LawResolver() {
      @Override
      public LawUse resolve(String caseName, String material, SourceSpec.LawSource source) {
        throw new AssertionError("no source laws here");
      }

      @Override
      public FaceLawUse resolveFace(String caseName, String group, SourceSpec.LawSource source) {
        assertEquals("linear-test", source.id());
        assertEquals(1.5, (Double) source.parameters().get("strength"));
        return new FaceLawUse(source.id(), "a test", law);
      }
    };
  }

  @Test
  void aLinearFaceLawMatchesTheExchangeFace() throws IOException {
    Path exchange =
        kase(
            "exchange",
            "{ \"kind\": \"exchange\", \"coefficient\": %s, \"value\": %s }".formatted(H, C_ENV));
    Path law = kase("law", "{ \"kind\": \"law\", \"law\": \"linear-test\", \"strength\": 1.5 }");
    RunPipeline.run(exchange, dir.resolve("a"), RunProgress.SILENT);
    RunPipeline.run(
        law,
        dir.resolve("b"),
        RunProgress.SILENT,
        faceLaws((at, out) -> out.set(H * (C_ENV - at.concentration()), -H)));
    Series a = Series.read(dir.resolve("a").resolve("series.csv"));
    Series b = Series.read(dir.resolve("b").resolve("series.csv"));
    double end = a.last("amount");
    assertTrue(end > 0.1 * C_ENV * 1e-11, "the sheet takes up: " + end);
    double[] ia = a.require("inflow:xmin");
    double[] ib = b.require("inflow:xmin");
    double[] ma = a.require("amount");
    double[] mb = b.require("amount");
    assertEquals(ia.length, ib.length);
    for (int i = 0; i < ia.length; i++) {
      assertEquals(ma[i], mb[i], 1e-4 * end, "amount at row " + i);
      assertEquals(ia[i], ib[i], 1e-4 * end, "inflow at row " + i);
    }
    // negative control: a face law 1 % stronger departs from the exchange face beyond the band
    RunPipeline.run(
        law,
        dir.resolve("c"),
        RunProgress.SILENT,
        faceLaws((at, out) -> out.set(1.01 * H * (C_ENV - at.concentration()), -1.01 * H)));
    double off = Series.read(dir.resolve("c").resolve("series.csv")).last("amount");
    assertTrue(Math.abs(off - end) > 1e-3 * end, "1 % stronger: " + off + " against " + end);
  }

  @Test
  void aFaceLawThatAnswersNanStopsTheRunNamingIt() throws IOException {
    Path law = kase("law", "{ \"kind\": \"law\", \"law\": \"linear-test\", \"strength\": 1.5 }");
    RunFailedException e =
        assertThrows(
            RunFailedException.class,
            () ->
                RunPipeline.run(
                    law,
                    dir.resolve("nan"),
                    RunProgress.SILENT,
                    faceLaws((at, out) -> out.set(Double.NaN, 0))));
    assertTrue(e.getMessage().contains("face law 'linear-test'"), e.getMessage());
    assertTrue(e.getMessage().contains("face group 'xmin'"), e.getMessage());
  }

  @Test
  void aCaseWithAFaceLawAndNoCatalogIsRefusedAtItsPlace() throws IOException {
    Path law = kase("law", "{ \"kind\": \"law\", \"law\": \"linear-test\", \"strength\": 1.5 }");
    CaseInputException e =
        assertThrows(
            CaseInputException.class,
            () -> RunPipeline.run(law, dir.resolve("none"), RunProgress.SILENT));
    assertTrue(e.getMessage().contains("faces.xmin"), e.getMessage());
    assertTrue(e.getMessage().contains("expected no face laws here"), e.getMessage());
  }
}
