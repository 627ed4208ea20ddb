package dev.soakfield.app.setup;

import dev.soakfield.app.Study;
import dev.soakfield.fem.laws.SourceLawCatalog;
import dev.soakfield.fem.results.RunManifest;
import dev.soakfield.fem.results.StoredRun;
import dev.soakfield.fem.run.RunOptions;
import dev.soakfield.mesh.MeshInputException;
import dev.soakfield.mesh.load.MeshLoader;
import dev.soakfield.mesh.topo.AssemblyOptions;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Optional;

/**
 * What the window works on, with no GL: the case being set up (when there is one), what is open in
 * the view, the face-group selection, the checks of the case as it is now, and the run started from
 * it.
 */
public final class SetupSession {
  private final Optional<CaseDraft> draft;
  private Study study;
  private final FaceSelection selection = new FaceSelection();
  private final SourceLawCatalog catalog;
  private String checkedText = "";
  private DraftCheck check;
  private Optional<RunJob> job = Optional.empty();
  private String part = "";

  private SetupSession(Optional<CaseDraft> draft, Study study, SourceLawCatalog catalog) {
    this.draft = draft;
    this.study = study;
    this.catalog = catalog;
    if (!study.geometry().partNames().isEmpty()) {
      part = study.geometry().partNames().get(0);
    }
  }

  /**
   * Opens a bare mesh (a new case beside it), a case (and its results when a run of it is there) or
   * a result folder (and the case that made it, when that file still exists).
   *
   * @throws MeshInputException or {@link dev.soakfield.fem.casefile.CaseInputException} for
   *     something that cannot be opened, with the file and the reason
   */
  public static SetupSession open(Path path, SourceLawCatalog catalog) throws IOException {
    String name = path.getFileName().toString().toLowerCase(Locale.ROOT);
    if (Files.isDirectory(path)) {
      Study s = Study.open(path);
      Optional<Path> caseFile = RunManifest.readFrom(path).map(RunManifest::caseFile);
      Optional<CaseDraft> d =
          caseFile.isPresent() && Files.isRegularFile(caseFile.get())
              ? Optional.of(CaseDraft.open(caseFile.get()))
              : Optional.empty();
      return new SetupSession(d, s, catalog);
    }
    if (name.endsWith(".json")) {
      CaseDraft d = CaseDraft.open(path);
      Path results = d.resultFolder();
      Study s =
          StoredRun.isResultFolder(results)
              ? Study.open(results)
              : Study.ofMesh(d.meshFile(), d.mesh());
      return new SetupSession(Optional.of(d), s, catalog);
    }
    if (name.endsWith(".msh")) {
      var mesh = MeshLoader.load(path, AssemblyOptions.defaults()).mesh();
      return new SetupSession(
          Optional.of(CaseDraft.ofMesh(path, mesh)), Study.ofMesh(path, mesh), catalog);
    }
    return new SetupSession(Optional.empty(), Study.open(path), catalog); // Study names the fault
  }

  /** A session on a study alone (results with no case file to edit, or a mesh in memory). */
  public static SetupSession viewOnly(Study study, SourceLawCatalog catalog) {
    return new SetupSession(Optional.empty(), study, catalog);
  }

  public Optional<CaseDraft> draft() {
    return draft;
  }

  public Study study() {
    return study;
  }

  public FaceSelection selection() {
    return selection;
  }

  public SourceLawCatalog catalog() {
    return catalog;
  }

  /** The part (volume group) the Parts panel edits. */
  public String part() {
    return part;
  }

  public void part(String name) {
    part = name;
  }

  /** The checks of the case as it is now, made again only when its text changed. */
  public Optional<DraftCheck> check() {
    if (draft.isEmpty()) {
      return Optional.empty();
    }
    String text = draft.get().text();
    if (check == null || !text.equals(checkedText)) {
      check = DraftCheck.of(draft.get(), catalog.resolver());
      checkedText = text;
    }
    return Optional.of(check);
  }

  /** The mesh of the draft changed (a split or rename, or their undo): the view shows it. */
  public boolean meshChanged() {
    if (draft.isEmpty() || study.results().isPresent()) {
      return false;
    }
    if (study.mesh() == draft.get().mesh()) {
      return false;
    }
    study = Study.ofMesh(draft.get().meshFile(), draft.get().mesh());
    selection.retain(study.geometry().faceGroupNames());
    return true;
  }

  /** Why Run cannot start now, or empty when it can. */
  public Optional<String> whyNoRun() {
    if (draft.isEmpty()) {
      return Optional.of("no case open: open a mesh or a case file to run");
    }
    if (running()) {
      return Optional.of("a run is going on (Esc cancels it)");
    }
    return check().flatMap(DraftCheck::blocksRun);
  }

  /**
   * Saves the case and starts its run into the folder beside it. The caller has asked the user
   * about comments the save drops ({@link CaseDraft#saveCaution}).
   *
   * @throws IllegalStateException when {@link #whyNoRun} has a reason
   */
  public RunJob run() throws IOException {
    Optional<String> no = whyNoRun();
    if (no.isPresent()) {
      throw new IllegalStateException(no.get());
    }
    CaseDraft d = draft.orElseThrow();
    d.save();
    RunJob j =
        RunJob.start(
            d.caseFile(), d.resultFolder(), RunOptions.defaults().withLaws(catalog.resolver()));
    job = Optional.of(j);
    return j;
  }

  public Optional<RunJob> job() {
    return job;
  }

  public boolean running() {
    return job.isPresent() && job.get().status() == RunJob.Status.RUNNING;
  }

  /** After a finished run: the view shows its results. */
  public void showResults(Path folder) {
    study = Study.open(folder);
  }
}
