package dev.soakfield.report;

import com.fasterxml.jackson.databind.JsonNode;
import dev.soakfield.fem.results.ResultFiles;
import dev.soakfield.fem.results.ResultFolderException;
import dev.soakfield.fem.results.ResultUnits;
import dev.soakfield.fem.results.RunManifest;
import dev.soakfield.fem.results.Series;
import dev.soakfield.fem.results.SummaryFile;
import dev.soakfield.fem.units.DurationText;
import dev.soakfield.mesh.AtomicFiles;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Stream;

/**
 * Writes {@code report.html} (self-contained) and {@code report.md} (with its PNG files) into a
 * result folder from what the folder holds: manifest.json, summary.json, series.csv and the case
 * copy. A folder of a failed run gets a report of what there is, saying so.
 */
public final class ReportWriter {
  /** Probe curves drawn in the report's picture at most. */
  static final int MAX_PROBE_CURVES = 12;

  public static final String HTML = "report.html";
  public static final String MARKDOWN = "report.md";

  /** Where pictures of the field are put to join the report, one PNG each. */
  public static final String PICTURES = "pictures";

  static final String CAUTION =
      "These are model predictions. They depend on the material data given (diffusivity,"
          + " solubility, sources), which should be measured for the actual material and"
          + " condition, and on Fickian diffusion holding for it. Moisture-sensitivity"
          + " classification, hydrogen-embrittlement acceptance and bake schedules are governed"
          + " by the applicable standards; decisions that bear on safety or reliability need the"
          + " review of a qualified, licensed engineer.";

  private ReportWriter() {}

  /**
   * Writes the report into {@code folder} and lists its files in the manifest.
   *
   * @return the files written, relative to the folder
   * @throws ResultFolderException when {@code folder} is not a result folder or the report cannot
   *     be written
   */
  public static List<String> write(Path folder) {
    RunManifest manifest =
        RunManifest.readFrom(folder)
            .orElseThrow(
                () ->
                    new ResultFolderException(
                        folder
                            + ": found no "
                            + RunManifest.FILE
                            + ", expected a result folder written by 'soakfield run'"));
    try {
      return write(folder, manifest);
    } catch (IOException e) {
      throw new ResultFolderException(
          folder
              + ": cannot write the report ("
              + e.getClass().getSimpleName()
              + ": "
              + e.getMessage()
              + "), expected a folder that can be written and a disk with room",
          e);
    }
  }

  private static List<String> write(Path folder, RunManifest manifest) throws IOException {
    List<String> written = writeFiles(folder, manifest);
    manifest.withFiles(written).writeTo(folder);
    return written;
  }

  /**
   * Writes the report of the results in {@code folder} as {@code manifest} describes them (the
   * manifest the folder is about to get), without touching the folder's manifest: the completion
   * step of a run, after which the run's folder says finished.
   *
   * @return the files written, relative to the folder
   */
  public static List<String> writeFiles(Path folder, RunManifest manifest) throws IOException {
    ReportDocument doc = build(folder, manifest);
    List<String> written = new ArrayList<>();
    for (String png : doc.pictureFiles()) {
      byte[] bytes = doc.pictureBytes(png);
      AtomicFiles.write(folder.resolve(png), f -> Files.write(f, bytes));
      written.add(png);
    }
    String html = doc.toHtml();
    String md = doc.toMarkdown();
    AtomicFiles.write(
        folder.resolve(HTML), f -> Files.writeString(f, html, StandardCharsets.UTF_8));
    AtomicFiles.write(
        folder.resolve(MARKDOWN), f -> Files.writeString(f, md, StandardCharsets.UTF_8));
    written.add(HTML);
    written.add(MARKDOWN);
    return written;
  }

