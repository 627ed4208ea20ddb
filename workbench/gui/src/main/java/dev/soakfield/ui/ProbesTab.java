package dev.soakfield.ui;

import static org.lwjgl.nuklear.Nuklear.*;

import dev.soakfield.app.setup.CaseDraft;
import dev.soakfield.app.setup.CaseValues;
import dev.soakfield.app.setup.ProbeEdits;
import dev.soakfield.app.setup.SetupSession;
import dev.soakfield.app.setup.TreePath;
import java.util.function.Supplier;

/** The "Probes" tab: named points, placed by clicking on the part (or the cut) or typed in. */
final class ProbesTab extends SetupTab {

  ProbesTab(Widgets w, Supplier<SetupSession> session) {
    super(w, session);
  }

  @Override
  void draw(SetupSession s, CaseDraft d) {
    var ctx = w.ctx();
    nk_layout_row_dynamic(ctx, 52, 1);
    ProbeEdits probes = new ProbeEdits(d);
    nk_label_wrap(
        ctx,
        "Click on the part to place a probe there (with a section on, on the cut): name,"
            + " x, y, z in metres (or \"2 mm\"), and where parts meet the part it reads.");
    for (String name : probes.names()) {
      nk_layout_row_begin(ctx, NK_DYNAMIC, 22, 4);
      nk_layout_row_push(ctx, 0.2f);
      w.field("probe name " + name, name).ifPresent(t -> probes.rename(name, t));
      nk_layout_row_push(ctx, 0.43f);
      w.field("probe at " + name, CaseValues.text(probes.point(name)))
          .ifPresent(t -> d.set(probes.pointPath(name), t));
      nk_layout_row_push(ctx, 0.15f);
      w.field("probe part " + name, probes.part(name)).ifPresent(t -> probes.part(name, t));
      nk_layout_row_push(ctx, 0.19f);
      if (w.button("remove probe " + name, "remove")) {
        probes.remove(name);
      }
      nk_layout_row_end(ctx);
    }
    nk_layout_row_dynamic(ctx, 22, 1);
    if (w.button("add a probe at the centre")) {
      double[] b = s.study().geometry().bounds();
      probes.add((b[0] + b[3]) / 2, (b[1] + b[4]) / 2, (b[2] + b[5]) / 2);
    }
    s.check().ifPresent(c -> w.problems(c.about(TreePath.of("probes"))));
    s.check()
        .ifPresent(
            c ->
                c.warnings().stream()
                    .filter(m -> m.contains("probe"))
                    .forEach(m -> w.problems(java.util.List.of(m))));
  }
}
