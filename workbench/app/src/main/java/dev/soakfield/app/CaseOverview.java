package dev.soakfield.app;

import dev.soakfield.fem.casefile.CaseSpec;
import dev.soakfield.fem.casefile.Diffusivity;
import dev.soakfield.fem.casefile.FaceSpec;
import dev.soakfield.fem.casefile.MaterialSpec;
import dev.soakfield.fem.casefile.ProbeSpec;
import dev.soakfield.fem.casefile.SourceSpec;
import dev.soakfield.fem.casefile.StepControl;
import dev.soakfield.fem.casefile.TimeTable;
import dev.soakfield.fem.run.MemoryEstimate;
import dev.soakfield.fem.run.RunPipeline;
import dev.soakfield.fem.run.RunTimeEstimate;
import dev.soakfield.fem.units.ConcentrationUnit;
import dev.soakfield.fem.units.DurationText;
import dev.soakfield.fem.units.Quantities;
import dev.soakfield.mesh.FaceGroup;
import dev.soakfield.mesh.FaceGroupKind;
import dev.soakfield.mesh.TetMesh;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * What a checked case will run, as text: mesh and element order, each part's material, each face
 * group's face kind (exterior groups without an entry are sealed and listed), time span and step
 * control, outputs and probes, and the memory and time estimates. {@code soakfield check} prints
 * it.
 */
public final class CaseOverview {
  private CaseOverview() {}

  /**
   * The overview of a checked case and its mesh.
   *
   * @param maxHeap the heap the run will have, for the memory line
   */
  public static String of(RunPipeline.Prepared p, long maxHeap) {
    CaseSpec c = p.spec();
    TetMesh mesh = p.mesh();
    StringBuilder sb = new StringBuilder();
    sb.append("case ").append(c.caseFile()).append(": no problems found\n");
    sb.append(
        String.format(
            Locale.ROOT,
            "mesh %s: %d nodes, %d tetrahedra; elements %s (%d-node)%n",
            c.mesh(),
            mesh.nodeCount(),
            mesh.tetCount(),
            mesh.order() == 2 ? "quadratic" : "linear",
            mesh.nodesPerTet()));
    sb.append(units(c));
    sb.append("materials:\n");
    for (MaterialSpec m : c.materials().values()) {
      if (m.impermeable()) {
        sb.append(
            String.format(
                Locale.ROOT,
                "  %-16s impermeable: taken out of the run, its faces with other parts sealed%n",
                m.volumeGroup()));
        continue;
      }
      sb.append(
          String.format(
              Locale.ROOT,
              "  %-16s %s = %s%s, %s = %s%s, source %s%s%n",
              m.volumeGroup(),
              m.diffusivityEnergy() != 0 ? "D0" : "D",
              diffusivity(m.diffusivity()),
              energy("Q", m.diffusivityEnergy()),
              m.solubilityEnergy() != 0 ? "S0" : "S",
              num(m.solubility()),
              energy("dH", m.solubilityEnergy()),
              source(m.source()),
              sourceLaws(m.laws())));
    }
    sb.append("materials at the run's temperatures:\n");
    sb.append(EnvironmentTable.of(c));
    sb.append("face groups:\n");
    List<String> unassigned = new ArrayList<>();
    for (FaceGroup g : mesh.faceGroups()) {
      FaceSpec f = c.faces().get(g.name());
      String where = g.kind() == FaceGroupKind.EXTERIOR ? "exterior" : "interface";
      String what;
      if (f != null) {
        what = faceKind(f, c.quantities());
      } else if (g.kind() == FaceGroupKind.EXTERIOR) {
        what = "sealed (no entry in faces: sealed by default)";
        unassigned.add(g.name());
      } else {
        what = "continuous (material interface)";
      }
      sb.append(String.format(Locale.ROOT, "  %-16s %-9s %s%n", g.name(), where, what));
    }
    if (!unassigned.isEmpty()) {
      sb.append("  unassigned exterior groups, sealed: ")
          .append(String.join(", ", unassigned))
          .append('\n');
    }
    sb.append(time(c));
    sb.append("outputs: fields at ");
    List<String> times = new ArrayList<>();
    for (double t : c.time().outputTimes()) {
      times.add(DurationText.of(t));
    }
    sb.append(String.join(", ", times)).append("; series.csv every step");
    if (!c.probes().isEmpty()) {
      List<String> names = new ArrayList<>();
      for (ProbeSpec pr : c.probes()) {
        names.add(pr.name());
      }
      sb.append("; probes ").append(String.join(", ", names));
    }
    if (c.threshold().isPresent()) {
      sb.append("; threshold ").append(num(c.threshold().getAsDouble()));
    }
    sb.append('\n');
    MemoryEstimate mem = MemoryEstimate.of(c, mesh);
    sb.append(
        String.format(
            Locale.ROOT,
            "memory: about %s of Java heap needed, %s available%s%n",
            MemoryEstimate.megabytes(mem.bytes()),
            MemoryEstimate.megabytes(maxHeap),
            mem.bytes() > maxHeap
                ? " - TOO SMALL: 'run' will refuse; raise it with JAVA_OPTS=-Xmx..."
                : ""));
    RunTimeEstimate est = RunTimeEstimate.of(c, mesh);
    sb.append(
        String.format(
            Locale.ROOT,
            "time: roughly %s of wall time for ~%d steps (an order-of-magnitude estimate from"
                + " the step count and a measured cost per node and step)%n",
            DurationText.of(est.seconds()),
            est.steps()));
    for (String w : p.warnings()) {
      sb.append("warning: ").append(w).append('\n');
    }
    return sb.toString();
  }

