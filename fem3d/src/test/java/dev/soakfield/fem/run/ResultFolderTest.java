package dev.soakfield.fem.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.soakfield.fem.results.ResultFolder;
import dev.soakfield.fem.results.ResultFolderException;
import dev.soakfield.fem.results.RunManifest;
import dev.soakfield.mesh.MeshImport;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.load.MeshLoader;
import dev.soakfield.mesh.msh.MshWriter;
import dev.soakfield.mesh.topo.AssemblyOptions;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ResultFolderTest {
  @TempDir Path dir;

  private Path sheetCase(String name, double diffusivity) throws IOException {
    if (!Files.exists(dir.resolve("sheet.msh"))) {
      MshWriter.write(
          dir.resolve("sheet.msh"), StructuredMesher.box(1e-3, 1e-4, 1e-4, 10, 1, 1, 2), false);
    }
    String json =
        """
        { "mesh": "sheet.msh",
          "materials": { "body": { "diffusivity": %s } },
          "faces": { "xmin": { "kind": "concentration", "value": 1.0 } },
          "time": { "end": 1000, "outputs": [500, 1000], "step": 50 } }
        """
            .formatted(diffusivity);
    return Files.writeString(dir.resolve(name), json);
  }

  private static JsonNode manifest(Path out) throws IOException {
    return new ObjectMapper().readTree(out.resolve(RunManifest.FILE).toFile());
  }

  private static String sha256(byte[] bytes) throws NoSuchAlgorithmException {
    return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
  }

  @Test
  void aFinishedRunHasAManifestWithHashesAndEveryFileItWrote() throws Exception {
    Path c = sheetCase("a.json", 1e-10);
    Path out = dir.resolve("out");
    RunPipeline.run(c, out, RunProgress.SILENT);
    JsonNode m = manifest(out);
    assertEquals("finished", m.get("status").asText());
    // the hash of the bytes, computed here with the JDK's digest independently of FileHashes
    assertEquals(sha256(Files.readAllBytes(c)), m.get("case_sha256").asText());
    assertEquals(
        sha256(Files.readAllBytes(dir.resolve("sheet.msh"))), m.get("mesh_sha256").asText());
    assertTrue(m.get("started").asText().compareTo(m.get("ended").asText()) <= 0);
    List<String> files = new java.util.ArrayList<>();
    m.get("files").forEach(f -> files.add(f.asText()));
    assertTrue(
        files.containsAll(
            List.of(
                "series.csv",
                "summary.json",
                "fields.pvd",
                "fields/c_0000.vtu",
                "fields/c_0002.vtu",
                "mesh.msh",
                "run.log")),
        files.toString());
    for (String f : files) {
      assertTrue(Files.isRegularFile(out.resolve(f)), f);
    }
    assertFalse(Files.exists(out.resolve(ResultFolder.STAGING)));
    // the mesh copy reads back with the same groups and counts
    MeshImport copy = MeshLoader.load(out.resolve("mesh.msh"), AssemblyOptions.defaults());
    assertEquals(10 * 6, copy.mesh().tetCount()); // Kuhn split: 6 tets per cell, exact
    assertTrue(copy.mesh().faceGroupIndex("xmin") >= 0);
    String log = Files.readString(out.resolve("run.log"), StandardCharsets.UTF_8);
    assertTrue(log.contains("finished: 20 steps"), log);
  }

  @Test
  void anotherCasesResultsAreKeptWithoutForceAndReplacedWithIt() throws IOException {
    Path out = dir.resolve("out");
    RunPipeline.run(sheetCase("a.json", 1e-10), out, RunProgress.SILENT);
    String before = Files.readString(out.resolve("series.csv"));
    Path other = sheetCase("b.json", 2e-10);
    ResultFolderException e =
        assertThrows(
            ResultFolderException.class, () -> RunPipeline.run(other, out, RunProgress.SILENT));
    assertTrue(e.getMessage().contains("another case") && e.getMessage().contains("--force"));
    assertEquals(before, Files.readString(out.resolve("series.csv")));
    assertEquals("finished", manifest(out).get("status").asText());
    RunPipeline.run(other, out, RunProgress.SILENT, RunOptions.defaults().withForce(true));
    assertTrue(manifest(out).get("case").asText().endsWith("b.json"));
    assertFalse(before.equals(Files.readString(out.resolve("series.csv"))));
  }

  @Test
  void aFolderOfOtherFilesIsNeverWrittenWithoutForce() throws IOException {
    Path out = Files.createDirectories(dir.resolve("mine"));
    Files.writeString(out.resolve("notes.txt"), "keep me");
    Path c = sheetCase("a.json", 1e-10);
    ResultFolderException e =
        assertThrows(
            ResultFolderException.class, () -> RunPipeline.run(c, out, RunProgress.SILENT));
    assertTrue(e.getMessage().contains("not empty"), e.getMessage());
    try (Stream<Path> s = Files.list(out)) {
      assertEquals(1, s.count());
    }
    RunPipeline.run(c, out, RunProgress.SILENT, RunOptions.defaults().withForce(true));
    assertEquals("keep me", Files.readString(out.resolve("notes.txt")));
    assertTrue(Files.exists(out.resolve("series.csv")));
  }

  @Test
  void aManifestNamingFilesOutsideTheFolderIsRefusedAndNothingIsDeleted() throws IOException {
    Path c = sheetCase("a.json", 1e-10);
    Path out = dir.resolve("out");
    RunPipeline.run(c, out, RunProgress.SILENT);
    Path victim = Files.writeString(dir.resolve("keep-me.txt"), "a user's file");
    RunManifest m = RunManifest.readFrom(out).orElseThrow();
    for (String bad : List.of(victim.toAbsolutePath().toString(), "../keep-me.txt")) {
      m.withFiles(List.of(bad)).writeTo(out);
      ResultFolderException e =
          assertThrows(
              ResultFolderException.class, () -> RunPipeline.run(c, out, RunProgress.SILENT));
      assertTrue(e.getMessage().contains("expected a name inside the folder"), e.getMessage());
      assertTrue(e.getMessage().contains(bad), e.getMessage());
      assertTrue(Files.exists(victim), bad);
    }
  }

  @Test
  void resumeWithNoCheckpointYetRunsFromTheStartAndSaysSo() throws IOException {
    Path c = sheetCase("a.json", 1e-10);
    Path plain = dir.resolve("plain");
    RunPipeline.run(c, plain, RunProgress.SILENT);
    Path out = dir.resolve("never-run");
    RunSummary s =
        RunPipeline.run(c, out, RunProgress.SILENT, RunOptions.defaults().withResume(true));
    assertTrue(
        s.warnings().stream().anyMatch(w -> w.contains("the run started from the beginning")),
        s.warnings().toString());
    assertEquals(
        Files.readString(plain.resolve("series.csv")), Files.readString(out.resolve("series.csv")));
    // a finished run is never resumed over: that refusal stays
    ResultFolderException e =
        assertThrows(
            ResultFolderException.class,
            () ->
                RunPipeline.run(
                    c, out, RunProgress.SILENT, RunOptions.defaults().withResume(true)));
    assertTrue(e.getMessage().contains("expected an interrupted one"), e.getMessage());
  }

  @Test
  void aRerunDropsTheEarlierRunsFilesItDidNotReplace() throws IOException {
    Path c = sheetCase("a.json", 1e-10);
    Path out = dir.resolve("out");
    RunPipeline.run(c, out, RunProgress.SILENT);
    // an earlier run of the same case listed a frame this run will not write
    Files.writeString(out.resolve("fields/c_0009.vtu"), "stale");
    RunManifest m = RunManifest.readFrom(out).orElseThrow();
    m.withFiles(List.of("fields/c_0009.vtu")).writeTo(out);
    RunPipeline.run(c, out, RunProgress.SILENT);
    assertFalse(Files.exists(out.resolve("fields/c_0009.vtu")));
    assertTrue(Files.exists(out.resolve("fields/c_0002.vtu")));
  }

  @Test
  void aFailedRunSaysSoAndKeepsOnlyFilesThatWereComplete() throws IOException {
    Path c = sheetCase("a.json", 1e-10);
    Path out = dir.resolve("out");
    ResultFolder stopped =
        ResultFolder.open(out, RunManifest.starting(c, dir.resolve("sheet.msh"), "test"), false);
    assertEquals("running", manifest(out).get("status").asText());
    Files.writeString(stopped.work().resolve("series.csv"), "time\n0\n");
    Files.writeString(stopped.work().resolve(".summary.json.123.part"), "{ cut");
    // the run stopped between writes (a numerical failure): what was staged is complete
    stopped.fail("the solver stalled at t = 5 s", true);
    JsonNode m = manifest(out);
    assertEquals("failed", m.get("status").asText());
    assertEquals("the solver stalled at t = 5 s", m.get("message").asText());
    assertEquals("time\n0\n", Files.readString(out.resolve("series.csv")));
    assertFalse(Files.exists(out.resolve(".summary.json.123.part")));
    assertFalse(Files.exists(out.resolve(ResultFolder.STAGING)));

    // a write failed (disk full): a staged file may be cut short, so none is kept
    ResultFolder broken =
        ResultFolder.open(out, RunManifest.starting(c, dir.resolve("sheet.msh"), "test"), false);
    Files.writeString(broken.work().resolve("summary.json"), "{ \"cut");
    broken.fail("writing the results failed: No space left on device", false);
    assertFalse(Files.exists(out.resolve("summary.json")));
    assertEquals("failed", manifest(out).get("status").asText());
    assertEquals("time\n0\n", Files.readString(out.resolve("series.csv")));
  }

  @Test
  void anUnwritableFolderGivesAClearErrorAndLeavesNothing() throws IOException {
    // a regular file where a parent folder should be: no one, not even root, can create the folder
    Path blocker = Files.writeString(dir.resolve("blocker"), "a file");
    Path c = sheetCase("a.json", 1e-10);
    Path out = blocker.resolve("out");
    ResultFolderException e =
        assertThrows(
            ResultFolderException.class, () -> RunPipeline.run(c, out, RunProgress.SILENT));
    assertTrue(e.getMessage().contains("cannot write the results"), e.getMessage());
    assertTrue(e.getMessage().contains(out.toString()), e.getMessage());
    assertEquals("a file", Files.readString(blocker));
  }

  @Test
  void aHeapTooSmallIsRefusedBeforeAnythingIsWritten() throws IOException {
    Path c = sheetCase("a.json", 1e-10);
    Path out = dir.resolve("out");
    HeapTooSmallException e =
        assertThrows(
            HeapTooSmallException.class,
            () ->
                RunPipeline.run(
                    c, out, RunProgress.SILENT, RunOptions.defaults().withMaxHeap(1 << 20)));
    assertTrue(e.getMessage().contains("JAVA_OPTS=-Xmx"), e.getMessage());
    assertTrue(e.getMessage().contains("1 MB"), e.getMessage());
    assertFalse(Files.exists(out));
  }
}
