package dev.soakfield.app.setup;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;

/** Edits of the probes: named points placed by a click or typed in, renamed and removed. */
public final class ProbeEdits {
  private static final JsonNodeFactory F = JsonNodeFactory.instance;
  private final CaseDraft draft;

  public ProbeEdits(CaseDraft draft) {
    this.draft = draft;
  }

  /** The probes' names in the case's order. */
  public List<String> names() {
    List<String> out = new ArrayList<>();
    Iterator<String> it = draft.tree().path("probes").fieldNames();
    it.forEachRemaining(out::add);
    return out;
  }

  /** The probe's point: the value itself, or its "at" when it names a part. */
  public JsonNode point(String name) {
    JsonNode p = TreePath.of("probes", name).in(draft.tree());
    return p.isObject() ? p.path("at") : p;
  }

  /** Where the point is stored: the probe's value, or its "at". */
  public TreePath pointPath(String name) {
    JsonNode p = TreePath.of("probes", name).in(draft.tree());
    return p.isObject() ? TreePath.of("probes", name, "at") : TreePath.of("probes", name);
  }

  /** The part the probe reads where parts meet, or empty text. */
  public String part(String name) {
    return TreePath.of("probes", name, "part").in(draft.tree()).asText("");
  }

  /** Names the part the probe reads (empty: none, the plain point form again). */
  public void part(String name, String part) {
    String p = part.strip();
    draft.edit(
        "probe " + name + " reads " + (p.isEmpty() ? "no named part" : p),
        tree -> {
          JsonNode point = TreePath.of("probes", name).in(tree);
          JsonNode at = point.isObject() ? point.path("at") : point;
          JsonNode value =
              p.isEmpty()
                  ? at.deepCopy()
                  : F.objectNode().<ObjectNode>set("at", at.deepCopy()).put("part", p);
          TreePath.of("probes", name).set(tree, value);
        });
  }

  /**
   * Adds a probe at (x, y, z) metres, rounded to 6 significant digits (a click is no more precise),
   * named {@code probe-N} with the first free N; returns the name.
   */
  public String add(double x, double y, double z) {
    List<String> taken = names();
    int n = 1;
    while (taken.contains("probe-" + n)) {
      n++;
    }
    String name = "probe-" + n;
    draft.edit(
        "probe " + name,
        tree -> {
          ArrayNode p = F.arrayNode();
          for (double v : new double[] {x, y, z}) {
            p.add(new BigDecimal(v).round(new MathContext(6)).stripTrailingZeros());
          }
          TreePath.of("probes", name).set(tree, p);
        });
    return name;
  }

  /** Renames a probe in place (its order kept); refuses a taken or empty name. */
  public boolean rename(String from, String to) {
    String t = to.strip();
    if (t.isEmpty() || names().contains(t) || !names().contains(from)) {
      return false;
    }
    return draft.edit(
        "probe " + from + " renamed " + t,
        tree -> {
          ObjectNode old = (ObjectNode) tree.get("probes");
          ObjectNode renamed = F.objectNode();
          for (java.util.Map.Entry<String, JsonNode> e : old.properties()) {
            renamed.set(e.getKey().equals(from) ? t : e.getKey(), e.getValue());
          }
          tree.set("probes", renamed);
        });
  }

  public void remove(String name) {
    draft.edit(
        "probe " + name + " removed",
        tree -> {
          TreePath.of("probes", name).set(tree, null);
          if (tree.path("probes").isEmpty()) {
            tree.remove("probes");
          }
        });
  }
}
