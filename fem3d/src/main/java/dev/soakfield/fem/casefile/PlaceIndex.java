package dev.soakfield.fem.casefile;

import java.util.LinkedHashMap;
import java.util.Map;

/** The place of every value of a case tree, by key path, for checks made after binding. */
final class PlaceIndex {
  private PlaceIndex() {}

  static Map<String, SourcePlace> of(CaseNode root) {
    Map<String, SourcePlace> places = new LinkedHashMap<>();
    visit(root, "", places);
    return places;
  }

  private static void visit(CaseNode node, String path, Map<String, SourcePlace> places) {
    places.put(path, new SourcePlace(node.line(), node.column()));
    if (node instanceof CaseNode.Obj obj) {
      for (CaseNode.Member m : obj.members().values()) {
        visit(m.value(), CasePaths.child(path, m.key()), places);
      }
    } else if (node instanceof CaseNode.Arr arr) {
      for (int i = 0; i < arr.items().size(); i++) {
        visit(arr.items().get(i), CasePaths.item(path, i), places);
      }
    }
  }
}
