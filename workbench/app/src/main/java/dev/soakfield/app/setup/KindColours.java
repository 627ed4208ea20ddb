package dev.soakfield.app.setup;

import dev.soakfield.fem.physics.FaceKind;
import java.util.List;

/**
 * The set-up view's colours of face groups, of our own choosing: one calm colour per face kind, a
 * loud yellow for exterior groups with no entry (sealed by default, which the user may not mean),
 * and the selection in magenta so it reads against every kind.
 */
public final class KindColours {
  /** Selected groups. */
  public static final int SELECTED = 0xd63a9e;

  /** Exterior groups with no entry. */
  public static final int NO_ENTRY = 0xf0d43a;

  private KindColours() {}

  /** The colour of a face kind. */
  public static int of(FaceKind kind) {
    return switch (kind) {
      case CONCENTRATION -> 0x3f78c0;
      case FLUX -> 0xd98b3a;
      case EXCHANGE -> 0x4aa37a;
      case AMBIENT -> 0x8c6cc4;
      case SEALED -> 0x8e8e8e;
      case LAW -> 0xc0508a;
    };
  }

  /** The colour of an interface group with no entry: it joins its parts, nothing to decide. */
  public static final int INTERFACE = 0xb4b4b4;

  /**
   * Colours for the mesh's face groups in order.
   *
   * @param groups the face group names
   * @param interfaces which of them join two parts
   */
  public static int[] forGroups(
      List<String> groups, boolean[] interfaces, FaceEdits faces, FaceSelection selection) {
    int[] out = new int[groups.size()];
    for (int i = 0; i < out.length; i++) {
      String g = groups.get(i);
      String kind = faces.kindOf(g);
      if (selection.contains(g)) {
        out[i] = SELECTED;
      } else if (kind.isEmpty()) {
        out[i] = interfaces[i] ? INTERFACE : NO_ENTRY;
      } else {
        out[i] = kindOf(kind);
      }
    }
    return out;
  }

  /**
   * The colour of the kind the case file calls {@code word} (unknown words: the no-entry yellow).
   */
  public static int ofWord(String word) {
    return kindOf(word);
  }

  private static int kindOf(String word) {
    for (FaceKind k : FaceKind.values()) {
      if (k.word().equals(word)) {
        return of(k);
      }
    }
    return NO_ENTRY; // a misspelt kind: the check says what it expected
  }
}
