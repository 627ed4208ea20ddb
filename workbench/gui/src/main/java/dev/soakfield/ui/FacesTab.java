package dev.soakfield.ui;

import static org.lwjgl.nuklear.Nuklear.*;

import com.fasterxml.jackson.databind.JsonNode;
import dev.soakfield.app.setup.CaseDraft;
import dev.soakfield.app.setup.CaseValues;
import dev.soakfield.app.setup.DraftCheck;
import dev.soakfield.app.setup.FaceEdits;
import dev.soakfield.app.setup.FaceSelection;
import dev.soakfield.app.setup.GroupEdits;
import dev.soakfield.app.setup.KindColours;
import dev.soakfield.app.setup.SetupSession;
import dev.soakfield.fem.laws.FaceLawEntry;
import dev.soakfield.law.api.LawParameter;
import dev.soakfield.mesh.FaceGroup;
import dev.soakfield.mesh.FaceGroupKind;
import dev.soakfield.report.TimeAxis;
import java.util.List;
import java.util.Optional;
import java.util.function.Supplier;

/**
 * The "Faces" tab: the face groups with their kinds (those with no entry stand out: sealed by
 * default), a selection shared with the view, the kind buttons and the selection's values as a
 * constant or a time table.
 */
final class FacesTab extends SetupTab {
  private String angle = "30";

  FacesTab(Widgets w, Supplier<SetupSession> session) {
    super(w, session);
  }

  @Override
  void draw(SetupSession s, CaseDraft d) {
    var ctx = w.ctx();
    nk_layout_row_dynamic(ctx, 20, 1);
    FaceEdits faces = new FaceEdits(d);
    FaceSelection sel = s.selection();
    List<FaceGroup> groups = d.mesh().faceGroups();
    nk_label(ctx, "Face groups (click in the view; Shift+click adds)", NK_TEXT_LEFT);
    int unset = 0;
    for (FaceGroup g : groups) {
      boolean iface = g.kind() == FaceGroupKind.INTERFACE;
      String kind = faces.kindOf(g.name());
      nk_layout_row_dynamic(ctx, 20, 2);
      w.place("group " + g.name());
      boolean on = nk_check_label(ctx, g.name(), sel.contains(g.name()));
      if (on != sel.contains(g.name())) {
        sel.set(g.name(), on);
      }
      if (!kind.isEmpty()) {
        w.label(kind, KindColours.ofWord(kind));
      } else if (iface) {
        nk_label(ctx, "interface (joins its parts)", NK_TEXT_LEFT);
      } else {
        unset++;
        w.label("no entry: sealed by default", KindColours.NO_ENTRY);
      }
    }
    if (unset > 0) {
      nk_layout_row_dynamic(ctx, 52, 1);
      nk_label_wrap(
          ctx,
          unset
              + " exterior group(s) have no entry and are sealed by default (yellow in the view);"
              + " give them a kind, or \"sealed\" to say you mean it.");
    }
    List<String> chosen = sel.groups();
    groupTools(d, chosen);
    nk_layout_row_dynamic(ctx, 20, 1);
    nk_label(
        ctx,
        chosen.isEmpty()
            ? "Select face groups to give them a kind"
            : "Selected: " + String.join(", ", chosen),
        NK_TEXT_LEFT);
    if (chosen.isEmpty()) {
      return;
    }
    nk_layout_row_dynamic(ctx, 22, 3);
    for (String k : FaceEdits.kindWords()) {
      if (w.button(k)) {
        faces.kind(chosen, k);
      }
    }
    if (w.button("no entry")) {
      faces.clear(chosen);
    }
    String kind = faces.kindOf(chosen.get(0));
    for (String g : chosen) {
      if (!faces.kindOf(g).equals(kind)) {
        nk_layout_row_dynamic(ctx, 20, 1);
        nk_label(ctx, "the selected groups differ in kind: give them one", NK_TEXT_LEFT);
        return;
      }
    }
    Optional<DraftCheck> check = s.check();
    if (kind.equals("exchange")) {
      value(d, faces, chosen, "coefficient", "coefficient h, m/s", check);
    }
    if (kind.equals("concentration") || kind.equals("flux") || kind.equals("exchange")) {
      String unit =
          kind.equals("flux")
              ? "inward flux, amount/(m²·s)"
              : kind.equals("exchange") ? "environment concentration" : "held concentration";
      value(d, faces, chosen, "value", unit, check);
    }
    if (kind.equals("law")) {
      faceLaw(faces, chosen);
    }
    if (kind.equals("ambient")) {
      nk_layout_row_dynamic(ctx, 34, 1);
      nk_label_wrap(ctx, "takes the exposure's potential (see Exposure): nothing to set here");
    }
    for (String g : chosen) {
      check.ifPresent(c -> w.problems(c.about(FaceEdits.path(g))));
    }
  }

