package dev.soakfield.app.setup;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.soakfield.mesh.FaceGroup;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.topo.FaceGroupEdit;
import java.util.Map;

/**
 * Edits of the mesh's face groups from the window: a group split into patches at sharp edges (its
 * entry, if any, goes to every patch) and a group renamed (its entry follows the name). Saving
 * writes the changed mesh beside the case; the mesher's file is never touched.
 */
public final class GroupEdits {
  private final CaseDraft draft;

  public GroupEdits(CaseDraft draft) {
    this.draft = draft;
  }

  /**
   * Splits the group at edges sharper than {@code angleDeg}; returns how many patches it became.
   *
   * @throws IllegalArgumentException naming what is wrong (no such group, a bad angle)
   */
  public int split(String group, double angleDeg) {
    TetMesh before = draft.mesh();
    TetMesh after = FaceGroupEdit.splitByFeatureAngle(before, group, angleDeg);
    if (after == before) {
      return 1;
    }
    int patches = after.faceGroups().size() - before.faceGroups().size() + 1;
    draft.editMesh(
        "split " + group + " into " + patches,
        m -> after,
        tree -> {
          JsonNode entry = FaceEdits.path(group).in(tree);
          FaceEdits.path(group).set(tree, null);
          if (!entry.isMissingNode()) {
            for (FaceGroup g : after.faceGroups()) {
              if (before.faceGroupIndex(g.name()) < 0) {
                FaceEdits.path(g.name()).set(tree, entry.deepCopy());
              }
            }
          }
        });
    return patches;
  }

  /**
   * Renames a face group, its entry in faces with it (in place, keeping the order).
   *
   * @throws IllegalArgumentException for a name that is empty, taken or unwritable
   */
  public void rename(String from, String to) {
    TetMesh after = FaceGroupEdit.rename(draft.mesh(), from, to);
    String name = to.strip();
    draft.editMesh(
        "rename " + from + " to " + name,
        m -> after,
        tree -> {
          if (tree.path("faces") instanceof ObjectNode faces && faces.has(from)) {
            ObjectNode renamed = faces.objectNode();
            for (Map.Entry<String, JsonNode> e : faces.properties()) {
              renamed.set(e.getKey().equals(from) ? name : e.getKey(), e.getValue());
            }
            tree.set("faces", renamed);
          }
        });
  }
}
