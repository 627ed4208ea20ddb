package dev.soakfield.sweep.spark;

import dev.soakfield.fem.sweep.CaseRow;
import dev.soakfield.fem.sweep.CasesTable;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;
import java.util.stream.Stream;
import org.apache.spark.sql.Row;
import org.apache.spark.sql.RowFactory;
import org.apache.spark.sql.SaveMode;
import org.apache.spark.sql.SparkSession;
import org.apache.spark.sql.types.DataType;
import org.apache.spark.sql.types.DataTypes;
import org.apache.spark.sql.types.StructField;
import org.apache.spark.sql.types.StructType;

/**
 * {@code cases.parquet}: the table of cases.csv as a Parquet folder written by Spark, with an
 * explicit schema (case and status as text, a varied key as a number when every case gave a number,
 * outputs as numbers, null where a case has none). Written beside its place and moved there when
 * complete.
 */
final class ParquetTable {
  static final String FOLDER = "cases.parquet";

  private ParquetTable() {}

  static Path write(SparkSession spark, CasesTable table, Path outDir, Consumer<String> log)
      throws IOException {
    List<Boolean> numericKey = new ArrayList<>();
    List<StructField> fields = new ArrayList<>();
    fields.add(DataTypes.createStructField("case", DataTypes.StringType, false));
    for (int k = 0; k < table.keys().size(); k++) {
      boolean numeric = true;
      for (CaseRow r : table.rows()) {
        numeric &= number(r.values().get(k)) != null;
      }
      numericKey.add(numeric);
      DataType type = numeric ? DataTypes.DoubleType : DataTypes.StringType;
      fields.add(DataTypes.createStructField(table.keys().get(k), type, true));
    }
    for (String o : table.outputs()) {
      fields.add(DataTypes.createStructField(o, DataTypes.DoubleType, true));
    }
    fields.add(DataTypes.createStructField("status", DataTypes.StringType, false));
    List<Row> rows = new ArrayList<>();
    for (CaseRow r : table.rows()) {
      List<Object> cells = new ArrayList<>();
      cells.add(r.id());
      for (int k = 0; k < table.keys().size(); k++) {
        String v = r.values().get(k);
        cells.add(numericKey.get(k) ? number(v) : text(v));
      }
      for (String o : table.outputs()) {
        double v = r.value(o);
        cells.add(Double.isNaN(v) ? null : v);
      }
      cells.add(r.status());
      rows.add(RowFactory.create(cells.toArray()));
    }
    Path target = outDir.toAbsolutePath().resolve(FOLDER);
    Path part = outDir.toAbsolutePath().resolve("." + FOLDER + ".part");
    SparkSweepEngine.deleteTree(part);
    spark
        .createDataFrame(rows, new StructType(fields.toArray(new StructField[0])))
        .coalesce(1)
        .write()
        .mode(SaveMode.ErrorIfExists)
        .parquet(part.toUri().toString());
    boolean here;
    try (Stream<Path> s = Files.list(part)) {
      here = s.anyMatch(p -> p.getFileName().toString().endsWith(".parquet"));
    }
    if (!here) {
      log.accept(
          "warning: Spark wrote cases.parquet on the workers' disks, not here: "
              + outDir
              + " is not shared with them (cases.csv has the same table)");
    }
    SparkSweepEngine.deleteTree(target);
    Files.move(part, target, StandardCopyOption.ATOMIC_MOVE);
    return target;
  }

  private static Double number(String json) {
    try {
      return Double.valueOf(json);
    } catch (NumberFormatException e) {
      return null;
    }
  }

  private static String text(String json) {
    return json.length() >= 2 && json.startsWith("\"") && json.endsWith("\"")
        ? json.substring(1, json.length() - 1)
        : json;
  }
}
