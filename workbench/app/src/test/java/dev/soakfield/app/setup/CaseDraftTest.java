package dev.soakfield.app.setup;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.casefile.CaseReader;
import dev.soakfield.fem.casefile.CaseSpec;
import dev.soakfield.fem.laws.SourceLawCatalog;
import dev.soakfield.fem.physics.FaceKind;
import dev.soakfield.law.api.LawParameter;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.function.Consumer;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The case as the window edits it: round trips through the file, undo and redo, checks. */
class CaseDraftTest {
  @TempDir Path dir;

  private Path demo(String name) throws IOException {
    Path to = dir.resolve("demo").resolve(name);
    Files.createDirectories(to.getParent());
    try (InputStream in = CaseDraftTest.class.getResourceAsStream("/samples/" + name)) {
      Files.copy(in, to);
    }
    return to;
  }

  private static void assertSameMeaning(CaseSpec a, CaseSpec b) {
    assertEquals(a.mesh(), b.mesh());
    assertEquals(a.elements(), b.elements());
    assertEquals(a.materials(), b.materials());
    assertEquals(a.faces(), b.faces());
    assertEquals(a.initial(), b.initial());
    assertEquals(a.time(), b.time());
    assertEquals(a.probes(), b.probes());
    assertEquals(a.threshold(), b.threshold());
    assertEquals(a.law(), b.law());
    assertEquals(
        Double.doubleToLongBits(a.temperature()), Double.doubleToLongBits(b.temperature()));
    assertEquals(a.exposure().isPresent(), b.exposure().isPresent());
    if (a.exposure().isPresent()) {
      double[] ta = a.exposure().get().breakpoints();
      assertEquals(
          java.util.Arrays.toString(ta),
          java.util.Arrays.toString(b.exposure().get().breakpoints()));
      for (double t : ta) {
        assertEquals(
            a.exposure().get().temperatureFunction().at(t),
            b.exposure().get().temperatureFunction().at(t));
      }
    }
  }

  @Test
  void handWrittenCasesSaveWithTheSameMeaningAndSayTheirCommentsGo() throws IOException {
    demo("sensor-pod.msh");
    for (String name :
        List.of(
            "sensor-pod.case.json", "sensor-pod-humid.case.json", "sensor-pod-bake.case.json")) {
      Path original = demo(name);
      CaseDraft d = CaseDraft.open(original);
      assertTrue(d.saveCaution().orElseThrow().contains("has comments"), name);
      Path copy = dir.resolve("elsewhere").resolve(name);
      Files.createDirectories(copy.getParent());
      d.saveAs(copy);
      // the mesh path is rewritten relative to the new folder, so it names the same file
      assertSameMeaning(CaseReader.read(original), CaseReader.read(copy));
      assertFalse(d.unsaved());
      assertTrue(d.saveCaution().isEmpty(), "the new file has no comments to lose");
      // and a second round trip through the window's own text changes nothing
      CaseDraft again = CaseDraft.open(copy);
      assertEquals(Files.readString(copy), again.text());
    }
  }

  @Test
  void aBareMeshGetsANewCaseBesideItThatNamesWhatIsMissing() throws IOException {
    Path mesh = dir.resolve("box.msh");
    MshWriter.write(mesh, StructuredMesher.box(0.01, 0.01, 0.004, 2, 2, 1, 1), false);
    SetupSession s = SetupSession.open(mesh, SourceLawCatalog.classPathOnly());
    CaseDraft d = s.draft().orElseThrow();
    assertEquals(dir.resolve("box.case.json"), d.caseFile());
    assertEquals(dir.resolve("box-results"), d.resultFolder());
    // a case already beside the mesh is never written over: the new one takes a free name
    Files.writeString(dir.resolve("box.case.json"), "{}");
    assertEquals(
        dir.resolve("box-2.case.json"),
        SetupSession.open(mesh, SourceLawCatalog.classPathOnly()).draft().orElseThrow().caseFile());
    Files.delete(dir.resolve("box.case.json"));
    DraftCheck c = s.check().orElseThrow();
    assertTrue(c.blocksRun().orElseThrow().contains("materials: "), c.blocksRun().toString());
    assertEquals(1, c.about(TreePath.of("materials")).size());
    new MaterialEdits(d)
        .fromLibrary(
            "body",
            "test",
            CaseText.parse("{\"diffusivity\": 1e-12, \"solubility\": 1}", d.caseFile(), "entry"));
    new FaceEdits(d).kind(List.of("zmax"), FaceKind.CONCENTRATION);
    DraftCheck ok = s.check().orElseThrow();
    assertTrue(ok.blocksRun().isEmpty(), ok.problems().toString());
    // the five groups left without an entry are sealed by default and said so
    assertEquals(5, ok.warnings().stream().filter(w -> w.contains("sealed by default")).count());
    // a value the reader refuses is reported at its own field
    new FaceEdits(d).value(List.of("zmax"), "value", "a lot");
    DraftCheck bad = s.check().orElseThrow();
    assertEquals(1, bad.about(FaceEdits.path("zmax").child("value")).size());
    assertTrue(bad.about(TreePath.of("time")).isEmpty());
  }

