package dev.soakfield.app.setup;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;

/**
 * Edits of the environment: the sorption law (plain, Henry, Sieverts) and the exposure history's
 * segments (duration, temperature, humidity or pressure, each constant or a ramp) and repeat
 * blocks. Segments are addressed by their path, so a segment inside a repeat edits the same way.
 */
public final class ExposureEdits {
  /** The laws a case may name. */
  public static final java.util.List<String> LAWS = java.util.List.of("plain", "henry", "sieverts");

  private static final JsonNodeFactory F = JsonNodeFactory.instance;
  private static final TreePath EXPOSURE = TreePath.of("exposure");
  private final CaseDraft draft;

  public ExposureEdits(CaseDraft draft) {
    this.draft = draft;
  }

  /** The law named by the case ("plain" when it names none). */
  public String law() {
    return draft.tree().path("law").asText("plain");
  }

  public void law(String word) {
    draft.edit("law " + word, tree -> TreePath.of("law").set(tree, F.textNode(word)));
  }

  /** The history's segments and repeat blocks, or an empty array. */
  public JsonNode segments() {
    JsonNode e = EXPOSURE.in(draft.tree());
    return e.isArray() ? e : F.arrayNode();
  }

  /**
   * Adds a segment at the end of the list at {@code list} (the history, or a repeat block's
   * segments): a copy of the last one, or a day at 20 °C and 50 % humidity (or no pressure under
   * Sieverts' law) for an empty list.
   */
  public void addSegment(TreePath list) {
    draft.edit(
        "exposure segment",
        tree -> {
          JsonNode at = list.in(tree);
          ArrayNode a;
          if (at instanceof ArrayNode existing) {
            a = existing;
          } else {
            a = F.arrayNode();
            list.set(tree, a);
          }
          if (!a.isEmpty() && !a.get(a.size() - 1).has("repeat")) {
            a.add(a.get(a.size() - 1).deepCopy());
            return;
          }
          ObjectNode s = a.addObject().put("duration", "24 h").put("temperature", "20 degC");
          if (tree.path("law").asText("plain").equals("sieverts")) {
            s.put("pressure", "0 Pa");
          } else {
            s.put("humidity", 0.5);
          }
        });
  }

  /** Wraps the last {@code count} entries of the history in a block repeated {@code times}. */
  public void repeatLast(int count, int times) {
    draft.edit(
        "repeat of " + count + " segments",
        tree -> {
          if (!(EXPOSURE.in(tree) instanceof ArrayNode a) || count < 1 || count > a.size()) {
            return;
          }
          ObjectNode block = F.objectNode().put("repeat", times);
          ArrayNode inner = block.putArray("segments");
          int from = a.size() - count;
          for (int i = 0; i < count; i++) {
            inner.add(a.remove(from));
          }
          a.add(block);
        });
  }

  /** Removes the entry at {@code at} (a segment or a repeat block); an empty history goes away. */
  public void remove(TreePath at) {
    draft.edit(
        "removed " + at.spelt(),
        tree -> {
          at.set(tree, null);
          if (EXPOSURE.in(tree) instanceof ArrayNode a && a.isEmpty()) {
            tree.remove("exposure");
          }
        });
  }
}
