package dev.soakfield.ui;

import static org.lwjgl.nuklear.Nuklear.*;

import com.fasterxml.jackson.databind.JsonNode;
import dev.soakfield.app.setup.CaseDraft;
import dev.soakfield.app.setup.CaseValues;
import dev.soakfield.app.setup.DraftCheck;
import dev.soakfield.app.setup.MaterialEdits;
import dev.soakfield.app.setup.MaterialLibrary;
import dev.soakfield.app.setup.SetupSession;
import dev.soakfield.app.setup.TreePath;
import dev.soakfield.fem.laws.LawEntry;
import dev.soakfield.law.api.LawParameter;
import dev.soakfield.mesh.VolumeGroup;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.function.Supplier;

/**
 * The "Parts" tab: each volume group's material — diffusivity (constant, Arrhenius or orthotropic
 * with axes), solubility, density and a source law from the catalog with its parameters' units,
 * defaults and ranges.
 */
final class PartsTab extends SetupTab {

  PartsTab(Widgets w, Supplier<SetupSession> session) {
    super(w, session);
  }

  @Override
  void draw(SetupSession s, CaseDraft d) {
    var ctx = w.ctx();
    nk_layout_row_dynamic(ctx, 20, 1);
    MaterialEdits m = new MaterialEdits(d);
    nk_label(ctx, "Parts (volume groups)", NK_TEXT_LEFT);
    for (VolumeGroup g : d.mesh().volumeGroups()) {
      nk_layout_row_dynamic(ctx, 20, 2);
      w.place("part " + g.name());
      if (nk_option_label(ctx, g.name(), g.name().equals(s.part()))) {
        s.part(g.name());
      }
      nk_label(ctx, m.entry(g.name()).isMissingNode() ? "no material yet" : "", NK_TEXT_LEFT);
    }
    String part = s.part();
    Optional<DraftCheck> check = s.check();
    JsonNode e = m.entry(part);
    nk_layout_row_dynamic(ctx, 22, 1);
    if (e.isMissingNode()) {
      if (w.button("give " + part + " a material")) {
        m.startingMaterial(part);
      }
      return;
    }
    if (m.isImpermeable(part)) {
      nk_layout_row_dynamic(ctx, 34, 1);
      nk_label_wrap(
          ctx,
          part + " is impermeable: taken out of the run; its faces with other parts are sealed");
      nk_layout_row_dynamic(ctx, 22, 1);
      if (w.button("give " + part + " a material")) {
        m.startingMaterial(part);
      }
      return;
    }
    nk_layout_row_dynamic(ctx, 22, 1);
    if (w.button("mark " + part + " impermeable")) {
      m.impermeable(part);
      return;
    }
    coefficient(m, part, "diffusivity", "D, m²/s", true);
    coefficient(m, part, "solubility", "S (c = S·potential)", false);
    w.labelled("density", "density", CaseValues.text(e.path("density")), 0.35f)
        .ifPresent(t -> m.value(part, TreePath.of("density"), t));
    source(m, part, e.path("source"));
    check.ifPresent(c -> w.problems(c.about(MaterialEdits.path(part))));
    library(d, m, part, e);
  }

  /** Import from the shipped examples or the user's library; keep this part's material there. */
  private void library(CaseDraft d, MaterialEdits m, String part, JsonNode entry) {
    var ctx = w.ctx();
    nk_layout_row_dynamic(ctx, 20, 1);
    nk_label(ctx, "Material library (" + MaterialLibrary.ofUser() + ")", NK_TEXT_LEFT);
    for (MaterialLibrary.Entry le : libraryEntries()) {
      nk_layout_row_dynamic(ctx, 22, 1);
      if (w.button("library " + le.name(), "use: " + le.name())) {
        m.fromLibrary(part, le.name(), le.material());
        libraryNote = le.name() + ": " + le.note() + " (" + le.source() + ")";
      }
    }
    nk_layout_row_dynamic(ctx, 22, 1);
    if (entry.isObject() && w.button("keep " + part + " in my library")) {
      try {
        MaterialLibrary.keep(
            MaterialLibrary.ofUser(),
            new MaterialLibrary.Entry(
                part + " (" + d.caseFile().getFileName() + ")",
                "kept from " + d.caseFile(),
                "",
                (com.fasterxml.jackson.databind.node.ObjectNode) entry));
        libraryNote = "kept in " + MaterialLibrary.ofUser();
        libraryReadAt = 0;
      } catch (IOException | RuntimeException ex) {
        libraryNote = "could not keep it: " + ex.getMessage();
      }
    }
    if (!libraryNote.isEmpty()) {
      nk_layout_row_dynamic(ctx, 48, 1);
      nk_label_wrap(ctx, libraryNote);
    }
  }

