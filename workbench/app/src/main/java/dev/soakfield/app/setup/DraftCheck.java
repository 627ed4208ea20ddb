package dev.soakfield.app.setup;

import dev.soakfield.fem.casefile.CaseChecks;
import dev.soakfield.fem.casefile.CaseInputException;
import dev.soakfield.fem.casefile.CaseReader;
import dev.soakfield.fem.casefile.CaseSpec;
import dev.soakfield.fem.model.ImpermeableParts;
import dev.soakfield.fem.model.LawResolver;
import dev.soakfield.fem.run.RunPipeline;
import dev.soakfield.mesh.MeshInputException;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * The checks {@code soakfield check} makes, on the case as edited now and the mesh in memory: the
 * case reader's, the checks against the mesh, and the binding of source laws and restart folders.
 * Each problem keeps its key path, so the window shows it beside its field.
 *
 * @param problems what stops a run, each with its key path (empty path: the whole case)
 * @param warnings what a run would warn about
 * @param spec the case as read, when it has no problems
 */
public record DraftCheck(
    List<CaseInputException.Problem> problems, List<String> warnings, Optional<CaseSpec> spec) {
  public DraftCheck {
    problems = List.copyOf(problems);
    warnings = List.copyOf(warnings);
  }

  /** Checks the draft as it is now. */
  public static DraftCheck of(CaseDraft draft, LawResolver laws) {
    String name = draft.caseFile().getFileName().toString();
    List<String> warnings = new ArrayList<>();
    try {
      CaseSpec spec = CaseReader.readText(draft.text(), draft.caseFile(), name);
      var mesh = ImpermeableParts.removedFrom(spec, draft.mesh());
      warnings.addAll(CaseChecks.againstMesh(spec, mesh));
      boolean binds =
          spec.initial().from().isPresent()
              || spec.materials().values().stream().anyMatch(m -> !m.laws().isEmpty())
              || spec.faces().values().stream().anyMatch(f -> f.law().isPresent());
      if (binds) { // building the model is the only full check of laws (source and face) and
        // restarts
        warnings.addAll(RunPipeline.bindAll(new RunPipeline.Prepared(spec, mesh, warnings), laws));
      }
      return new DraftCheck(List.of(), warnings, Optional.of(spec));
    } catch (CaseInputException e) {
      return new DraftCheck(e.problems(), warnings, Optional.empty());
    } catch (MeshInputException e) {
      return new DraftCheck(
          List.of(new CaseInputException.Problem(0, 0, "", e.getMessage())),
          warnings,
          Optional.empty());
    }
  }

  /**
   * The exposure's temperature in °C at {@code count} even times from 0 to its end, then the end
   * time in s as the last element; empty when the case has no exposure or does not read yet.
   */
  public Optional<double[]> temperatureCurve(int count) {
    return spec.flatMap(CaseSpec::exposure)
        .map(
            h -> {
              double[] out = new double[count + 1];
              for (int i = 0; i < count; i++) {
                out[i] = h.temperature(h.end() * i / (count - 1.0)) - 273.15;
              }
              out[count] = h.end();
              return out;
            });
  }

  /** The problems about {@code path} or inside it. */
  public List<String> about(TreePath path) {
    List<String> out = new ArrayList<>();
    for (CaseInputException.Problem p : problems) {
      if (path.covers(p.path())) {
        out.add(p.message());
      }
    }
    return out;
  }

  /** Why a run cannot start, or empty when it can. */
  public Optional<String> blocksRun() {
    if (problems.isEmpty()) {
      return Optional.empty();
    }
    CaseInputException.Problem first = problems.get(0);
    String where = first.path().isEmpty() ? "" : first.path() + ": ";
    return Optional.of(
        (problems.size() == 1 ? "1 problem" : problems.size() + " problems")
            + " to fix first — "
            + where
            + first.message());
  }
}
