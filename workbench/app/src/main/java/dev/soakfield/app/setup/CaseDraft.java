package dev.soakfield.app.setup;

import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.soakfield.mesh.AtomicFiles;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.load.MeshLoader;
import dev.soakfield.mesh.msh.MshWriter;
import dev.soakfield.mesh.topo.AssemblyOptions;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import java.util.function.Consumer;
import java.util.function.UnaryOperator;

/**
 * A case being set up in the window: the case file's JSON tree and the mesh it names, with undo and
 * redo over every edit. The tree is what gets saved, so a case saved here runs unchanged with
 * {@code soakfield run}, and a hand-written case keeps its meaning (not its comments).
 */
public final class CaseDraft {
  /** One state of the draft; never changed once made. */
  record State(ObjectNode tree, TetMesh mesh, boolean meshEdited) {}

  private final EditHistory<State> history;
  private Path caseFile;
  private final boolean hadComments;
  private boolean commentLossAccepted;

  private CaseDraft(Path caseFile, State first, boolean hadComments) {
    this.caseFile = caseFile.toAbsolutePath().normalize();
    this.history = new EditHistory<>(first);
    this.hadComments = hadComments;
  }

  /**
   * A new case for a bare mesh, to be saved beside it as {@code <mesh name>.case.json} (or {@code
   * <mesh name>-2.case.json} and so on when that file exists): every volume group still needs a
   * material, every face group is sealed until given a kind.
   */
  public static CaseDraft ofMesh(Path meshFile, TetMesh mesh) {
    JsonNodeFactory f = JsonNodeFactory.instance;
    ObjectNode tree = f.objectNode();
    tree.put("mesh", meshFile.getFileName().toString());
    tree.putObject("materials");
    tree.putObject("faces");
    tree.put("initial", 0);
    ObjectNode time = tree.putObject("time");
    time.put("end", "24 h");
    time.put("tolerance", 1e-3);
    time.put("capacity", "lumped"); // keeps values within their bounds from the first step
    String stem = stem(meshFile.getFileName().toString(), ".msh");
    Path caseFile = meshFile.toAbsolutePath().resolveSibling(stem + ".case.json");
    for (int n = 2; Files.exists(caseFile); n++) { // never over a case already there
      caseFile = meshFile.toAbsolutePath().resolveSibling(stem + "-" + n + ".case.json");
    }
    return new CaseDraft(caseFile, new State(tree, mesh, false), false);
  }

  /**
   * Opens a case file with whatever mistakes it has (the checks show them) and loads its mesh.
   *
   * @throws dev.soakfield.fem.casefile.CaseInputException for text that is not a JSON object
   * @throws dev.soakfield.mesh.MeshInputException when its mesh cannot be read
   */
  public static CaseDraft open(Path caseFile) throws IOException {
    String text = Files.readString(caseFile, StandardCharsets.UTF_8);
    ObjectNode tree = CaseText.parse(text, caseFile, caseFile.getFileName().toString());
    Path folder = caseFile.toAbsolutePath().getParent();
    String meshName = tree.path("mesh").asText("");
    if (meshName.isEmpty()) {
      throw new dev.soakfield.mesh.MeshInputException(
          caseFile.toString(), "key mesh", "no mesh file name", "the mesh file the case uses");
    }
    Path mesh = folder.resolve(meshName).normalize();
    TetMesh m = MeshLoader.load(mesh, AssemblyOptions.defaults()).mesh();
    return new CaseDraft(caseFile, new State(tree, m, false), CaseText.hasComments(text));
  }

  static String stem(String fileName, String extension) {
    String lower = fileName.toLowerCase(Locale.ROOT);
    if (lower.endsWith(".case.json")) {
      return fileName.substring(0, fileName.length() - ".case.json".length());
    }
    return lower.endsWith(extension)
        ? fileName.substring(0, fileName.length() - extension.length())
        : fileName;
  }

  /**
   * The folder a run of this case writes: {@code pod.case.json} or {@code pod.json} → pod-results.
   */
  public Path resultFolder() {
    return caseFile.resolveSibling(stem(caseFile.getFileName().toString(), ".json") + "-results");
  }

  /** The tree now; read it, never change it (edits go through {@link #edit}). */
  public ObjectNode tree() {
    return history.current().tree();
  }

  public TetMesh mesh() {
    return history.current().mesh();
  }