  private String libraryNote = "";
  private List<MaterialLibrary.Entry> library = List.of();
  private long libraryReadAt;

  /** The examples and the user's entries, read again at most every two seconds. */
  private List<MaterialLibrary.Entry> libraryEntries() {
    long now = System.nanoTime();
    if (libraryReadAt == 0 || now - libraryReadAt > 2_000_000_000L) {
      List<MaterialLibrary.Entry> all = new ArrayList<>(MaterialLibrary.examples());
      try {
        all.addAll(MaterialLibrary.read(MaterialLibrary.ofUser()));
      } catch (IOException | RuntimeException ex) {
        libraryNote = "your library cannot be read: " + ex.getMessage();
      }
      library = all;
      libraryReadAt = now;
    }
    return library;
  }

  private void coefficient(MaterialEdits m, String part, String key, String what, boolean axes) {
    var ctx = w.ctx();
    nk_layout_row_dynamic(ctx, 20, 1);
    nk_label(ctx, key + ": " + what, NK_TEXT_LEFT);
    MaterialEdits.Form form = m.form(part, key);
    nk_layout_row_dynamic(ctx, 20, axes ? 3 : 2);
    for (MaterialEdits.Form f : MaterialEdits.Form.values()) {
      if (f == MaterialEdits.Form.ORTHOTROPIC && !axes) {
        continue;
      }
      w.place(key + " " + f);
      if (nk_option_label(ctx, f.name().toLowerCase(Locale.ROOT), f == form) && f != form) {
        m.form(part, key, f);
      }
    }
    JsonNode v = m.entry(part).path(key);
    switch (form) {
      case CONSTANT ->
          w.labelled("value", key, CaseValues.text(v), 0.35f)
              .ifPresent(t -> m.value(part, TreePath.of(key), t));
      case ARRHENIUS -> {
        String pre = axes ? "D0" : "S0";
        String energy = axes ? "Q" : "dH";
        w.labelled(pre, key + pre, CaseValues.text(v.path(pre)), 0.35f)
            .ifPresent(t -> m.value(part, TreePath.of(key, pre), t));
        w.labelled(
                energy + " (J/mol, or kJ/mol)",
                key + energy,
                CaseValues.text(v.path(energy)),
                0.35f)
            .ifPresent(t -> m.value(part, TreePath.of(key, energy), t));
      }
      case ORTHOTROPIC -> {
        for (int i = 0; i < 3; i++) {
          int k = i;
          w.labelled(
                  "D" + (i + 1), key + "p" + i, CaseValues.text(v.path("principal").path(i)), 0.35f)
              .ifPresent(t -> m.value(part, TreePath.of(key, "principal", k), t));
          w.labelled(
                  "axis " + (i + 1), key + "a" + i, CaseValues.text(v.path("axes").path(i)), 0.35f)
              .ifPresent(t -> m.value(part, TreePath.of(key, "axes", k), t));
        }
      }
    }
  }

  private void source(MaterialEdits m, String part, JsonNode source) {
    var ctx = w.ctx();
    String law = source.path("law").asText("");
    nk_layout_row_dynamic(ctx, 20, 1);
    nk_label(ctx, "source law: " + (law.isEmpty() ? "none" : law), NK_TEXT_LEFT);
    nk_layout_row_dynamic(ctx, 22, 3);
    if (w.button("source none", "none")) {
      m.noSource(part);
    }
    for (LawEntry entry : session.get().catalog().entries()) {
      String id = entry.provider().id();
      if (w.button("source " + id, id)) {
        m.sourceLaw(part, id, entry.provider().parameters());
      }
    }
    session.get().catalog().find(law).ifPresent(entry -> parameters(m, part, entry, source));
  }

  private void parameters(MaterialEdits m, String part, LawEntry entry, JsonNode source) {
    var ctx = w.ctx();
    nk_layout_row_dynamic(ctx, 34, 1);
    nk_label_wrap(ctx, entry.provider().description());
    for (LawParameter p : entry.provider().parameters()) {
      w.lawParameter(p, "law " + p.name(), CaseValues.text(source.path(p.name())))
          .ifPresent(t -> m.value(part, TreePath.of("source", p.name()), t));
    }
  }
}
