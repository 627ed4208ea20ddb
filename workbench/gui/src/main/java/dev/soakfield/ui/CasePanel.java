package dev.soakfield.ui;

import static org.lwjgl.nuklear.Nuklear.*;

import dev.soakfield.app.setup.CaseDraft;
import dev.soakfield.app.setup.RunJob;
import dev.soakfield.app.setup.SetupSession;
import java.nio.file.Path;
import java.util.Optional;
import org.lwjgl.system.MemoryStack;

/**
 * The case panel on the right: the file and run buttons, then one tab at a time — Faces, Parts,
 * Exposure, Time, Probes (the set-up) and Uptake (the results). The tab also sets what a click on
 * the view does ({@link Mode}).
 */
final class CasePanel {
  /** The tabs, in their order. */
  enum Tab {
    FACES("Faces"),
    PARTS("Parts"),
    EXPOSURE("Exposure"),
    TIME("Time"),
    PROBES("Probes"),
    UPTAKE("Uptake");

    final String label;

    Tab(String label) {
      this.label = label;
    }
  }

  /** What a click on the view does. */
  enum Mode {
    PICK_FACES,
    PLACE_PROBES,
    LOOK
  }

  private final Widgets w;
  private final Workbench wb;
  private final FacesTab faces;
  private final PartsTab parts;
  private final ExposureTab exposure;
  private final TimeTab time;
  private final ProbesTab probes;
  private Tab tab;

  CasePanel(Widgets w, Workbench wb) {
    this.w = w;
    this.wb = wb;
    faces = new FacesTab(w, wb::session);
    parts = new PartsTab(w, wb::session);
    exposure = new ExposureTab(w, wb::session);
    time = new TimeTab(w, wb::session);
    probes = new ProbesTab(w, wb::session);
    tab = wb.session().draft().isPresent() ? Tab.FACES : Tab.UPTAKE;
  }

  Tab tab() {
    return tab;
  }

  void tab(Tab t) {
    tab = t;
  }

  Mode mode() {
    if (wb.session().draft().isEmpty()) {
      return Mode.LOOK;
    }
    return tab == Tab.FACES ? Mode.PICK_FACES : tab == Tab.PROBES ? Mode.PLACE_PROBES : Mode.LOOK;
  }

  /** The panel's title: the case file, with a star while it has unsaved edits. */
  String title() {
    Optional<CaseDraft> d = wb.session().draft();
    if (d.isEmpty()) {
      return "Results (no case file to edit)";
    }
    Path f = d.get().caseFile();
    return "Case " + f.getFileName() + (d.get().unsaved() ? " *" : "");
  }

  void draw(MemoryStack stack, UptakePanel uptake) {
    var ctx = w.ctx();
    SetupSession s = wb.session();
    WorkbenchActions a = wb.actions();
    nk_layout_row_dynamic(ctx, 24, 4);
    if (w.button("Open…")) {
      a.openWithDialog();
    }
    a.recentCombo(w);
    if (w.button("Save", s.draft().isPresent())) {
      a.save();
    }
    if (w.button("Save as…", s.draft().isPresent())) {
      a.saveAsWithDialog();
    }
    nk_layout_row_dynamic(ctx, 24, 4);
    CaseDraft d = s.draft().orElse(null);
    if (w.button("Undo", d != null && d.undoLabel().isPresent())) {
      d.undo();
    }
    if (w.button("Redo", d != null && d.redoLabel().isPresent())) {
      d.redo();
    }
    Optional<String> whyNot = s.whyNoRun();
    if (s.running()) {
      if (w.button("Cancel run")) {
        a.cancelRun();
      }
    } else if (w.button("Run", whyNot.isEmpty())) {
      a.run();
    }
    if (w.button("Keys (F1)")) {
      wb.toggleHelp();
    }
    if (whyNot.isPresent() && !s.running()) {
      nk_layout_row_dynamic(ctx, 34, 1);
      w.place("why no run");
      nk_label_wrap(ctx, "Run is off: " + whyNot.get());
    }
    progress(s);
    nk_layout_row_dynamic(ctx, 22, Tab.values().length);
    for (Tab t : Tab.values()) {
      w.place("tab " + t.label);
      if (nk_select_label(ctx, t.label, NK_TEXT_CENTERED, t == tab)) {
        tab = t;
      }
    }
    switch (tab) {
      case FACES -> faces.draw();
      case PARTS -> parts.draw();
      case EXPOSURE -> exposure.draw();
      case TIME -> time.draw();
      case PROBES -> probes.draw();
      case UPTAKE -> uptake.draw(stack);
    }
  }

  private void progress(SetupSession s) {
    if (s.job().isEmpty()) {
      return;
    }
    var ctx = w.ctx();
    RunJob j = s.job().get();
    RunJob.Progress p = j.progress();
    nk_layout_row_dynamic(ctx, 18, 1);
    nk_prog(ctx, Math.round(1000 * p.fraction()), 1000, false);
    nk_layout_row_dynamic(ctx, 34, 1);
    nk_label_wrap(ctx, RunText.progress(j));
  }
}
