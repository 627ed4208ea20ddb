package dev.soakfield.fem.sweep;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.soakfield.fem.casefile.CaseInputException;
import dev.soakfield.fem.casefile.CaseReader;
import dev.soakfield.fem.casefile.CaseSpec;
import dev.soakfield.fem.model.LawResolver;
import dev.soakfield.fem.results.ResultFiles;
import dev.soakfield.fem.results.Series;
import dev.soakfield.fem.run.RunOptions;
import dev.soakfield.fem.run.RunPipeline;
import dev.soakfield.fem.run.RunProgress;
import dev.soakfield.mesh.AtomicFiles;
import dev.soakfield.mesh.MeshImport;
import dev.soakfield.mesh.load.MeshLoader;
import dev.soakfield.mesh.topo.AssemblyOptions;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import java.util.TreeSet;
import java.util.stream.Stream;

/**
 * Turns one planned case into one row: sets the varied keys in the base case's JSON tree, binds and
 * runs it through the run pipeline (no field frames, no checkpoints) in a scratch folder, and
 * collects the amount (and weight gain) at the collect times, every threshold's time, the peak of
 * each part's maximum, the balance error and the status. The mesh is imported once per runner. A
 * case that fails becomes a row that says why; it never stops the sweep. Safe to share between
 * threads.
 */
public final class CaseRunner {
  private final SweepJob job;
  private final Path meshFile;
  private final Path scratch;
  private final LawResolver laws;
  private final long heapPerCase;
  private volatile MeshImport mesh;

  /**
   * @param meshFile where the mesh is on this machine
   * @param scratch a folder for the cases' run folders, each removed when its row is made
   * @param heapPerCase the heap one case may use (the memory estimate is held against it)
   */
  public CaseRunner(SweepJob job, Path meshFile, Path scratch, LawResolver laws, long heapPerCase) {
    this.job = job;
    this.meshFile = meshFile.toAbsolutePath().normalize();
    this.scratch = scratch;
    this.laws = laws;
    this.heapPerCase = heapPerCase;
  }

  /** Runs {@code c} and returns its row; failures are rows too. */
  public CaseRow run(PlannedCase c) {
    long start = System.nanoTime();
    Path folder = scratch.resolve("case-" + c.id());
    try {
      deleteTree(folder);
      Files.createDirectories(folder);
      Path caseFile = folder.resolve("case.json");
      String text = caseText(c, folder);
      AtomicFiles.write(caseFile, f -> Files.writeString(f, text, StandardCharsets.UTF_8));
      CaseSpec spec = CaseReader.readText(text, caseFile, source(c));
      RunOptions options =
          RunOptions.defaults()
              .withLaws(laws)
              .withMaxHeap(heapPerCase)
              .withCheckpoints(0, 0)
              .withFrames(false);
      Path out = folder.resolve("run");
      RunPipeline.run(RunPipeline.prepare(spec, mesh()), out, RunProgress.SILENT, options);
      CaseRow row = collect(c, out, seconds(start));
      deleteTree(folder);
      return row;
    } catch (RuntimeException | IOException | OutOfMemoryError e) {
      String reason =
          e instanceof CaseInputException ci
              ? withoutPlaces(ci)
              : e instanceof OutOfMemoryError
                  ? "the Java heap ran out (give the sweep more heap or fewer workers)"
                  : e instanceof IOException
                      ? "a file could not be read or written: " + e
                      : e.getMessage();
      try {
        deleteTree(folder);
      } catch (IOException ignored) {
        // the scratch folder stays; the row says what failed
      }
      return CaseRow.failed(c, reason, seconds(start));
    }
  }

  /**
   * A case's binding problems by key path alone: lines and columns would point into the generated
   * case text, which the user never sees.
   */
  private static String withoutPlaces(CaseInputException e) {
    StringBuilder sb = new StringBuilder(e.source()).append(": ");
    for (int i = 0; i < e.problems().size(); i++) {
      CaseInputException.Problem p = e.problems().get(i);
      sb.append(i > 0 ? "; " : "")
          .append(p.path().isEmpty() ? "" : p.path() + ": ")
          .append(p.message());
    }
    return sb.toString();
  }

  private static double seconds(long start) {
    return (System.nanoTime() - start) * 1e-9;
  }

  private String source(PlannedCase c) {
    StringBuilder sb =
        new StringBuilder("case ").append(c.id()).append(" of ").append(job.sweepName());
    sb.append(" (").append(job.baseName()).append(" with ");
    for (int i = 0; i < job.keys().size(); i++) {
      sb.append(i > 0 ? ", " : "")
          .append(job.keys().get(i))
          .append(" = ")
          .append(c.values().get(i));
    }
    return sb.append(")").toString();
  }