  static ReportDocument build(Path folder, RunManifest manifest) throws IOException {
    JsonNode summary = SummaryFile.readOrMissing(folder);
    JsonNode kase = SummaryFile.caseCopyOrMissing(folder);
    Path seriesFile = folder.resolve(ResultFiles.SERIES);
    Optional<Series> series =
        Files.isRegularFile(seriesFile) ? Optional.of(Series.read(seriesFile)) : Optional.empty();
    double end = summary.path("solver").path("end_time").asDouble(Double.NaN);
    if (Double.isNaN(end) && series.isPresent()) {
      end = series.get().last("time");
    }
    TimeAxis axis = TimeAxis.forEnd(Double.isNaN(end) ? 1 : end);
    ResultUnits units = ResultUnits.of(summary);

    ReportDocument doc = new ReportDocument("Soakfield run: " + fileName(manifest.caseFile()));
    run(doc, manifest);
    caseSummary(doc, kase, series, units);
    if (series.isPresent()) {
      curves(doc, series.get(), axis, units);
      WeightGainSection.write(doc, series.get(), axis);
      TrapSection.write(doc, series.get(), axis, units);
      PermeationSection.write(doc, summary, series.get(), axis, units);
      groupTables(doc, series.get(), axis, units);
    } else {
      doc.heading("Curves").paragraph("No series.csv in the folder: the run wrote no steps.");
    }
    ThresholdSection.write(doc, summary, units.concentration());
    AccuracySection.write(doc, summary);
    figures(doc, summary, series, units);
    warnings(doc, manifest, summary);
    pictures(doc, folder);
    doc.heading("Cautions");
    doc.paragraph(CAUTION);
    return doc;
  }

  private static void run(ReportDocument doc, RunManifest m) {
    doc.heading("Run");
    List<List<String>> rows = new ArrayList<>();
    rows.add(List.of("status", m.status().word() + m.message().map(s -> ": " + s).orElse("")));
    rows.add(List.of("case file", m.caseFile().toString()));
    rows.add(List.of("case SHA-256", m.caseSha256()));
    rows.add(List.of("mesh file", m.meshFile().toString()));
    rows.add(List.of("mesh SHA-256", m.meshSha256()));
    rows.add(List.of("tool version", m.toolVersion()));
    rows.add(List.of("started", m.started()));
    rows.add(List.of("ended", m.ended().orElse("(still running)")));
    doc.table(List.of("item", "value"), rows);
    if (m.status() != RunManifest.Status.FINISHED) {
      doc.paragraph(
          "This run did not finish: the figures below cover only the part that was computed.");
    }
  }

  private static void caseSummary(
      ReportDocument doc, JsonNode kase, Optional<Series> series, ResultUnits units) {
    doc.heading("Case");
    if (kase.isMissingNode()) {
      doc.paragraph("No readable case copy (case.json) in the folder.");
      return;
    }
    List<List<String>> materials = new ArrayList<>();
    for (Map.Entry<String, JsonNode> e : kase.path("materials").properties()) {
      JsonNode m = e.getValue();
      materials.add(
          List.of(
              e.getKey(),
              text(m.path("diffusivity")),
              m.has("solubility") ? text(m.get("solubility")) : "1 (default)",
              m.has("source") ? text(m.get("source")) : "none"));
    }
    doc.paragraph("Materials per volume group (values as given in the case file):");
    doc.table(List.of("volume group", "diffusivity", "solubility", "source"), materials);
    List<List<String>> faces = new ArrayList<>();
    List<String> named = new ArrayList<>();
    for (Map.Entry<String, JsonNode> e : kase.path("faces").properties()) {
      named.add(e.getKey());
      JsonNode f = e.getValue();
      faces.add(
          List.of(
              e.getKey(),
              f.path("kind").asText("?"),
              f.has("value") ? text(f.get("value")) : "",
              f.has("coefficient") ? text(f.get("coefficient")) : ""));
    }
    for (String g : series.map(s -> s.suffixes("inflow:")).orElse(List.of())) {
      if (!named.contains(g)) {
        faces.add(List.of(g, "sealed (no entry in faces)", "", ""));
      }
    }
    doc.paragraph("Partitions per face group:");
    doc.table(List.of("face group", "kind", "value", "coefficient"), faces);
    if (kase.has("exposure")) {
      doc.paragraph("Exposure history:");
      doc.preformatted(kase.get("exposure").toPrettyString());
    }
    List<String> other = new ArrayList<>();
    other.add(
        "units: concentrations in "
            + units.concentration()
            + ", amounts in "
            + units.amount()
            + (kase.has("species") ? " (species " + text(kase.get("species")) + ")" : ""));
    for (String key : List.of("law", "temperature", "initial", "time", "threshold", "elements")) {
      if (kase.has(key)) {
        other.add(key + ": " + text(kase.get(key)));
      }
    }
    doc.bullets(other);
  }

