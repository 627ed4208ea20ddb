package dev.soakfield.app.setup;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.soakfield.fem.physics.FaceKind;
import dev.soakfield.law.api.LawParameter;
import java.util.Collection;
import java.util.List;

/**
 * Edits of face conditions: the kind of a selection of face groups, a value or coefficient as a
 * constant or a time table, or no entry (sealed by default). Each call is one undo step.
 */
public final class FaceEdits {
  private static final JsonNodeFactory F = JsonNodeFactory.instance;

  private final CaseDraft draft;

  public FaceEdits(CaseDraft draft) {
    this.draft = draft;
  }

  public static TreePath path(String group) {
    return TreePath.of("faces", group);
  }

  /** The face group's entry, or a missing node when it has none (sealed by default). */
  public JsonNode entry(String group) {
    return path(group).in(draft.tree());
  }

  /** The kind the group has: its entry's, or empty text for none. */
  public String kindOf(String group) {
    return entry(group).path("kind").asText("");
  }

  /**
   * Gives the groups a kind, keeping a value or coefficient the new kind also takes and filling
   * what it lacks with a starting value to edit (concentration 1, flux 0, exchange h = 1e-8 m/s
   * towards 1).
   */
  public void kind(Collection<String> groups, FaceKind kind) {
    draft.edit(
        kind.word() + " on " + String.join(", ", groups),
        tree -> {
          for (String g : groups) {
            JsonNode old = path(g).in(tree);
            ObjectNode e = F.objectNode().put("kind", kind.word());
            switch (kind) {
              case CONCENTRATION -> e.set("value", keep(old, "value", F.numberNode(1)));
              case FLUX -> e.set("value", keep(old, "value", F.numberNode(0)));
              case EXCHANGE -> {
                e.set("coefficient", keep(old, "coefficient", F.numberNode(1e-8)));
                e.set("value", keep(old, "value", F.numberNode(1)));
              }
              case AMBIENT, SEALED, LAW -> {
                // the kind alone
              }
            }
            path(g).set(tree, e);
          }
        });
  }

  private static JsonNode keep(JsonNode old, String key, JsonNode otherwise) {
    JsonNode v = old.path(key);
    return v.isMissingNode() || v.isNull() ? otherwise : v.deepCopy();
  }

  /** Takes the groups' entries away: they are sealed by default. */
  public void clear(Collection<String> groups) {
    draft.edit(
        "no entry for " + String.join(", ", groups),
        tree -> {
          for (String g : groups) {
            if (tree.path("faces") instanceof ObjectNode faces) {
              faces.remove(g);
            }
          }
        });
  }

  /**
   * Gives the groups the face law {@code lawId} with the defaults of its optional parameters (the
   * required ones are left for the user: the check names them). A face-level gas pressure the
   * groups had is kept.
   */
  public void faceLaw(Collection<String> groups, String lawId, List<LawParameter> parameters) {
    draft.edit(
        "face law " + lawId + " on " + String.join(", ", groups),
        tree -> {
          for (String g : groups) {
            JsonNode old = path(g).in(tree);
            ObjectNode e = F.objectNode().put("kind", FaceKind.LAW.word()).put("law", lawId);
            if (old.has("pressure")) {
              e.set("pressure", old.get("pressure").deepCopy());
            }
            for (LawParameter lp : parameters) {
              if (!lp.isRequired()) {
                e.put(lp.name(), lp.defaultValue());
              }
            }
            path(g).set(tree, e);
          }
        });
  }

  /** Sets {@code key} ("value" or "coefficient") of the groups from typed text. */
  public void value(Collection<String> groups, String key, String typed) {
    JsonNode v = CaseValues.node(typed);
    draft.edit(
        key + " of " + String.join(", ", groups),
        tree -> {
          for (String g : groups) {
            path(g).child(key).set(tree, v);
          }
        });
  }

  /**
   * Turns a constant into a table holding it from 0 to the end time, or a table into its first
   * value.
   */
  public void tableOrConstant(String group, String key, boolean table, JsonNode endTime) {
    draft.edit(
        (table ? "time table for " : "constant for ") + group + " " + key,
        tree -> {
          TreePath p = path(group).child(key);
          JsonNode v = p.in(tree);
          if (table && !v.isArray()) {
            JsonNode c = v.isMissingNode() ? F.numberNode(0) : v;
            ArrayNode a = F.arrayNode();
            a.addArray().add(0).add(c.deepCopy());
            a.addArray().add(endTime.isMissingNode() ? F.numberNode(86400) : endTime).add(c);
            p.set(tree, a);
          } else if (!table && v.isArray()) {
            p.set(tree, v.path(0).path(1).deepCopy());
          }
        });
  }

  /** Sets one cell of a time table (column 0 time, 1 value). */
  public void cell(String group, String key, int row, int column, String typed) {
    JsonNode v = CaseValues.node(typed);
    if (v == null) {
      return;
    }
    draft.edit(
        key + " table of " + group,
        tree -> path(group).child(key).child(row).child(column).set(tree, v));
  }

  /** Adds a row after the last, one hour later with the same value. */
  public void addRow(String group, String key) {
    draft.edit(
        "table row for " + group,
        tree -> {
          JsonNode t = path(group).child(key).in(tree);
          if (!(t instanceof ArrayNode a) || a.isEmpty()) {
            return;
          }
          JsonNode last = a.get(a.size() - 1);
          ArrayNode row = a.addArray();
          row.add(
              last.path(0).isNumber()
                  ? F.numberNode(
                      last.path(0).decimalValue().add(java.math.BigDecimal.valueOf(3600)))
                  : last.path(0).deepCopy());
          row.add(last.path(1).deepCopy());
        });
  }

  /** Removes a row, keeping at least one. */
  public void removeRow(String group, String key, int row) {
    draft.edit(
        "table row of " + group,
        tree -> {
          JsonNode t = path(group).child(key).in(tree);
          if (t instanceof ArrayNode a && a.size() > 1 && row < a.size()) {
            a.remove(row);
          }
        });
  }

  /** The kinds a window offers, in its order. */
  public static List<FaceKind> kinds() {
    return List.of(
        FaceKind.CONCENTRATION,
        FaceKind.FLUX,
        FaceKind.EXCHANGE,
        FaceKind.AMBIENT,
        FaceKind.LAW,
        FaceKind.SEALED);
  }

  /** The case file's words for {@link #kinds()}, for the window's buttons. */
  public static List<String> kindWords() {
    return kinds().stream().map(FaceKind::word).toList();
  }

  /** Gives the groups the kind the case file calls {@code word}. */
  public void kind(Collection<String> groups, String word) {
    for (FaceKind k : FaceKind.values()) {
      if (k.word().equals(word)) {
        kind(groups, k);
        return;
      }
    }
    throw new IllegalArgumentException(
        "found the kind '" + word + "', expected one of " + kindWords());
  }
}
