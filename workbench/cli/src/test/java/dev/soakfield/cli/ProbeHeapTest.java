package dev.soakfield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.soakfield.fem.casefile.CaseSpec;
import dev.soakfield.fem.run.MemoryEstimate;
import dev.soakfield.fem.run.RunPipeline;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Probes are counted into the heap estimate: 200 000 probes once needed 4 GB against an estimate of
 * 41 MB from the mesh alone. The sample case with 20 000 probes must run to its end in a JVM whose
 * heap is exactly the estimate (the run refuses a smaller one itself).
 */
class ProbeHeapTest {
  @TempDir Path dir;

  @Test
  void aCaseWithTwentyThousandProbesRunsInTheHeapItsEstimateAsksFor() throws Exception {
    Path sample = Samples.copyTo(dir);
    ObjectMapper json = new ObjectMapper();
    ObjectNode c = (ObjectNode) json.readTree(stripComments(Files.readString(sample)));
    ObjectNode probes = json.createObjectNode();
    Random random = new Random(1);
    for (int i = 0; i < 20_000; i++) {
      ArrayNode at = probes.putArray("p" + i);
      at.add(0.012 * random.nextDouble()).add(0.012 * random.nextDouble());
      at.add(0.004 * random.nextDouble());
    }
    c.set("probes", probes);
    Path many = dir.resolve("many-probes.json");
    json.writeValue(many.toFile(), c);

    var prepared = RunPipeline.prepare(many);
    CaseSpec spec = prepared.spec();
    var mesh = prepared.mesh();
    long estimate = MemoryEstimate.of(spec, mesh).bytes();
    long meshOnly = MemoryEstimate.of(mesh, mesh.order()).bytes();
    // the probes' series and entries at least double what the mesh alone needs
    assertTrue(estimate > 2 * meshOnly, estimate + " against " + meshOnly);

    Process p =
        new ProcessBuilder(
                List.of(
                    Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                    // Runtime.maxMemory() reports a little under -Xmx (a survivor space)
                    "-Xmx" + (long) Math.ceil(estimate * 1.03 / (1 << 20)) + "m",
                    "-cp",
                    System.getProperty("java.class.path"),
                    SoakfieldCli.class.getName(),
                    "run",
                    many.toString(),
                    "--out",
                    dir.resolve("out").toString(),
                    "--quiet"))
            .redirectErrorStream(true)
            .start();
    String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
    assertTrue(p.waitFor(300, TimeUnit.SECONDS));
    assertEquals(0, p.exitValue(), out);
    assertTrue(Files.exists(dir.resolve("out/report.html")), out);
    // the report draws a dozen probe curves and says where the rest are
    String report = Files.readString(dir.resolve("out/report.md"));
    assertTrue(report.contains("The first 12 of 20000 probes"), report.substring(0, 400));
  }

  private static String stripComments(String text) {
    return text.replaceAll("(?m)//[^\\n\"]*$", "");
  }
}
