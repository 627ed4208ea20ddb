package dev.soakfield.ui;

import static org.lwjgl.nuklear.Nuklear.*;

import com.fasterxml.jackson.databind.JsonNode;
import dev.soakfield.app.setup.CaseDraft;
import dev.soakfield.app.setup.CaseValues;
import dev.soakfield.app.setup.SetupSession;
import dev.soakfield.app.setup.TreePath;
import java.util.function.Supplier;

/**
 * The "Time" tab: end, output times, step control (adaptive with a tolerance, or fixed steps),
 * capacity form, the initial concentration and the threshold whose arrival is reported.
 */
final class TimeTab extends SetupTab {
  private static final float LABEL = 0.4f;

  TimeTab(Widgets w, Supplier<SetupSession> session) {
    super(w, session);
  }

  @Override
  void draw(SetupSession s, CaseDraft d) {
    var ctx = w.ctx();
    nk_layout_row_dynamic(ctx, 20, 1);
    JsonNode time = d.tree().path("time");
    nk_label(ctx, "Times take a unit: 3600, \"1 h\", \"7 d\"", NK_TEXT_LEFT);
    text(d, "end", TreePath.of("time", "end"));
    text(d, "outputs (a, b, ...)", TreePath.of("time", "outputs"));
    boolean fixed = time.has("step");
    nk_layout_row_dynamic(ctx, 20, 2);
    w.place("adaptive steps");
    if (nk_option_label(ctx, "adaptive steps", !fixed) && fixed) {
      d.edit(
          "adaptive steps",
          tree -> {
            TreePath.of("time", "step").set(tree, null);
            TreePath.of("time", "tolerance").set(tree, CaseValues.node("0.001"));
          });
    }
    w.place("fixed steps");
    if (nk_option_label(ctx, "fixed steps", fixed) && !fixed) {
      d.edit(
          "fixed steps",
          tree -> {
            TreePath.of("time", "tolerance").set(tree, null);
            TreePath.of("time", "step").set(tree, CaseValues.node("60"));
          });
    }
    if (fixed) {
      text(d, "step", TreePath.of("time", "step"));
    } else {
      text(d, "tolerance (relative)", TreePath.of("time", "tolerance"));
    }
    nk_layout_row_dynamic(ctx, 20, 2);
    String capacity = time.path("capacity").asText("consistent");
    for (String form : new String[] {"lumped", "consistent"}) {
      w.place("capacity " + form);
      if (nk_option_label(ctx, form + " capacity", form.equals(capacity))
          && !form.equals(capacity)) {
        d.set(TreePath.of("time", "capacity"), form);
      }
    }
    text(d, "initial concentration", TreePath.of("initial"));
    text(d, "threshold", TreePath.of("threshold"));
    s.check().ifPresent(c -> w.problems(c.about(TreePath.of("time"))));
    s.check().ifPresent(c -> w.problems(c.about(TreePath.of("initial"))));
    s.check().ifPresent(c -> w.problems(c.about(TreePath.of("threshold"))));
  }

  private void text(CaseDraft d, String label, TreePath path) {
    w.labelled(label, path.spelt(), CaseValues.text(path.in(d.tree())), LABEL)
        .ifPresent(t -> d.set(path, t));
  }
}
