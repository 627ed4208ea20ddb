package dev.soakfield.fem.tds;

import dev.soakfield.fem.casefile.CaseSpec;
import dev.soakfield.fem.casefile.FaceSpec;
import dev.soakfield.fem.casefile.MaterialSpec;
import dev.soakfield.fem.physics.FaceKind;
import dev.soakfield.fem.results.Series;
import dev.soakfield.mesh.FaceGroupKind;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.topo.MeshGeometry;
import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

/**
 * The desorption curve of a TDS run, from its series: the desorption rate is the outflow summed
 * over every exterior face group (minus the summed inflow), per unit of the desorbing area (the
 * face groups the case gives a condition other than sealed) and per unit of the specimen's mass
 * (its parts' densities times their volumes; NaN without densities); the cumulative amount desorbed
 * since the start; and the amount still in the specimen.
 *
 * @param time s
 * @param temperature K
 * @param rate desorption rate, amount/s (each row the mean over the step that ended there)
 * @param cumulative amount desorbed since the start (the first row counts what faces set to their
 *     values at the start took out at once)
 * @param remaining amount in the specimen (lattice and trapped)
 * @param area desorbing area, m²
 * @param mass specimen mass, kg (NaN without densities)
 * @param charged the amount at the start, before faces took their values
 * @param rampStart the time the ramp starts, s
 * @param amountUnit the amount unit (kg or mol, or the case's own)
 */
@SuppressWarnings("ArrayRecordComponent") // built once from a finished run and handed over
public record TdsCurve(
    double[] time,
    double[] temperature,
    double[] rate,
    double[] cumulative,
    double[] remaining,
    double area,
    double mass,
    double charged,
    double rampStart,
    String amountUnit) {
  /** The file a TDS run writes its curve to. */
  public static final String FILE = "tds.csv";

  static TdsCurve of(Series s, CaseSpec spec, TetMesh mesh, double charged, double rampStart) {
    double[] time = s.require("time");
    double[] rate = new double[time.length];
    double[] cumulative = new double[time.length];
    for (var g : mesh.faceGroups()) {
      if (g.kind() != FaceGroupKind.EXTERIOR || !s.has("inflow:" + g.name())) {
        continue;
      }
      double[] r = s.require("inflow_rate:" + g.name());
      double[] c = s.require("inflow:" + g.name());
      for (int i = 0; i < time.length; i++) {
        rate[i] -= r[i];
        cumulative[i] -= c[i];
      }
    }
    double[] areas = MeshGeometry.groupAreas(mesh);
    double area = 0;
    for (int g = 0; g < areas.length; g++) {
      FaceSpec f = spec.faces().get(mesh.faceGroups().get(g).name());
      if (f != null && f.kind() != FaceKind.SEALED) {
        area += areas[g];
      }
    }
    double[] volumes = MeshGeometry.groupVolumes(mesh);
    double mass = 0;
    for (int g = 0; g < volumes.length; g++) {
      MaterialSpec m = spec.materials().get(mesh.volumeGroups().get(g).name());
      mass += (m == null ? Double.NaN : m.density().orElse(Double.NaN)) * volumes[g];
    }
    return new TdsCurve(
        time,
        s.require("temperature"),
        rate,
        cumulative,
        s.require("amount"),
        area,
        mass,
        charged,
        rampStart,
        spec.quantities().amount());
  }

  /**
   * The temperature each row's rate stands for: the middle of the step that ended there (a row's
   * rate is its step's mean), the start temperature for the first row.
   */
  public double[] stepTemperatures() {
    double[] out = temperature.clone();
    for (int i = 1; i < out.length; i++) {
      out[i] = 0.5 * (temperature[i - 1] + temperature[i]);
    }
    return out;
  }

  /** The index of the first row of the ramp. */
  public int rampIndex() {
    int i = 0;
    while (i < time.length - 1 && time[i] < rampStart) {
      i++;
    }
    return i;
  }

  /** The desorbed amount at the end plus what remains, less what was charged, over the charge. */
  public double closure() {
    int n = time.length - 1;
    return (cumulative[n] + remaining[n] - charged) / charged;
  }

  /**
   * Writes tds.csv: time, temperature, desorption rate per unit area and per unit mass, the
   * cumulative desorbed amount and what remains, each header with its unit in brackets.
   */
  public void write(Path file) throws IOException {
    dev.soakfield.mesh.AtomicFiles.write(file, f -> writeTo(f));
  }

  private void writeTo(Path file) throws IOException {
    String a = amountUnit;
    try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
      w.write(
          "time [s],temperature [K],desorption_rate_per_area ["
              + a
              + "/(m^2*s)],desorption_rate_per_mass ["
              + a
              + "/(kg*s)],cumulative ["
              + a
              + "],remaining ["
              + a
              + "]\n");
      for (int i = 0; i < time.length; i++) {
        w.write(
            String.format(
                Locale.ROOT,
                "%.17g,%.17g,%.17g,%s,%.17g,%.17g%n",
                time[i],
                temperature[i],
                rate[i] / area,
                Double.isNaN(mass) ? "" : String.format(Locale.ROOT, "%.17g", rate[i] / mass),
                cumulative[i],
                remaining[i]));
      }
    }
  }
}