  private static void curves(ReportDocument doc, Series s, TimeAxis axis, ResultUnits units)
      throws IOException {
    double[] t = s.column("time").orElse(new double[s.rows()]);
    doc.heading("Uptake");
    SeriesPlot uptake =
        new SeriesPlot("Amount in the part", "amount [" + units.amount() + "]", axis).time(t);
    s.column("amount").ifPresent(a -> uptake.line("total", a));
    for (String g : s.suffixes("amount:")) {
      uptake.line(g, s.column("amount:" + g).orElseThrow());
    }
    if (uptake.hasData()) {
      doc.picture("report-uptake.png", "Uptake: amount in the part over time", uptake.png());
    }
    List<String> probes = s.suffixes("probe:");
    if (!probes.isEmpty()) {
      doc.heading("Probes");
      SeriesPlot plot =
          new SeriesPlot(
                  "Concentration at the probes",
                  "concentration [" + units.concentration() + "]",
                  axis)
              .time(t);
      // a legend stays readable, and the picture's memory bounded, with a dozen curves
      List<String> shown = probes.subList(0, Math.min(probes.size(), MAX_PROBE_CURVES));
      for (String p : shown) {
        plot.line(p, s.column("probe:" + p).orElseThrow());
      }
      if (shown.size() < probes.size()) {
        doc.paragraph(
            "The first "
                + shown.size()
                + " of "
                + probes.size()
                + " probes (in the case's order); series.csv has every probe's column.");
      }
      if (plot.hasData()) {
        doc.picture("report-probes.png", "Concentration at the probes over time", plot.png());
      } else {
        doc.paragraph("No probe lies inside the mesh.");
      }
    }
  }

  private static void groupTables(ReportDocument doc, Series s, TimeAxis axis, ResultUnits units)
      throws IOException {
    doc.heading("Amount per volume group");
    doc.paragraph("At the last recorded time, t = " + DurationText.of(s.last("time")) + ":");
    List<List<String>> rows = new ArrayList<>();
    for (String g : s.suffixes("amount:")) {
      rows.add(
          List.of(g, num(s.last("amount:" + g)), num(s.last("max:" + g)), num(s.max("max:" + g))));
    }
    rows.add(List.of("all", num(s.last("amount")), "", ""));
    doc.table(
        List.of(
            "volume group",
            "amount [" + units.amount() + "]",
            "max. concentration now [" + units.concentration() + "]",
            "max. concentration in run [" + units.concentration() + "]"),
        rows);
    List<String> faces = s.suffixes("inflow:");
    if (!faces.isEmpty()) {
      doc.heading("Inflow per face group");
      double[] t = s.column("time").orElse(new double[s.rows()]);
      SeriesPlot plot =
          new SeriesPlot(
                  "Cumulative inflow per face group", "amount [" + units.amount() + "]", axis)
              .time(t);
      for (String g : faces) {
        plot.line(g, s.column("inflow:" + g).orElseThrow());
      }
      if (plot.hasData()) {
        doc.picture("report-inflow.png", "Cumulative inflow per face group", plot.png());
      }
      List<List<String>> f = new ArrayList<>();
      for (String g : faces) {
        f.add(List.of(g, num(s.last("inflow:" + g)), num(s.last("inflow_rate:" + g))));
      }
      doc.table(
          List.of(
              "face group",
              "cumulative inflow [" + units.amount() + "]",
              "inflow rate at the end [" + units.amount() + "/s]"),
          f);
    }
  }

