package dev.soakfield.fem.sweep;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.DoubleNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.soakfield.fem.casefile.CaseReader;
import dev.soakfield.fem.casefile.CaseSpec;
import dev.soakfield.fem.results.FileHashes;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * A sweep expanded into its cases: the full factorial of the listed levels (the last key of the
 * sweep file changing fastest), each crossed with the same {@code samples} draws of the
 * distributions. The base case is checked on its own first, and every varied key must exist in it.
 * The fingerprint tells a rerun of the same sweep from another.
 */
public final class SweepPlan {
  private final SweepFile sweep;
  private final CaseSpec baseSpec;
  private final String baseText;
  private final List<PlannedCase> cases;
  private final List<String> warnings;
  private final String fingerprint;

  private SweepPlan(
      SweepFile sweep,
      CaseSpec baseSpec,
      String baseText,
      List<PlannedCase> cases,
      List<String> warnings,
      String fingerprint) {
    this.sweep = sweep;
    this.baseSpec = baseSpec;
    this.baseText = baseText;
    this.cases = List.copyOf(cases);
    this.warnings = List.copyOf(warnings);
    this.fingerprint = fingerprint;
  }

  /**
   * Expands {@code sweep}.
   *
   * @throws SweepInputException for a key the base case does not have
   * @throws dev.soakfield.fem.casefile.CaseInputException when the base case itself is wrong
   */
  public static SweepPlan of(SweepFile sweep) throws IOException {
    if (!java.nio.file.Files.isRegularFile(sweep.base())) {
      throw new SweepInputException(
          sweep.file()
              + ": base: found "
              + sweep.base()
              + ", which does not exist, expected the"
              + " case file the sweep starts from (a path relative to the sweep file)");
    }
    CaseSpec spec = CaseReader.read(sweep.base());
    ObjectNode base = (ObjectNode) SweepFile.readJson(sweep.base(), "the base case file (JSON)");
    for (Varied v : sweep.vary()) {
      Optional<String> problem = KeyPaths.problem(base, v.key());
      if (problem.isPresent()) {
        throw new SweepInputException(
            sweep.file()
                + ": vary."
                + v.key()
                + ": "
                + problem.get()
                + " in the base case "
                + sweep.base().getFileName()
                + "; a sweep varies keys the base case has");
      }
    }
    spec.initial()
        .from()
        .ifPresent(from -> ((ObjectNode) base.get("initial")).put("from", from.toString()));
    List<String> warnings = new ArrayList<>();
    List<Varied.Sampled> sampled = sweep.sampled();
    for (Varied.Sampled s : sampled) {
      double belowZero = s.distribution().cumulative(0);
      if (belowZero > 1e-9) {
        warnings.add(
            String.format(
                Locale.ROOT,
                "vary.%s: %s gives a value at or below 0 with probability %.2g; a case that"
                    + " draws one fails if the key must be positive",
                s.key(),
                s.distribution().described(),
                belowZero));
      }
    }
    double[][] u = sweep.sampling().probabilities(sweep.samples(), sampled.size(), sweep.seed());
    List<List<JsonNode>> combos = factorial(sweep.vary());
    int total = combos.size() * sweep.samples();
    int width = Math.max(4, Integer.toString(total).length());
    List<PlannedCase> cases = new ArrayList<>(total);
    for (List<JsonNode> combo : combos) {
      for (int s = 0; s < sweep.samples(); s++) {
        List<String> values = new ArrayList<>();
        int level = 0;
        int drawn = 0;
        for (Varied v : sweep.vary()) {
          JsonNode value =
              v instanceof Varied.Sampled d
                  ? DoubleNode.valueOf(d.distribution().quantile(u[s][drawn++]))
                  : combo.get(level++);
          values.add(value.toString());
        }
        String id = String.format(Locale.ROOT, "%0" + width + "d", cases.size() + 1);
        cases.add(new PlannedCase(id, values));
      }
    }
    String text = base.toString();
    return new SweepPlan(
        sweep, spec, text, cases, warnings, fingerprint(text, spec.mesh(), sweep, cases));
  }

  /** Every combination of the listed levels, the last key changing fastest. */
  private static List<List<JsonNode>> factorial(List<Varied> vary) {
    List<List<JsonNode>> combos = new ArrayList<>();
    combos.add(List.of());
    for (Varied v : vary) {
      if (v instanceof Varied.Levels l) {
        List<List<JsonNode>> next = new ArrayList<>();
        for (List<JsonNode> c : combos) {
          for (JsonNode value : l.values()) {
            List<JsonNode> longer = new ArrayList<>(c);
            longer.add(value);
            next.add(longer);
          }
        }
        combos = next;
      }
    }
    return combos;
  }

  private static String fingerprint(
      String baseText, Path mesh, SweepFile sweep, List<PlannedCase> cases) throws IOException {
    MessageDigest md;
    try {
      md = MessageDigest.getInstance("SHA-256");
    } catch (NoSuchAlgorithmException e) {
      throw new IllegalStateException("SHA-256 is part of every Java platform", e);
    }
    StringBuilder sb = new StringBuilder(baseText).append('\n');
    sb.append(java.nio.file.Files.isRegularFile(mesh) ? FileHashes.sha256(mesh) : "no mesh");
    sb.append('\n').append(keys(sweep)).append('\n').append(sweep.collectTimes()).append('\n');
    for (PlannedCase c : cases) {
      sb.append(c.id()).append(c.values()).append('\n');
    }
    return HexFormat.of().formatHex(md.digest(sb.toString().getBytes(StandardCharsets.UTF_8)));
  }

  private static List<String> keys(SweepFile sweep) {
    return sweep.vary().stream().map(Varied::key).toList();
  }

  public SweepFile sweep() {
    return sweep;
  }

  /** The base case as read and checked on its own. */
  public CaseSpec baseSpec() {
    return baseSpec;
  }

  public List<PlannedCase> cases() {
    return cases;
  }

  /** The varied key paths, in the order of the sweep file. */
  public List<String> keys() {
    return keys(sweep);
  }

  /** What the plan noticed (distributions that reach values at or below 0). */
  public List<String> warnings() {
    return warnings;
  }

  public String fingerprint() {
    return fingerprint;
  }

  /** The mesh every case runs on. */
  public Path mesh() {
    return baseSpec.mesh();
  }

  /** What a worker needs to run this plan's cases. */
  public SweepJob job() {
    Path meshName = mesh().getFileName();
    return new SweepJob(
        sweep.file().getFileName().toString(),
        sweep.base().getFileName().toString(),
        baseText,
        keys(),
        sweep.collectTimes(),
        meshName == null ? "mesh.msh" : meshName.toString());
  }
}
