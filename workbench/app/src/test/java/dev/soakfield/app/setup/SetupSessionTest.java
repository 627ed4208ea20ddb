package dev.soakfield.app.setup;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.app.OrbitCamera;
import dev.soakfield.app.Study;
import dev.soakfield.app.ViewSettings;
import dev.soakfield.app.WorkbenchModel;
import dev.soakfield.fem.laws.SourceLawCatalog;
import dev.soakfield.fem.physics.FaceKind;
import dev.soakfield.fem.results.RunManifest;
import dev.soakfield.fem.results.Series;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Opening, checking, running and placing probes as the window does it, without the window. */
class SetupSessionTest {
  private static final SourceLawCatalog LAWS = SourceLawCatalog.classPathOnly();

  @TempDir Path dir;

  /** A 10 × 10 × 4 mm box (StructuredMesher: groups xmin … zmax, part body). */
  private Path box() throws IOException {
    Path mesh = dir.resolve("pod.msh");
    MshWriter.write(mesh, StructuredMesher.box(0.01, 0.01, 0.004, 2, 2, 2, 1), false);
    return mesh;
  }

  /** The bare mesh set up as a user would: top held at 1, a material, a short fixed-step run. */
  private SetupSession setUp() throws IOException {
    SetupSession s = SetupSession.open(box(), LAWS);
    CaseDraft d = s.draft().orElseThrow();
    new FaceEdits(d).kind(List.of("zmax"), FaceKind.CONCENTRATION);
    new MaterialEdits(d)
        .fromLibrary(
            "body",
            "m",
            CaseText.parse("{\"diffusivity\": 1e-9, \"solubility\": 1}", d.caseFile(), "m"));
    d.set(TreePath.of("time", "end"), "100");
    d.edit("fixed", t -> TreePath.of("time", "tolerance").set(t, null));
    d.set(TreePath.of("time", "step"), "10");
    return s;
  }

  @Test
  void aRunSavesTheCaseRunsBesideItAndAReRunReplacesOnlyItsOwnResults() throws Exception {
    SetupSession s = setUp();
    assertTrue(s.whyNoRun().isEmpty(), s.whyNoRun().toString());
    RunJob job = s.run();
    job.join();
    assertEquals(RunJob.Status.FINISHED, job.status(), job.message());
    assertEquals(dir.resolve("pod-results"), job.folder());
    assertEquals(10, job.progress().steps());
    assertEquals(100, job.progress().time(), 1e-9);
    assertEquals(0, job.progress().secondsLeft());
    assertTrue(job.progress().iterations() > 0);
    // a sealed box but for the held top: the amount is the inflow through it (conservation)
    Series series = Series.read(job.folder().resolve("series.csv"));
    assertEquals(
        series.last("inflow:zmax"), series.last("amount"), 1e-12 * series.last("amount") + 1e-30);
    // an edit and a second run replace the first run's results of this same case file
    s.draft().get().set(TreePath.of("time", "end"), "200");
    RunJob again = s.run();
    again.join();
    assertEquals(RunJob.Status.FINISHED, again.status(), again.message());
    assertEquals(20, again.progress().steps());
    // opening the case shows its results; opening the results finds the case
    SetupSession byCase = SetupSession.open(dir.resolve("pod.case.json"), LAWS);
    assertTrue(byCase.study().results().isPresent());
    SetupSession byResults = SetupSession.open(dir.resolve("pod-results"), LAWS);
    assertEquals(dir.resolve("pod.case.json"), byResults.draft().orElseThrow().caseFile());
    // another case file pointed at the same folder is refused, as 'run' refuses it
    Path other = dir.resolve("other.case.json");
    Files.writeString(other, s.draft().get().text().replace("\"end\" : 200", "\"end\" : 300"));
    SetupSession o = SetupSession.open(other, LAWS);
    RunJob refused =
        RunJob.start(
            other, dir.resolve("pod-results"), dev.soakfield.fem.run.RunOptions.defaults());
    refused.join();
    assertEquals(RunJob.Status.FAILED, refused.status());
    assertTrue(refused.message().contains("another case"), refused.message());
    assertTrue(o.draft().isPresent());
  }

  @Test
  void aCancelledRunSaysSoAndItsFolderIsNotMarkedFinished() throws Exception {
    SetupSession s = setUp();
    s.draft().get().set(TreePath.of("time", "end"), "1e7"); // a million steps: long enough
    RunJob job = s.run();
    assertTrue(s.running());
    assertTrue(s.whyNoRun().orElseThrow().contains("a run is going on"));
    assertThrows(IllegalStateException.class, s::run);
    job.cancel();
    job.join();
    assertEquals(RunJob.Status.CANCELLED, job.status());
    assertTrue(job.message().startsWith("cancelled at t = "), job.message());
    RunManifest m = RunManifest.readFrom(job.folder()).orElseThrow();
    assertEquals(RunManifest.Status.FAILED, m.status());
    assertFalse(s.running());
  }

