package dev.soakfield.ui;

import static org.lwjgl.nuklear.Nuklear.*;

import dev.soakfield.app.FieldKind;
import dev.soakfield.app.OrbitCamera;
import dev.soakfield.app.Scene;
import dev.soakfield.app.setup.CaseDraft;
import dev.soakfield.app.setup.ProbeEdits;
import dev.soakfield.app.setup.ProbePlacement;
import dev.soakfield.app.setup.RecentFiles;
import dev.soakfield.app.setup.RunJob;
import dev.soakfield.app.setup.SetupSession;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.lwjgl.nuklear.NkRect;
import org.lwjgl.nuklear.NkVec2;
import org.lwjgl.system.MemoryStack;

/**
 * What the buttons and shortcuts do: open (with the recent list), save and save as (asking first
 * when the file's comments would go), run and cancel, placing probes; and the one message line that
 * tells the user how it went.
 */
final class WorkbenchActions implements AutoCloseable {
  private final Workbench wb;
  private FileDialogs dialogs = FileDialogs.DESKTOP;
  private RecentFiles recent = RecentFiles.ofUser();
  private String message = "";
  private boolean error;
  private Optional<Runnable> afterConfirm = Optional.empty();
  private String confirmText = "";
  private RunJob shownJob;

  WorkbenchActions(Workbench wb) {
    this.wb = wb;
  }

  /** For scripted sessions: dialogs that answer without a user, a recent list of their own. */
  void use(FileDialogs d, RecentFiles r) {
    dialogs = d;
    recent = r;
  }

  String message() {
    return message;
  }

  boolean messageIsError() {
    return error;
  }

  private void say(String text, boolean isError) {
    message = text;
    error = isError;
  }

  void openWithDialog() {
    dialogs.open().ifPresent(this::open);
  }

  /** Opens a file or folder in place of what is open (a fields.pvd opens its result folder). */
  void open(Path p) {
    Path target =
        p.getFileName() != null && p.getFileName().toString().equals("fields.pvd")
            ? p.getParent()
            : p;
    Optional<CaseDraft> d = wb.session().draft();
    if (d.isPresent() && d.get().unsaved() && d.get().undoLabel().isPresent()) {
      confirm(
          d.get().caseFile().getFileName()
              + " has unsaved edits. Open "
              + target.getFileName()
              + " and lose them?",
          () -> openNow(target));
      return;
    }
    openNow(target);
  }

  private void openNow(Path target) {
    try {
      wb.open(SetupSession.open(target, wb.session().catalog()));
      recent.opened(target);
      say("opened " + target, false);
    } catch (IOException | RuntimeException e) {
      say("could not open " + target + ": " + e.getMessage(), true);
    }
  }

  void recentCombo(Widgets w) {
    List<Path> files = recent.list();
    var ctx = w.ctx();
    try (MemoryStack stack = MemoryStack.stackPush()) {
      w.place("Recent");
      if (nk_combo_begin_label(ctx, "Recent", NkVec2.malloc(stack).set(380, 240))) {
        nk_layout_row_dynamic(ctx, 20, 1);
        if (files.isEmpty()) {
          nk_label(ctx, "(nothing opened yet)", NK_TEXT_LEFT);
        }
        for (Path f : files) {
          if (nk_combo_item_label(ctx, f.toString(), NK_TEXT_LEFT)) {
            open(f);
          }
        }
        nk_combo_end(ctx);
      }
    }
  }

  void save() {
    Optional<CaseDraft> d = wb.session().draft();
    if (d.isEmpty()) {
      say("nothing to save: no case is open", true);
      return;
    }
    Optional<String> caution = d.get().saveCaution();
    if (caution.isPresent()) {
      confirm(
          caution.get() + ". Save anyway?",
          () -> {
            d.get().acceptCommentLoss();
            save();
          });
      return;
    }
    try {
      d.get().save();
      recent.opened(d.get().caseFile());
      say("saved " + d.get().caseFile(), false);
    } catch (IOException e) {
      say("could not save " + d.get().caseFile() + ": " + e.getMessage(), true);
    }
  }

