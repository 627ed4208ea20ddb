package dev.soakfield.sweep.spark;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.spark.sql.SparkSession;

/**
 * Spark sessions for tests: loopback only, no web UI, Spark's logs at WARN (log4j2-test). Local
 * cluster mode starts a master and a worker in this process and an executor process of two cores;
 * it needs SPARK_HOME with a jars/ folder (an empty one, made here; the build sets SPARK_HOME) and
 * the test's class path for the executors.
 */
final class SparkSessions {
  static final String LOCAL_CLUSTER = "local-cluster[1,2,1024]";

  private SparkSessions() {}

  private static SparkSession.Builder base(String master) {
    return SparkSession.builder()
        .master(master)
        .appName("soakfield sweep tests")
        .config("spark.ui.enabled", "false")
        .config("spark.driver.bindAddress", "127.0.0.1")
        .config("spark.driver.host", "127.0.0.1")
        .config("spark.sql.shuffle.partitions", "2");
  }

  static SparkSession local() {
    return base("local[2]").getOrCreate();
  }

  static SparkSession localCluster() {
    String home = System.getenv("SPARK_HOME");
    if (home == null) {
      throw new IllegalStateException("SPARK_HOME must be set (the module's surefire does it)");
    }
    try {
      Files.createDirectories(Path.of(home, "jars"));
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    return base(LOCAL_CLUSTER)
        .config("spark.executor.extraClassPath", System.getProperty("java.class.path"))
        .config("spark.executor.memory", "512m")
        .getOrCreate();
  }
}