  public Path caseFile() {
    return caseFile;
  }

  /** Whether the case file exists with the draft's present state in it. */
  public boolean unsaved() {
    return history.unsaved() || !Files.exists(caseFile);
  }

  /**
   * Makes an edit: {@code change} gets a copy of the tree to change. An edit that changes nothing
   * leaves no undo step.
   *
   * @return whether the tree changed
   */
  public boolean edit(String label, Consumer<ObjectNode> change) {
    State now = history.current();
    ObjectNode copy = now.tree().deepCopy();
    change.accept(copy);
    if (copy.equals(now.tree())) {
      return false;
    }
    history.push(new State(copy, now.mesh(), now.meshEdited()), label);
    return true;
  }

  /** Sets the value at {@code path} from typed text (empty text removes the key). */
  public boolean set(TreePath path, String typed) {
    com.fasterxml.jackson.databind.JsonNode v = CaseValues.node(typed);
    return edit(path.spelt(), tree -> path.set(tree, v));
  }

  /**
   * Changes the mesh (face groups split or renamed) and the tree with it as one undo step; saving
   * then writes the mesh beside the case as {@code <case>-regrouped.msh}, never over the original.
   */
  public void editMesh(String label, UnaryOperator<TetMesh> change, Consumer<ObjectNode> treeFix) {
    State now = history.current();
    TetMesh mesh = Objects.requireNonNull(change.apply(now.mesh()), "changed mesh");
    ObjectNode copy = now.tree().deepCopy();
    treeFix.accept(copy);
    copy.put("mesh", regroupedMeshName());
    history.push(new State(copy, mesh, true), label);
  }

  private String regroupedMeshName() {
    return stem(caseFile.getFileName().toString(), ".json") + "-regrouped.msh";
  }

  public boolean undo() {
    return history.undo();
  }

  public boolean redo() {
    return history.redo();
  }

  public Optional<String> undoLabel() {
    return history.undoLabel();
  }

  public Optional<String> redoLabel() {
    return history.redoLabel();
  }

  /** The case as it would be saved now. */
  public String text() {
    return CaseText.write(tree());
  }

  /**
   * Why saving over the case file needs the user's word first: the file had comments, which the
   * saved text cannot keep. Empty once {@link #acceptCommentLoss} was called or for a new file.
   */
  public Optional<String> saveCaution() {
    if (hadComments && !commentLossAccepted && Files.exists(caseFile)) {
      return Optional.of(
          caseFile.getFileName()
              + " has comments; saving writes the same case without them (save as another file"
              + " to keep the original)");
    }
    return Optional.empty();
  }

  public void acceptCommentLoss() {
    commentLossAccepted = true;
  }

  /** Saves over the case file (see {@link #saveCaution}). */
  public void save() throws IOException {
    saveAs(caseFile);
  }

  /**
   * Writes the case (and a regrouped mesh) to {@code target}, each file complete before it takes
   * its name; the mesh path is rewritten relative to the new folder.
   */
  public void saveAs(Path target) throws IOException {
    Path to = target.toAbsolutePath().normalize();
    State now = history.current();
    ObjectNode tree = now.tree().deepCopy();
    Path oldFolder = caseFile.getParent();
    caseFile = to;
    if (now.meshEdited()) {
      Path mesh = to.resolveSibling(regroupedMeshName());
      AtomicFiles.write(mesh, f -> MshWriter.write(f, now.mesh(), true));
      tree.put("mesh", mesh.getFileName().toString());
    } else {
      Path mesh = oldFolder.resolve(tree.path("mesh").asText()).normalize();
      tree.put("mesh", relative(to.getParent(), mesh));
    }
    byte[] bytes = CaseText.write(tree).getBytes(StandardCharsets.UTF_8);
    AtomicFiles.write(to, f -> Files.write(f, bytes));
    commentLossAccepted = true; // the file now holds text without comments
    if (!tree.equals(now.tree())) {
      history.push(new State(tree, now.mesh(), now.meshEdited()), "save as");
    }
    history.markSaved();
  }

  /** The mesh file the case names now, resolved against the case file's folder. */
  public Path meshFile() {
    return caseFile.resolveSibling(tree().path("mesh").asText()).normalize();
  }

  private static String relative(Path folder, Path file) {
    Path r = folder == null ? file : folder.relativize(file);
    return r.toString().replace('\\', '/');
  }
}
