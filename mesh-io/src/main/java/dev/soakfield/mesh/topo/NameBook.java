package dev.soakfield.mesh.topo;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/** Hands out group names that are unique within one kind of group, and remembers renames. */
final class NameBook {
  private final Set<String> taken = new HashSet<>();
  private final List<String> renames = new ArrayList<>();

  /** {@code wanted} when free, else {@code wanted-2}, {@code wanted-3}, ... */
  String claim(String wanted) {
    if (taken.add(wanted)) {
      return wanted;
    }
    for (int n = 2; ; n++) {
      String candidate = wanted + "-" + n;
      if (taken.add(candidate)) {
        renames.add("'" + wanted + "' became '" + candidate + "'");
        return candidate;
      }
    }
  }

  /** One line per renamed group, e.g. {@code 'wall' became 'wall-2'}. */
  List<String> renames() {
    return renames;
  }
}
