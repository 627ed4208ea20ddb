package dev.soakfield.sweep.spark;

import dev.soakfield.fem.sweep.CaseRow;
import dev.soakfield.fem.sweep.CasesTable;
import dev.soakfield.fem.sweep.EngineSettings;
import dev.soakfield.fem.sweep.PlannedCase;
import dev.soakfield.fem.sweep.SweepEngine;
import dev.soakfield.fem.sweep.SweepEngineException;
import dev.soakfield.fem.sweep.SweepInputException;
import dev.soakfield.fem.sweep.SweepJob;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;
import java.util.stream.Stream;
import org.apache.spark.SparkConf;
import org.apache.spark.SparkContext;
import org.apache.spark.api.java.JavaSparkContext;
import org.apache.spark.rdd.RDD;
import org.apache.spark.sql.SparkSession;
import scala.reflect.ClassTag;
import scala.reflect.ClassTag$;
import scala.runtime.AbstractFunction2;
import scala.runtime.BoxedUnit;

/**
 * The sweep engine {@code spark}: the cases go to Spark as one job, split into groups of a few
 * cases (at least one group per core of the cluster), the mesh and the plugin jars shipped once
 * with {@code addFile}. Each group's rows come back to this process as soon as the group is done,
 * and are stored there, so a job that dies keeps what finished. After the table: {@code
 * DIR/cases.parquet}. A Spark session that was running before (spark-submit, tests) is used and
 * left running; one made here is stopped at the end.
 */
public final class SparkSweepEngine implements SweepEngine {
  public static final String NAME = "spark";

  /** Cases per Spark task at most: few enough that rows come back often, enough to pay its cost. */
  static final int CASES_PER_TASK = 8;

  private SparkSession session;
  private boolean ownSession;

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public void run(
      SweepJob job, List<PlannedCase> cases, EngineSettings settings, Consumer<CaseRow> sink)
      throws IOException {
    SparkSession spark = session(settings);
    SparkContext sc = spark.sparkContext();
    Path staging = Files.createTempDirectory("soakfield-spark-ship-");
    try {
      ShippedFiles files =
          ShippedFiles.ship(sc, settings.meshFile(), settings.pluginFolders(), staging);
      int slices = slices(cases.size(), sc.defaultParallelism());
      settings
          .log()
          .accept(
              "spark: "
                  + sc.master()
                  + ", "
                  + sc.defaultParallelism()
                  + " cores, "
                  + cases.size()
                  + " cases in "
                  + slices
                  + " tasks");
      RDD<PlannedCase> rdd = new JavaSparkContext(sc).parallelize(cases, slices).rdd();
      try {
        sc.runJob(rdd, new PartitionTask(job, files), new RowHandler(sink), listTag());
      } catch (java.io.UncheckedIOException e) {
        throw e; // storing a row failed: a file-system problem on this side
      } catch (Exception e) { // SparkException, which Scala throws without declaring it
        throw new SweepEngineException(
            "the Spark job failed ("
                + e.getMessage().lines().findFirst().orElse("no reason given")
                + "); the cases that finished are stored in "
                + settings.outDir()
                + ": run the same command again to run the rest",
            e);
      }
    } finally {
      deleteTree(staging);
    }
  }

  /** At least one task per core, at most {@link #CASES_PER_TASK} cases a task. */
  static int slices(int cases, int cores) {
    int byCases = (cases + CASES_PER_TASK - 1) / CASES_PER_TASK;
    return Math.max(1, Math.min(cases, Math.max(cores, byCases)));
  }

  @SuppressWarnings({
    "unchecked",
    "rawtypes",
    "NonApiType"
  }) // Scala's ClassTag of a generic Java class
  private static ClassTag<ArrayList<CaseRow>> listTag() {
    return (ClassTag) ClassTag$.MODULE$.apply(ArrayList.class);
  }

  /** Hands each finished group's rows to the sweep on this (the driver's) side. */
  @SuppressWarnings("NonApiType") // the type PartitionTask returns
  private static final class RowHandler
      extends AbstractFunction2<Object, ArrayList<CaseRow>, BoxedUnit>
      implements java.io.Serializable {
    private static final long serialVersionUID = 1L;
    private final transient Consumer<CaseRow> sink;

    RowHandler(Consumer<CaseRow> sink) {
      this.sink = sink;
    }

    @Override
    public BoxedUnit apply(Object partition, ArrayList<CaseRow> rows) {
      rows.forEach(sink);
      return BoxedUnit.UNIT;
    }
  }

  @Override
  public List<Path> finish(CasesTable table, EngineSettings settings) throws IOException {
    try {
      Path parquet =
          ParquetTable.write(session(settings), table, settings.outDir(), settings.log());
      return List.of(parquet);
    } finally {
      if (ownSession && session != null) {
        session.stop();
      }
      session = null;
    }
  }

  private SparkSession session(EngineSettings settings) {
    if (session != null) {
      return session;
    }
    SparkSession running = SparkSession.getActiveSession().getOrElse(() -> null);
    if (running == null) {
      running = SparkSession.getDefaultSession().getOrElse(() -> null);
    }
    if (running != null) {
      ownSession = false;
      session = running;
      return session;
    }
    SparkConf conf = new SparkConf(); // spark.* system properties: what spark-submit passes
    settings.master().ifPresent(conf::setMaster);
    if (!conf.contains("spark.master")) {
      throw new SweepInputException(
          "--master: found none, and Spark has no master configured; expected --master local[N]"
              + " (this machine, N cores) or a cluster's URL such as spark://host:7077, or a run"
              + " under spark-submit");
    }
    conf.setIfMissing("spark.app.name", "soakfield sweep");
    if (conf.get("spark.master").startsWith("local")) {
      // everything runs on this machine: listen on the loopback only
      conf.setIfMissing("spark.driver.bindAddress", "127.0.0.1");
      conf.setIfMissing("spark.driver.host", "127.0.0.1");
    }
    conf.setIfMissing("spark.ui.enabled", "false");
    conf.setIfMissing("spark.sql.shuffle.partitions", "2");
    try {
      session = SparkSession.builder().config(conf).getOrCreate();
    } catch (Exception e) { // Scala throws SparkException without declaring it
      if (!String.valueOf(e.getMessage()).toLowerCase(java.util.Locale.ROOT).contains("master")) {
        throw new IllegalStateException("Spark did not start: " + e.getMessage(), e);
      }
      throw new SweepInputException(
          "--master: found '"
              + conf.get("spark.master")
              + "', which Spark could not use ("
              + e.getMessage()
              + "), expected local[N], local-cluster[W,C,M] or a cluster's URL such as"
              + " spark://host:7077",
          e);
    }
    ownSession = true;
    return session;
  }

  static void deleteTree(Path root) throws IOException {
    if (!Files.exists(root)) {
      return;
    }
    try (Stream<Path> s = Files.walk(root)) {
      for (Path p : s.sorted(java.util.Comparator.reverseOrder()).toList()) {
        Files.deleteIfExists(p);
      }
    }
  }
}