  /**
   * The case's JSON: the base with the varied values, the mesh on this machine, and the collect
   * times among the output times (steps land exactly on output times).
   */
  String caseText(PlannedCase c, Path folder) throws IOException {
    ObjectNode tree = (ObjectNode) SweepFile.JSON.readTree(job.baseText());
    for (int i = 0; i < job.keys().size(); i++) {
      KeyPaths.set(tree, job.keys().get(i), SweepFile.JSON.readTree(c.values().get(i)));
    }
    tree.put("mesh", meshFile.toString());
    if (!job.collectTimes().isEmpty()) {
      // the end may itself be varied: bind once to learn it, keep the collect times up to it
      CaseSpec bound = CaseReader.readText(tree.toString(), folder.resolve("case.json"), source(c));
      double end = bound.time().end();
      TreeSet<Double> outputs = new TreeSet<>();
      for (double t : bound.time().outputTimes()) {
        outputs.add(t);
      }
      for (double t : job.collectTimes()) {
        if (t <= end) {
          outputs.add(t);
        }
      }
      JsonNode time = tree.path("time");
      ObjectNode timeObj = time.isObject() ? (ObjectNode) time : tree.putObject("time");
      ArrayNode list = timeObj.putArray("outputs");
      outputs.forEach(list::add);
    }
    return tree.toPrettyString();
  }

  private CaseRow collect(PlannedCase c, Path out, double seconds) throws IOException {
    Series series = Series.read(out.resolve(ResultFiles.SERIES));
    JsonNode summary = SweepFile.readJson(out.resolve(ResultFiles.SUMMARY), "summary.json");
    List<String> names = new ArrayList<>();
    List<Double> numbers = new ArrayList<>();
    double[] time = series.require("time");
    for (double t : job.collectTimes()) {
      names.add("amount@" + SweepColumns.time(t));
      numbers.add(at(time, series.require("amount"), t));
      if (series.has("weight_gain_percent")) {
        names.add("weight_gain_percent@" + SweepColumns.time(t));
        numbers.add(at(time, series.require("weight_gain_percent"), t));
      }
    }
    for (JsonNode th : summary.path("thresholds")) {
      names.add("threshold:" + th.path("name").asText());
      numbers.add(th.path("time").isNumber() ? th.get("time").asDouble() : Double.NaN);
    }
    JsonNode legacy = summary.path("threshold").path("first_time");
    for (String kind : List.of("volume_groups", "probes")) {
      for (Iterator<String> it = legacy.path(kind).fieldNames(); it.hasNext(); ) {
        String name = it.next();
        if (!names.contains("threshold:" + name)) {
          JsonNode t = legacy.path(kind).get(name);
          names.add("threshold:" + name);
          numbers.add(t.isNumber() ? t.asDouble() : Double.NaN);
        }
      }
    }
    for (String part : series.suffixes("max:")) {
      names.add("max:" + part);
      numbers.add(series.max("max:" + part));
    }
    names.add("balance");
    numbers.add(summary.path("balance").path("relative").asDouble(Double.NaN));
    return new CaseRow(c.id(), c.values(), names, numbers, CaseRow.FINISHED, seconds);
  }

  /** The value at time t: the row whose time is t (to round-off), else NaN (t after the end). */
  static double at(double[] time, double[] values, double t) {
    for (int i = 0; i < time.length; i++) {
      if (Math.abs(time[i] - t) <= 1e-9 * Math.max(1, Math.abs(t))) {
        return values[i];
      }
    }
    return Double.NaN;
  }

  private MeshImport mesh() {
    MeshImport m = mesh;
    if (m == null) {
      synchronized (this) {
        m = mesh;
        if (m == null) {
          m = MeshLoader.load(meshFile, AssemblyOptions.defaults());
          mesh = m;
        }
      }
    }
    return m;
  }

  static void deleteTree(Path root) throws IOException {
    if (!Files.exists(root)) {
      return;
    }
    try (Stream<Path> s = Files.walk(root)) {
      for (Path p : s.sorted(Comparator.reverseOrder()).toList()) {
        Files.deleteIfExists(p);
      }
    }
  }

  @Override
  public String toString() {
    return String.format(Locale.ROOT, "CaseRunner[%s on %s]", job.sweepName(), meshFile);
  }
}