  void saveAsWithDialog() {
    wb.session().draft().ifPresent(d -> dialogs.saveAs(d.caseFile()).ifPresent(this::saveAs));
  }

  void saveAs(Path target) {
    CaseDraft d = wb.session().draft().orElseThrow();
    try {
      d.saveAs(target);
      recent.opened(d.caseFile());
      say("saved " + d.caseFile(), false);
    } catch (IOException e) {
      say("could not save " + target + ": " + e.getMessage(), true);
    }
  }

  /** Saves the case and runs it; says why not when it cannot. */
  void run() {
    SetupSession s = wb.session();
    Optional<String> no = s.whyNoRun();
    if (no.isPresent()) {
      say("cannot run: " + no.get(), true);
      return;
    }
    Optional<String> caution = s.draft().orElseThrow().saveCaution();
    if (caution.isPresent()) {
      confirm(
          caution.get() + ". Run saves the case first; go on?",
          () -> {
            s.draft().orElseThrow().acceptCommentLoss();
            run();
          });
      return;
    }
    try {
      RunJob j = s.run();
      say(
          "running " + s.draft().orElseThrow().caseFile().getFileName() + " into " + j.folder(),
          false);
    } catch (IOException e) {
      say("could not save the case to run it: " + e.getMessage(), true);
    }
  }

  void cancelRun() {
    wb.session().job().ifPresent(RunJob::cancel);
  }

  /** Each frame: a run that ended since the last frame opens its results or says why not. */
  void poll() {
    Optional<RunJob> j = wb.session().job();
    if (j.isEmpty() || j.get() == shownJob || j.get().status() == RunJob.Status.RUNNING) {
      return;
    }
    shownJob = j.get();
    if (j.get().status() == RunJob.Status.FINISHED) {
      try {
        wb.showResults(j.get().folder());
        wb.showField(FieldKind.CONCENTRATION);
        wb.model().settings().frame(wb.model().study().results().orElseThrow().frameCount() - 1);
        say(j.get().message(), false);
      } catch (RuntimeException e) {
        say("the run finished but its results could not be shown: " + e.getMessage(), true);
      }
    } else {
      say(j.get().message(), j.get().status() == RunJob.Status.FAILED);
    }
  }

  void placeProbe(Scene scene, OrbitCamera camera, double x, double y) {
    Optional<CaseDraft> d = wb.session().draft();
    Optional<double[]> p = ProbePlacement.under(scene, camera, x, y);
    if (d.isEmpty() || p.isEmpty()) {
      say("no probe: the click missed the part", true);
      return;
    }
    String name = new ProbeEdits(d.get()).add(p.get()[0], p.get()[1], p.get()[2]);
    say("placed " + name, false);
  }

  private void confirm(String text, Runnable then) {
    confirmText = text;
    afterConfirm = Optional.of(then);
  }

  /** The question of a pending confirmation, in a small window over the view. */
  void drawConfirmation(MemoryStack stack, int width, int height) {
    if (afterConfirm.isEmpty()) {
      return;
    }
    var ctx = wb.context();
    NkRect r = NkRect.malloc(stack);
    if (nk_begin(
        ctx,
        "Please confirm",
        nk_rect((width - 520) / 2f, height / 3f, 520, 130, r),
        NK_WINDOW_BORDER | NK_WINDOW_TITLE | NK_WINDOW_NO_SCROLLBAR)) {
      nk_layout_row_dynamic(ctx, 40, 1);
      nk_label_wrap(ctx, confirmText);
      nk_layout_row_dynamic(ctx, 24, 2);
      wb.widgets().place("confirm yes");
      if (nk_button_label(ctx, "Yes")) {
        Runnable r2 = afterConfirm.get();
        afterConfirm = Optional.empty();
        r2.run();
      }
      wb.widgets().place("confirm no");
      if (nk_button_label(ctx, "No")) {
        afterConfirm = Optional.empty();
        say("nothing done", false);
      }
    }
    nk_end(ctx);
  }

  boolean confirming() {
    return afterConfirm.isPresent();
  }

  void dismissConfirmation() {
    afterConfirm = Optional.empty();
  }

  @Override
  public void close() {
    wb.session().job().ifPresent(RunJob::cancel);
  }
}
