package dev.soakfield.app.setup;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.soakfield.law.api.LawParameter;
import java.util.List;

/**
 * Edits of a part's material: diffusivity (constant, Arrhenius or orthotropic with axes),
 * solubility (constant or Arrhenius), density, a source law from the catalog with its parameters,
 * or a whole entry from a material library. Each call is one undo step.
 */
public final class MaterialEdits {
  /** How a coefficient is given. */
  public enum Form {
    CONSTANT,
    ARRHENIUS,
    ORTHOTROPIC
  }

  private static final JsonNodeFactory F = JsonNodeFactory.instance;
  private final CaseDraft draft;

  public MaterialEdits(CaseDraft draft) {
    this.draft = draft;
  }

  public static TreePath path(String part) {
    return TreePath.of("materials", part);
  }

  public JsonNode entry(String part) {
    return path(part).in(draft.tree());
  }

  /** The form the diffusivity ("diffusivity") or solubility ("solubility") is given in. */
  public Form form(String part, String key) {
    JsonNode v = entry(part).path(key);
    if (v.has("principal")) {
      return Form.ORTHOTROPIC;
    }
    return v.has("D0") || v.has("S0") ? Form.ARRHENIUS : Form.CONSTANT;
  }

  /**
   * Changes how the coefficient is given, carrying the value over: a constant becomes the
   * pre-factor with a zero energy, or the three principal values along x, y and z.
   */
  public void form(String part, String key, Form form) {
    boolean diffusivity = key.equals("diffusivity");
    draft.edit(
        key + " of " + part + " as " + form.name().toLowerCase(java.util.Locale.ROOT),
        tree -> {
          TreePath p = path(part).child(key);
          JsonNode old = p.in(tree);
          JsonNode value = scalar(old, diffusivity ? 1e-12 : 1);
          switch (form) {
            case CONSTANT -> p.set(tree, value);
            case ARRHENIUS -> {
              ObjectNode o = F.objectNode();
              o.set(diffusivity ? "D0" : "S0", value);
              o.put(diffusivity ? "Q" : "dH", "0 kJ/mol");
              p.set(tree, o);
            }
            case ORTHOTROPIC -> {
              if (!diffusivity) {
                throw new IllegalArgumentException("solubility has no axes");
              }
              ObjectNode o = F.objectNode();
              ArrayNode principal = o.putArray("principal");
              for (int i = 0; i < 3; i++) {
                principal.add(value.deepCopy());
              }
              ArrayNode axes = o.putArray("axes");
              axes.addArray().add(1).add(0).add(0);
              axes.addArray().add(0).add(1).add(0);
              axes.addArray().add(0).add(0).add(1);
              p.set(tree, o);
            }
          }
        });
  }

  private static JsonNode scalar(JsonNode old, double otherwise) {
    if (old.isValueNode()) {
      return old.deepCopy();
    }
    for (String k : List.of("D0", "S0")) {
      if (old.has(k)) {
        return old.get(k).deepCopy();
      }
    }
    if (old.path("principal").isArray() && old.path("principal").size() > 0) {
      return old.path("principal").get(0).deepCopy();
    }
    return F.numberNode(otherwise);
  }

  /** Sets a value of the part's material from typed text: {@code at} is a path inside the entry. */
  public void value(String part, TreePath at, String typed) {
    JsonNode v = CaseValues.node(typed);
    TreePath p = path(part);
    for (Object s : at.steps()) {
      p = p.child(s);
    }
    TreePath target = p;
    draft.edit(at.spelt() + " of " + part, tree -> target.set(tree, v));
  }

  /**
   * Gives the part a source law with every parameter at its default (required ones left to fill).
   */
  public void sourceLaw(String part, String lawId, List<LawParameter> parameters) {
    draft.edit(
        "source law " + lawId + " in " + part,
        tree -> {
          ObjectNode o = F.objectNode().put("law", lawId);
          for (LawParameter lp : parameters) {
            if (!lp.isRequired()) {
              o.put(lp.name(), lp.defaultValue());
            }
          }
          path(part).child("source").set(tree, o);
        });
  }

  /** Gives the part values to start from: D = 1e-12 m²/s, S = 1 (to be edited). */
  public void startingMaterial(String part) {
    draft.edit(
        "material for " + part,
        tree ->
            path(part).set(tree, F.objectNode().put("diffusivity", 1e-12).put("solubility", 1)));
  }

  /** Marks the part impermeable: it is taken out of the run (see the case file's key). */
  public void impermeable(String part) {
    draft.edit(
        part + " impermeable",
        tree -> path(part).set(tree, F.objectNode().put("impermeable", true)));
  }

  public boolean isImpermeable(String part) {
    return entry(part).path("impermeable").asBoolean(false);
  }

  /** Takes the part's source away. */
  public void noSource(String part) {
    draft.edit("no source in " + part, tree -> path(part).child("source").set(tree, null));
  }

  /** Replaces the part's material by a library entry (its note and origin stay in the library). */
  public void fromLibrary(String part, String name, ObjectNode entry) {
    draft.edit("material " + name + " for " + part, tree -> path(part).set(tree, entry.deepCopy()));
  }
}
