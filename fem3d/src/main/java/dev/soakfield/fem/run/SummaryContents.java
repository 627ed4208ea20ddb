package dev.soakfield.fem.run;

import dev.soakfield.fem.casefile.CaseSpec;
import dev.soakfield.fem.model.DiffusionModel;
import dev.soakfield.fem.model.ImpermeableParts;
import dev.soakfield.fem.results.MeshAsRun;
import dev.soakfield.fem.time.RunTotals;
import dev.soakfield.mesh.TetMesh;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** What summary.json says about a finished run: case, mesh, solver, balance, thresholds, stop. */
final class SummaryContents {
  private SummaryContents() {}

  static final String CAUTION =
      "Model estimates from the data given. Where results bear on safety, check them against"
          + " the applicable standards and have them reviewed by a qualified engineer.";

  static Map<String, Object> of(
      CaseSpec spec,
      DiffusionModel model,
      RunTotals totals,
      BalanceLedger balance,
      double[] partFirstTimes,
      ProbeWatch probes,
      StopRule stop,
      List<String> warnings,
      ThresholdWatch thresholds,
      List<Map<String, Object>> rangeExcursions,
      Map<String, Object> permeation,
      Map<String, Object> accuracy) {
    TetMesh mesh = model.space().mesh();
    Map<String, Object> root = new LinkedHashMap<>();
    root.put("case", spec.caseFile().toString());
    Map<String, Object> m = new LinkedHashMap<>();
    m.put("file", spec.mesh().toString());
    m.put("nodes", mesh.nodeCount());
    m.put("tets", mesh.tetCount());
    m.put("order", mesh.order());
    // mesh.msh is the user's file as it is: this says what the run took out of it
    m.put(MeshAsRun.REMOVED_PARTS, List.copyOf(ImpermeableParts.names(spec)));
    root.put("mesh", m);
    Map<String, Object> solver = new LinkedHashMap<>();
    solver.put("steps", totals.steps());
    solver.put("rejected_steps", totals.rejectedSteps());
    solver.put("linear_iterations", totals.linearIterations());
    solver.put("end_time", totals.endTime());
    root.put("solver", solver);
    Map<String, Object> b = new LinkedHashMap<>();
    b.put("relative", balance.relative());
    b.put("error", balance.error());
    b.put("amount_start", balance.amountStart());
    b.put("amount_end", balance.amountNow());
    root.put("balance", b);
    Map<String, Object> threshold = new LinkedHashMap<>();
    threshold.put("value", spec.threshold().isPresent() ? spec.threshold().getAsDouble() : null);
    Map<String, Object> perPart = new LinkedHashMap<>();
    for (int g = 0; g < partFirstTimes.length; g++) {
      double t = partFirstTimes[g];
      perPart.put(mesh.volumeGroups().get(g).name(), t < 0 ? null : t);
    }
    Map<String, Object> perProbe = new LinkedHashMap<>();
    for (int i = 0; i < spec.probes().size(); i++) {
      double t = probes.firstTime(i);
      perProbe.put(spec.probes().get(i).name(), t < 0 ? null : t);
    }
    Map<String, Object> first = new LinkedHashMap<>();
    first.put("volume_groups", perPart);
    first.put("probes", perProbe);
    threshold.put("first_time", first);
    root.put("threshold", spec.threshold().isPresent() ? threshold : null);
    if (spec.time().stop().isPresent()) {
      double at = stop.stoppedAt();
      Map<String, Object> s = new LinkedHashMap<>();
      s.put("condition", spec.time().stop().get().describe());
      s.put("met", !Double.isNaN(at));
      s.put("time", Double.isNaN(at) ? null : at);
      root.put("stop", s);
    }
    if (!spec.thresholds().isEmpty()) {
      root.put("thresholds", thresholds.summary(spec.quantities().concentration()));
    }
    // per unit area, SI: the amount unit of the solve (kg or mol) per m² and s; times in s
    root.put("permeation", permeation);
    // estimated discretisation errors at the last output: relative for the uptake and probes,
    // seconds for threshold times
    root.put("accuracy", accuracy);
    root.put("units", spec.quantities().describe());
    if (!rangeExcursions.isEmpty()) {
      root.put("range_excursions", rangeExcursions);
    }
    root.put("law", model.law().word());
    root.put("temperature_start", model.referenceTemperature());
    root.put("warnings", warnings);
    root.put("caution", CAUTION);
    return root;
  }
}
