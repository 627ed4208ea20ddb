package dev.soakfield.fem.sweep;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.soakfield.fem.results.FolderLock;
import dev.soakfield.fem.results.ResultFolderException;
import dev.soakfield.mesh.AtomicFiles;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Stream;

/**
 * A sweep from its file to its table: expands the plan, keeps the rows of cases an earlier run of
 * the same sweep finished, has an engine run the others (each row stored durably as it arrives),
 * then writes {@code cases.csv} and {@code statistics.csv}. The folder is locked while it runs; a
 * folder holding another sweep is not touched without {@code force}.
 */
public final class SweepRun {
  public static final String PLAN = "plan.json";

  /** Files a sweep folder may hold besides its rows and plots. */
  private static final Set<String> OWN =
      Set.of(
          PLAN,
          RowStore.FOLDER,
          CasesTable.FILE,
          SweepStatistics.FILE,
          "plots",
          "cases.parquet",
          LocalSweepEngine.SCRATCH,
          FolderLock.NAME);

  /** How long between two progress lines, at most one per finished case. */
  static final double PROGRESS_SECONDS = 5;

  private SweepRun() {}

  /**
   * What a sweep gave.
   *
   * @param ran cases run now
   * @param kept cases whose rows an earlier run of the same sweep had stored
   * @param engineFiles what the engine added (Parquet)
   */
  public record Outcome(
      Path folder,
      CasesTable table,
      SweepStatistics statistics,
      int ran,
      int kept,
      List<String> warnings,
      List<Path> engineFiles) {
    /** The rows of cases that failed. */
    public List<CaseRow> failures() {
      return table.rows().stream().filter(r -> !r.finished()).toList();
    }
  }

  /**
   * Runs the sweep of {@code plan} into {@code settings.outDir()} with {@code engine}.
   *
   * @param force replace a folder that holds another sweep (or other files)
   * @param retryFailed run again the cases whose stored rows say they failed
   */
  public static Outcome run(
      SweepPlan plan,
      SweepEngine engine,
      EngineSettings settings,
      boolean force,
      boolean retryFailed)
      throws IOException {
    Path dir = settings.outDir().toAbsolutePath().normalize();
    FolderLock lock = FolderLock.take(dir);
    try {
      RowStore store = new RowStore(dir);
      prepareFolder(dir, plan, store, force);
      List<PlannedCase> missing = new ArrayList<>();
      Map<String, CaseRow> rows = new HashMap<>();
      for (PlannedCase c : plan.cases()) {
        Optional<CaseRow> row = store.read(c);
        if (row.isPresent() && (row.get().finished() || !retryFailed)) {
          rows.put(c.id(), row.get());
        } else {
          missing.add(c);
        }
      }
      int kept = rows.size();
      settings
          .log()
          .accept(
              String.format(
                  Locale.ROOT,
                  "sweep %s: %d cases, %d to run on the %s engine%s",
                  plan.sweep().file().getFileName(),
                  plan.cases().size(),
                  missing.size(),
                  engine.name(),
                  kept > 0 ? " (" + kept + " kept from an earlier run)" : ""));
      if (!missing.isEmpty()) {
        Progress progress = new Progress(missing.size(), settings);
        engine.run(
            plan.job(),
            missing,
            settings,
            row -> {
              try {
                store.write(row);
              } catch (IOException e) {
                throw new UncheckedIOException(e);
              }
              synchronized (rows) {
                rows.put(row.id(), row);
              }
              progress.done(row);
            });
      }
      List<CaseRow> all = new ArrayList<>();
      for (PlannedCase c : plan.cases()) {
        CaseRow r = rows.get(c.id());
        if (r == null) {
          throw new IllegalStateException(
              "the " + engine.name() + " engine returned without a row for case " + c.id());
        }
        all.add(r);
      }
      CasesTable table = new CasesTable(plan.keys(), all);
      table.write(dir.resolve(CasesTable.FILE));
      SweepStatistics stats = SweepStatistics.of(table);
      stats.write(dir.resolve(SweepStatistics.FILE));
      List<Path> extra = engine.finish(table, settings);
      return new Outcome(dir, table, stats, missing.size(), kept, plan.warnings(), extra);
    } finally {
      lock.close();
    }
  }

