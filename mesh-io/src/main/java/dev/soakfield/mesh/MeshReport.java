package dev.soakfield.mesh;

import java.util.List;

/**
 * What an import or a check found: every finding in the order it was made, and the quality figures.
 */
public record MeshReport(List<MeshFinding> findings, MeshQuality quality) {
  public MeshReport {
    findings = List.copyOf(findings);
  }

  /** True when any finding is an {@link MeshFinding.Severity#ERROR}. */
  public boolean hasErrors() {
    return findings.stream().anyMatch(f -> f.severity() == MeshFinding.Severity.ERROR);
  }

  /** Findings whose code is {@code code}. */
  public List<MeshFinding> withCode(String code) {
    return findings.stream().filter(f -> f.code().equals(code)).toList();
  }
}
