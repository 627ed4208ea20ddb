package dev.soakfield.app.setup;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.MissingNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * A place in a case tree: object keys and array indexes, spelt as the case reader spells key paths
 * in its messages ({@code faces.zmax.value}, {@code exposure[1].duration}), so that a check's
 * message finds the field it is about.
 */
public record TreePath(List<Object> steps) {
  public TreePath {
    steps = List.copyOf(steps);
    for (Object s : steps) {
      if (!(s instanceof String) && !(s instanceof Integer)) {
        throw new IllegalArgumentException("a path step is a key or an index, got " + s);
      }
    }
  }

  /** A path of keys (String) and indexes (Integer). */
  public static TreePath of(Object... steps) {
    return new TreePath(List.of(steps));
  }

  public TreePath child(Object step) {
    List<Object> s = new ArrayList<>(steps);
    s.add(step);
    return new TreePath(s);
  }

  /** The reader's spelling. */
  public String spelt() {
    StringBuilder sb = new StringBuilder();
    for (Object s : steps) {
      if (s instanceof Integer i) {
        sb.append('[').append(i).append(']');
      } else {
        if (sb.length() > 0) {
          sb.append('.');
        }
        sb.append(s);
      }
    }
    return sb.toString();
  }

  /** The node at this path, or a missing node. */
  public JsonNode in(JsonNode root) {
    JsonNode n = root;
    for (Object s : steps) {
      n = s instanceof Integer i ? n.path(i) : n.path((String) s);
    }
    return n == null ? MissingNode.getInstance() : n;
  }

  /**
   * Puts {@code value} at this path, making the objects on the way; {@code null} removes the key
   * (and objects left empty by it, but never the top-level sections).
   */
  public void set(ObjectNode root, JsonNode value) {
    if (steps.isEmpty()) {
      throw new IllegalArgumentException("cannot replace the whole case");
    }
    JsonNode parent = root;
    for (int i = 0; i < steps.size() - 1; i++) {
      Object s = steps.get(i);
      JsonNode next = s instanceof Integer k ? parent.path(k) : parent.path((String) s);
      if (!next.isContainerNode()) {
        if (value == null) {
          return; // nothing there to remove
        }
        next = steps.get(i + 1) instanceof Integer ? root.arrayNode() : root.objectNode();
        put(parent, s, next);
      }
      parent = next;
    }
    Object last = steps.get(steps.size() - 1);
    if (value == null) {
      if (parent instanceof ObjectNode o) {
        o.remove((String) last);
        if (o.isEmpty() && steps.size() > 2) {
          new TreePath(steps.subList(0, steps.size() - 1)).set(root, null);
        }
      } else if (parent instanceof ArrayNode a && (Integer) last < a.size()) {
        a.remove((Integer) last);
      }
      return;
    }
    put(parent, last, value);
  }

  private static void put(JsonNode parent, Object step, JsonNode value) {
    if (parent instanceof ObjectNode o) {
      o.set((String) step, value);
    } else if (parent instanceof ArrayNode a) {
      int i = (Integer) step;
      while (a.size() <= i) {
        a.addNull();
      }
      a.set(i, value);
    } else {
      throw new IllegalArgumentException("no object or array to hold " + step);
    }
  }

  @Override
  public String toString() {
    return spelt();
  }

  /** Whether {@code problemPath} (the reader's spelling) is this path or inside it. */
  public boolean covers(String problemPath) {
    String me = spelt();
    Objects.requireNonNull(problemPath, "problemPath");
    return problemPath.equals(me)
        || problemPath.startsWith(me + ".")
        || problemPath.startsWith(me + "[");
  }
}