  private static void figures(
      ReportDocument doc, JsonNode summary, Optional<Series> series, ResultUnits units) {
    doc.heading("Mesh, solver and balance");
    if (summary.isMissingNode()) {
      doc.paragraph("No summary.json: the run did not finish.");
      return;
    }
    JsonNode mesh = summary.path("mesh");
    JsonNode solver = summary.path("solver");
    JsonNode balance = summary.path("balance");
    List<List<String>> rows = new ArrayList<>();
    rows.add(List.of("nodes", text(mesh.path("nodes"))));
    rows.add(List.of("tetrahedra", text(mesh.path("tets"))));
    rows.add(List.of("element order", text(mesh.path("order"))));
    rows.add(List.of("accepted steps", text(solver.path("steps"))));
    rows.add(List.of("rejected steps", text(solver.path("rejected_steps"))));
    rows.add(List.of("linear solver iterations", text(solver.path("linear_iterations"))));
    rows.add(List.of("end time", DurationText.of(solver.path("end_time").asDouble(Double.NaN))));
    rows.add(
        List.of(
            "amount at start, before the faces take their values [" + units.amount() + "]",
            num(balance.path("amount_start").asDouble(Double.NaN))));
    // the series' first row comes after held and ambient faces set their nodes: say both
    series
        .filter(s -> s.has("amount") && s.rows() > 0)
        .ifPresent(
            s ->
                rows.add(
                    List.of(
                        "amount at t = 0 with the faces' values (the first row of series.csv) ["
                            + units.amount()
                            + "]",
                        num(s.require("amount")[0]))));
    rows.add(
        List.of(
            "amount at end [" + units.amount() + "]",
            num(balance.path("amount_end").asDouble(Double.NaN))));
    rows.add(
        List.of(
            "balance error (amount change − inflow − sources)",
            num(balance.path("error").asDouble(Double.NaN))
                + ", relative "
                + num(balance.path("relative").asDouble(Double.NaN))));
    doc.table(List.of("figure", "value"), rows);
  }

  private static void warnings(ReportDocument doc, RunManifest m, JsonNode summary) {
    doc.heading("Warnings");
    List<String> all = new ArrayList<>();
    m.message().ifPresent(msg -> all.add("the run failed: " + msg));
    summary.path("warnings").forEach(w -> all.add(w.asText()));
    if (all.isEmpty()) {
      doc.paragraph("None.");
    } else {
      doc.bullets(all);
    }
  }

  /** The hook for field pictures: every PNG in {@code pictures/}, by name. */
  private static void pictures(ReportDocument doc, Path folder) throws IOException {
    Path dir = folder.resolve(PICTURES);
    if (!Files.isDirectory(dir)) {
      return;
    }
    List<Path> pngs;
    try (Stream<Path> s = Files.list(dir)) {
      pngs =
          s.filter(p -> p.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".png"))
              .sorted()
              .toList();
    }
    if (pngs.isEmpty()) {
      return;
    }
    doc.heading("Field pictures");
    for (Path p : pngs) {
      String name = p.getFileName().toString();
      doc.picture(PICTURES + "/" + name, name, Files.readAllBytes(p));
    }
  }

  private static String text(JsonNode n) {
    if (n.isMissingNode() || n.isNull()) {
      return "";
    }
    return n.isValueNode() ? n.asText() : n.toString();
  }

  private static String num(double v) {
    return Double.isNaN(v) ? "" : String.format(Locale.ROOT, "%.4g", v);
  }

  private static String fileName(Path p) {
    Path n = p.getFileName();
    return n == null ? p.toString() : n.toString();
  }
}