  private static CaseDraft pod(Path dir) throws IOException {
    Path mesh = dir.resolve("box.msh");
    MshWriter.write(mesh, StructuredMesher.box(0.01, 0.01, 0.004, 2, 2, 1, 1), false);
    return CaseDraft.ofMesh(
        mesh,
        dev.soakfield.mesh.load.MeshLoader.load(
                mesh, dev.soakfield.mesh.topo.AssemblyOptions.defaults())
            .mesh());
  }

  /** Makes the edit, undoes it (back to the text before) and redoes it (the text after). */
  private static void undoable(CaseDraft d, Consumer<CaseDraft> edit) {
    String before = d.text();
    edit.accept(d);
    String after = d.text();
    assertNotEquals(before, after, "the edit changed nothing");
    assertTrue(d.undo());
    assertEquals(before, d.text());
    assertTrue(d.redo());
    assertEquals(after, d.text());
  }

  @Test
  void everyKindOfEditUndoesAndRedoes() throws IOException {
    CaseDraft d = pod(dir);
    FaceEdits faces = new FaceEdits(d);
    MaterialEdits parts = new MaterialEdits(d);
    ExposureEdits env = new ExposureEdits(d);
    ProbeEdits probes = new ProbeEdits(d);
    undoable(d, x -> faces.kind(List.of("zmax", "xmin"), FaceKind.EXCHANGE));
    undoable(d, x -> faces.value(List.of("zmax"), "coefficient", "2e-8"));
    undoable(
        d, x -> faces.tableOrConstant("xmin", "value", true, d.tree().path("time").path("end")));
    undoable(d, x -> faces.cell("xmin", "value", 1, 1, "3"));
    undoable(d, x -> faces.addRow("xmin", "value"));
    undoable(d, x -> faces.removeRow("xmin", "value", 0));
    undoable(d, x -> faces.clear(List.of("xmin")));
    undoable(
        d,
        x ->
            parts.fromLibrary(
                "body",
                "lib",
                CaseText.parse(
                    "{\"diffusivity\": 1e-12, \"solubility\": 1}", d.caseFile(), "entry")));
    undoable(d, x -> parts.form("body", "diffusivity", MaterialEdits.Form.ARRHENIUS));
    undoable(d, x -> parts.value("body", TreePath.of("diffusivity", "Q"), "40 kJ/mol"));
    undoable(d, x -> parts.form("body", "diffusivity", MaterialEdits.Form.ORTHOTROPIC));
    undoable(d, x -> parts.value("body", TreePath.of("density"), "1900 kg/m^3"));
    undoable(
        d,
        x ->
            parts.sourceLaw(
                "body",
                "consumption",
                List.of(LawParameter.optional("k", "1/s", "rate", 1e-6, 0, 1))));
    undoable(d, x -> parts.noSource("body"));
    undoable(d, x -> env.law("henry"));
    undoable(d, x -> env.addSegment(TreePath.of("exposure")));
    undoable(d, x -> env.addSegment(TreePath.of("exposure")));
    undoable(d, x -> d.set(TreePath.of("exposure", 1, "temperature"), "85 degC -> 125 degC"));
    undoable(d, x -> env.repeatLast(2, 3));
    // a ramp typed with an arrow is stored as the two-element array the reader takes
    assertEquals(
        "[\"85 degC\",\"125 degC\"]",
        d.tree().path("exposure").path(0).path("segments").path(1).path("temperature").toString());
    undoable(d, x -> env.remove(TreePath.of("exposure", 0)));
    undoable(d, x -> d.set(TreePath.of("time", "outputs"), "1 h"));
    undoable(d, x -> d.set(TreePath.of("threshold"), "0.5"));
    undoable(d, x -> probes.add(0.005, 0.005, 0.004));
    undoable(d, x -> probes.rename("probe-1", "centre"));
    undoable(d, x -> probes.part("centre", "body"));
    assertEquals("body", probes.part("centre"));
    assertEquals(TreePath.of("probes", "centre", "at"), probes.pointPath("centre"));
    undoable(d, x -> probes.part("centre", ""));
    undoable(d, x -> probes.remove("centre"));
    undoable(d, x -> new GroupEdits(x).rename("zmax", "lid"));
  }

