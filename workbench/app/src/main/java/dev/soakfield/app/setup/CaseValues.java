package dev.soakfield.app.setup;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import java.math.BigDecimal;

/**
 * Values as typed into a field and as stored in the case: a plain number stays a JSON number as
 * typed, anything else (a value with a unit, "168 h", "85 degC", a word) a string the case reader
 * then checks; an arrow makes a ramp ({@code "85 degC -> 125 degC"} → a two-element array) and
 * commas a list ({@code "1 h, 6 h, 24 h"}, a point {@code "0.005, 0.005, 0.001"}).
 */
public final class CaseValues {
  private static final JsonNodeFactory F = JsonNodeFactory.instance;
  private static final String ARROW = "->";

  private CaseValues() {}

  /** The node for typed text; {@code null} for empty text (the key is removed). */
  public static JsonNode node(String typed) {
    String t = typed.strip();
    if (t.isEmpty()) {
      return null;
    }
    int arrow = t.indexOf(ARROW);
    if (arrow > 0) {
      JsonNode from = node(t.substring(0, arrow));
      JsonNode to = node(t.substring(arrow + ARROW.length()));
      if (from != null && to != null) {
        return F.arrayNode().add(from).add(to);
      }
    }
    if (t.indexOf(',') >= 0) {
      var list = F.arrayNode();
      for (String part : t.split(",", -1)) {
        JsonNode n = node(part);
        if (n != null) {
          list.add(n);
        }
      }
      return list;
    }
    return number(t);
  }

  /** The text of a value that may be a ramp (two values, shown with an arrow). */
  public static String rampText(JsonNode n) {
    if (n != null && n.isArray() && n.size() == 2 && !n.get(0).isContainerNode()) {
      return text(n.get(0)) + " " + ARROW + " " + text(n.get(1));
    }
    return text(n);
  }

  private static JsonNode number(String t) {
    try {
      BigDecimal d = new BigDecimal(t);
      if (d.scale() <= 0 && d.abs().compareTo(BigDecimal.valueOf(Long.MAX_VALUE)) < 0) {
        return t.matches("[-+]?\\d+") ? F.numberNode(d.longValueExact()) : F.numberNode(d);
      }
      return F.numberNode(d);
    } catch (NumberFormatException e) {
      return F.textNode(t);
    }
  }

  /** The text a field shows for a stored value: lists joined by commas. */
  public static String text(JsonNode n) {
    if (n == null || n.isMissingNode() || n.isNull()) {
      return "";
    }
    if (n.isArray()) {
      StringBuilder sb = new StringBuilder();
      for (JsonNode item : n) {
        sb.append(sb.length() > 0 ? ", " : "").append(text(item));
      }
      return sb.toString();
    }
    if (n.isBigDecimal()) {
      return n.decimalValue().toString();
    }
    return n.isValueNode() ? n.asText() : n.toString();
  }
}