  @Test
  void aClickPlacesAProbeOnTheSurfaceOrOnTheCutInFrontOfIt() throws IOException {
    Study study = Study.open(box());
    WorkbenchModel model = new WorkbenchModel(study);
    OrbitCamera cam = model.camera();
    cam.viewport(400, 300);
    cam.fit(study.geometry().bounds());
    cam.look(OrbitCamera.View.ZMAX);
    model.scene().update();
    double[] px = cam.toPixel(0.003, 0.006, 0.004);
    // looking down on the top face: the ray meets z = 4 mm at the clicked x, y (exact geometry)
    double[] p = ProbePlacement.under(model.scene(), cam, px[0], px[1]).orElseThrow();
    assertEquals(0.003, p[0], 1e-9);
    assertEquals(0.006, p[1], 1e-9);
    assertEquals(0.004, p[2], 1e-9);
    // with the part above z = 1.5 mm cut away, the probe goes onto the cut
    model.settings().section(Optional.of(new ViewSettings.Plane(0, 0, 1, 0.0015)));
    model.scene().update();
    double[] q = ProbePlacement.under(model.scene(), cam, px[0], px[1]).orElseThrow();
    assertEquals(0.0015, q[2], 1e-9);
    assertEquals(0.003, q[0], 1e-9);
    // beside the part: nothing
    assertTrue(ProbePlacement.under(model.scene(), cam, 1, 1).isEmpty());
  }

  @Test
  void aFaceLawComesFromTheCatalogWithItsDefaultsAndTheCheckNamesWhatIsMissing()
      throws IOException {
    SetupSession s = setUp();
    CaseDraft d = s.draft().orElseThrow();
    FaceEdits f = new FaceEdits(d);
    assertTrue(FaceEdits.kindWords().contains("law"), FaceEdits.kindWords().toString());
    f.kind(List.of("xmin"), FaceKind.LAW);
    List<String> noLaw = s.check().orElseThrow().about(FaceEdits.path("xmin"));
    assertFalse(noLaw.isEmpty(), "a law kind without a law must be refused");
    var cathodic = LAWS.findFace("cathodic-charging").orElseThrow();
    f.faceLaw(List.of("xmin"), "cathodic-charging", cathodic.provider().parameters());
    assertEquals("law", f.kindOf("xmin"));
    assertEquals("cathodic-charging", f.entry("xmin").path("law").asText());
    assertEquals(1.0, f.entry("xmin").path("efficiency").asDouble()); // the optional default
    List<String> missing =
        s.check().orElseThrow().about(FaceEdits.path("xmin").child("current-density"));
    assertEquals(List.of("found nothing, expected a value in A/m^2 (required)"), missing);
    f.value(List.of("xmin"), "current-density", "10");
    assertEquals(List.of(), s.check().orElseThrow().about(FaceEdits.path("xmin")));
  }

  @Test
  void facesAreColouredByKindWithUnsetExteriorGroupsStandingOut() throws IOException {
    SetupSession s = SetupSession.open(box(), LAWS);
    CaseDraft d = s.draft().orElseThrow();
    FaceEdits f = new FaceEdits(d);
    f.kind(List.of("xmin"), FaceKind.FLUX);
    s.selection().click("zmax");
    List<String> groups = List.of("xmin", "xmax", "zmax", "joint");
    int[] c =
        KindColours.forGroups(groups, new boolean[] {false, false, false, true}, f, s.selection());
    assertEquals(KindColours.of(FaceKind.FLUX), c[0]);
    assertEquals(KindColours.NO_ENTRY, c[1]);
    assertEquals(KindColours.SELECTED, c[2]);
    assertEquals(KindColours.INTERFACE, c[3]);
  }

  @Test
  void theRecentListKeepsTheNewestFirstAndForgetsWhatIsGone() throws IOException {
    RecentFiles r = new RecentFiles(dir.resolve("settings").resolve("recent.txt"));
    assertTrue(r.list().isEmpty());
    Path a = Files.writeString(dir.resolve("a.json"), "{}");
    Path b = Files.writeString(dir.resolve("b.json"), "{}");
    r.opened(a);
    r.opened(b);
    r.opened(a);
    assertEquals(List.of(a, b), r.list());
    Files.delete(b);
    assertEquals(List.of(a), r.list());
    for (int i = 0; i < RecentFiles.KEEP + 3; i++) {
      r.opened(Files.writeString(dir.resolve("f" + i + ".json"), "{}"));
    }
    assertEquals(RecentFiles.KEEP, r.list().size());
  }

  @Test
  void pathsAreSpeltAsTheCaseReaderSpellsThem() {
    TreePath p = TreePath.of("exposure", 2, "segments", 0, "duration");
    assertEquals("exposure[2].segments[0].duration", p.spelt());
    assertTrue(TreePath.of("exposure", 2).covers("exposure[2].segments[0].duration"));
    assertFalse(TreePath.of("exposure", 2).covers("exposure[20]"));
    assertFalse(TreePath.of("faces", "top").covers("faces.topside"));
    var tree =
        CaseText.parse(
            "{\"materials\": {\"body\": {\"source\": {\"law\": \"x\"}}}}",
            dir.resolve("c.json"),
            "c");
    TreePath.of("materials", "body", "source", "law").set(tree, null);
    // the objects emptied by the removal go with it, the top-level section stays
    assertEquals("{\"materials\":{}}", tree.toString());
    assertEquals("1 h, 2 h", CaseValues.text(CaseValues.node("1 h, 2 h")));
    assertEquals("20 -> 85 degC", CaseValues.rampText(CaseValues.node("20 -> 85 degC")));
  }
}