  @Test
  void aCurvedSideSplitsIntoPatchesThatKeepItsKindAndSaveWithTheirOwnMesh() throws IOException {
    Path mesh = dir.resolve("can.msh");
    // 8 cells around: neighbouring side facets meet at 45°, more than a 30° feature angle
    MshWriter.write(mesh, StructuredMesher.cylinder(0.005, 0.004, 1, 8, 1, 1), false);
    CaseDraft d =
        CaseDraft.ofMesh(
            mesh,
            dev.soakfield.mesh.load.MeshLoader.load(
                    mesh, dev.soakfield.mesh.topo.AssemblyOptions.defaults())
                .mesh());
    new FaceEdits(d).kind(List.of("side"), FaceKind.FLUX);
    new MaterialEdits(d)
        .fromLibrary(
            "body", "m", CaseText.parse("{\"diffusivity\": 1e-12, \"solubility\": 1}", mesh, "m"));
    String before = d.text();
    var meshBefore = d.mesh();
    assertEquals(8, new GroupEdits(d).split("side", 30));
    assertEquals(-1, d.mesh().faceGroupIndex("side"));
    for (int i = 1; i <= 8; i++) {
      assertEquals("flux", new FaceEdits(d).kindOf("side-" + i));
    }
    assertTrue(d.undo());
    assertEquals(before, d.text());
    assertTrue(d.mesh() == meshBefore);
    assertTrue(d.redo());
    new GroupEdits(d).rename("side-1", "window");
    d.saveAs(dir.resolve("can.case.json"));
    // the case names the regrouped mesh written beside it; the mesher's file is untouched
    CaseSpec spec = CaseReader.read(dir.resolve("can.case.json"));
    assertEquals(dir.resolve("can-regrouped.msh"), spec.mesh());
    var saved =
        dev.soakfield.mesh.load.MeshLoader.load(
                spec.mesh(), dev.soakfield.mesh.topo.AssemblyOptions.defaults())
            .mesh();
    assertTrue(saved.faceGroupIndex("window") >= 0);
    assertEquals(FaceKind.FLUX, spec.faces().get("window").kind());
    assertTrue(
        dev.soakfield.mesh.load.MeshLoader.load(
                    mesh, dev.soakfield.mesh.topo.AssemblyOptions.defaults())
                .mesh()
                .faceGroupIndex("side")
            >= 0);
    // a flat group has no edge to split at: nothing changes
    assertEquals(1, new GroupEdits(d).split("top", 30));
  }

  @Test
  void typedValuesKeepTheirSpellingAndUnits() {
    assertEquals("5E-12", CaseValues.text(CaseValues.node("5e-12")));
    assertEquals("604800", CaseValues.text(CaseValues.node("604800")));
    assertTrue(CaseValues.node("604800").isIntegralNumber());
    assertEquals("168 h", CaseValues.node(" 168 h ").asText());
    assertEquals(null, CaseValues.node("  "));
    assertTrue(CaseText.hasComments("{\"a\": 1} // note"));
    assertFalse(CaseText.hasComments("{\"url\": \"http://x\"}"));
  }

  @Test
  void selectionFollowsClicksShiftClicksAndTheList() {
    FaceSelection s = new FaceSelection();
    s.click("zmax");
    s.toggle("xmin");
    assertEquals(List.of("zmax", "xmin"), s.groups());
    s.toggle("zmax");
    assertEquals(List.of("xmin"), s.groups());
    s.set("ymax", true);
    s.set("xmin", false);
    assertEquals(List.of("ymax"), s.groups());
    s.click(null);
    assertTrue(s.isEmpty());
    s.click("gone");
    s.retain(List.of("zmax"));
    assertTrue(s.isEmpty());
  }
}
