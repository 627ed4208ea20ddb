package dev.soakfield.fem.run;

import dev.soakfield.fem.casefile.ProbeSpec;
import dev.soakfield.mesh.FaceGroupKind;
import dev.soakfield.mesh.TetMesh;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.IntStream;

/**
 * The columns of series.csv and one row of them per step: time, amounts and maxima per part, inflow
 * per exterior face group, probes, balance error, temperature, then the trapped amounts (with
 * source laws: per part, then per law instance as {@code trapped:<part>:<name>}, then the
 * diffusible amount, lattice plus reversibly trapped) and the weight gain (with densities). A new
 * column is added here, in both {@link #header()} and {@link #row}.
 */
final class SeriesRows {
  private final TetMesh mesh;
  private final List<ProbeSpec> probes;
  private final boolean sourceLaws;
  private final List<String> trapInstances;
  private final boolean[] reversible;
  private final int[] exteriorGroups;
  private final double[] partVolume;
  private final double[] partDensity; // NaN where a material gives none
  private final double massPerAmount; // kg per unit of amount; NaN when the species is unknown

  /**
   * What one row is made of.
   *
   * @param amounts mobile plus trapped amount per part
   * @param trapped trapped amount per part (empty without source laws)
   * @param trappedPerInstance trapped amount per source-law instance, in the order of the instances
   *     the rows were made with
   */
  @SuppressWarnings("ArrayRecordComponent") // one step's figures, handed over and not kept
  record Figures(
      double t,
      double dt,
      double[] amounts,
      double[] amountsAtStart,
      double[] maxima,
      double[] stepInflow,
      BalanceLedger balance,
      double[] probeValues,
      double temperature,
      double[] trapped,
      double[] trappedPerInstance) {}

  SeriesRows(
      TetMesh mesh,
      List<ProbeSpec> probes,
      boolean sourceLaws,
      List<String> trapInstances,
      boolean[] reversible,
      double[] partVolume,
      double[] partDensity,
      double massPerAmount) {
    this.mesh = mesh;
    this.massPerAmount = massPerAmount;
    this.probes = probes;
    this.sourceLaws = sourceLaws;
    this.trapInstances = List.copyOf(trapInstances);
    this.reversible = reversible.clone();
    this.partVolume = partVolume;
    this.partDensity = partDensity;
    this.exteriorGroups =
        IntStream.range(0, mesh.faceGroups().size())
            .filter(g -> mesh.faceGroups().get(g).kind() == FaceGroupKind.EXTERIOR)
            .toArray();
  }

  List<String> header() {
    List<String> h = new ArrayList<>();
    h.add("time");
    h.add("amount");
    for (var g : mesh.volumeGroups()) {
      h.add("amount:" + g.name());
    }
    for (var g : mesh.volumeGroups()) {
      h.add("max:" + g.name());
    }
    for (int g : exteriorGroups) {
      h.add("inflow_rate:" + mesh.faceGroups().get(g).name());
    }
    for (int g : exteriorGroups) {
      h.add("inflow:" + mesh.faceGroups().get(g).name());
    }
    for (ProbeSpec p : probes) {
      h.add("probe:" + p.name());
    }
    h.add("balance_error");
    h.add("temperature");
    if (sourceLaws) {
      h.add("lattice_amount");
      h.add("trapped_amount");
      for (var g : mesh.volumeGroups()) {
        h.add("trapped:" + g.name());
      }
      for (String instance : trapInstances) {
        h.add("trapped:" + instance);
      }
      h.add("diffusible_amount");
    }
    if (hasDensities()) {
      h.add("weight_gain_percent");
      for (var g : mesh.volumeGroups()) {
        h.add("weight_gain_percent:" + g.name());
      }
    }
    return h;
  }

  double[] row(Figures f) {
    List<Double> r = new ArrayList<>();
    r.add(f.t());
    double total = 0;
    for (double a : f.amounts()) {
      total += a;
    }
    r.add(total);
    for (double a : f.amounts()) {
      r.add(a);
    }
    for (double m : f.maxima()) {
      r.add(m);
    }
    for (int g : exteriorGroups) {
      r.add(f.dt() > 0 ? f.stepInflow()[g] / f.dt() : 0.0);
    }
    for (int g : exteriorGroups) {
      r.add(f.balance().cumulativeInflow(g));
    }
    for (double p : f.probeValues()) {
      r.add(p);
    }
    r.add(f.balance().error());
    r.add(f.temperature());
    if (sourceLaws) {
      double trappedTotal = 0;
      for (double v : f.trapped()) {
        trappedTotal += v;
      }
      r.add(total - trappedTotal);
      r.add(trappedTotal);
      for (double v : f.trapped()) {
        r.add(v);
      }
      double diffusible = total - trappedTotal;
      double[] perInstance = f.trappedPerInstance();
      for (int k = 0; k < perInstance.length; k++) {
        r.add(perInstance[k]);
        diffusible += reversible[k] ? perInstance[k] : 0.0;
      }
      r.add(diffusible);
    }
    if (hasDensities()) {
      double[] amounts = f.amounts();
      double[] start = f.amountsAtStart();
      double gained = 0;
      double mass = 0;
      for (int g = 0; g < amounts.length; g++) {
        gained += amounts[g] - start[g];
        mass += partDensity[g] * partVolume[g];
      }
      r.add(100 * gained * massPerAmount / mass);
      for (int g = 0; g < amounts.length; g++) {
        r.add(100 * (amounts[g] - start[g]) * massPerAmount / (partDensity[g] * partVolume[g]));
      }
    }
    return r.stream().mapToDouble(Double::doubleValue).toArray();
  }

  private boolean hasDensities() {
    for (double d : partDensity) {
      if (Double.isNaN(d)) {
        return false;
      }
    }
    return partDensity.length > 0 && !Double.isNaN(massPerAmount);
  }
}