  /** Checks that the folder holds this sweep or nothing, and records the plan. */
  private static void prepareFolder(Path dir, SweepPlan plan, RowStore store, boolean force)
      throws IOException {
    Path planFile = dir.resolve(PLAN);
    if (Files.isRegularFile(planFile)) {
      JsonNode earlier = SweepFile.readJson(planFile, "the plan of a sweep");
      if (!earlier.path("fingerprint").asText().equals(plan.fingerprint())) {
        if (!force) {
          throw new ResultFolderException(
              dir
                  + ": found the results of another sweep (or of this one before its sweep file,"
                  + " base case or mesh changed), expected this sweep's folder; choose another"
                  + " --out, or --force to replace them");
        }
        store.clear();
        Files.deleteIfExists(dir.resolve(CasesTable.FILE));
        Files.deleteIfExists(dir.resolve(SweepStatistics.FILE));
      }
    } else if (!force) {
      try (Stream<Path> s = Files.list(dir)) {
        List<String> foreign =
            s.map(p -> p.getFileName().toString()).filter(n -> !OWN.contains(n)).sorted().toList();
        if (!foreign.isEmpty() || Files.isDirectory(dir.resolve(RowStore.FOLDER))) {
          throw new ResultFolderException(
              dir
                  + ": found files that are not this sweep's ("
                  + String.join(", ", foreign)
                  + "), expected an empty folder or this sweep's; choose another --out, or"
                  + " --force to write there anyway");
        }
      }
    }
    AtomicFiles.write(planFile, f -> Files.write(f, planJson(plan)));
  }

  private static byte[] planJson(SweepPlan plan) throws IOException {
    ObjectNode n = SweepFile.JSON.createObjectNode();
    SweepFile s = plan.sweep();
    n.put("sweep", s.file().toAbsolutePath().toString());
    n.put("base", s.base().toString());
    n.put("mesh", plan.mesh().toString());
    n.put("fingerprint", plan.fingerprint());
    n.put("samples", s.samples());
    n.put("seed", s.seed());
    n.put("sampling", s.sampling().word());
    ArrayNode keys = n.putArray("keys");
    plan.keys().forEach(keys::add);
    ArrayNode times = n.putArray("collect_times");
    s.collectTimes().forEach(times::add);
    ArrayNode cases = n.putArray("cases");
    for (PlannedCase c : plan.cases()) {
      ObjectNode o = cases.addObject();
      o.put("case", c.id());
      ArrayNode values = o.putArray("values");
      c.values().forEach(values::add);
    }
    ArrayNode warnings = n.putArray("warnings");
    plan.warnings().forEach(warnings::add);
    return SweepFile.JSON.writerWithDefaultPrettyPrinter().writeValueAsBytes(n);
  }

  /** Progress lines: at most one every few seconds, and one for every failure and the last case. */
  private static final class Progress {
    private final int total;
    private final EngineSettings settings;
    private final long start = System.nanoTime();
    private long lastLine = System.nanoTime();
    private int done;
    private int failed;

    Progress(int total, EngineSettings settings) {
      this.total = total;
      this.settings = settings;
    }

    synchronized void done(CaseRow row) {
      done++;
      if (!row.finished()) {
        failed++;
        settings.log().accept("case " + row.id() + " " + row.status());
      }
      long now = System.nanoTime();
      if (done < total && (now - lastLine) * 1e-9 < PROGRESS_SECONDS) {
        return;
      }
      lastLine = now;
      double elapsed = (now - start) * 1e-9;
      double left = elapsed / done * (total - done);
      settings
          .log()
          .accept(
              String.format(
                  Locale.ROOT,
                  "%d of %d cases done (%d failed), %.0f s so far%s",
                  done,
                  total,
                  failed,
                  elapsed,
                  done < total ? String.format(Locale.ROOT, ", about %.0f s left", left) : ""));
    }
  }
}