  private static String time(CaseSpec c) {
    String steps;
    if (c.time().steps() instanceof StepControl.Fixed f) {
      steps = "fixed steps of " + DurationText.of(f.step());
    } else {
      StepControl.Adaptive a = (StepControl.Adaptive) c.time().steps();
      steps = "adaptive steps (tolerance " + num(a.tolerance()) + ")";
    }
    return String.format(
        Locale.ROOT,
        "time: 0 to %s (%s s), %s, %s, %s capacity%n",
        DurationText.of(c.time().end()),
        num(c.time().end()),
        c.time().scheme().word(),
        steps,
        c.time().capacity().word());
  }

  /** The line that says what the case's numbers are in and how amounts are weighed. */
  private static String units(CaseSpec c) {
    Quantities q = c.quantities();
    if (q.unit() == ConcentrationUnit.UNDECLARED) {
      return "units: concentration not declared (\"units\": {\"concentration\": ...});"
          + " amounts are concentration × m³\n";
    }
    return "units: concentrations in "
        + q.concentration()
        + ", amounts in "
        + q.amount()
        + q.species()
            .map(s -> ", species " + s.name() + " (" + num(s.molarMass() * 1e3) + " g/mol)")
            .orElse("")
        + "\n";
  }

  private static String faceKind(FaceSpec f, Quantities q) {
    String value = table(f.value());
    String c = q.unit() == ConcentrationUnit.UNDECLARED ? "" : " " + q.concentration();
    String flux = q.unit() == ConcentrationUnit.UNDECLARED ? "amount/(m²·s)" : q.flux();
    return switch (f.kind()) {
      case SEALED -> "sealed";
      case CONCENTRATION -> "concentration " + value + c;
      case FLUX -> "flux " + value + " " + flux;
      case EXCHANGE ->
          "exchange with environment "
              + (f.ambientValue() ? "ambient" : value + c)
              + ", coefficient "
              + table(f.coefficient())
              + " m/s";
      case AMBIENT -> "ambient (the exposure's humidity or gas pressure)";
      case LAW ->
          "face law "
              + f.law().map(l -> l.id()).orElse("?")
              + (f.ambientValue() ? " (gas: the exposure's)" : " (gas pressure " + value + " Pa)");
    };
  }

  private static String table(TimeTable t) {
    if (t.isConstant()) {
      return num(t.at(0));
    }
    return "table of " + t.breakpoints().length + " points";
  }

  private static String diffusivity(Diffusivity d) {
    if (d.isIsotropic()) {
      return num(d.xx()) + " m²/s";
    }
    return "tensor ["
        + num(d.xx())
        + ", "
        + num(d.yy())
        + ", "
        + num(d.zz())
        + "; "
        + num(d.xy())
        + ", "
        + num(d.yz())
        + ", "
        + num(d.zx())
        + "] m²/s";
  }

  private static String source(SourceSpec s) {
    if (s instanceof SourceSpec.ConstantRate r) {
      return "constant " + num(r.rate()) + " amount/(m³·s)";
    }
    if (s instanceof SourceSpec.FirstOrder r) {
      return "first-order " + num(r.rate()) + " 1/s";
    }
    return s.kind();
  }

  /** The source laws as bound: id and the parameters the case gives. */
  private static String sourceLaws(List<SourceSpec.LawSource> laws) {
    if (laws.isEmpty()) {
      return "";
    }
    List<String> named = new ArrayList<>();
    for (SourceSpec.LawSource l : laws) {
      List<String> given = new ArrayList<>();
      l.parameters()
          .forEach(
              (k, v) -> {
                if (!k.equals("law")) {
                  given.add(k + " = " + v);
                }
              });
      String label =
          (l.name().equals(l.id()) ? l.id() : "'" + l.name() + "' " + l.id())
              + (l.reversible() ? "" : " [irreversible]");
      named.add(label + (given.isEmpty() ? "" : " (" + String.join(", ", given) + ")"));
    }
    return "; source laws " + String.join(" + ", named);
  }

  private static String energy(String name, double joulesPerMole) {
    return joulesPerMole == 0
        ? ""
        : String.format(Locale.ROOT, " (%s = %.4g kJ/mol)", name, joulesPerMole / 1000);
  }

  private static String num(double v) {
    return String.format(Locale.ROOT, "%.4g", v);
  }
}