  /** A face law from the catalog (built-in and plugins) and its parameters, with their units. */
  private void faceLaw(FaceEdits faces, List<String> chosen) {
    var ctx = w.ctx();
    String first = chosen.get(0);
    String law = faces.entry(first).path("law").asText("");
    nk_layout_row_dynamic(ctx, 20, 1);
    nk_label(ctx, "face law: " + (law.isEmpty() ? "none chosen" : law), NK_TEXT_LEFT);
    nk_layout_row_dynamic(ctx, 22, 2);
    for (FaceLawEntry entry : session.get().catalog().faceEntries()) {
      String id = entry.provider().id();
      if (w.button("face law " + id, id)) {
        faces.faceLaw(chosen, id, entry.provider().parameters());
      }
    }
    Optional<FaceLawEntry> entry = session.get().catalog().findFace(law);
    if (entry.isEmpty()) {
      return;
    }
    nk_layout_row_dynamic(ctx, 34, 1);
    nk_label_wrap(ctx, entry.get().provider().description());
    nk_layout_row_dynamic(ctx, 18, 1);
    nk_label(
        ctx, "gas pressure [Pa], for laws that use one; default: the exposure's", NK_TEXT_LEFT);
    w.labelled(
            "  value", "face pressure", CaseValues.text(faces.entry(first).path("pressure")), 0.35f)
        .ifPresent(t -> faces.value(chosen, "pressure", t));
    for (LawParameter p : entry.get().provider().parameters()) {
      w.lawParameter(p, "face law " + p.name(), CaseValues.text(faces.entry(first).path(p.name())))
          .ifPresent(t -> faces.value(chosen, p.name(), t));
    }
  }

  private void value(
      CaseDraft d,
      FaceEdits faces,
      List<String> chosen,
      String key,
      String what,
      Optional<DraftCheck> check) {
    var ctx = w.ctx();
    String first = chosen.get(0);
    JsonNode v = faces.entry(first).path(key);
    nk_layout_row_dynamic(ctx, 20, 1);
    nk_label(ctx, what, NK_TEXT_LEFT);
    if (!v.isArray() || chosen.size() > 1) {
      nk_layout_row_dynamic(ctx, 22, 2);
      w.field(key, CaseValues.text(v)).ifPresent(t -> faces.value(chosen, key, t));
      if (chosen.size() == 1 && w.button(key + " as table", "time table")) {
        faces.tableOrConstant(first, key, true, d.tree().path("time").path("end"));
      }
      return;
    }
    for (int r = 0; r < v.size(); r++) {
      nk_layout_row_dynamic(ctx, 22, 3);
      int row = r;
      w.field(key + " t" + r, CaseValues.text(v.get(r).path(0)))
          .ifPresent(t -> faces.cell(first, key, row, 0, t));
      w.field(key + " v" + r, CaseValues.text(v.get(r).path(1)))
          .ifPresent(t -> faces.cell(first, key, row, 1, t));
      if (w.button(key + " remove " + r, "remove")) {
        faces.removeRow(first, key, row);
      }
    }
    nk_layout_row_dynamic(ctx, 22, 2);
    if (w.button(key + " add row", "add row")) {
      faces.addRow(first, key);
    }
    if (w.button(key + " as constant", "constant")) {
      faces.tableOrConstant(first, key, false, d.tree().path("time").path("end"));
    }
    check
        .flatMap(c -> c.spec())
        .map(spec -> spec.faces().get(first))
        .ifPresent(
            f -> {
              var table = key.equals("value") ? f.value() : f.coefficient();
              double[] b = table.breakpoints();
              if (b.length >= 2) {
                TimeAxis axis = TimeAxis.forEnd(b[b.length - 1]);
                double[] x = new double[40];
                double[] y = new double[x.length];
                for (int i = 0; i < y.length; i++) {
                  double t = b[0] + (b[b.length - 1] - b[0]) * i / (y.length - 1.0);
                  x[i] = t / axis.seconds();
                  y[i] = table.at(t);
                }
                AxesPlot.draw(
                    ctx,
                    110,
                    x,
                    List.of(y),
                    new int[] {0x6fa8dc},
                    "time [" + axis.unit() + "]",
                    key);
              }
            });
  }

  /** Split one selected group at sharp edges, or rename it. */
  private void groupTools(CaseDraft d, List<String> chosen) {
    var ctx = w.ctx();
    if (chosen.size() != 1) {
      return;
    }
    String g = chosen.get(0);
    GroupEdits edits = new GroupEdits(d);
    nk_layout_row_dynamic(ctx, 22, 3);
    nk_label(ctx, "feature angle, °", NK_TEXT_LEFT);
    w.field("split angle", angle).ifPresent(t -> angle = t);
    if (w.button("split " + g, "split at edges")) {
      try {
        int n = edits.split(g, Double.parseDouble(angle.strip()));
        session.get().selection().click(null);
        note = n == 1 ? g + " has no edge sharper than " + angle + "°" : g + " split into " + n;
      } catch (IllegalArgumentException e) {
        note = e.getMessage();
      }
    }
    nk_layout_row_dynamic(ctx, 22, 2);
    nk_label(ctx, "rename to", NK_TEXT_LEFT);
    w.field("rename " + g, g)
        .ifPresent(
            t -> {
              try {
                edits.rename(g, t);
                session.get().selection().click(t.strip());
                note = "";
              } catch (IllegalArgumentException e) {
                note = e.getMessage();
              }
            });
    if (!note.isEmpty()) {
      nk_layout_row_dynamic(ctx, 34, 1);
      nk_label_wrap(ctx, note);
    }
  }

  private String note = "";
}
