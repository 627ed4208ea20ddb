package dev.soakfield.fem.casefile;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.casefile.CaseInputException.Problem;
import dev.soakfield.fem.physics.FaceKind;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CaseReaderTest {
  @TempDir Path dir;

  // Expected values below are the numbers written in the case files themselves (the files are the
  // input; the test checks that each key lands in the right place of the spec).

  @Test
  void exampleCaseParsesEveryKeyIncludingCommentedLines() {
    Path file = CaseFiles.resource("example.json");
    CaseSpec spec = CaseReader.read(file);

    assertEquals(file.toAbsolutePath().getParent().resolve("wall.msh"), spec.mesh());
    assertEquals(ElementChoice.QUADRATIC, spec.elements());

    MaterialSpec body = spec.materials().get("body");
    assertEquals("body", body.volumeGroup());
    assertTrue(body.diffusivity().isIsotropic());
    assertArrayEquals(
        new double[] {2.5e-12, 2.5e-12, 2.5e-12, 0, 0, 0}, body.diffusivity().tensor());
    assertEquals(1.0, body.solubility());
    assertEquals(new SourceSpec.FirstOrder(-1e-6), body.source());

    assertEquals(List.of("xmin", "xmax", "ymin", "ymax"), List.copyOf(spec.faces().keySet()));
    FaceSpec xmin = spec.faces().get("xmin");
    assertEquals(FaceKind.CONCENTRATION, xmin.kind());
    assertEquals(TimeTable.constant(1.0), xmin.value());
    FaceSpec xmax = spec.faces().get("xmax");
    assertEquals(FaceKind.FLUX, xmax.kind());
    assertArrayEquals(new double[] {0, 3600}, xmax.value().breakpoints());
    // linear between (0, 0) and (3600, 1e-6): half way at 1800 s
    assertEquals(5e-7, xmax.value().at(1800), 1e-22);
    assertEquals(1e-6, xmax.value().at(7200));
    FaceSpec ymin = spec.faces().get("ymin");
    assertEquals(FaceKind.EXCHANGE, ymin.kind());
    assertEquals(TimeTable.constant(1e-7), ymin.coefficient());
    assertEquals(TimeTable.constant(1.0), ymin.value());
    assertEquals(FaceKind.SEALED, spec.faces().get("ymax").kind());

    assertEquals(InitialSpec.uniform(0.0), spec.initial());
    assertEquals(0.0, spec.initial().valueFor("body"));

    TimeSpec time = spec.time();
    assertEquals(86400, time.end());
    assertEquals(List.of(3600.0, 7200.0, 86400.0), time.outputs());
    assertEquals(TimeScheme.BACKWARD_EULER, time.scheme());
    assertEquals(CapacityForm.CONSISTENT, time.capacity());
    assertEquals(
        new StepControl.Adaptive(1e-3, OptionalDouble.empty(), OptionalDouble.empty()),
        time.steps());

    assertEquals(List.of(new ProbeSpec("core", 0.005, 0.005, 0.001)), spec.probes());
    assertEquals(OptionalDouble.of(0.5), spec.threshold());
    // the value of faces.xmax sits on line 8 of the file (after a two-line block comment)
    assertEquals(new SourcePlace(8, 22), spec.placeOf("faces.xmax"));
  }

  @Test
  void fixedStepsOrthotropicLayersAndPerGroupInitialValues() {
    Path file = CaseFiles.resource("fixed-steps.json");
    CaseSpec spec = CaseReader.read(file);

    // "meshes/../plate.msh" normalized against the case file's folder
    assertEquals(file.toAbsolutePath().getParent().resolve("plate.msh"), spec.mesh());
    assertEquals(ElementChoice.AS_MESHED, spec.elements());
    assertEquals(new SourceSpec.NoSource(), spec.materials().get("lower").source());
    assertEquals(1.0, spec.materials().get("lower").solubility());
    MaterialSpec upper = spec.materials().get("upper");
    // exact geometry: axes x, z, -y carry 1e-12, 2e-12, 3e-12, so D = diag(1e-12, 3e-12, 2e-12)
    assertArrayEquals(
        new double[] {1e-12, 3e-12, 2e-12, 0, 0, 0}, upper.diffusivity().tensor(), 1e-27);
    assertEquals(4.0, upper.solubility());
    assertEquals(new SourceSpec.ConstantRate(2e-3), upper.source());
    assertEquals(0.25, spec.initial().valueFor("lower"));
    assertEquals(0.0, spec.initial().valueFor("upper"));
    assertTrue(spec.faces().isEmpty());
    assertTrue(spec.probes().isEmpty());
    assertTrue(spec.threshold().isEmpty());

    TimeSpec time = spec.time();
    assertEquals(List.of(600.0), time.outputs()); // default: just the end
    assertEquals(TimeScheme.CRANK_NICOLSON, time.scheme());
    assertEquals(0.5, time.scheme().theta());
    assertEquals(CapacityForm.LUMPED, time.capacity());
    assertEquals(new StepControl.Fixed(60), time.steps());
  }

  @Test
  void independentMistakesAreReportedTogetherEachWithLineAndPath() {
    CaseInputException e =
        assertThrows(
            CaseInputException.class, () -> CaseReader.read(CaseFiles.resource("bad-values.json")));
    assertEquals("bad-values.json", e.source());
    List<Problem> p = e.problems();
    assertEquals(5, p.size(), e.getMessage());

    // negative diffusivity: the value starts on line 4, column 30
    assertEquals(new SourcePlace(4, 30), place(p.get(0)));
    assertEquals("materials.body.diffusivity", p.get(0).path());
    assertTrue(p.get(0).message().startsWith("found -2.5e-12, expected a positive number"));

    // wrong type
    assertEquals(5, p.get(1).line());
    assertEquals("materials.body.solubility", p.get(1).path());
    assertEquals(
        "found \"one\", expected a positive number, or {\"S0\": ..., \"dH\": ...}",
        p.get(1).message());

    // unknown key with a suggestion, at the key
    assertEquals(8, p.get(2).line());
    assertEquals("faces.xmin.vaue", p.get(2).path());
    assertEquals("unknown key; did you mean 'value'?", p.get(2).message());

    // a time table whose third time repeats the second
    assertEquals(9, p.get(3).line());
    assertEquals("faces.xmax.value[2][0]", p.get(3).path());
    assertTrue(p.get(3).message().startsWith("found 3600, expected a time greater than"));

    // tolerance and step together: reported at the second of them
    assertEquals(13, p.get(4).line());
    assertEquals("time.step", p.get(4).path());
    assertTrue(p.get(4).message().contains("'tolerance' on line 12"), p.get(4).message());

    // one line per problem in the message
    List<String> lines = e.getMessage().lines().toList();
    assertEquals(6, lines.size());
    assertEquals("bad-values.json: 5 problems", lines.get(0));
    assertEquals(
        "  line 8, column 40, faces.xmin.vaue: unknown key; did you mean 'value'?", lines.get(3));
  }

  @Test
  void axesThatAreNotOrthonormalAreReportedAtTheAxes() {
    CaseInputException e =
        assertThrows(
            CaseInputException.class, () -> CaseReader.read(CaseFiles.resource("bad-axes.json")));
    Problem p = single(e);
    assertEquals(5, p.line());
    assertEquals("materials.body.diffusivity.axes", p.path());
    // exact geometry: (1,0,0)·(0.1,1,0)/|(0.1,1,0)| = 0.1/sqrt(1.01) = 0.0995037...
    assertTrue(
        p.message().startsWith("found axes 1 and 2 have a dot product of 0.0995037"), p.message());
    assertTrue(p.message().contains("expected orthonormal axes"));
  }

  @Test
  void malformedJsonGivesTheParsersLineAndColumn() {
    CaseInputException e =
        assertThrows(
            CaseInputException.class, () -> CaseReader.read(CaseFiles.resource("malformed.json")));
    Problem p = single(e);
    // the missing comma: the next key's quote on line 3, column 3 is where the parser stops
    assertEquals(3, p.line());
    assertEquals(3, p.column());
    assertTrue(p.message().startsWith("malformed JSON: "), p.message());
    assertTrue(e.getMessage().startsWith("malformed.json, line 3, column 3, malformed JSON"));
  }

  @Test
  void textInMemoryReadsAsTheFileWouldAndNamesItsPlaces() throws IOException {
    Path file = CaseFiles.resource("example.json");
    String text = Files.readString(file);
    CaseSpec fromFile = CaseReader.read(file);
    CaseSpec fromText = CaseReader.readText(text, file, "edited case");
    assertEquals(fromFile.mesh(), fromText.mesh());
    assertEquals(fromFile.materials(), fromText.materials());
    assertEquals(fromFile.faces(), fromText.faces());
    assertEquals(fromFile.time(), fromText.time());
    assertEquals(fromFile.places(), fromText.places());
    CaseInputException e =
        assertThrows(
            CaseInputException.class,
            () ->
                CaseReader.readText(
                    Files.readString(CaseFiles.resource("malformed.json")), file, "edited case"));
    assertEquals(3, single(e).line());
    assertTrue(e.getMessage().startsWith("edited case, line 3, column 3, malformed JSON"));
  }

  @Test
  void wrongTypesAndMissingKeysNameTheirPath() throws IOException {
    Path file =
        write(
            "wrong.json",
            """
            { "mesh": 3,
              "materials": { "body": { "diffusivity": "fast" } },
              "time": { "outputs": [10] },
              "threshold": -1 }
            """);
    CaseInputException e = assertThrows(CaseInputException.class, () -> CaseReader.read(file));
    List<Problem> p = e.problems();
    assertEquals(4, p.size(), e.getMessage());
    assertEquals("mesh", p.get(0).path());
    assertEquals(1, p.get(0).line());
    assertTrue(p.get(0).message().startsWith("found 3, expected the mesh file name"));
    assertEquals("materials.body.diffusivity", p.get(1).path());
    assertEquals(2, p.get(1).line());
    assertTrue(p.get(1).message().startsWith("found \"fast\", expected a positive number"));
    // a missing key is reported at the object that should hold it
    assertEquals("time.end", p.get(2).path());
    assertEquals(3, p.get(2).line());
    assertEquals(
        "missing; expected a positive duration (seconds, or with a unit: \"168 h\")",
        p.get(2).message());
    assertEquals("threshold", p.get(3).path());
    assertEquals(4, p.get(3).line());
  }

  @Test
  void outputTimesMustIncreaseAndStayWithinTheRun() throws IOException {
    Path file =
        write(
            "outputs.json",
            """
            { "mesh": "m.msh", "materials": { "b": { "diffusivity": 1 } },
              "time": { "end": 100,
                        "outputs": [10, 50, 50] } }
            """);
    Problem p = single(assertThrows(CaseInputException.class, () -> CaseReader.read(file)));
    assertEquals("time.outputs[2]", p.path());
    assertEquals(3, p.line());
    assertTrue(p.message().startsWith("found 50, expected a time in (50, 100]"), p.message());
  }

  @Test
  void misspeltWordsGetASuggestion() throws IOException {
    Path file =
        write(
            "words.json",
            """
            { "mesh": "m.msh", "materials": { "b": { "diffusivity": 1,
              "source": { "kind": "first_order", "rate": 1 } } },
              "tim": { "end": 100 } }
            """);
    CaseInputException e = assertThrows(CaseInputException.class, () -> CaseReader.read(file));
    List<Problem> p = e.problems();
    assertEquals(2, p.size(), e.getMessage());
    // the required "time" is not reported missing: the typo's suggestion already names it
    assertEquals("materials.b.source.kind", p.get(0).path());
    assertEquals(2, p.get(0).line());
    assertTrue(p.get(0).message().endsWith("(did you mean 'first-order'?)"), p.get(0).message());
    assertEquals("tim", p.get(1).path());
    assertEquals(3, p.get(1).line());
    assertEquals("unknown key; did you mean 'time'?", p.get(1).message());
  }

  @Test
  void initialValuesPerGroupMustCoverEveryMaterial() throws IOException {
    Path file =
        write(
            "initial.json",
            """
            { "mesh": "m.msh",
              "materials": { "a": { "diffusivity": 1 }, "b": { "diffusivity": 1 },
                             "c": { "diffusivity": 1 } },
              "initial": { "b": 0.5 },
              "time": { "end": 1 } }
            """);
    Problem p = single(assertThrows(CaseInputException.class, () -> CaseReader.read(file)));
    assertEquals("initial", p.path());
    assertEquals(4, p.line());
    assertTrue(p.message().contains("volume group(s) a, c"), p.message());
  }

  @Test
  void duplicateKeysAndMissingFilesAreInputErrors() throws IOException {
    Path dup = write("dup.json", "{ \"mesh\": \"a.msh\",\n  \"mesh\": \"b.msh\" }\n");
    Problem p = single(assertThrows(CaseInputException.class, () -> CaseReader.read(dup)));
    assertEquals("mesh", p.path());
    assertEquals(2, p.line());
    assertTrue(p.message().contains("first on line 1"), p.message());

    CaseInputException missing =
        assertThrows(CaseInputException.class, () -> CaseReader.read(dir.resolve("none.json")));
    assertEquals(
        "none.json, found no such file, expected a readable case file", missing.getMessage());
  }

  @Test
  void aFileThatIsNotAnObjectOrHasTrailingContentIsRejected() throws IOException {
    Problem array =
        single(
            assertThrows(
                CaseInputException.class, () -> CaseReader.read(write("a.json", "[1, 2]"))));
    assertEquals("found an array of 2, expected a JSON object (the case)", array.message());
    Problem trailing =
        single(
            assertThrows(
                CaseInputException.class, () -> CaseReader.read(write("t.json", "{}\n{}"))));
    assertEquals(2, trailing.line());
    assertTrue(trailing.message().startsWith("malformed JSON"));
  }

  @Test
  void numbersBeyondDoubleRangeAreNotTakenAsInfinity() throws IOException {
    // IEEE 754 double: the largest finite value is about 1.8e308 (common practice)
    Path file =
        write(
            "huge.json",
            """
            { "mesh": "m.msh", "materials": { "b": { "diffusivity": 1e400 } },
              "time": { "end": 1 } }
            """);
    Problem p = single(assertThrows(CaseInputException.class, () -> CaseReader.read(file)));
    assertEquals("materials.b.diffusivity", p.path());
    assertTrue(p.message().startsWith("found 1e400, expected a positive number"), p.message());
  }

  @Test
  void adaptiveStepLimitsAreReadAndChecked() throws IOException {
    Path good =
        write(
            "limits.json",
            """
            { "mesh": "m.msh", "elements": "linear", "materials": { "b": { "diffusivity": 1 } },
              "time": { "end": 100, "tolerance": 1e-4, "initial_step": 0.5, "max_step": 20 } }
            """);
    CaseSpec spec = CaseReader.read(good);
    assertEquals(
        new StepControl.Adaptive(1e-4, OptionalDouble.of(0.5), OptionalDouble.of(20)),
        spec.time().steps());
    assertEquals(ElementChoice.LINEAR, spec.elements());
    assertEquals(1, spec.elements().orderFor(2));
    assertEquals(2, ElementChoice.AS_MESHED.orderFor(2));
    assertEquals(2, ElementChoice.QUADRATIC.orderFor(1));

    Path bad =
        write(
            "limits-bad.json",
            """
            { "mesh": "m.msh", "materials": { "b": { "diffusivity": 1 } },
              "time": { "end": 100, "initial_step": 50,
                        "max_step": 20 },
              "faces": { "f": { "kind": "exchange", "value": 1 } } }
            """);
    List<Problem> p = assertThrows(CaseInputException.class, () -> CaseReader.read(bad)).problems();
    assertEquals(2, p.size());
    assertEquals("time.initial_step", p.get(0).path());
    assertEquals("found 50, expected at most max_step (20)", p.get(0).message());
    assertEquals("faces.f.coefficient", p.get(1).path());
    assertEquals(4, p.get(1).line());

    Path fixed =
        write(
            "limits-fixed.json",
            """
            { "mesh": "m.msh", "materials": { "b": { "diffusivity": 1 } },
              "time": { "end": 100, "step": 5, "max_step": 20 } }
            """);
    Problem only = single(assertThrows(CaseInputException.class, () -> CaseReader.read(fixed)));
    assertEquals("time.max_step", only.path());
    assertTrue(only.message().startsWith("found with fixed steps"), only.message());
  }

  private static SourcePlace place(Problem p) {
    return new SourcePlace(p.line(), p.column());
  }

  private static Problem single(CaseInputException e) {
    assertEquals(1, e.problems().size(), e.getMessage());
    return e.problems().get(0);
  }

  private Path write(String name, String text) throws IOException {
    Path file = dir.resolve(name);
    Files.writeString(file, text);
    return file;
  }

  @Test
  void probesAreThreeNumbers() throws IOException {
    Path file =
        write(
            "probes.json",
            """
            { "mesh": "m.msh", "materials": { "b": { "diffusivity": 1 } },
              "time": { "end": 1 },
              "probes": { "p": [0, 1] } }
            """);
    Problem p = single(assertThrows(CaseInputException.class, () -> CaseReader.read(file)));
    assertEquals("probes.p", p.path());
    assertEquals(3, p.line());
    assertEquals(
        "found an array of 2, expected a point [x, y, z] in metres, or {\"at\": [x, y, z],"
            + " \"part\": NAME}",
        p.message());
  }

  @Test
  void aProbeMayNameThePartItReads() throws IOException {
    Path file =
        write(
            "probes.json",
            """
            { "mesh": "m.msh", "materials": { "b": { "diffusivity": 1 } },
              "time": { "end": 1 },
              "probes": { "p": { "at": [0, 1, 2], "part": "b" }, "q": { "at": [0, 1] },
                          "r": { "part": "b", "where": 1 } } }
            """);
    CaseInputException e = assertThrows(CaseInputException.class, () -> CaseReader.read(file));
    List<String> paths = e.problems().stream().map(Problem::path).toList();
    assertTrue(paths.contains("probes.q.at"), paths.toString());
    assertTrue(paths.contains("probes.r.where") && paths.contains("probes.r.at"), paths.toString());
    Path good =
        write(
            "good.json",
            """
            { "mesh": "m.msh", "materials": { "b": { "diffusivity": 1 } },
              "time": { "end": 1 },
              "probes": { "p": { "at": [0, 1, 2], "part": "b" }, "q": [3, 4, 5] } }
            """);
    CaseSpec spec = CaseReader.read(good);
    assertEquals(new ProbeSpec("p", 0, 1, 2, java.util.Optional.of("b")), spec.probes().get(0));
    assertEquals(new ProbeSpec("q", 3, 4, 5), spec.probes().get(1));
  }
}
